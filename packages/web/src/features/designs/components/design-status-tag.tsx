import { Tag } from '@blueprintjs/core';
import { DESIGN_STATE_LABELS } from '@tacet/vibration';

import type { DesignStatus } from '@/types/design-api';

/** The states in the glossary's words ("In check"). */
export const STATUS_LABELS: Record<DesignStatus, string> = DESIGN_STATE_LABELS;

/** A design's life-cycle state in Tacet's own colours (see workspace.css). */
export function DesignStatusTag({ status }: { status: DesignStatus }) {
  return (
    <Tag minimal round className={`tc-status tc-status--${status}`}>
      {STATUS_LABELS[status] ?? status}
    </Tag>
  );
}
