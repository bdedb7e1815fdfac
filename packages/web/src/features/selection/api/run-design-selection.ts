import { useMutation } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { SelectionResult } from '@/types/design-api';

export interface RunDesignSelectionInput {
  designId: number;
  /** Most candidates to return (server default 20, at most 200). */
  limit?: number;
}

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
