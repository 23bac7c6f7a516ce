import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, json } from '../test/fake-api';
import { ownerMe, sessionOf } from '../test/sessions';
import { session } from './session';

describe('session', () => {
  afterEach(() => {
    session.end();
    vi.useRealTimers();
  });

  it('renews the access token a minute before it expires, without anyone asking', async () => {
    vi.useFakeTimers();
    const api = fakeApi({ 'POST /api/auth/refresh': json(200, sessionOf(ownerMe, 'second-token')) });
    session.start(sessionOf(ownerMe, 'first-token'));

    await vi.advanceTimersByTimeAsync(539_000);
    expect(api.calls('POST /api/auth/refresh')).toHaveLength(0);

    await vi.advanceTimersByTimeAsync(1_000);
    expect(api.calls('POST /api/auth/refresh')).toHaveLength(1);
    expect(session.accessToken()).toBe('second-token');
  });

  it('keeps the token out of browser storage', () => {
    session.start(sessionOf(ownerMe, 'secret-token'));

    const stored = [...Object.values({ ...localStorage }), ...Object.values({ ...sessionStorage })].join(' ');
    expect(stored).not.toContain('secret-token');
    expect(document.cookie).not.toContain('secret-token');
  });
});
