import { cleanup, configure } from '@testing-library/react';
import { afterAll, afterEach, vi } from 'vitest';
import { dismissAllToasts } from './lib/toaster';

// The default second is too tight when the whole test suite shares a loaded machine.
configure({ asyncUtilTimeout: 4000 });

afterEach(async () => {
  await dismissAllToasts();
  cleanup();
  vi.unstubAllGlobals();
});

// Let the toasts' exit transitions finish while the page still exists.
afterAll(() => new Promise((resolve) => setTimeout(resolve, 500)));
