import { openAsBlob } from 'node:fs';
import { basename } from 'node:path';
import { signIn } from '../../../tools/harness/fixtures.mjs';

export { tagOfInput, taggedInput } from '../../../tools/harness/fixtures.mjs';

export interface Reply<T = unknown> {
  status: number;
  headers: Headers;
  body: T;
  text: string;
}

/** A signed-in client of the Tacet API (fetch, JSON). */
/** A reply's JSON as the fault tests read it: loosely; a caller names the type where it matters. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of many shapes, read field by field in the tests
type Json = any;

export class Api {
  constructor(
    public baseURL: string,
    readonly token: string,
  ) {}

  static async signIn(baseURL: string, email: string): Promise<Api> {
    return new Api(baseURL, await signIn(baseURL, email));
  }

  /** The same account against another server (the token stays valid: the secret is in the data folder). */
  on(baseURL: string): Api {
    return new Api(baseURL, this.token);
  }

  async request<T = Json>(method: string, path: string, body?: unknown, timeoutMs = 60_000): Promise<Reply<T>> {
    const res = await fetch(`${this.baseURL}${path}`, {
      method,
      headers: { authorization: `Bearer ${this.token}`, ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: AbortSignal.timeout(timeoutMs),
    });
    const text = await res.text();
    let parsed: unknown = text;
    if ((res.headers.get('content-type') ?? '').includes('json') && text) parsed = JSON.parse(text);
    return { status: res.status, headers: res.headers, body: parsed as T, text };
  }

  get<T = Json>(path: string): Promise<Reply<T>> {
    return this.request<T>('GET', path);
  }
  post<T = Json>(path: string, body: unknown): Promise<Reply<T>> {
    return this.request<T>('POST', path, body);
  }
  put<T = Json>(path: string, body: unknown): Promise<Reply<T>> {
    return this.request<T>('PUT', path, body);
  }

  /** The body of a GET as bytes (e.g. the catalog export). */
  async bytes(path: string): Promise<Buffer> {
    const res = await fetch(`${this.baseURL}${path}`, { headers: { authorization: `Bearer ${this.token}` } });
    if (res.status !== 200) throw new Error(`GET ${path} answered ${res.status}`);
    return Buffer.from(await res.arrayBuffer());
  }

  /** Uploads a catalog CSV file (POST /api/mounts/import). */
  async importCatalog(file: string, timeoutMs = 120_000): Promise<Reply> {
    const form = new FormData();
    form.append('file', await openAsBlob(file, { type: 'text/csv' }), basename(file));
    const res = await fetch(`${this.baseURL}/api/mounts/import`, {
      method: 'POST',
      headers: { authorization: `Bearer ${this.token}` },
      body: form,
      signal: AbortSignal.timeout(timeoutMs),
    });
    const text = await res.text();
    return { status: res.status, headers: res.headers, body: text ? JSON.parse(text) : null, text };
  }
}
