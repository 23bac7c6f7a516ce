import { domainEvents } from '@tressury/schema';
import { desc, eq } from 'drizzle-orm';
import { startTestApp, type TestApp } from './support/test-app.js';

type Branch = { id: string; name: string; timeZone: string; minimumWage: string; overtimeAfterHours: string };

describe('branches', () => {
  let t: TestApp;
  let all: Branch[];
  const byName = (name: string) => all.find((b) => b.name === name)!;

  beforeAll(async () => {
    t = await startTestApp();
    all = (await t.http().get('/api/branches').set('Authorization', `Bearer ${await t.tokenFor('owner')}`).expect(200)).body;
  });
  afterAll(() => t.close());

  const as = async (role: Parameters<TestApp['tokenFor']>[0]) => `Bearer ${await t.tokenFor(role)}`;

  describe('owner', () => {
    it('creates a branch with US federal defaults for the wage settings, and lists it', async () => {
      const created = await t
        .http()
        .post('/api/branches')
        .set('Authorization', await as('owner'))
        .send({ name: '  Lantern Quay ', timeZone: 'America/Los_Angeles' })
        .expect(201);
      // 29 U.S.C. 206(a)(1)(C): $7.25; 29 U.S.C. 207(a)(1): over 40 hours at one and a half times.
      expect(created.body).toMatchObject({
        name: 'Lantern Quay',
        timeZone: 'America/Los_Angeles',
        currency: 'USD',
        minimumWage: '7.25',
        overtimeAfterHours: '40',
        overtimeMultiplier: '1.5',
        commissionExemption: false,
        retailTaxRate: '0',
        varianceNoteThreshold: '5.00',
        patchTestMaxAgeDays: 180,
      });
      const list = await t.http().get('/api/branches').set('Authorization', await as('owner')).expect(200);
      expect(list.body.map((b: Branch) => b.name)).toContain('Lantern Quay');
    });

    it('renames a branch and changes its settings, recording before and after in domain_events', async () => {
      const riverside = byName('Riverside');
      const response = await t
        .http()
        .patch(`/api/branches/${riverside.id}`)
        .set('Authorization', await as('owner'))
        .send({ name: 'Riverside Commons', minimumWage: '15.00' })
        .expect(200);
      expect(response.body).toMatchObject({ id: riverside.id, name: 'Riverside Commons', minimumWage: '15.00', timeZone: riverside.timeZone });
      const [event] = await t.database.db
        .select()
        .from(domainEvents)
        .where(eq(domainEvents.aggregateId, riverside.id))
        .orderBy(desc(domainEvents.id))
        .limit(1);
      expect(event).toMatchObject({ type: 'BranchUpdated', aggregateType: 'Branch' });
      expect(event!.payload).toMatchObject({ before: { name: 'Riverside' }, after: { name: 'Riverside Commons' } });
      await t.http().patch(`/api/branches/${riverside.id}`).set('Authorization', await as('owner')).send({ name: 'Riverside' }).expect(200);
    });

    it('appends exactly one domain event per command, with the actor', async () => {
      const count = async () => (await t.database.db.select({ id: domainEvents.id }).from(domainEvents)).length;
      const before = await count();
      const created = await t
        .http()
        .post('/api/branches')
        .set('Authorization', await as('owner'))
        .send({ name: 'Saltmarsh', timeZone: 'America/New_York' })
        .expect(201);
      expect(await count()).toBe(before + 1);
      await t.http().patch(`/api/branches/${created.body.id}`).set('Authorization', await as('owner')).send({ name: 'Saltmarsh Row' }).expect(200);
      expect(await count()).toBe(before + 2);
      const [latest] = await t.database.db.select().from(domainEvents).orderBy(desc(domainEvents.id)).limit(1);
      const me = await t.http().get('/api/auth/me').set('Authorization', await as('owner'));
      expect(latest).toMatchObject({ type: 'BranchUpdated', actorId: me.body.id, aggregateId: created.body.id });
    });

    it('refuses a duplicate name with 409 naming the field, and writes nothing', async () => {
      const count = async () => (await t.database.db.select({ id: domainEvents.id }).from(domainEvents)).length;
      const before = await count();
      const response = await t
        .http()
        .post('/api/branches')
        .set('Authorization', await as('owner'))
        .send({ name: 'Old Mill', timeZone: 'America/Chicago' })
        .expect(409);
      expect(response.body).toMatchObject({ code: 'branch.name_taken', details: [{ field: 'name' }] });
      expect(await count()).toBe(before);
    });

    it('names every bad field in a 400', async () => {
      const response = await t
        .http()
        .post('/api/branches')
        .set('Authorization', await as('owner'))
        .send({ name: '', timeZone: 'Atlantis/Harbour', currency: 'dollars', minimumWage: 7.25, overtimeMultiplier: '0.5', retailTaxRate: '1.5', colour: 'teal' })
        .expect(400);
      const fields = new Set(response.body.details.map((d: { field: string }) => d.field));
      expect([...fields].sort()).toEqual(['colour', 'currency', 'minimumWage', 'name', 'overtimeMultiplier', 'retailTaxRate', 'timeZone']);
      expect(response.body.code).toBe('request.invalid');
    });

    it('answers 400 naming the id when the id is not a UUID, and 404 for an unknown one', async () => {
      const bad = await t.http().get('/api/branches/riverside').set('Authorization', await as('owner')).expect(400);
      expect(bad.body.details).toEqual([{ field: 'id', message: expect.stringContaining('UUID') }]);
      await t.http().get('/api/branches/00000000-0000-4000-8000-000000000000').set('Authorization', await as('owner')).expect(404);
    });
  });

  describe('manager (Old Mill and Riverside)', () => {
    it('lists only the assigned branches', async () => {
      const response = await t.http().get('/api/branches').set('Authorization', await as('manager')).expect(200);
      expect(response.body.map((b: Branch) => b.name)).toEqual(['Old Mill', 'Riverside']);
    });

    it('reads an assigned branch, and gets 404 for another branch exactly as for one that does not exist', async () => {
      await t.http().get(`/api/branches/${byName('Old Mill').id}`).set('Authorization', await as('manager')).expect(200);
      const other = await t.http().get(`/api/branches/${byName('Harbor Point').id}`).set('Authorization', await as('manager')).expect(404);
      const missing = await t.http().get('/api/branches/00000000-0000-4000-8000-000000000000').set('Authorization', await as('manager')).expect(404);
      expect(other.body).toEqual(missing.body);
    });

    it('may not create or change branches: 403 with a plain reason', async () => {
      const create = await t
        .http()
        .post('/api/branches')
        .set('Authorization', await as('manager'))
        .send({ name: 'Nope', timeZone: 'America/Chicago' })
        .expect(403);
      expect(create.body.message).toBe('A manager may not create branches.');
      const update = await t
        .http()
        .patch(`/api/branches/${byName('Old Mill').id}`)
        .set('Authorization', await as('manager'))
        .send({ name: 'Renamed' })
        .expect(403);
      expect(update.body.code).toBe('auth.forbidden');
    });
  });

  describe('other roles', () => {
    it('front desk and stylist see only their own branch and change nothing', async () => {
      for (const role of ['front_desk', 'stylist'] as const) {
        const list = await t.http().get('/api/branches').set('Authorization', await as(role)).expect(200);
        expect(list.body.map((b: Branch) => b.name)).toEqual(['Riverside']);
        await t.http().get(`/api/branches/${byName('Old Mill').id}`).set('Authorization', await as(role)).expect(404);
        await t.http().post('/api/branches').set('Authorization', await as(role)).send({ name: 'X', timeZone: 'UTC' }).expect(403);
      }
    });

    it('the accountant reads every branch but may not change one', async () => {
      const list = await t.http().get('/api/branches').set('Authorization', await as('accountant')).expect(200);
      expect(list.body.length).toBeGreaterThanOrEqual(4);
      await t
        .http()
        .patch(`/api/branches/${byName('Juniper Flats').id}`)
        .set('Authorization', await as('accountant'))
        .send({ name: 'X' })
        .expect(403);
    });
  });
});

describe('organisation', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('the owner renames the organisation; a manager may read but not rename it', async () => {
    const owner = `Bearer ${await t.tokenFor('owner')}`;
    const manager = `Bearer ${await t.tokenFor('manager')}`;
    await t.http().patch('/api/organisation').set('Authorization', owner).send({ name: 'Thistlewick Group' }).expect(200);
    const read = await t.http().get('/api/organisation').set('Authorization', manager).expect(200);
    expect(read.body.name).toBe('Thistlewick Group');
    const refused = await t.http().patch('/api/organisation').set('Authorization', manager).send({ name: 'Mine' }).expect(403);
    expect(refused.body.message).toBe('A manager may not change the organisation settings.');
    const blank = await t.http().patch('/api/organisation').set('Authorization', owner).send({ name: '   ' }).expect(400);
    expect(blank.body.details[0].field).toBe('name');
  });
});
