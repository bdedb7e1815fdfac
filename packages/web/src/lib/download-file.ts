import axios from 'axios';

import { api } from './api-client';

/**
 * The file name a `Content-Disposition` header proposes (`filename*=UTF-8''…` preferred over
 * `filename="…"`), or `fallback` when it names none. Path parts are dropped.
 */
export function fileNameFromDisposition(header: string | null | undefined, fallback: string): string {
  if (!header) return fallback;
  let name: string | undefined;
  const extended = /filename\*\s*=\s*(?:UTF-8|utf-8)''([^;]+)/.exec(header);
  if (extended?.[1]) {
    try {
      name = decodeURIComponent(extended[1].trim().replace(/^"|"$/g, ''));
    } catch {
      name = undefined;
    }
  }
  if (!name) {
    const plain = /filename\s*=\s*("([^"]*)"|[^;]+)/.exec(header);
    name = (plain?.[2] ?? plain?.[1])?.trim();
  }
  const base = name?.split(/[\\/]/).pop()?.trim();
  return base ? base : fallback;
}

/** Hands a blob to the browser as a download named `fileName`. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  link.style.display = 'none';
  document.body.appendChild(link);
  try {
    link.click();
  } finally {
    link.remove();
    // Give the browser a moment to start the download before the URL goes away.
    setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }
}

/** An error body that came back as a Blob (because a file was asked for) turned back into JSON. */
async function readBlobError(error: unknown): Promise<never> {
  if (axios.isAxiosError(error) && error.response && error.response.data instanceof Blob) {
    const text = await error.response.data.text();
    try {
      error.response.data = JSON.parse(text) as unknown;
    } catch {
      error.response.data = text;
    }
  }
  throw error;
}

/**
 * Downloads a file from the API through the one axios instance, so the bearer token goes with
 * it (a plain link would not carry it). Returns the file name used. A failed call throws the
 * axios error with its JSON body restored, ready for `errorMessage`.
 */
export async function downloadFile(path: string, fallbackName: string): Promise<string> {
  const response = await api.get<Blob>(path, { responseType: 'blob', headers: { Accept: '*/*' } }).catch(readBlobError);
  const disposition = response.headers['content-disposition'] as string | undefined;
  const fileName = fileNameFromDisposition(disposition, fallbackName);
  const blob = response.data instanceof Blob ? response.data : new Blob([response.data as BlobPart]);
  saveBlob(blob, fileName);
  return fileName;
}
