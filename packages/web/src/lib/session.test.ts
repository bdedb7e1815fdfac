import { clearToken, getToken, safeNextPath, setToken, signInPath, TOKEN_STORAGE_KEY } from './session';

describe('session token storage', () => {
  it('keeps the token under tacet.token', () => {
    setToken('abc');
    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBe('abc');
    expect(TOKEN_STORAGE_KEY).toBe('tacet.token');
    expect(getToken()).toBe('abc');
    clearToken();
    expect(getToken()).toBeNull();
  });
});

describe('signInPath', () => {
  it('carries the page to come back to', () => {
    expect(signInPath('/admin/users?x=1')).toBe('/sign-in?next=%2Fadmin%2Fusers%3Fx%3D1');
  });

  it('needs no next for the start page or the sign-in page itself', () => {
    expect(signInPath('/')).toBe('/sign-in');
    expect(signInPath('/sign-in?next=%2Fx')).toBe('/sign-in');
    expect(signInPath()).toBe('/sign-in');
  });
});

describe('safeNextPath', () => {
  it('accepts in-app paths', () => {
    expect(safeNextPath('/projects')).toBe('/projects');
    expect(safeNextPath('/admin/users?tab=2')).toBe('/admin/users?tab=2');
  });

  it.each([null, '', 'https://example.com/', '//example.com/x', '/\\example.com', 'projects', '/sign-in'])(
    'falls back to the start page for %j',
    (next) => {
      expect(safeNextPath(next)).toBe('/');
    },
  );
});
