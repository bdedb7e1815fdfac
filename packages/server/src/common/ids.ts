/**
 * Record ids are `integer` columns: 32-bit on PostgreSQL, where a larger value in a query is an
 * error (a 500) rather than "not found". Every id the API reads — a `:id` path parameter or an
 * id field in a body or query — is checked against this range first.
 */
export const MAX_ID = 2_147_483_647;

export const ID_RANGE_MESSAGE = `must be a whole number from 1 to ${MAX_ID}`;
