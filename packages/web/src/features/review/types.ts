/**
 * The review API's shapes: aliases of the types generated from the server's OpenAPI document
 * (`@/api/schema`, `npm run api-types`).
 */
import type { ApiSchemas } from '@/api/schema';

/**
 * One step in a design's record (`GET /api/designs/:id/history`), oldest first; `from` is null
 * for the record of a revision's creation.
 */
export type DesignHistoryEntry = ApiSchemas['HistoryEntryDto'];

/** The states a design can be moved to by a transition (`POST /api/designs/:id/transitions`). */
export type TransitionTarget = ApiSchemas['TransitionTarget'];

/** What the review panel sends: the design and the body of the transition. */
export type TransitionInput = ApiSchemas['TransitionDto'] & { designId: number };

/** What changed in a design's input since it was last sent for check, in the reader's units. */
export type SubmissionChanges = ApiSchemas['SubmissionChangesDto'];
export type InputChange = ApiSchemas['InputChangeDto'];
