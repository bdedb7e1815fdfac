import axios, { type InternalAxiosRequestConfig } from 'axios';

import { clearToken, getToken, signInPath } from './session';

/** The one configured HTTP client for the Tacet API. Every feature's fetchers use it. */
export const api = axios.create({
  baseURL: '/api',
  headers: { Accept: 'application/json' },
  timeout: 30_000,
});

api.interceptors.request.use((config) => {
  const token = getToken();
  if (token) config.headers.set('Authorization', `Bearer ${token}`);
  return config;
});

type UnauthorizedHandler = () => void;

let unauthorizedHandler: UnauthorizedHandler | null = null;

/**
 * Registers what happens when the server answers 401 to a signed-in call (expired or revoked
 * token). The auth provider registers itself so the router can send the user to sign in
 * and back; returns a function that unregisters it.
 */
export function setUnauthorizedHandler(handler: UnauthorizedHandler | null): () => void {
  unauthorizedHandler = handler;
  return () => {
    if (unauthorizedHandler === handler) unauthorizedHandler = null;
  };
}

function isLoginRequest(config: InternalAxiosRequestConfig | undefined): boolean {
  const url = config?.url ?? '';
  return /(^|\/)auth\/login\/?$/.test(url.split('?')[0] ?? '');
}

api.interceptors.response.use(undefined, (error: unknown) => {
  if (axios.isAxiosError(error) && error.response?.status === 401 && !isLoginRequest(error.config)) {
    clearToken();
    if (unauthorizedHandler) {
      unauthorizedHandler();
    } else {
      const here = `${window.location.pathname}${window.location.search}`;
      window.location.assign(signInPath(here));
    }
  }
  return Promise.reject(error);
});
