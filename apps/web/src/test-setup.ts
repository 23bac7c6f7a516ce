import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// The default second is too tight when the whole test suite shares a loaded machine.
configure({ asyncUtilTimeout: 4000 });

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});
