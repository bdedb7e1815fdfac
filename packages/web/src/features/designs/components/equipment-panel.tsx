import { Callout } from '@blueprintjs/core';

import { useUnits } from '@/lib/units';

import type { DesignFigures } from '../hooks/use-design-figures';
import { EquipmentTable } from './equipment-table';
import { positionDigits } from './key-figures';

/** The machine's components and, live, their total mass and combined centre of gravity. */
export function EquipmentPanel({ readOnly, figures }: { readOnly: boolean; figures: DesignFigures }) {
  const units = useUnits();
  const { mass } = figures;
  const digits = positionDigits(units);
  return (
    <>
      <p className="tc-muted tc-intro">
        Use operating masses — with liquid in the casing, insulation and any inertia base. Axes: x along the skid, y across it, z up;
        positions from any origin you like, the same one as the mount points. A box size adds the part's own inertia for the rocking modes.
      </p>
      <EquipmentTable readOnly={readOnly} />
      <section className="tc-totals" aria-label="Equipment totals">
        {mass ? (
          <dl className="tc-facts tc-facts--inline">
            <dt>Total mass</dt>
            <dd data-testid="equipment-total-mass">{units.format('mass', mass.massKg)}</dd>
            <dt>Centre of gravity</dt>
            <dd data-testid="equipment-cg">
              x {units.format('position', mass.cg.x, digits)}, y {units.format('position', mass.cg.y, digits)}, z{' '}
              {units.format('position', mass.cg.z, digits)}
            </dd>
          </dl>
        ) : (
          <Callout>{figures.massProblem}</Callout>
        )}
      </section>
    </>
  );
}
