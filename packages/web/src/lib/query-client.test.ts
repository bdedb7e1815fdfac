import { AxiosError, AxiosHeaders } from 'axios';

import { shouldRetry } from './query-client';

function httpError(status: number): AxiosError {
  const config = { headers: new AxiosHeaders() };
  return new AxiosError('failed', 'ERR', config, {}, { status, statusText: '', data: {}, headers: {}, config });
}

describe('shouldRetry', () => {
  it.each([400, 401, 403, 404, 409, 422, 429])('never retries a %i answer', (status) => {
    expect(shouldRetry(0, httpError(status))).toBe(false);
  });

  it('retries server errors and network failures twice', () => {
    expect(shouldRetry(0, httpError(503))).toBe(true);
    expect(shouldRetry(1, httpError(500))).toBe(true);
    expect(shouldRetry(2, httpError(500))).toBe(false);
    expect(shouldRetry(0, new AxiosError('Network Error', 'ERR_NETWORK'))).toBe(true);
  });
});
