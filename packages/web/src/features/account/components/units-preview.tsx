import { HTMLTable } from '@blueprintjs/core';
import type { Quantity } from '@tacet/vibration';

import { useUnits } from '@/lib/units';

/** Typical figures of a small pump skid, in SI base units — only to show how numbers will read. */
const SAMPLES: ReadonlyArray<{ label: string; quantity: Quantity; si: number }> = [
  { label: 'Equipment mass', quantity: 'mass', si: 850 },
  { label: 'Load on one mount', quantity: 'force', si: 2450 },
  { label: 'Static deflection', quantity: 'deflection', si: 0.0254 },
  { label: 'Vertical stiffness', quantity: 'stiffness', si: 250_000 },
  { label: 'Running speed', quantity: 'speed', si: 24.75 },
  { label: 'Ambient temperature', quantity: 'temperature', si: 40 },
];

/** How figures appear with the signed-in user's saved unit preference. */
export function UnitsPreview() {
  const units = useUnits();
  return (
    <div className="tc-units-preview">
      <h3 className="tc-subsection-title">How figures appear</h3>
      <HTMLTable compact className="tc-table" aria-label="How figures appear">
        <tbody>
          {SAMPLES.map((sample) => (
            <tr key={sample.label}>
              <th scope="row">{sample.label}</th>
              <td className="tc-number">{units.format(sample.quantity, sample.si)}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <p className="tc-muted">Values are stored in SI and converted only for display.</p>
    </div>
  );
}
