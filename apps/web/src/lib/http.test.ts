import { afterEach, describe, expect, it } from 'vitest';
import { branchRows, ownerMe, sessionOf } from '../test/sessions';
import { fakeApi, json, problem } from '../test/fake-api';
import { ApiError } from './api-error';
import { expectData, http } from './http';
import { session } from './session';

const expired = () => problem(401, 'auth.required', 'Sign in to continue.');

describe('http client', () => {
  afterEach(() => session.end());

  it('refreshes once after a 401 and retries the request with the new token', async () => {
    session.start(sessionOf(ownerMe, 'stale-token'));
    const api = fakeApi({
      'GET /api/branches': [expired(), json(200, branchRows)],
      'POST /api/auth/refresh': json(200, sessionOf(ownerMe, 'fresh-token')),
    });

    const branches = await expectData(http.GET('/api/branches'));

    expect(branches.map((b) => b.name)).toEqual(['Elmstead', 'Quarry Lane']);
    expect(api.seen.map((r) => `${r.method} ${r.path} ${r.authorization ?? '-'}`)).toEqual([
      'GET /api/branches Bearer stale-token',
      'POST /api/auth/refresh -',
      'GET /api/branches Bearer fresh-token',
    ]);
    expect(session.accessToken()).toBe('fresh-token');
  });

  it('replays the body of a refused write', async () => {
    session.start(sessionOf(ownerMe, 'stale-token'));
    const api = fakeApi({
      'POST /api/branches': [expired(), json(201, branchRows[0])],
      'POST /api/auth/refresh': json(200, sessionOf(ownerMe, 'fresh-token')),
    });

    await expectData(http.POST('/api/branches', { body: { name: 'Elmstead', timeZone: 'America/Chicago' } }));

    const [first, retry] = api.calls('POST /api/branches');
    expect(retry?.body).toBe(first?.body);
    expect(JSON.parse(retry?.body ?? '')).toEqual({ name: 'Elmstead', timeZone: 'America/Chicago' });
  });

  it('gives up after one refresh when the session has ended, and forgets the user', async () => {
    session.start(sessionOf(ownerMe, 'stale-token'));
    const api = fakeApi({
      'GET /api/branches': expired(),
      'POST /api/auth/refresh': problem(401, 'auth.not_signed_in', 'Your session has ended; sign in again.'),
    });

    const failure = await expectData(http.GET('/api/branches')).catch((error: unknown) => error);

    expect(failure).toBeInstanceOf(ApiError);
    expect((failure as ApiError).status).toBe(401);
    expect(api.calls('POST /api/auth/refresh')).toHaveLength(1);
    expect(api.calls('GET /api/branches')).toHaveLength(1);
    expect(session.user()).toBeNull();
  });

  it('shares one refresh between requests refused at the same time', async () => {
    session.start(sessionOf(ownerMe, 'stale-token'));
    const api = fakeApi({
      'GET /api/branches': (request) => (request.headers.get('Authorization') === 'Bearer fresh-token' ? json(200, branchRows) : expired()),
      'GET /api/auth/me': (request) => (request.headers.get('Authorization') === 'Bearer fresh-token' ? json(200, ownerMe) : expired()),
      'POST /api/auth/refresh': json(200, sessionOf(ownerMe, 'fresh-token')),
    });

    await Promise.all([expectData(http.GET('/api/branches')), expectData(http.GET('/api/auth/me'))]);

    expect(api.calls('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('does not treat a wrong password as an expired session', async () => {
    const api = fakeApi({ 'POST /api/auth/login': problem(401, 'auth.not_signed_in', 'The e-mail or password is not right.') });

    const failure = await expectData(http.POST('/api/auth/login', { body: { email: 'a@example.test', password: 'nope' } })).catch((e: unknown) => e);

    expect((failure as ApiError).message).toBe('The e-mail or password is not right.');
    expect(api.calls('POST /api/auth/refresh')).toHaveLength(0);
  });
});
