import { NonIdealState } from '@blueprintjs/core';
import { LockIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';

import { useDocumentTitle } from '@/hooks/use-document-title';

/** Shown in place of a page the signed-in user's role may not use. */
export function Forbidden() {
  useDocumentTitle('No access');
  return (
    <div className="tc-panel tc-message-page">
      <NonIdealState
        icon={<LockIcon size={40} />}
        title="Your role does not give access to this page"
        description="If your work needs it, ask an administrator to change your role."
        action={<Link to="/">Back to the start page</Link>}
      />
    </div>
  );
}
