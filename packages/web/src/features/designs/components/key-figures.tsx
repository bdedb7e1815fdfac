import type { ReactNode } from 'react';

import type { Units } from '@/lib/units';
import type { Candidate } from '@/types/design-api';

import type { DesignFigures } from '../hooks/use-design-figures';
import { formatHz } from './frequency-list';

function Figure({ label, children, testId }: { label: string; children: ReactNode; testId?: string }) {
  return (
    <div className="tc-key-figure">
      <dt>{label}</dt>
      <dd data-testid={testId}>{children}</dd>
    </div>
  );
}

/** Position digits: 4 decimals in metres (0.3775 m), 2 in inches (14.86 in). */
export function positionDigits(units: Units): number {
  return units.system === 'SI' ? 4 : 2;
}

/** The figures an engineer keeps an eye on while editing, recomputed as they type. */
export function KeyFigures({ figures, chosen, units }: { figures: DesignFigures; chosen: Candidate | null; units: Units }) {
  const { mass, governing } = figures;
  const digits = positionDigits(units);
  return (
    <dl className="tc-key-figures" aria-label="Key figures">
      <Figure label="Total mass" testId="total-mass">
        {mass ? units.format('mass', mass.massKg) : '—'}
      </Figure>
      <Figure label="Weight" testId="total-weight">
        {mass ? units.format('force', mass.weightN) : '—'}
      </Figure>
      <Figure label="Centre of gravity (x, y, z)" testId="total-cg">
        {mass
          ? `${units.format('position', mass.cg.x, digits)}, ${units.format('position', mass.cg.y, digits)}, ${units.format('position', mass.cg.z, digits)}`
          : '—'}
      </Figure>
      <Figure label="Governing frequency" testId="governing-frequency">
        {governing ? formatHz(governing.frequencyHz) : '—'}
      </Figure>
      <Figure label="Chosen mounts" testId="chosen-mounts">
        {chosen ? chosen.label : <span className="tc-muted">None chosen yet</span>}
      </Figure>
    </dl>
  );
}
