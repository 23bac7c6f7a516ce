import { DEMO_PASSWORD } from '@tressury/fixtures';
import { branches, clients, domainEvents } from '@tressury/schema';
import { desc, eq } from 'drizzle-orm';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { ClientsBuilder } from './support/clients-builders.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Client = { id: string; firstName: string; lastName: string; homeBranchId: string; homeBranchName: string; phone: string | null; email: string | null };
type Page<T> = { items: T[]; total: number; limit: number; offset: number };

const MISSING = '00000000-0000-4000-8000-000000000000';

// Riverside and Old Mill are in America/Chicago (fixtures/src/demo-business.ts).
const chicagoToday = () => businessDateIn('America/Chicago');
const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

describe('clients', () => {
  let t: TestApp;
  let build: ClientsBuilder;
  let riverside: string;
  let oldMill: string;
  let harborPoint: string;
  let stylistStaffId: string;
  let unlinkedStylistToken: string;

  const as = async (role: Parameters<TestApp['tokenFor']>[0]) => `Bearer ${await t.tokenFor(role)}`;
  const eventCount = async () => (await t.database.db.select({ id: domainEvents.id }).from(domainEvents)).length;
  const clientCount = async () => (await t.database.db.select({ id: clients.id }).from(clients)).length;
  const lastEvent = async (aggregateId: string) =>
    (await t.database.db.select().from(domainEvents).where(eq(domainEvents.aggregateId, aggregateId)).orderBy(desc(domainEvents.id)).limit(1))[0]!;

  async function create(role: Parameters<TestApp['tokenFor']>[0], body: Record<string, unknown>) {
    return (await t.http().post('/api/clients').set('Authorization', await as(role)).send(body).expect(201)).body;
  }

  beforeAll(async () => {
    t = await startTestApp();
    build = await ClientsBuilder.create(t.database.db);
    riverside = await build.branchId('Riverside');
    oldMill = await build.branchId('Old Mill');
    harborPoint = await build.branchId('Harbor Point');
    const login = await t.http().post('/api/auth/login').send({ email: 'stylist@thistlewick.example', password: DEMO_PASSWORD }).expect(200);
    unlinkedStylistToken = login.body.accessToken;
    // The demo stylist has no staff record after seeding; tokens carry the staff id, so link before signing in.
    stylistStaffId = await build.linkUser('stylist@thistlewick.example', 'Rhea Castellane', 'Riverside');
  });
  afterAll(() => t.close());

  describe('creating', () => {
    it('front desk records a client of their branch with contact, notes and a patch test ten days ago', async () => {
      const tested = addDays(chicagoToday(), -10);
      await as('front_desk'); // signing in appends an event of its own
      const before = await eventCount();
      const body = await create('front_desk', {
        firstName: '  Wren ',
        lastName: 'Halloway',
        homeBranchId: riverside,
        phone: '(555) 014-2233',
        email: 'wren.halloway@mail.example',
        notes: 'Prefers mornings.',
        allergyNotes: 'Reacted to a fragranced shampoo in 2023.',
        lastPatchTestOn: tested,
      });
      expect(body).toMatchObject({
        firstName: 'Wren',
        lastName: 'Halloway',
        homeBranchId: riverside,
        homeBranchName: 'Riverside',
        phone: '(555) 014-2233',
        email: 'wren.halloway@mail.example',
        notes: 'Prefers mornings.',
        allergyNotes: 'Reacted to a fragranced shampoo in 2023.',
        lastPatchTestOn: tested,
        patchTest: {
          status: 'current',
          ageDays: 10,
          validUntil: addDays(tested, 180), // branches.patch_test_max_age_days defaults to 180
          onDate: chicagoToday(),
          maxAgeDays: 180,
          acknowledgementRequired: false,
          caution: null,
        },
      });
      expect(await eventCount()).toBe(before + 1);
      const event = await lastEvent(body.id);
      expect(event).toMatchObject({ type: 'ClientCreated', aggregateType: 'Client' });
      expect(event.payload).toMatchObject({ after: { lastName: 'Halloway', lastPatchTestOn: tested } });
      const read = await t.http().get(`/api/clients/${body.id}`).set('Authorization', await as('front_desk')).expect(200);
      expect(read.body).toEqual(body);
    });

    it('leaves phone, e-mail, notes and the patch test empty when they are not given, and asks for an acknowledgement', async () => {
      const body = await create('manager', { firstName: 'Ossian', lastName: 'Pellow', homeBranchId: oldMill, phone: '  ', email: '' });
      expect(body).toMatchObject({ phone: null, email: null, notes: '', allergyNotes: '', lastPatchTestOn: null, homeBranchName: 'Old Mill' });
      expect(body.patchTest).toMatchObject({ status: 'none', ageDays: null, validUntil: null, acknowledgementRequired: true });
      // Common practice in salons: a patch test 48 hours before colour.
      expect(body.patchTest.caution).toContain('48 hours');
    });

    // Common practice, after US FDA consumer guidance on hair dyes (from memory): a patch test 48 hours before
    // colour. Dates only are kept, so a test today or yesterday has not yet been read; two days ago has.
    it('calls a test from today or yesterday too recent, and one from two days ago current', async () => {
      const today = chicagoToday();
      const status = async (lastPatchTestOn: string) =>
        (await create('front_desk', { firstName: 'Tamsin', lastName: `Rook ${lastPatchTestOn}`, homeBranchId: riverside, lastPatchTestOn })).patchTest;
      expect(await status(today)).toMatchObject({ status: 'too-recent', ageDays: 0, acknowledgementRequired: true });
      expect((await status(today)).caution).toContain('48 hours');
      expect(await status(addDays(today, -1))).toMatchObject({ status: 'too-recent', ageDays: 1 });
      expect(await status(addDays(today, -2))).toMatchObject({ status: 'current', ageDays: 2, acknowledgementRequired: false });
    });

    it('calls a test older than the home branch’s window expired', async () => {
      await t.database.db.update(branches).set({ patchTestMaxAgeDays: 30 }).where(eq(branches.id, harborPoint));
      const harborToday = businessDateIn('America/New_York');
      const at = async (days: number) =>
        (await create('owner', { firstName: 'Linnea', lastName: `Sorrel ${days}`, homeBranchId: harborPoint, lastPatchTestOn: addDays(harborToday, -days) })).patchTest;
      expect(await at(30)).toMatchObject({ status: 'current', ageDays: 30, maxAgeDays: 30, validUntil: harborToday, onDate: harborToday });
      const expired = await at(31);
      expect(expired).toMatchObject({ status: 'expired', ageDays: 31, validUntil: addDays(harborToday, -1), acknowledgementRequired: true });
      expect(expired.caution).toContain('30-day');
    });

    it('names every bad field in a 400 and writes nothing', async () => {
      const [clientsBefore, eventsBefore] = [await clientCount(), await eventCount()];
      const response = await t
        .http()
        .post('/api/clients')
        .set('Authorization', await as('front_desk'))
        .send({ firstName: ' ', lastName: 'Ashdown', homeBranchId: 'riverside', email: 'not-an-address', phone: 'call me', notes: null, lastPatchTestOn: '2024-02-30', favouriteColour: 'copper' })
        .expect(400);
      const fields = [...new Set(response.body.details.map((d: { field: string }) => d.field))].sort();
      expect(fields).toEqual(['email', 'favouriteColour', 'firstName', 'homeBranchId', 'lastPatchTestOn', 'notes', 'phone']);
      expect([await clientCount(), await eventCount()]).toEqual([clientsBefore, eventsBefore]);
    });

    it('refuses a patch test dated after today at the home branch, naming the field, and writes nothing', async () => {
      const [clientsBefore, eventsBefore] = [await clientCount(), await eventCount()];
      const response = await t
        .http()
        .post('/api/clients')
        .set('Authorization', await as('front_desk'))
        .send({ firstName: 'Edda', lastName: 'Vantreight', homeBranchId: riverside, lastPatchTestOn: addDays(chicagoToday(), 1) })
        .expect(400);
      expect(response.body).toMatchObject({ code: 'client.patch_test_in_future', details: [{ field: 'lastPatchTestOn' }] });
      expect([await clientCount(), await eventCount()]).toEqual([clientsBefore, eventsBefore]);
    });

    it('treats an unknown branch and a branch outside the caller’s own alike: 400 naming homeBranchId', async () => {
      const send = async (homeBranchId: string) =>
        (await t.http().post('/api/clients').set('Authorization', await as('front_desk')).send({ firstName: 'Bram', lastName: 'Oakes', homeBranchId }).expect(400)).body;
      const unknown = await send(MISSING);
      expect(unknown).toMatchObject({ code: 'client.unknown_branch', details: [{ field: 'homeBranchId' }] });
      expect(await send(oldMill)).toEqual(unknown);
    });

    it('a stylist may not record clients and an accountant may not either: 403 with a plain reason', async () => {
      const body = { firstName: 'Pim', lastName: 'Garrow', homeBranchId: riverside };
      const stylist = await t.http().post('/api/clients').set('Authorization', await as('stylist')).send(body).expect(403);
      expect(stylist.body.message).toBe('A stylist may not create client records.');
      const accountant = await t.http().post('/api/clients').set('Authorization', await as('accountant')).send(body).expect(403);
      expect(accountant.body.message).toBe('An accountant may not create client records.');
    });
  });

  describe('changing', () => {
    let client: Client;
    beforeAll(async () => {
      client = await create('front_desk', { firstName: 'Maren', lastName: 'Quillfeather', homeBranchId: riverside, email: 'maren@mail.example', lastPatchTestOn: addDays(chicagoToday(), -200) });
    });

    it('changes only the fields sent and keeps the old and new patch-test dates in the event', async () => {
      const newTest = addDays(chicagoToday(), -3);
      const response = await t
        .http()
        .patch(`/api/clients/${client.id}`)
        .set('Authorization', await as('front_desk'))
        .send({ phone: '555 0199', lastPatchTestOn: newTest, email: null })
        .expect(200);
      expect(response.body).toMatchObject({ firstName: 'Maren', lastName: 'Quillfeather', phone: '555 0199', email: null, lastPatchTestOn: newTest });
      expect(response.body.patchTest).toMatchObject({ status: 'current', ageDays: 3 });
      const event = await lastEvent(client.id);
      expect(event).toMatchObject({ type: 'ClientUpdated', aggregateType: 'Client' });
      expect(event.payload).toMatchObject({
        before: { lastPatchTestOn: addDays(chicagoToday(), -200), email: 'maren@mail.example', phone: null },
        after: { lastPatchTestOn: newTest, email: null, phone: '555 0199' },
      });
    });

    it('refuses a future patch test, a null name and an unknown field, naming each, and changes nothing', async () => {
      const eventsBefore = await eventCount();
      const future = await t
        .http()
        .patch(`/api/clients/${client.id}`)
        .set('Authorization', await as('front_desk'))
        .send({ lastPatchTestOn: addDays(chicagoToday(), 2), notes: 'should not stick' })
        .expect(400);
      expect(future.body.details).toEqual([expect.objectContaining({ field: 'lastPatchTestOn' })]);
      const bad = await t
        .http()
        .patch(`/api/clients/${client.id}`)
        .set('Authorization', await as('front_desk'))
        .send({ firstName: null, allergyNotes: 7, vip: true })
        .expect(400);
      expect([...new Set(bad.body.details.map((d: { field: string }) => d.field))].sort()).toEqual(['allergyNotes', 'firstName', 'vip']);
      const read = await t.http().get(`/api/clients/${client.id}`).set('Authorization', await as('front_desk')).expect(200);
      expect(read.body.notes).toBe('');
      expect(await eventCount()).toBe(eventsBefore);
    });

    it('a manager of both branches moves a client to Old Mill; front desk of Riverside cannot, and then no longer sees them', async () => {
      const moved = await create('front_desk', { firstName: 'Cosimo', lastName: 'Brack', homeBranchId: riverside });
      const refused = await t.http().patch(`/api/clients/${moved.id}`).set('Authorization', await as('front_desk')).send({ homeBranchId: oldMill }).expect(400);
      expect(refused.body.details).toEqual([expect.objectContaining({ field: 'homeBranchId' })]);
      const response = await t.http().patch(`/api/clients/${moved.id}`).set('Authorization', await as('manager')).send({ homeBranchId: oldMill }).expect(200);
      expect(response.body).toMatchObject({ homeBranchId: oldMill, homeBranchName: 'Old Mill' });
      await t.http().get(`/api/clients/${moved.id}`).set('Authorization', await as('front_desk')).expect(404);
      await t.http().patch(`/api/clients/${moved.id}`).set('Authorization', await as('front_desk')).send({ notes: 'x' }).expect(404);
    });

    it('answers 400 naming the id when it is not a UUID, and 404 for an unknown one', async () => {
      const bad = await t.http().patch('/api/clients/wren').set('Authorization', await as('owner')).send({ notes: 'x' }).expect(400);
      expect(bad.body.details).toEqual([{ field: 'id', message: expect.stringContaining('UUID') }]);
      await t.http().patch(`/api/clients/${MISSING}`).set('Authorization', await as('owner')).send({ notes: 'x' }).expect(404);
    });
  });

  describe('finding', () => {
    let ids: Record<string, string>;
    beforeAll(async () => {
      ids = {};
      for (const [firstName, lastName, branch, phone, email] of [
        ['Alba', 'Quarrendon', riverside, '+1 (555) 010-7788', 'alba.z@mail.example'],
        ['Ciaran', 'Quarrendon', riverside, null, 'CIARAN@Post.example'],
        ['Beatrix', 'Quarrendon', oldMill, '555.010.9911', null],
        ['Aurelio', 'Quarrendale', riverside, null, null],
      ] as const) {
        ids[firstName] = (await create('owner', { firstName, lastName, homeBranchId: branch, phone, email })).id;
      }
    });

    const list = async (role: Parameters<TestApp['tokenFor']>[0], query: Record<string, string | number>) =>
      (await t.http().get('/api/clients').query(query).set('Authorization', await as(role)).expect(200)).body as Page<Client>;
    const names = (page: Page<Client>) => page.items.map((c) => `${c.firstName} ${c.lastName}`);
    // Demo data may use the same fictional 555-01xx numbers: only the clients made here count for these.
    const ours = (page: Page<Client>) => names({ ...page, items: page.items.filter((c) => Object.values(ids).includes(c.id)) });

    it('finds by part of a name in any case, ordered by last name then first name', async () => {
      expect(names(await list('owner', { search: 'qUaRrEnDo' }))).toEqual(['Alba Quarrendon', 'Beatrix Quarrendon', 'Ciaran Quarrendon']);
      expect(names(await list('owner', { search: 'quarren' }))).toEqual(['Aurelio Quarrendale', 'Alba Quarrendon', 'Beatrix Quarrendon', 'Ciaran Quarrendon']);
      expect(names(await list('owner', { search: 'alba quarr' }))).toEqual(['Alba Quarrendon']);
    });

    it('finds by e-mail in any case and by phone digits however they are written', async () => {
      expect(ours(await list('owner', { search: 'ciaran@post' }))).toEqual(['Ciaran Quarrendon']);
      expect(ours(await list('owner', { search: '010-7788' }))).toEqual(['Alba Quarrendon']);
      expect(ours(await list('owner', { search: '5550109911' }))).toEqual(['Beatrix Quarrendon']);
    });

    it('takes % and _ literally', async () => {
      expect((await list('owner', { search: 'Qu%rrendon' })).total).toBe(0);
      expect((await list('owner', { search: 'Qu_rrendon' })).total).toBe(0);
    });

    it('filters by home branch and pages with the total', async () => {
      expect(names(await list('owner', { search: 'quarrendon', branchId: oldMill }))).toEqual(['Beatrix Quarrendon']);
      const second = await list('owner', { search: 'quarren', limit: 2, offset: 2 });
      expect(second).toMatchObject({ total: 4, limit: 2, offset: 2 });
      expect(names(second)).toEqual(['Beatrix Quarrendon', 'Ciaran Quarrendon']);
      expect(await list('owner', { search: 'quarren' })).toMatchObject({ limit: 50, offset: 0 });
    });

    it('names bad paging and filter parameters', async () => {
      const response = await t.http().get('/api/clients').query({ limit: 0, offset: -1, branchId: 'old-mill', colour: 'red' }).set('Authorization', await as('owner')).expect(400);
      expect([...new Set(response.body.details.map((d: { field: string }) => d.field))].sort()).toEqual(['branchId', 'colour', 'limit', 'offset']);
    });

    it('front desk of Riverside lists only Riverside clients and gets 404 for an Old Mill client, as for a missing one', async () => {
      expect(names(await list('front_desk', { search: 'quarrendon' }))).toEqual(['Alba Quarrendon', 'Ciaran Quarrendon']);
      expect((await list('front_desk', { search: 'quarrendon', branchId: oldMill })).total).toBe(0);
      const other = await t.http().get(`/api/clients/${ids.Beatrix}`).set('Authorization', await as('front_desk')).expect(404);
      const missing = await t.http().get(`/api/clients/${MISSING}`).set('Authorization', await as('front_desk')).expect(404);
      expect(other.body).toEqual(missing.body);
      await t.http().get(`/api/clients/${ids.Beatrix}/formulas`).set('Authorization', await as('front_desk')).expect(404);
      await t.http().patch(`/api/clients/${ids.Beatrix}`).set('Authorization', await as('front_desk')).send({ notes: 'x' }).expect(404);
    });

    it('the manager of Riverside and Old Mill sees both', async () => {
      expect(names(await list('manager', { search: 'quarrendon' }))).toEqual(['Alba Quarrendon', 'Beatrix Quarrendon', 'Ciaran Quarrendon']);
    });

    it('the accountant reads no clients: 403 for the list, 404 for one client and its formulas', async () => {
      const refused = await t.http().get('/api/clients').set('Authorization', await as('accountant')).expect(403);
      expect(refused.body.message).toBe('An accountant may not see client records.');
      await t.http().get(`/api/clients/${ids.Alba}`).set('Authorization', await as('accountant')).expect(404);
      await t.http().get(`/api/clients/${ids.Alba}/formulas`).set('Authorization', await as('accountant')).expect(404);
    });
  });

  describe('a stylist', () => {
    let served: Client;
    let other: Client;
    beforeAll(async () => {
      served = await create('front_desk', { firstName: 'Idony', lastName: 'Farrant', homeBranchId: riverside, allergyNotes: 'Sensitive scalp.' });
      other = await create('front_desk', { firstName: 'Idony', lastName: 'Garside', homeBranchId: riverside });
    });

    it('without a staff record may not see client records', async () => {
      await t.http().get('/api/clients').set('Authorization', `Bearer ${unlinkedStylistToken}`).expect(403);
      await t.http().get(`/api/clients/${served.id}`).set('Authorization', `Bearer ${unlinkedStylistToken}`).expect(404);
    });

    it('sees a client of their own branch only once they have a service line for them', async () => {
      await t.http().get(`/api/clients/${served.id}`).set('Authorization', await as('stylist')).expect(404);
      await t.http().get(`/api/clients/${served.id}/formulas`).set('Authorization', await as('stylist')).expect(404);
      expect((await t.http().get('/api/clients').query({ search: 'idony' }).set('Authorization', await as('stylist')).expect(200)).body.total).toBe(0);

      await build.visit({ clientId: served.id, branchName: 'Riverside', staffId: stylistStaffId, businessDate: addDays(chicagoToday(), -1), serviceName: 'Cut and finish' });

      const read = await t.http().get(`/api/clients/${served.id}`).set('Authorization', await as('stylist')).expect(200);
      expect(read.body).toMatchObject({ lastName: 'Farrant', allergyNotes: 'Sensitive scalp.' });
      const page = (await t.http().get('/api/clients').query({ search: 'idony' }).set('Authorization', await as('stylist')).expect(200)).body;
      expect(page.items.map((c: Client) => c.id)).toEqual([served.id]);
      await t.http().get(`/api/clients/${other.id}`).set('Authorization', await as('stylist')).expect(404);
    });

    it('sees a client they served at another branch', async () => {
      const visitor = await create('manager', { firstName: 'Juno', lastName: 'Ashcombe', homeBranchId: oldMill });
      await t.http().get(`/api/clients/${visitor.id}`).set('Authorization', await as('stylist')).expect(404);
      await build.visit({ clientId: visitor.id, branchName: 'Old Mill', staffId: stylistStaffId, businessDate: addDays(chicagoToday(), -5), serviceName: 'Cut and finish' });
      await t.http().get(`/api/clients/${visitor.id}`).set('Authorization', await as('stylist')).expect(200);
    });

    it('may not change a client they serve: 403 with a plain reason', async () => {
      const response = await t.http().patch(`/api/clients/${served.id}`).set('Authorization', await as('stylist')).send({ notes: 'x' }).expect(403);
      expect(response.body.message).toBe('A stylist may not change client records.');
    });
  });

  describe('formula history', () => {
    let client: Client;
    let colleague: string;
    let assistant: string;
    const today = chicagoToday();
    const permanent = { product: 'Thistlewick Permanent 6.3', kind: 'colour', grams: '60', costPerGram: '0.18' } as const;
    const dev20 = { product: 'Thistlewick Developer 20 vol', kind: 'developer', grams: '60', costPerGram: '0.012', developerVolume: '20' } as const;

    beforeAll(async () => {
      client = await create('front_desk', { firstName: 'Sabine', lastName: 'Thorncroft', homeBranchId: riverside });
      colleague = await build.staffMember('Leopold Arkwright', 'Old Mill');
      assistant = await build.staffMember('Nell Pryor', 'Riverside');
      // Oldest: a permanent colour at Old Mill by a colleague.
      await build.visit({
        clientId: client.id,
        branchName: 'Old Mill',
        staffId: colleague,
        businessDate: addDays(today, -60),
        serviceName: 'Permanent colour',
        bowls: [{ components: [permanent, dev20], processingMinutes: 35, note: 'Roots only' }],
      });
      // A voided ticket: not part of the history.
      await build.visit({
        clientId: client.id,
        branchName: 'Riverside',
        staffId: colleague,
        businessDate: addDays(today, -30),
        serviceName: 'Permanent colour',
        status: 'void',
        bowls: [{ components: [permanent, dev20] }],
      });
      // Newest: foils by our stylist, two mixes, the second weighed by the assistant, recorded in that order.
      await build.visit({
        clientId: client.id,
        branchName: 'Riverside',
        staffId: stylistStaffId,
        businessDate: addDays(today, -2),
        serviceName: 'Full head foils',
        bowls: [
          {
            components: [
              { product: 'Thistlewick Lightener', kind: 'lightener', grams: '40', costPerGram: '0.09' },
              { product: 'Thistlewick Developer 20 vol', kind: 'developer', grams: '40', costPerGram: '0.01', developerVolume: '20' },
              { product: 'Thistlewick Developer 30 vol', kind: 'developer', grams: '40', costPerGram: '0.011', developerVolume: '30' },
              { product: 'Thistlewick Bond Additive', kind: 'additive', grams: '5', costPerGram: '0.6' },
            ],
            leftoverGrams: '25',
            processingMinutes: 40,
          },
          {
            components: [{ product: 'Thistlewick Gloss 9.1', kind: 'colour', grams: '30.5', costPerGram: '0.2' }, { ...dev20, grams: '30.5' }],
            mixedByStaffId: assistant,
            processingMinutes: 20,
          },
        ],
      });
    });

    const formulas = async (role: Parameters<TestApp['tokenFor']>[0], query: Record<string, number> = {}) =>
      (await t.http().get(`/api/clients/${client.id}/formulas`).query(query).set('Authorization', await as(role)).expect(200)).body;

    it('lists every bowl newest first with its date, branch, service, stylist and components', async () => {
      const page = await formulas('front_desk');
      expect(page).toMatchObject({ total: 3, limit: 50, offset: 0 });
      expect(page.items.map((f: { date: string; serviceName: string }) => [f.date, f.serviceName])).toEqual([
        [addDays(today, -2), 'Full head foils'],
        [addDays(today, -2), 'Full head foils'],
        [addDays(today, -60), 'Permanent colour'],
      ]);
      const [gloss, foils, colour] = page.items;
      expect(gloss).toMatchObject({ branchName: 'Riverside', stylistName: 'Rhea Castellane', mixedByName: 'Nell Pryor', totalGrams: '61', leftoverGrams: '0', ratio: '1.00', developerVolume: '20.0', processingMinutes: 20 });
      expect(gloss.components).toEqual([
        { productName: 'Thistlewick Gloss 9.1', kind: 'colour', grams: '30.5', developerVolume: null },
        { productName: 'Thistlewick Developer 20 vol', kind: 'developer', grams: '30.5', developerVolume: '20' },
      ]);
      // Common practice in the trade: lightener about 1:1.5 to 1:2; two developers mix to their weighted mean volume.
      expect(foils).toMatchObject({ stylistName: 'Rhea Castellane', mixedByName: 'Rhea Castellane', totalGrams: '125', leftoverGrams: '25', ratio: '2.00', developerVolume: '25.0', processingMinutes: 40, note: '' });
      expect(foils.components.map((c: { productName: string; grams: string }) => [c.productName, c.grams])).toEqual([
        ['Thistlewick Lightener', '40'],
        ['Thistlewick Developer 20 vol', '40'],
        ['Thistlewick Developer 30 vol', '40'],
        ['Thistlewick Bond Additive', '5'],
      ]);
      expect(colour).toMatchObject({ branchName: 'Old Mill', stylistName: 'Leopold Arkwright', serviceName: 'Permanent colour', ratio: '1.00', note: 'Roots only', processingMinutes: 35 });
    });

    it('shows the bowl cost to owners and managers but not to front desk or stylists', async () => {
      for (const role of ['owner', 'manager'] as const) {
        // 60 × 0.18 + 60 × 0.012 = 11.52; 40 × 0.09 + 40 × 0.01 + 40 × 0.011 + 5 × 0.6 = 7.44; 30.5 × 0.2 + 30.5 × 0.012 = 6.466 → 6.47
        expect((await formulas(role)).items.map((f: { cost?: string }) => f.cost)).toEqual(['6.47', '7.44', '11.52']);
      }
      for (const role of ['front_desk', 'stylist'] as const) {
        for (const item of (await formulas(role)).items) expect(item).not.toHaveProperty('cost');
      }
    });

    it('gives the stylist serving the client the whole history, colleagues’ bowls included', async () => {
      const page = await formulas('stylist');
      expect(page.items.map((f: { stylistName: string }) => f.stylistName)).toEqual(['Rhea Castellane', 'Rhea Castellane', 'Leopold Arkwright']);
    });

    it('pages with the total', async () => {
      const page = await formulas('owner', { limit: 1, offset: 2 });
      expect(page).toMatchObject({ total: 3, limit: 1, offset: 2 });
      expect(page.items.map((f: { serviceName: string }) => f.serviceName)).toEqual(['Permanent colour']);
    });

    it('is empty for a client with no bowls, and 404 for an unknown client', async () => {
      const fresh = await create('front_desk', { firstName: 'Vesna', lastName: 'Oldcastle', homeBranchId: riverside });
      expect((await t.http().get(`/api/clients/${fresh.id}/formulas`).set('Authorization', await as('front_desk')).expect(200)).body).toEqual({ items: [], total: 0, limit: 50, offset: 0 });
      await t.http().get(`/api/clients/${MISSING}/formulas`).set('Authorization', await as('owner')).expect(404);
    });
  });
});
