import { Tag } from '@blueprintjs/core';

import type { DesignStatus } from '@/types/design-api';

export const STATUS_LABELS: Record<DesignStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  released: 'Released',
  superseded: 'Superseded',
};

/** A design's life-cycle state in Tacet's own colours (see workspace.css). */
export function DesignStatusTag({ status }: { status: DesignStatus }) {
  return (
    <Tag minimal round className={`tc-status tc-status--${status}`}>
      {STATUS_LABELS[status] ?? status}
    </Tag>
  );
}
