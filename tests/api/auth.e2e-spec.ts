import { DEMO_PASSWORD, demoBusiness } from '@tressury/fixtures';
import { refreshTokens } from '@tressury/schema';
import { sql } from 'drizzle-orm';
import { startTestApp, type TestApp } from './support/test-app.js';

const owner = demoBusiness.users.find((u) => u.role === 'owner')!;
const stylist = demoBusiness.users.find((u) => u.role === 'stylist')!;

function refreshCookie(setCookie: string[] | string | undefined): string {
  const cookies = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const cookie = cookies.find((c) => c.startsWith('tressury_refresh='));
  if (!cookie) throw new Error('no refresh cookie was set');
  return cookie;
}

describe('sign-in and sessions', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('signs in with e-mail and password and sets an httpOnly, SameSite=Strict refresh cookie', async () => {
    const response = await t.http().post('/api/auth/login').send({ email: owner.email, password: DEMO_PASSWORD }).expect(200);
    expect(response.body.accessToken).toEqual(expect.any(String));
    expect(response.body.expiresIn).toBeLessThanOrEqual(900);
    expect(response.body.user).toMatchObject({ email: owner.email, role: 'owner', organisationName: demoBusiness.organisationName });
    expect(response.body.user.branches).toHaveLength(demoBusiness.branches.length);
    const cookie = refreshCookie(response.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Strict/i);
    expect(cookie).toMatch(/Path=\/api\/auth/);
  });

  it('accepts the e-mail in any case', async () => {
    await t.http().post('/api/auth/login').send({ email: owner.email.toUpperCase(), password: DEMO_PASSWORD }).expect(200);
  });

  it('answers a wrong password and an unknown e-mail with the same 401 that says nothing about which part was wrong', async () => {
    const wrongPassword = await t.http().post('/api/auth/login').send({ email: owner.email, password: 'not-it' }).expect(401);
    const unknownEmail = await t.http().post('/api/auth/login').send({ email: 'nobody@thistlewick.example', password: DEMO_PASSWORD }).expect(401);
    expect(wrongPassword.body).toEqual(unknownEmail.body);
    expect(wrongPassword.body.message).not.toMatch(/password is wrong|no such user|unknown/i);
    expect(wrongPassword.headers['set-cookie']).toBeUndefined();
  });

  it('names the bad field when the sign-in body is malformed', async () => {
    const response = await t.http().post('/api/auth/login').send({ email: 'not-an-email' }).expect(400);
    expect([...new Set(response.body.details.map((d: { field: string }) => d.field))].sort()).toEqual(['email', 'password']);
  });

  it('returns the user, their branches and packed CASL rules from /auth/me', async () => {
    const token = await t.tokenFor('stylist');
    const response = await t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
    expect(response.body).toMatchObject({ email: stylist.email, role: 'stylist' });
    expect(response.body.branches.map((b: { name: string }) => b.name)).toEqual(['Riverside']);
    expect(response.body.rules.length).toBeGreaterThan(0);
  });

  it('rotates the refresh token: the cookie buys a new session and a new cookie', async () => {
    const login = await t.http().post('/api/auth/login').send({ email: owner.email, password: DEMO_PASSWORD }).expect(200);
    const first = refreshCookie(login.headers['set-cookie']).split(';')[0]!;
    const refreshed = await t.http().post('/api/auth/refresh').set('Cookie', first).expect(200);
    const second = refreshCookie(refreshed.headers['set-cookie']).split(';')[0]!;
    expect(second).not.toEqual(first);
    await t.http().get('/api/auth/me').set('Authorization', `Bearer ${refreshed.body.accessToken}`).expect(200);
    await t.http().post('/api/auth/refresh').set('Cookie', second).expect(200);
  });

  it('ends the whole chain when a used refresh token comes back after the grace window', async () => {
    const login = await t.http().post('/api/auth/login').send({ email: owner.email, password: DEMO_PASSWORD }).expect(200);
    const first = refreshCookie(login.headers['set-cookie']).split(';')[0]!;
    const refreshed = await t.http().post('/api/auth/refresh').set('Cookie', first).expect(200);
    const second = refreshCookie(refreshed.headers['set-cookie']).split(';')[0]!;
    // Age the first token's use past the grace window for two tabs refreshing together.
    await t.database.db.update(refreshTokens).set({ usedAt: sql`now() - interval '1 minute'` }).where(sql`used_at is not null`);
    await t.http().post('/api/auth/refresh').set('Cookie', first).expect(401);
    await t.http().post('/api/auth/refresh').set('Cookie', second).expect(401);
  });

  it('lets two tabs refresh with the same token at once', async () => {
    const login = await t.http().post('/api/auth/login').send({ email: owner.email, password: DEMO_PASSWORD }).expect(200);
    const cookie = refreshCookie(login.headers['set-cookie']).split(';')[0]!;
    await t.http().post('/api/auth/refresh').set('Cookie', cookie).expect(200);
    await t.http().post('/api/auth/refresh').set('Cookie', cookie).expect(200);
  });

  it('signs out: the refresh cookie no longer works', async () => {
    const login = await t.http().post('/api/auth/login').send({ email: owner.email, password: DEMO_PASSWORD }).expect(200);
    const cookie = refreshCookie(login.headers['set-cookie']).split(';')[0]!;
    await t.http().post('/api/auth/logout').set('Cookie', cookie).expect(204);
    await t.http().post('/api/auth/refresh').set('Cookie', cookie).expect(401);
  });

  it('refuses a refresh without a cookie and a forged access token', async () => {
    await t.http().post('/api/auth/refresh').expect(401);
    const token = await t.tokenFor('owner');
    const [header, payload] = token.split('.');
    await t.http().get('/api/auth/me').set('Authorization', `Bearer ${header}.${payload}.forged`).expect(401);
  });

  it('answers 401 on every non-public route of the OpenAPI document when no token is sent', async () => {
    const doc = (await t.http().get('/api/docs-json').expect(200)).body as { paths: Record<string, Record<string, unknown>> };
    const open = new Set(['post /api/auth/login', 'post /api/auth/refresh', 'post /api/auth/logout', 'get /api/health']);
    const probed: string[] = [];
    for (const [path, operations] of Object.entries(doc.paths)) {
      for (const method of Object.keys(operations)) {
        if (open.has(`${method} ${path}`)) continue;
        const url = path.replace(/\{[^}]+\}/g, '00000000-0000-4000-8000-000000000000');
        const response = await (t.http() as unknown as Record<string, (u: string) => Promise<{ status: number }>>)[method]!(url);
        expect({ route: `${method} ${path}`, status: response.status }).toEqual({ route: `${method} ${path}`, status: 401 });
        probed.push(`${method} ${path}`);
      }
    }
    expect(probed.length).toBeGreaterThanOrEqual(6);
  });
});

describe('sign-in throttling', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ LOGIN_THROTTLE_LIMIT: '3' });
  });
  afterAll(() => t.close());

  it('answers 429 once the attempts in the window are used up', async () => {
    for (let i = 0; i < 3; i++) await t.http().post('/api/auth/login').send({ email: owner.email, password: 'wrong' }).expect(401);
    const response = await t.http().post('/api/auth/login').send({ email: owner.email, password: DEMO_PASSWORD }).expect(429);
    expect(response.body.code).toBe('request.too_many');
  });
});
