import { DEMO_PASSWORD, demoBusiness, demoLevels } from '@tressury/fixtures';
import { domainEvents, staff, users } from '@tressury/schema';
import { count, desc, eq } from 'drizzle-orm';
import { startTestApp, type TestApp } from './support/test-app.js';

type Role = Parameters<TestApp['tokenFor']>[0];
type StaffMember = {
  id: string;
  displayName: string;
  email: string | null;
  levelId: string;
  levelName: string;
  homeBranchId: string;
  homeBranchName: string;
  userId: string | null;
  active: boolean;
  hourlyRate?: string | null;
};

describe('staff', () => {
  let t: TestApp;
  const branch: Record<string, string> = {};
  const level: Record<string, string> = {};
  const userId: Partial<Record<Role, string>> = {};
  let harbor: StaffMember;
  let riverside: StaffMember;
  let oldMill: StaffMember;

  const as = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const staffCount = async () => (await t.database.db.select({ n: count() }).from(staff))[0]!.n;
  const eventCount = async () => (await t.database.db.select({ n: count() }).from(domainEvents))[0]!.n;
  const create = async (role: Role, body: object, status = 201) =>
    (await t.http().post('/api/staff').set('Authorization', await as(role)).send(body).expect(status)).body;
  const update = async (role: Role, id: string, body: object, status = 200) =>
    (await t.http().patch(`/api/staff/${id}`).set('Authorization', await as(role)).send(body).expect(status)).body;
  const fields = (body: { details: { field: string }[] }) => [...new Set(body.details.map((d) => d.field))].sort();

  beforeAll(async () => {
    t = await startTestApp();
    const owner = await as('owner');
    for (const l of demoLevels) level[l.name] = (await t.http().post('/api/catalogue/levels').set('Authorization', owner).send(l).expect(201)).body.id;
    for (const b of (await t.http().get('/api/branches').set('Authorization', owner)).body as { id: string; name: string }[]) branch[b.name] = b.id;
    for (const u of demoBusiness.users) {
      const [row] = await t.database.db.select({ id: users.id }).from(users).where(eq(users.email, u.email));
      userId[u.role] = row!.id;
    }
    harbor = await create('owner', { displayName: 'Wren Halloway', email: 'wren@thistlewick.example', levelId: level.Principal, homeBranchId: branch['Harbor Point'], hourlyRate: '12.50' });
    riverside = await create('owner', { displayName: 'Cassius Fenwright', levelId: level.Stylist, homeBranchId: branch.Riverside, hourlyRate: '9.75' });
    oldMill = await create('owner', { displayName: 'Berenice Oakes', levelId: level.Senior, homeBranchId: branch['Old Mill'] });
  }, 120_000);
  afterAll(() => t.close());

  describe('owner', () => {
    it('adds a staff member with level, home branch and hourly rate, recording the event', async () => {
      expect(harbor).toMatchObject({
        displayName: 'Wren Halloway',
        email: 'wren@thistlewick.example',
        levelId: level.Principal,
        levelName: 'Principal',
        homeBranchId: branch['Harbor Point'],
        homeBranchName: 'Harbor Point',
        userId: null,
        active: true,
        hourlyRate: '12.50',
      });
      const [event] = await t.database.db.select().from(domainEvents).where(eq(domainEvents.aggregateId, harbor.id));
      expect(event).toMatchObject({ type: 'StaffCreated', aggregateType: 'Staff', actorId: userId.owner, payload: { after: { hourlyRate: '12.50' } } });
    });

    it('links a stylist’s sign-in in the same command, and unlinks it with null', async () => {
      const member = await create('owner', { displayName: 'Odile Marchbank', levelId: level.Associate, homeBranchId: branch.Riverside, userId: userId.stylist });
      expect(member.userId).toBe(userId.stylist);
      const [linked] = await t.database.db.select({ staffId: users.staffId }).from(users).where(eq(users.id, userId.stylist!));
      expect(linked!.staffId).toBe(member.id);
      const unlinked = await update('owner', member.id, { userId: null });
      expect(unlinked.userId).toBeNull();
      const [after] = await t.database.db.select({ staffId: users.staffId }).from(users).where(eq(users.id, userId.stylist!));
      expect(after!.staffId).toBeNull();
    });

    it('links only a stylist’s sign-in assigned to the home branch (400 naming userId), and one person only (409)', async () => {
      const before = await staffCount();
      const notStylist = await create('owner', { displayName: 'Desk Link', levelId: level.Stylist, homeBranchId: branch.Riverside, userId: userId.front_desk }, 400);
      expect(fields(notStylist)).toEqual(['userId']);
      const otherBranch = await create('owner', { displayName: 'Far Link', levelId: level.Stylist, homeBranchId: branch['Old Mill'], userId: userId.stylist }, 400);
      expect(fields(otherBranch)).toEqual(['userId']);
      const first = await create('owner', { displayName: 'First Link', levelId: level.Stylist, homeBranchId: branch.Riverside, userId: userId.stylist });
      const second = await create('owner', { displayName: 'Second Link', levelId: level.Stylist, homeBranchId: branch.Riverside, userId: userId.stylist }, 409);
      expect(second).toMatchObject({ code: 'staff.user_already_linked', details: [{ field: 'userId' }] });
      expect(await staffCount()).toBe(before + 1);
      await update('owner', first.id, { userId: null });
    });

    it('names every bad field, and an unknown level or branch exactly like a malformed one', async () => {
      const malformed = await t
        .http()
        .post('/api/staff')
        .set('Authorization', await as('owner'))
        .send({ displayName: '', email: 'not-an-address', levelId: 'senior', hourlyRate: 12 })
        .expect(400);
      expect(fields(malformed.body)).toEqual(['displayName', 'email', 'homeBranchId', 'hourlyRate', 'levelId']);
      const unknown = await create('owner', { displayName: 'Nobody', levelId: '00000000-0000-4000-8000-000000000000', homeBranchId: '00000000-0000-4000-8000-000000000000' }, 400);
      expect(fields(unknown)).toEqual(['homeBranchId', 'levelId']);
      const cleared = await update('owner', harbor.id, { displayName: null, levelId: null }, 400);
      expect(fields(cleared)).toEqual(['displayName', 'levelId']);
    });

    it('changes the rate and clears it; the event keeps before and after', async () => {
      const member = await create('owner', { displayName: 'Imogen Tarrant', levelId: level.Senior, homeBranchId: branch['Juniper Flats'], hourlyRate: '11.00' });
      expect((await update('owner', member.id, { hourlyRate: '11.40' })).hourlyRate).toBe('11.40');
      expect((await update('owner', member.id, { hourlyRate: null })).hourlyRate).toBeNull();
      const [event] = await t.database.db.select().from(domainEvents).where(eq(domainEvents.aggregateId, member.id)).orderBy(desc(domainEvents.id)).limit(1);
      expect(event).toMatchObject({ type: 'StaffUpdated', payload: { before: { hourlyRate: '11.40' }, after: { hourlyRate: null } } });
    });
  });

  describe('manager (Riverside and Old Mill)', () => {
    it('adds and changes staff of their branches, and sees their rates', async () => {
      const member = await create('manager', { displayName: 'Ptolemy Greaves', levelId: level.Associate, homeBranchId: branch['Old Mill'] });
      expect(member).toMatchObject({ homeBranchName: 'Old Mill', hourlyRate: null });
      const moved = await update('manager', member.id, { homeBranchId: branch.Riverside, levelId: level.Stylist, active: false });
      expect(moved).toMatchObject({ homeBranchName: 'Riverside', levelName: 'Stylist', active: false });
      const inactive = await t.http().get(`/api/staff?active=false&branchId=${branch.Riverside}`).set('Authorization', await as('manager')).expect(200);
      expect(inactive.body.map((s: StaffMember) => s.displayName)).toEqual(['Ptolemy Greaves']);
      const got = await t.http().get(`/api/staff/${riverside.id}`).set('Authorization', await as('manager')).expect(200);
      expect(got.body.hourlyRate).toBe('9.75');
    });

    it('lists only the staff of their branches', async () => {
      const list = await t.http().get('/api/staff').set('Authorization', await as('manager')).expect(200);
      const ids = list.body.map((s: StaffMember) => s.id);
      expect(ids).toEqual(expect.arrayContaining([riverside.id, oldMill.id]));
      expect(ids).not.toContain(harbor.id);
      expect(list.body.every((s: StaffMember) => ['Riverside', 'Old Mill'].includes(s.homeBranchName))).toBe(true);
    });

    it('gets 404 for another branch’s staff member, exactly as for one that does not exist', async () => {
      const missing = await t.http().get('/api/staff/00000000-0000-4000-8000-000000000000').set('Authorization', await as('manager')).expect(404);
      const elsewhere = await t.http().get(`/api/staff/${harbor.id}`).set('Authorization', await as('manager')).expect(404);
      expect(elsewhere.body).toEqual(missing.body);
      await update('manager', harbor.id, { displayName: 'Renamed' }, 404);
    });

    it('may not put staff in a branch they do not manage (400 naming homeBranchId), and writes nothing', async () => {
      const before = await staffCount();
      const response = await create('manager', { displayName: 'Far Hire', levelId: level.Stylist, homeBranchId: branch['Harbor Point'] }, 400);
      expect(fields(response)).toEqual(['homeBranchId']);
      expect(await staffCount()).toBe(before);
      const move = await update('manager', riverside.id, { homeBranchId: branch['Harbor Point'] }, 400);
      expect(fields(move)).toEqual(['homeBranchId']);
      const [row] = await t.database.db.select().from(staff).where(eq(staff.id, riverside.id));
      expect(row!.homeBranchId).toBe(branch.Riverside);
    });

    it('reads pay but may not set it: 403 with a plain reason, and nothing is written', async () => {
      const [before, events] = [await staffCount(), await eventCount()];
      const hire = await create('manager', { displayName: 'Paid Hire', levelId: level.Stylist, homeBranchId: branch.Riverside, hourlyRate: '10.00' }, 403);
      expect(hire.message).toBe('A manager may not change pay figures.');
      await update('manager', riverside.id, { hourlyRate: '20.00', displayName: 'Cassius F.' }, 403);
      expect([await staffCount(), await eventCount()]).toEqual([before, events]);
      const [row] = await t.database.db.select().from(staff).where(eq(staff.id, riverside.id));
      expect(row).toMatchObject({ hourlyRate: '9.75', displayName: 'Cassius Fenwright' });
    });
  });

  describe('front desk (Riverside)', () => {
    it('reads the staff of their branch and never receives an hourly rate', async () => {
      const list = await t.http().get('/api/staff').set('Authorization', await as('front_desk')).expect(200);
      expect(list.body.length).toBeGreaterThan(0);
      expect(list.body.every((s: StaffMember) => s.homeBranchName === 'Riverside')).toBe(true);
      expect(list.body.some((s: StaffMember) => 'hourlyRate' in s)).toBe(false);
      const one = await t.http().get(`/api/staff/${riverside.id}`).set('Authorization', await as('front_desk')).expect(200);
      expect(one.body).not.toHaveProperty('hourlyRate');
      expect(one.body.displayName).toBe('Cassius Fenwright');
    });

    it('may not add or change staff', async () => {
      const refused = await create('front_desk', { displayName: 'Desk Hire', levelId: level.Stylist, homeBranchId: branch.Riverside }, 403);
      expect(refused.message).toBe('Front desk may not create staff records.');
      await update('front_desk', riverside.id, { displayName: 'Renamed' }, 403);
      await t.http().get(`/api/staff/${harbor.id}`).set('Authorization', await as('front_desk')).expect(404);
    });
  });

  describe('stylist (Riverside)', () => {
    it('may not create staff: 403', async () => {
      const refused = await create('stylist', { displayName: 'Self Hire', levelId: level.Stylist, homeBranchId: branch.Riverside }, 403);
      expect(refused.message).toBe('A stylist may not create staff records.');
    });

    it('once linked, sees their own hourly rate and nobody else’s', async () => {
      const me = await create('owner', { displayName: 'Rhea Castellane', levelId: level.Senior, homeBranchId: branch.Riverside, userId: userId.stylist, hourlyRate: '8.00' });
      // The staff link travels in the access token, so sign in again after linking.
      const stylist = demoBusiness.users.find((u) => u.role === 'stylist')!;
      const login = await t.http().post('/api/auth/login').send({ email: stylist.email, password: DEMO_PASSWORD }).expect(200);
      const list = await t.http().get('/api/staff').set('Authorization', `Bearer ${login.body.accessToken}`).expect(200);
      const mine = list.body.find((s: StaffMember) => s.id === me.id);
      expect(mine.hourlyRate).toBe('8.00');
      const others = list.body.filter((s: StaffMember) => s.id !== me.id);
      expect(others.length).toBeGreaterThan(0);
      expect(others.some((s: StaffMember) => 'hourlyRate' in s)).toBe(false);
    });
  });

  describe('accountant', () => {
    it('reads every branch’s staff with their rates, and changes nothing', async () => {
      const list = await t.http().get('/api/staff').set('Authorization', await as('accountant')).expect(200);
      expect(list.body.find((s: StaffMember) => s.id === harbor.id).hourlyRate).toBe('12.50');
      await update('accountant', harbor.id, { hourlyRate: '13.00' }, 403);
    });
  });

  it('answers 400 naming the parameter for a malformed id or branch filter', async () => {
    const id = await t.http().get('/api/staff/wren').set('Authorization', await as('owner')).expect(400);
    expect(id.body.details).toEqual([expect.objectContaining({ field: 'id' })]);
    const filter = await t.http().get('/api/staff?branchId=riverside&active=maybe').set('Authorization', await as('owner')).expect(400);
    expect(fields(filter.body)).toEqual(['active', 'branchId']);
  });
});
