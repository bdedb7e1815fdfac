import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Design } from '@/types/design-api';

import type { TransitionInput } from '../types';
import { designHistoryQueryKey } from './get-design-history';

/**
 * `POST /api/designs/:id/transitions {to, comment?}`: sends a draft for check, returns it to
 * draft (a comment is required) or releases it. The server decides; 403/409 say why not.
 */
export async function transitionDesign({ designId, to, comment }: TransitionInput): Promise<Design> {
  const body = comment === undefined ? { to } : { to, comment };
  const { data } = await api.post<Design>(`/designs/${designId}/transitions`, body);
  return data;
}

export function useTransitionDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: transitionDesign,
    onSuccess: (design) => queryClient.invalidateQueries({ queryKey: designHistoryQueryKey(design.id) }),
  });
}
