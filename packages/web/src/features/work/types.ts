/** The work-list API's shapes: aliases of the types generated from the server's OpenAPI document. */
import type { ApiSchemas } from '@/api/schema';

/** `GET /api/my-work`: what the signed-in person has to do. */
export type MyWork = ApiSchemas['MyWorkDto'];
export type WorkItem = ApiSchemas['WorkItemDto'];
