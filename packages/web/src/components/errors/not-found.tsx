import { NonIdealState } from '@blueprintjs/core';
import { MapIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';

import { useDocumentTitle } from '@/hooks/use-document-title';

export function NotFound() {
  useDocumentTitle('Page not found');
  return (
    <div className="tc-panel tc-message-page">
      <NonIdealState
        icon={<MapIcon size={40} />}
        title="Page not found"
        description="There is no page at this address. It may have moved, or the link may be mistyped."
        action={<Link to="/">Back to the start page</Link>}
      />
    </div>
  );
}
