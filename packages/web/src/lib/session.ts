/** Where the signed-in user's bearer token is kept between visits. */
export const TOKEN_STORAGE_KEY = 'tacet.token';

export function getToken(): string | null {
  try {
    return window.localStorage.getItem(TOKEN_STORAGE_KEY);
  } catch {
    return null;
  }
}

export function setToken(token: string): void {
  window.localStorage.setItem(TOKEN_STORAGE_KEY, token);
}

export function clearToken(): void {
  try {
    window.localStorage.removeItem(TOKEN_STORAGE_KEY);
  } catch {
    // Storage unavailable (private mode quota, disabled storage): nothing to clear.
  }
}

/**
 * The sign-in address that brings the user back to `path` afterwards.
 * `/sign-in` itself and the root need no `next`.
 */
export function signInPath(path?: string): string {
  if (!path || path === '/' || path.startsWith('/sign-in')) return '/sign-in';
  return `/sign-in?next=${encodeURIComponent(path)}`;
}

/**
 * The in-app path to go to after signing in. Only same-origin absolute paths are accepted,
 * so a crafted link cannot send the user to another site.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  if (next.startsWith('/sign-in')) return '/';
  return next;
}
