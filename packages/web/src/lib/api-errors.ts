import axios from 'axios';

import { fieldPlace } from '@tacet/vibration';

import type { ApiSchemas } from '@/api/schema';

/** One field problem as the server reports it; `field` is the dotted property path. */
export type ApiFieldError = ApiSchemas['ApiFieldErrorDto'];

/**
 * The server's error body `{statusCode, message, errors?}` (its `ApiErrorDto`); a list of
 * messages, the framework's own shape, is read as well.
 */
export type ApiErrorBody = Omit<ApiSchemas['ApiErrorDto'], 'message'> & { message: string | string[] };

function isApiErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null) return false;
  const message = (value as { message?: unknown }).message;
  return typeof message === 'string' || Array.isArray(message);
}

/** `unitSystem` → "Unit system", `criteria.minIsolationPct` → "Criteria › min isolation pct". */
export function fieldLabel(field: string): string {
  const words = field
    .split('.')
    .map((part) =>
      part
        .replace(/\[(\d+)\]/g, ' $1')
        .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
        .replace(/[_-]+/g, ' ')
        .toLowerCase()
        .trim(),
    )
    .filter(Boolean)
    .join(' › ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function sentence(text: string): string {
  const trimmed = text.trim();
  if (!trimmed) return trimmed;
  const capital = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

/**
 * One field problem as a person reads it: the server's message (in words, naming the field), with
 * the list item it is about in front when the path has one ("Component 2: Mass must be ...").
 */
function problemText(item: ApiFieldError): string {
  const place = fieldPlace(item.field);
  const message = item.message.replace(/[.]$/, '');
  return place ? `${place.charAt(0).toUpperCase()}${place.slice(1)}: ${message}` : message;
}

/** A refused save split for a form: each problem once, at its field when the form has one. */
export interface FormFailure {
  /** Messages keyed by the form's own field names, for Formik's `setErrors`. */
  fields: Record<string, string>;
  /** The one general message: problems without a field on this form, or the error itself; null when every problem is at its field. */
  general: string | null;
}

/**
 * Splits a failed save between a form's fields and its general message, so no problem is shown
 * twice (PRODUCT.md "One voice": one message per problem, placed at the field). `formField`
 * names the form's field for a server field path (`undefined` when the form has none); a list of
 * names means the server paths are the form's own names.
 */
export function formFailure(error: unknown, formField: readonly string[] | ((serverField: string) => string | undefined)): FormFailure {
  const toForm = typeof formField === 'function' ? formField : (field: string) => (formField.includes(field) ? field : undefined);
  const problems =
    axios.isAxiosError(error) && isApiErrorBody(error.response?.data) && (error.response?.status ?? 500) < 500
      ? (error.response.data.errors ?? []).filter((item) => item && typeof item.field === 'string' && typeof item.message === 'string')
      : [];
  if (problems.length === 0) return { fields: {}, general: errorMessage(error) };
  const fields: Record<string, string> = {};
  const unplaced: ApiFieldError[] = [];
  for (const item of problems) {
    const key = toForm(item.field);
    if (key === undefined) unplaced.push(item);
    else if (!(key in fields)) fields[key] = item.message;
  }
  const general = unplaced.length ? `Some fields need attention — ${[...new Set(unplaced.map(problemText))].join('; ')}.` : null;
  return { fields, general };
}

/** The HTTP status of a failed API call, if the server answered. */
export function errorStatus(error: unknown): number | undefined {
  return axios.isAxiosError(error) ? error.response?.status : undefined;
}

/** Turns whatever a failed call threw into one or two sentences a user understands. */
export function errorMessage(error: unknown): string {
  if (axios.isAxiosError(error)) {
    const response = error.response;
    if (!response) {
      if (error.code === 'ECONNABORTED' || error.code === 'ETIMEDOUT') {
        return 'The server took too long to answer. Try again in a moment.';
      }
      return 'Cannot reach the Tacet server. Check your connection and try again.';
    }
    const body = isApiErrorBody(response.data) ? response.data : undefined;
    const status = response.status;
    if (status >= 500) {
      return 'Something went wrong on the server. Try again; if it keeps happening, tell your administrator.';
    }
    if (status === 429) {
      return 'Too many attempts in a short time. Wait a minute, then try again.';
    }
    const fields = body?.errors?.filter((item) => item && typeof item.field === 'string') ?? [];
    if (fields.length > 0) {
      return `Some fields need attention — ${[...new Set(fields.map(problemText))].join('; ')}.`;
    }
    if (body) {
      const messages = Array.isArray(body.message) ? body.message : [body.message];
      const text = messages
        .filter((m) => typeof m === 'string' && m.trim())
        .map(sentence)
        .join(' ');
      if (text) return text;
    }
    switch (status) {
      case 401:
        return 'Your session has ended. Sign in again.';
      case 403:
        return 'Your role does not allow this.';
      case 404:
        return 'That item no longer exists.';
      case 409:
        return 'Someone else changed this in the meantime. Reload and try again.';
      default:
        return 'The request was not accepted. Check what you entered and try again.';
    }
  }
  if (error instanceof Error && error.message) return sentence(error.message);
  return 'Something went wrong. Try again.';
}
