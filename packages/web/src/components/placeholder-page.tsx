import { NonIdealState } from '@blueprintjs/core';
import { BuildIcon } from '@blueprintjs/icons';

import { PageHeader } from './page-header';

/** Stands in for an area that a later release delivers. */
export function PlaceholderPage({ title, purpose }: { title: string; purpose: string }) {
  return (
    <>
      <PageHeader title={title} description={purpose} />
      <div className="tc-panel tc-placeholder">
        <NonIdealState
          icon={<BuildIcon size={40} />}
          title="Not built yet — this area arrives with a later release"
          description="Nothing here is lost: the area appears in the navigation already so you know where it will be."
        />
      </div>
    </>
  );
}
