import type { DesignStatus, PersonRef } from '@/types/design-api';

/** One step in a design's record (`GET /api/designs/:id/history`), oldest first. */
export interface DesignHistoryEntry {
  id: number;
  at: string;
  user: PersonRef;
  /** The state before; null for the record of a revision's creation. */
  from: DesignStatus | null;
  to: DesignStatus;
  comment: string | null;
}

/** The states a design can be moved to by a transition (`POST /api/designs/:id/transitions`). */
export type TransitionTarget = 'in_review' | 'draft' | 'released';

export interface TransitionInput {
  designId: number;
  to: TransitionTarget;
  comment?: string;
}
