/**
 * Suppliers as the API returns and takes them. Aliases of the types generated from the server's
 * OpenAPI document (`@/api/schema`, `npm run api-types`).
 */
import type { ApiSchemas } from '@/api/schema';

/** A supplier as `GET /api/suppliers` returns it (sorted by name), with its mount count. */
export type Supplier = ApiSchemas['SupplierDto'];

/** Body of `POST /api/suppliers`. A name already taken (any case or spacing) answers 409. */
export type CreateSupplierInput = ApiSchemas['CreateSupplierDto'];

/** Body of `PATCH /api/suppliers/:id`: the changed fields only. */
export type UpdateSupplierInput = ApiSchemas['UpdateSupplierDto'];
