import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Design } from '@/types/design-api';

import type { TransitionInput } from '../types';
import { designHistoryQueryKey } from './get-design-history';

/**
 * `POST /api/designs/:id/transitions {to, note?, comment?, checkerId?}`: sends a draft for check
 * (with the author's note and, optionally, a named checker), returns it to draft (a comment is
 * required) or releases it (the comment is the release notes). The server decides; 403/409 say why not.
 */
export async function transitionDesign({ designId, ...body }: TransitionInput): Promise<Design> {
  const sent = Object.fromEntries(Object.entries(body).filter(([, value]) => value !== undefined && value !== ''));
  const { data } = await api.post<Design>(`/designs/${designId}/transitions`, sent);
  return data;
}

export function useTransitionDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: transitionDesign,
    onSuccess: (design) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: designHistoryQueryKey(design.id) }),
        queryClient.invalidateQueries({ queryKey: ['my-work'] }),
      ]),
  });
}
