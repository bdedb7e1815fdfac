/** A supplier as `GET /api/suppliers` returns it (sorted by name). */
export interface Supplier {
  id: number;
  name: string;
  contactEmail: string | null;
  phone: string | null;
  notes: string | null;
  active: boolean;
  /** How many mounts of this supplier the catalog holds. */
  mountCount: number;
  createdAt: string;
  updatedAt: string;
}

/** Body of `POST /api/suppliers`. A name already taken (any case or spacing) answers 409. */
export interface CreateSupplierInput {
  name: string;
  contactEmail?: string | null;
  phone?: string | null;
  notes?: string | null;
}

/** Body of `PATCH /api/suppliers/:id`: the changed fields only. */
export type UpdateSupplierInput = Partial<CreateSupplierInput> & { active?: boolean };
