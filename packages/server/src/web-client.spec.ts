import { join } from 'node:path';
import { cacheControlFor } from './web-client.js';

describe('cacheControlFor', () => {
  const dist = join('/srv', 'web', 'dist');

  it('caches hashed build assets for a year', () => {
    expect(cacheControlFor(dist, join(dist, 'assets', 'index-3f2a9c.js'))).toBe('public, max-age=31536000, immutable');
  });

  it('revalidates index.html and other files every time', () => {
    expect(cacheControlFor(dist, join(dist, 'index.html'))).toBe('no-cache');
    expect(cacheControlFor(dist, join(dist, 'favicon.svg'))).toBe('no-cache');
    expect(cacheControlFor(dist, join(dist, 'not-assets', 'assets', 'x.js'))).toBe('no-cache');
  });
});
