import { HTMLTable, Tag } from '@blueprintjs/core';
import { hzToCpm } from '@tacet/vibration';

import type { DisturbingLine } from '../hooks/use-design-figures';

const hz = new Intl.NumberFormat('en-US', { minimumSignificantDigits: 4, maximumSignificantDigits: 4, useGrouping: false });

/** A frequency with four significant figures, e.g. "24.67 Hz", "148.0 Hz". */
export function formatHz(value: number): string {
  return `${hz.format(value)} Hz`;
}

/** The disturbing frequencies derived from the running conditions, lowest (governing) first. */
export function FrequencyList({ frequencies }: { frequencies: readonly DisturbingLine[] }) {
  return (
    <HTMLTable compact className="tc-table" aria-label="Disturbing frequencies">
      <thead>
        <tr>
          <th scope="col" className="tc-number">
            Frequency
          </th>
          <th scope="col" className="tc-number">
            cpm
          </th>
          <th scope="col">Source</th>
          <th scope="col">
            <span className="tc-visually-hidden">Role</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {frequencies.map((f, index) => (
          <tr key={`${f.label}-${index}`} className={f.governing ? 'tc-row-governing' : undefined}>
            <td className="tc-number">{formatHz(f.frequencyHz)}</td>
            <td className="tc-number tc-muted">{Math.round(hzToCpm(f.frequencyHz)).toLocaleString('en-US')}</td>
            <td>{f.label}</td>
            <td>
              {f.governing ? (
                <Tag minimal className="tc-tag-governing">
                  Governing
                </Tag>
              ) : null}
            </td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
