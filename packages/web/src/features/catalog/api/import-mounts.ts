import { useMutation, useQueryClient } from '@tanstack/react-query';
import axios from 'axios';

import { api } from '@/lib/api-client';

import type { ImportResult } from '../types';
import { mountsQueryKey } from './get-mounts';
import { importsQueryKey } from './get-imports';

/**
 * How to send a file: a dry run checks it and writes nothing; `skipInvalid` writes the valid rows
 * and leaves the others in an error report; neither is the default all-or-nothing import.
 */
export type ImportRequestMode = 'dry-run' | 'all-or-nothing' | 'skip-invalid';

export interface ImportMountsInput {
  file: File;
  mode: ImportRequestMode;
}

/**
 * What the server answered about a file. `written` is false when nothing was stored: a dry run,
 * or a file refused with 422 (invalid rows without "valid rows only", or not a catalog CSV).
 */
export interface ImportOutcome {
  mode: ImportRequestMode;
  fileName: string;
  /** 200, or 422 when the server refused the file and wrote nothing. */
  status: 200 | 422;
  /** The server's sentence for a refusal (422). */
  message: string | null;
  result: ImportResult;
}

/** Large files take longer than ordinary calls; allow them the time. */
const IMPORT_TIMEOUT_MS = 5 * 60_000;

function isImportResult(value: unknown): value is ImportResult & { message?: unknown } {
  if (typeof value !== 'object' || value === null) return false;
  const body = value as Partial<ImportResult>;
  return typeof body.accepted === 'number' && typeof body.rejected === 'number' && Array.isArray(body.errors);
}

function withDefaults(body: ImportResult): ImportResult {
  return {
    accepted: body.accepted,
    rejected: body.rejected,
    created: body.created ?? 0,
    updated: body.updated ?? 0,
    errors: body.errors ?? [],
    newSuppliers: body.newSuppliers ?? [],
    errorsTruncated: body.errorsTruncated ?? false,
    importId: body.importId ?? null,
    preview: body.preview ?? [],
  };
}

/**
 * `POST /api/mounts/import` (catalog manager, admin), multipart field `file`. A 422 that carries
 * the import report (rows with problems, or a file that is not a catalog CSV) is returned as an
 * outcome like a 200, because the problems are what the user needs to see; other failures
 * (413 too large, 415 not a CSV, 403...) throw for `errorMessage`.
 */
export async function importMounts({ file, mode }: ImportMountsInput): Promise<ImportOutcome> {
  const form = new FormData();
  form.append('file', file, file.name);
  const params: Record<string, string> = {};
  if (mode === 'dry-run') params.dryRun = 'true';
  if (mode === 'skip-invalid') params.onInvalid = 'skip';
  try {
    const { data } = await api.post<ImportResult>('/mounts/import', form, { params, timeout: IMPORT_TIMEOUT_MS });
    return { mode, fileName: file.name, status: 200, message: null, result: withDefaults(data) };
  } catch (error) {
    if (axios.isAxiosError(error) && error.response?.status === 422 && isImportResult(error.response.data)) {
      const body = error.response.data;
      const message = typeof body.message === 'string' ? body.message : null;
      return { mode, fileName: file.name, status: 422, message, result: withDefaults(body) };
    }
    throw error;
  }
}

export function useImportMounts() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importMounts,
    onSuccess: async (outcome) => {
      if (outcome.mode === 'dry-run' || outcome.status !== 200) return;
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: mountsQueryKey }),
        queryClient.invalidateQueries({ queryKey: importsQueryKey }),
      ]);
    },
  });
}
