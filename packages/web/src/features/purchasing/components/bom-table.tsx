import { HTMLTable } from '@blueprintjs/core';

import type { BomLine } from '@/types/design-api';

import { formatLeadTime, formatPrice } from './format';

export interface BomTotals {
  quantity: number;
  /** Sum of the extended prices; null when no line has a price. */
  total: number | null;
  /** Some line has no price, so the total leaves it out. */
  incomplete: boolean;
  /** The longest lead time of any line. */
  leadTimeDays: number | null;
  currency: string;
}

export function bomTotals(lines: readonly BomLine[]): BomTotals {
  const priced = lines.filter((line) => line.extendedPrice !== null);
  const leadTimes = lines.map((line) => line.leadTimeDays).filter((days): days is number => days !== null);
  return {
    quantity: lines.reduce((sum, line) => sum + line.quantity, 0),
    total: priced.length > 0 ? priced.reduce((sum, line) => sum + (line.extendedPrice ?? 0), 0) : null,
    incomplete: priced.length < lines.length,
    leadTimeDays: leadTimes.length > 0 ? Math.max(...leadTimes) : null,
    currency: lines[0]?.currency ?? 'USD',
  };
}

/** The bill of materials: one line per supplier and part number, with the totals underneath. */
export function BomTable({ lines }: { lines: readonly BomLine[] }) {
  const totals = bomTotals(lines);
  return (
    <div className="tc-table-scroll">
      <HTMLTable className="tc-table tc-bom-table" striped aria-label="Bill of materials">
        <thead>
          <tr>
            <th scope="col">Supplier</th>
            <th scope="col">Part number</th>
            <th scope="col" className="tc-number">
              Quantity
            </th>
            <th scope="col">Mount points</th>
            <th scope="col" className="tc-number">
              Unit price
            </th>
            <th scope="col" className="tc-number">
              Extended price
            </th>
            <th scope="col" className="tc-number">
              Lead time
            </th>
          </tr>
        </thead>
        <tbody>
          {lines.map((line) => (
            <tr key={`${line.supplier.id}:${line.partNumber}`}>
              <td>{line.supplier.name}</td>
              <td className="tc-part-number">{line.partNumber}</td>
              <td className="tc-number">{line.quantity}</td>
              <td>{line.mountPoints.join(', ')}</td>
              <td className="tc-number">{formatPrice(line.unitPrice, line.currency)}</td>
              <td className="tc-number">{formatPrice(line.extendedPrice, line.currency)}</td>
              <td className="tc-number">{formatLeadTime(line.leadTimeDays)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="tc-bom-totals">
            <th scope="row" colSpan={2}>
              Total
            </th>
            <td className="tc-number" data-testid="bom-total-quantity">
              {totals.quantity}
            </td>
            <td />
            <td />
            <td className="tc-number" data-testid="bom-total-price">
              {formatPrice(totals.total, totals.currency)}
              {totals.incomplete && totals.total !== null ? ' + unpriced lines' : ''}
            </td>
            <td className="tc-number" data-testid="bom-longest-lead-time">
              {totals.leadTimeDays === null ? '—' : `longest ${formatLeadTime(totals.leadTimeDays)}`}
            </td>
          </tr>
        </tfoot>
      </HTMLTable>
    </div>
  );
}
