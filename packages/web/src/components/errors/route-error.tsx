import { Button, NonIdealState } from '@blueprintjs/core';
import { ErrorIcon } from '@blueprintjs/icons';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

import { useDocumentTitle } from '@/hooks/use-document-title';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (error instanceof Error) {
    // A page's code could not be fetched: usually a new version was published meanwhile.
    if (/dynamically imported module|Importing a module script failed|Failed to fetch/i.test(error.message)) {
      return 'Part of the app could not be loaded — a newer version may have been published. Reloading fixes this.';
    }
    return error.message;
  }
  return 'An unexpected error occurred.';
}

/** Router error boundary: anything a page throws ends up here instead of a blank screen. */
export function RouteError() {
  const error = useRouteError();
  useDocumentTitle('Something went wrong');
  return (
    <div className="tc-panel tc-message-page tc-message-page--standalone">
      <NonIdealState
        icon={<ErrorIcon size={40} />}
        title="Something went wrong"
        description={describe(error)}
        action={<Button intent="primary" text="Reload the page" onClick={() => window.location.reload()} />}
      />
    </div>
  );
}
