import { HTMLTable } from '@blueprintjs/core';

import { formatNumber } from '@/lib/units';

import type { ImportProblem } from '../../types';

export interface ImportProblemsTableProps {
  problems: readonly ImportProblem[];
  truncated: boolean;
}

/** Every problem of a file: the file's own row number, the column and what is wrong. */
export function ImportProblemsTable({ problems, truncated }: ImportProblemsTableProps) {
  return (
    <>
      <div className="tc-import-scroll">
        <HTMLTable className="tc-table" compact striped aria-label="Problems in the file">
          <thead>
            <tr>
              <th scope="col" className="tc-number">
                Row
              </th>
              <th scope="col">Column</th>
              <th scope="col">Problem</th>
            </tr>
          </thead>
          <tbody>
            {problems.map((problem, index) => (
              <tr key={`${problem.row}-${problem.column}-${index}`}>
                <td className="tc-number">{formatNumber(problem.row, 0)}</td>
                <td>
                  <code>{problem.column || '—'}</code>
                </td>
                <td>{problem.message}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      {truncated ? (
        <p className="tc-muted tc-import-note">
          Only the first {formatNumber(problems.length, 0)} problems are listed here; there are more problems in the error report. Import
          the valid rows only to get the report with every rejected row.
        </p>
      ) : null}
    </>
  );
}
