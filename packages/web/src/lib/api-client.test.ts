import { installFakeApi } from '@/testing/fake-api';

import { api, setUnauthorizedHandler } from './api-client';
import { getToken, setToken } from './session';

describe('api client', () => {
  it('talks to /api and sends the stored token as a bearer token', async () => {
    const fake = installFakeApi().on('get', '/health', { status: 200, data: { status: 'ok' } });
    expect(api.defaults.baseURL).toBe('/api');

    await api.get('/health');
    expect(fake.requests[0]?.headers.authorization).toBeUndefined();

    setToken('token-1');
    await api.get('/health');
    expect(fake.requests[1]?.headers.authorization).toBe('Bearer token-1');
  });

  it('ends the session on a 401 from a signed-in call', async () => {
    installFakeApi().on('get', '/users', { status: 401, data: { statusCode: 401, message: 'Unauthorized' } });
    const onUnauthorized = vi.fn();
    setUnauthorizedHandler(onUnauthorized);
    setToken('expired');

    await expect(api.get('/users')).rejects.toMatchObject({ response: { status: 401 } });
    expect(getToken()).toBeNull();
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });

  it('leaves a failed login alone: the form reports it', async () => {
    installFakeApi().on('post', '/auth/login', {
      status: 401,
      data: { statusCode: 401, message: 'Email or password is incorrect' },
    });
    const onUnauthorized = vi.fn();
    setUnauthorizedHandler(onUnauthorized);
    setToken('still-here');

    await expect(api.post('/auth/login', { email: 'a@b.c', password: 'x' })).rejects.toBeTruthy();
    expect(onUnauthorized).not.toHaveBeenCalled();
    expect(getToken()).toBe('still-here');
  });

  it('without a registered handler, goes to sign-in with the current page as next', async () => {
    installFakeApi().on('get', '/users', { status: 401, data: { statusCode: 401, message: 'Unauthorized' } });
    const assign = vi.fn();
    vi.spyOn(window, 'location', 'get').mockReturnValue({
      ...window.location,
      pathname: '/admin/users',
      search: '',
      assign,
    });

    await expect(api.get('/users')).rejects.toBeTruthy();
    expect(assign).toHaveBeenCalledWith('/sign-in?next=%2Fadmin%2Fusers');
  });
});
