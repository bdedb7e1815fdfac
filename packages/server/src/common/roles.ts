/** The roles a user can hold (exact strings of the API). */
export const ROLES = ['admin', 'catalog_manager', 'engineer', 'purchaser', 'viewer'] as const;

export type Role = (typeof ROLES)[number];
