import { useMutation, useQueryClient } from '@tanstack/react-query';
import axios from 'axios';

import { api } from '@/lib/api-client';

import type { FrfQuantity, TapTestProblem, Verification, VerificationKind } from '../types';
import { verificationsQueryKey } from './get-verifications';

export interface UploadVerificationInput {
  designId: number;
  file: File;
  kind: VerificationKind;
  /** For an FRF file: what it holds. */
  quantity?: FrfQuantity;
  tolerancePct?: number;
  note?: string;
}

/** What the server answered: the recorded measurement, or a refused file with its problems (422, nothing stored). */
export type UploadOutcome =
  { status: 201; verification: Verification } | { status: 422; message: string; problems: TapTestProblem[]; fileName: string };

const UPLOAD_TIMEOUT_MS = 2 * 60_000;

function isRefusal(value: unknown): value is { message: string; errors: TapTestProblem[] } {
  if (typeof value !== 'object' || value === null) return false;
  const body = value as { message?: unknown; errors?: unknown };
  return typeof body.message === 'string' && Array.isArray(body.errors);
}

/**
 * `POST /api/designs/:id/verifications` (engineer, admin), multipart `file` with `kind`,
 * `quantity`, `tolerancePct` and `note`. A 422 comes back as an outcome, because its problems
 * are what the user needs to see; other failures (413, 409, 403…) throw for `errorMessage`.
 */
export async function uploadVerification(input: UploadVerificationInput): Promise<UploadOutcome> {
  const form = new FormData();
  form.append('kind', input.kind);
  if (input.kind === 'frf' && input.quantity) form.append('quantity', input.quantity);
  if (input.tolerancePct !== undefined) form.append('tolerancePct', String(input.tolerancePct));
  if (input.note?.trim()) form.append('note', input.note.trim());
  form.append('file', input.file, input.file.name);
  try {
    const { data } = await api.post<Verification>(`/designs/${input.designId}/verifications`, form, { timeout: UPLOAD_TIMEOUT_MS });
    return { status: 201, verification: data };
  } catch (error) {
    if (axios.isAxiosError(error) && error.response?.status === 422 && isRefusal(error.response.data)) {
      return { status: 422, message: error.response.data.message, problems: error.response.data.errors, fileName: input.file.name };
    }
    throw error;
  }
}

export function useUploadVerification() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadVerification,
    onSuccess: async (outcome, input) => {
      if (outcome.status === 201) await queryClient.invalidateQueries({ queryKey: verificationsQueryKey(input.designId) });
    },
  });
}
