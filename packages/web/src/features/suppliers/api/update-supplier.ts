import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Supplier, UpdateSupplierInput } from '../types';
import { suppliersQueryKey } from './get-suppliers';

/** `PATCH /api/suppliers/:id` (catalog manager, admin). */
export async function updateSupplier(id: number, changes: UpdateSupplierInput): Promise<Supplier> {
  const { data } = await api.patch<Supplier>(`/suppliers/${id}`, changes);
  return data;
}

export function useUpdateSupplier() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: number; changes: UpdateSupplierInput }) => updateSupplier(id, changes),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: suppliersQueryKey }),
  });
}
