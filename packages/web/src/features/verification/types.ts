/**
 * The as-built verification API's shapes: aliases of the types generated from the server's
 * OpenAPI document (`@/api/schema`, `npm run api-types`).
 */
import type { ApiSchemas } from '@/api/schema';

/** One tap test of a design and its comparison with the prediction (`GET /api/designs/:id/verifications`). */
export type Verification = ApiSchemas['VerificationDto'];
/** One problem of a refused file: row (0 = the whole file, 1 = the header), column, message. */
export type TapTestProblem = ApiSchemas['TapTestProblemDto'];
export type VerificationKind = ApiSchemas['VerificationKind'];
export type FrfQuantity = ApiSchemas['FrfQuantity'];
export type VerificationVerdict = ApiSchemas['VerificationVerdict'];
