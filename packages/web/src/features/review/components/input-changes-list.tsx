import { HTMLTable } from '@blueprintjs/core';

import type { SubmissionChanges } from '../types';

/** "Since when" in words. */
export function changesSince(changes: SubmissionChanges): string {
  return changes.sinceRevision === null ? 'since it was last sent for check' : `since revision ${changes.sinceRevision}`;
}

/** What changed in the input, field by field, in the reader's units (the server formats them for the signed-in user). */
export function InputChangesList({ changes }: { changes: SubmissionChanges }) {
  if (changes.items.length === 0) {
    return <p className="tc-muted">Nothing in the input or the chosen mounts changed {changesSince(changes)}.</p>;
  }
  return (
    <HTMLTable compact className="tc-table tc-changes-table" aria-label={`What changed ${changesSince(changes)}`}>
      <thead>
        <tr>
          <th scope="col">Field</th>
          <th scope="col">Before</th>
          <th scope="col">Now</th>
        </tr>
      </thead>
      <tbody>
        {changes.items.map((item) => (
          <tr key={item.field}>
            <td>{item.label}</td>
            <td>{item.beforeText}</td>
            <td>{item.afterText}</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
