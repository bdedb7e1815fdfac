/** Life cycle of a design revision (the transitions belong to the review workflow). */
export const DESIGN_STATUSES = ['draft', 'in_review', 'released', 'superseded'] as const;

export type DesignStatus = (typeof DESIGN_STATUSES)[number];

/** The statuses a purchaser may see: only what was signed off. */
export const PURCHASER_VISIBLE_STATUSES: readonly DesignStatus[] = ['released', 'superseded'];
