import '@/styles/workspace.css';

import { Button, Callout } from '@blueprintjs/core';
import { ChevronLeftIcon } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';

import { NotFound } from '@/components/errors/not-found';
import { PageLoader } from '@/components/page-loader';
import { designQueryKey, useDesign } from '@/features/designs/api/get-design';
import { projectDesignsQueryKey } from '@/features/designs/api/get-project-designs';
import { DesignWorkspace, type DesignTab } from '@/features/designs/components/design-workspace';
import { DesignFilesPanel } from '@/features/purchasing/components/design-files-panel';
import { ReviewPanel } from '@/features/review/components/review-panel';
import { SelectionPanel } from '@/features/selection/components/selection-panel';
import { MeasuredPanel } from '@/features/verification/components/measured-panel';
import { errorMessage, errorStatus } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';
import { canDesign } from '@/lib/authorization';

const TABS: readonly DesignTab[] = ['equipment', 'layout', 'running', 'requirements', 'restraint', 'selection', 'measured'];

/**
 * The design workspace: the design's input (designs feature) with the mount selection
 * (selection feature) in its last tab, check and release (review feature) with the report and
 * bill of materials (purchasing feature) under the header, and on a released or superseded
 * design the as-built measurements (verification feature) in a "Measured" tab.
 * `?tab=selection` (or `measured`) opens that tab first. A change of status remounts the workspace, so
 * it reads the design's new state (e.g. frozen once in review).
 */
export function Component() {
  const designId = Number(useParams().designId);
  const valid = Number.isInteger(designId) && designId > 0;
  const design = useDesign(valid ? designId : 0);
  const [search] = useSearchParams();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const user = useUser();
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
        key={`${design.data.id}:${design.data.status}`}
        design={design.data}
        initialTab={initialTab}
        onReload={async () => (await design.refetch()).data}
        renderReview={(context) => (
          <>
            <ReviewPanel
              design={design.data}
              unsavedEdits={context.dirty}
              saveEdits={context.saveIfNeeded}
              onChanged={(changed) => {
                queryClient.setQueryData(designQueryKey(changed.id), changed);
                void queryClient.invalidateQueries({ queryKey: projectDesignsQueryKey(changed.projectId) });
              }}
              onRevisionCreated={(created) => {
                void queryClient.invalidateQueries({ queryKey: projectDesignsQueryKey(created.projectId) });
                void navigate(`/designs/${created.id}`);
              }}
            />
            <DesignFilesPanel design={design.data} />
          </>
        )}
        renderMeasured={
          design.data.status === 'released' || design.data.status === 'superseded'
            ? () => <MeasuredPanel designId={design.data.id} canUpload={canDesign(user.role)} />
            : undefined
        }
        renderSelection={(context) => (
          <SelectionPanel
            designId={context.design.id}
            savedInput={context.design.input}
            chosen={context.design.chosen}
            stored={context.design.lastSelection}
            liveMassKg={context.figures.mass?.massKg ?? null}
            frequencies={context.figures.frequencies}
            targetTransmissibility={context.figures.targetTransmissibility}
            canRun={context.canRun}
            canEdit={context.canEdit}
            dirty={context.dirty}
            saveIfNeeded={context.saveIfNeeded}
            choose={context.choose}
            choosing={context.choosing}
            onRun={() => void queryClient.invalidateQueries({ queryKey: designQueryKey(context.design.id) })}
          />
        )}
      />
    </div>
  );
}
