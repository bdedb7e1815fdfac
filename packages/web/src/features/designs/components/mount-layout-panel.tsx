import { Callout } from '@blueprintjs/core';
import { useMemo } from 'react';

import { useUnits } from '@/lib/units';

import type { DesignFigures } from '../hooks/use-design-figures';
import { LayoutWarnings } from './layout-warnings';
import { MountPointsTable } from './mount-points-table';
import { PlanView } from './plan-view';
import { SideElevation } from './side-elevation';

/** Mount positions with the live plan and side drawings and the load each point takes. */
export function MountLayoutPanel({ readOnly, figures }: { readOnly: boolean; figures: DesignFigures }) {
  const units = useUnits();
  const { mountPoints, mass, loads, layoutWarnings, components, sources } = figures;
  const flagged = useMemo(
    () => new Set(layoutWarnings.filter((w) => w.code === 'mount-lift-off' && w.pointIndex !== undefined).map((w) => w.pointIndex!)),
    [layoutWarnings],
  );
  const planCg = useMemo(() => (mass ? { x: mass.cg.x, y: mass.cg.y } : null), [mass]);
  const total = loads ? loads.loadsN.reduce((sum, f) => sum + f, 0) : null;

  return (
    <>
      <p className="tc-muted tc-intro">
        Plan positions of the mounts and the height of each mount's elastic centre (usually mid-height of the resilient part). Loads assume
        equal mounts under a rigid frame; the candidates' own loads come with the selection.
      </p>
      <div className="tc-two-columns tc-two-columns--wide-left">
        <div>
          <MountPointsTable readOnly={readOnly} loadsN={loads?.loadsN ?? null} />
          {total !== null && mass ? (
            <p className="tc-muted tc-note" data-testid="loads-total">
              Loads add up to {units.format('force', total)}; the weight is {units.format('force', mass.weightN)}.
            </p>
          ) : null}
          <LayoutWarnings warnings={layoutWarnings} points={mountPoints} units={units} />
          {!mass && figures.massProblem ? <Callout className="tc-note">{figures.massProblem}</Callout> : null}
          {!mountPoints ? <Callout className="tc-note">Complete every mount point to see the drawings and loads.</Callout> : null}
        </div>
        <div className="tc-drawings">
          {mountPoints && mountPoints.length > 0 ? (
            <>
              <h3 className="tc-subsection-title tc-first">Plan, from above</h3>
              <PlanView points={mountPoints} loadsN={loads?.loadsN ?? null} cg={planCg} flagged={flagged} sources={sources} units={units} />
              <h3 className="tc-subsection-title">Side elevation, looking along +y</h3>
              <SideElevation points={mountPoints} cg={mass?.cg ?? null} components={components} sources={sources} units={units} />
            </>
          ) : null}
        </div>
      </div>
    </>
  );
}
