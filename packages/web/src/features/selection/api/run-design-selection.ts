import { useMutation } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';
import type { SelectionResult } from '@/types/design-api';

/** The design and the body; `limit` is the most candidates to return (server default 20, at most 200). */
export type RunDesignSelectionInput = ApiSchemas['RunDesignSelectionDto'] & { designId: number };

/**
 * `POST /api/designs/:id/selection` (engineer, admin): ranks the catalog for the design's saved
 * input; passing candidates first, then failing ones with their reasons.
 */
export async function runDesignSelection({ designId, limit }: RunDesignSelectionInput): Promise<SelectionResult> {
  const { data } = await api.post<SelectionResult>(`/designs/${designId}/selection`, limit === undefined ? {} : { limit });
  return data;
}

export function useRunDesignSelection() {
  return useMutation({ mutationFn: runDesignSelection });
}
