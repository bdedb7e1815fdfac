import '@testing-library/jest-dom/vitest';

import { cleanup, configure } from '@testing-library/react';

import { setUnauthorizedHandler } from '@/lib/api-client';

// Pages are lazy chunks; on a busy 2-core machine the first import of one can take more
// than the default one second to transform. This is how long `findBy…` waits, not a speed check.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  cleanup();
  window.localStorage.clear();
  setUnauthorizedHandler(null);
});
