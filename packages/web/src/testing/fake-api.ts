import { AxiosError, AxiosHeaders, type AxiosAdapter, type AxiosResponse, type InternalAxiosRequestConfig } from 'axios';
import { onTestFinished } from 'vitest';

import { api } from '@/lib/api-client';

/**
 * A stand-in for the Tacet server at the HTTP boundary: tests declare the answers, the real
 * fetchers, interceptors and error handling run unchanged.
 */
export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface FakeRequest {
  method: HttpMethod;
  /** Path below `/api`, without the query string, e.g. `/users/3`. */
  path: string;
  params: Record<string, string>;
  /** The query string as the server would read it (`?page=2&q=abc` → `{page: '2', q: 'abc'}`). */
  query: Record<string, string>;
  body: unknown;
  headers: Record<string, string>;
}

export interface FakeReply {
  status: number;
  data?: unknown;
  /** Response headers besides `content-type: application/json`, e.g. `content-disposition`. */
  headers?: Record<string, string>;
}

export type FakeHandler = (request: FakeRequest) => FakeReply | Promise<FakeReply>;

interface Route {
  method: HttpMethod;
  pattern: RegExp;
  keys: string[];
  handler: FakeHandler;
}

function compile(path: string): { pattern: RegExp; keys: string[] } {
  const keys: string[] = [];
  const source = path
    .split('/')
    .map((segment) => {
      if (segment.startsWith(':')) {
        keys.push(segment.slice(1));
        return '([^/]+)';
      }
      return segment.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
    })
    .join('/');
  return { pattern: new RegExp(`^${source}/?$`), keys };
}

function parseBody(data: unknown): unknown {
  if (typeof data !== 'string') return data;
  try {
    return JSON.parse(data);
  } catch {
    return data;
  }
}

export class FakeApi {
  private routes: Route[] = [];
  /** Every request the app made, in order. */
  readonly requests: FakeRequest[] = [];
  /** Requests no route answered (they got a 404). */
  readonly unhandled: FakeRequest[] = [];

  on(method: HttpMethod, path: string, handler: FakeHandler | FakeReply): this {
    const { pattern, keys } = compile(path);
    // Later declarations win, so a test can override a default answer.
    this.routes.unshift({ method, pattern, keys, handler: typeof handler === 'function' ? handler : () => handler });
    return this;
  }

  readonly adapter: AxiosAdapter = async (config: InternalAxiosRequestConfig) => {
    const method = (config.method ?? 'get').toLowerCase() as HttpMethod;
    const path = (config.url ?? '').split('?')[0] ?? '';
    const headers: Record<string, string> = {};
    for (const [key, value] of Object.entries(AxiosHeaders.from(config.headers).toJSON())) {
      if (typeof value === 'string') headers[key.toLowerCase()] = value;
    }
    const query = Object.fromEntries(new URL(api.getUri({ url: config.url, params: config.params }), 'http://fake.invalid').searchParams);
    const request: FakeRequest = { method, path, params: {}, query, body: parseBody(config.data), headers };
    this.requests.push(request);

    let reply: FakeReply | undefined;
    for (const route of this.routes) {
      if (route.method !== method) continue;
      const match = route.pattern.exec(path);
      if (!match) continue;
      route.keys.forEach((key, index) => {
        request.params[key] = decodeURIComponent(match[index + 1] ?? '');
      });
      reply = await route.handler(request);
      break;
    }
    if (!reply) {
      this.unhandled.push(request);
      reply = { status: 404, data: { statusCode: 404, message: `Cannot ${method.toUpperCase()} /api${path}` } };
    }

    const response: AxiosResponse = {
      data: reply.data ?? '',
      status: reply.status,
      statusText: String(reply.status),
      headers: new AxiosHeaders({ 'content-type': 'application/json', ...reply.headers }),
      config,
      request: {},
    };
    const validate = config.validateStatus ?? ((status: number) => status >= 200 && status < 300);
    if (validate(reply.status)) return response;
    throw new AxiosError(
      `Request failed with status code ${reply.status}`,
      reply.status >= 500 ? AxiosError.ERR_BAD_RESPONSE : AxiosError.ERR_BAD_REQUEST,
      config,
      {},
      response,
    );
  };

  /** Requests matching a method and path, e.g. `calls('patch', '/auth/me')`. */
  calls(method: HttpMethod, path: string): FakeRequest[] {
    const { pattern } = compile(path);
    return this.requests.filter((request) => request.method === method && pattern.test(request.path));
  }
}

/** Routes the app's axios instance to a fresh fake server for the current test. */
export function installFakeApi(): FakeApi {
  const fake = new FakeApi();
  const previous = api.defaults.adapter;
  api.defaults.adapter = fake.adapter;
  onTestFinished(() => {
    api.defaults.adapter = previous;
  });
  return fake;
}

/** A network failure: the server could not be reached at all. */
export function networkError(config: InternalAxiosRequestConfig = { headers: new AxiosHeaders() }): AxiosError {
  return new AxiosError('Network Error', AxiosError.ERR_NETWORK, config, {});
}
