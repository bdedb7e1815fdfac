import '@/styles/workspace.css';

import { Button, Callout } from '@blueprintjs/core';
import { ChevronLeftIcon } from '@blueprintjs/icons';
import { Link, useParams, useSearchParams } from 'react-router-dom';

import { NotFound } from '@/components/errors/not-found';
import { PageLoader } from '@/components/page-loader';
import { useDesign } from '@/features/designs/api/get-design';
import { DesignWorkspace, type DesignTab } from '@/features/designs/components/design-workspace';
import { SelectionPanel } from '@/features/selection/components/selection-panel';
import { errorMessage, errorStatus } from '@/lib/api-errors';

const TABS: readonly DesignTab[] = ['equipment', 'layout', 'running', 'requirements', 'selection'];

/**
 * The design workspace: the design's input (designs feature) with the mount selection
 * (selection feature) in its last tab. `?tab=selection` opens that tab first.
 */
export function Component() {
  const designId = Number(useParams().designId);
  const valid = Number.isInteger(designId) && designId > 0;
  const design = useDesign(valid ? designId : 0);
  const [search] = useSearchParams();
  const requested = search.get('tab') as DesignTab | null;
  const initialTab = requested && TABS.includes(requested) ? requested : 'equipment';

  if (!valid || errorStatus(design.error) === 404) return <NotFound />;
  if (design.isPending) return <PageLoader label="Loading the design" />;
  if (design.isError) {
    return (
      <Callout intent="danger" title="The design could not be loaded">
        <p>{errorMessage(design.error)}</p>
        <Button text="Try again" onClick={() => void design.refetch()} />
      </Callout>
    );
  }

  return (
    <div className="tc-design-page">
      <Link to={`/projects/${design.data.projectId}`} className="tc-back-link">
        <ChevronLeftIcon /> {design.data.projectName}
      </Link>
      <DesignWorkspace
        key={design.data.id}
        design={design.data}
        initialTab={initialTab}
        onReload={async () => (await design.refetch()).data}
        renderSelection={(context) => (
          <SelectionPanel
            designId={context.design.id}
            savedInput={context.design.input}
            chosen={context.design.chosen}
            liveMassKg={context.figures.mass?.massKg ?? null}
            frequencies={context.figures.frequencies}
            targetTransmissibility={context.figures.targetTransmissibility}
            canRun={context.canRun}
            canEdit={context.canEdit}
            dirty={context.dirty}
            saveIfNeeded={context.saveIfNeeded}
            choose={context.choose}
            choosing={context.choosing}
          />
        )}
      />
    </div>
  );
}
