/**
 * The server's API contract for the web: types (and the members of each named enum) generated
 * from its OpenAPI document into `schema.gen.ts` by `npm run api-types`. Features alias what they
 * use (`export type Mount = ApiSchemas['MountDto']`); nothing here is written by hand.
 */
import type { components } from './schema.gen';

export * from './schema.gen';

/** Every request and response body of the API, by the server's DTO name. */
export type ApiSchemas = components['schemas'];
