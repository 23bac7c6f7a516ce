import { dayCloses, tickets, users } from '@tressury/schema';
import { eq, sql } from 'drizzle-orm';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { buildFloor, type Floor } from './support/floor-builders.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Preview = {
  close: { cashVariance: string; cardVariance: string; note: string; countedCash: string } | null;
  ticketsByStatus: { open: number; closed: number; void: number };
  openTickets: { number: number; due: string }[];
  colourLinesWithoutBowl: { serviceName: string }[];
  revenueByCategory: { category: string; amount: string }[];
  serviceRevenue: string;
  retailRevenue: string;
  retailTax: string;
  tipsByStaff: { staffName: string; amount: string }[];
  colourProductCost: string;
  expectedCash: string;
  cardTotalTickets: string;
  cardTotalProcessor: string;
  adjustments: { amount: string; category: string }[];
  readyToClose: boolean;
};

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);

describe('day close', () => {
  let t: TestApp;
  let floor: Floor;
  let today: string;
  const auth = async (role: Parameters<TestApp['tokenFor']>[0]) => `Bearer ${await t.tokenFor(role)}`;
  const ids: Record<string, string> = {};

  async function ticketWith(role: 'front_desk' | 'manager', branchId: string, build: (id: string, authz: string) => Promise<void>) {
    const authz = await auth(role);
    const ticket = (await t.http().post('/api/tickets').set('Authorization', authz).send({ branchId, clientId: floor.clients.tested.id }).expect(201)).body;
    await build(ticket.id, authz);
    return ticket.id as string;
  }

  beforeAll(async () => {
    t = await startTestApp();
    floor = await buildFloor(t.database);
    today = businessDateIn(floor.riverside.timeZone);
    const post = (path: string, authz: string, body: object) => t.http().post(path).set('Authorization', authz).send(body);

    ids.cashTicket = await ticketWith('front_desk', floor.riverside.id, async (id, authz) => {
      await post(`/api/tickets/${id}/service-lines`, authz, { serviceId: floor.services.cut.id, staffId: floor.staff.jonah.id }).expect(201);
      await post(`/api/tickets/${id}/retail-lines`, authz, { productId: floor.products.shampoo.id, quantity: 1, sellerStaffId: floor.staff.jonah.id }).expect(201);
      await post(`/api/tickets/${id}/tips`, authz, { staffId: floor.staff.jonah.id, amount: '10.00' }).expect(201);
      await post(`/api/tickets/${id}/payments`, authz, { method: 'cash', amount: '90.98', tendered: '100.00', idempotencyKey: 'day-cash-1' }).expect(201);
      await post(`/api/tickets/${id}/close`, authz, {}).expect(200);
    });
    ids.cardTicket = await ticketWith('front_desk', floor.riverside.id, async (id, authz) => {
      const line = (await post(`/api/tickets/${id}/service-lines`, authz, { serviceId: floor.services.rootColour.id, staffId: floor.staff.rhea.id }).expect(201)).body.serviceLines[0];
      await post(`/api/tickets/${id}/bowls`, authz, {
        serviceLineId: line.id,
        components: [
          { productId: floor.products.shade.id, amount: '45', unit: 'g' },
          { productId: floor.products.developer20.id, amount: '45', unit: 'g' },
        ],
      }).expect(201);
      await post(`/api/tickets/${id}/payments`, authz, { method: 'card', amount: '110.00', paymentMethod: 'pm_card_visa', idempotencyKey: 'day-card-1' }).expect(201);
      await post(`/api/tickets/${id}/close`, authz, {}).expect(200);
    });
    ids.openTicket = await ticketWith('front_desk', floor.riverside.id, async (id, authz) => {
      await post(`/api/tickets/${id}/service-lines`, authz, { serviceId: floor.services.rootColour.id, staffId: floor.staff.jonah.id }).expect(201);
    });
    ids.voidTicket = await ticketWith('manager', floor.riverside.id, async (id, authz) => {
      await post(`/api/tickets/${id}/service-lines`, authz, { serviceId: floor.services.cut.id, staffId: floor.staff.rhea.id }).expect(201);
      await post(`/api/tickets/${id}/void`, authz, { reason: 'Opened on the wrong client' }).expect(200);
    });
  });
  afterAll(() => t.close());

  const preview = async (branchId = floor.riverside.id, role: 'manager' | 'owner' = 'manager'): Promise<Preview> =>
    (await t.http().get(`/api/day-close?branchId=${branchId}&businessDate=${today}`).set('Authorization', await auth(role)).expect(200)).body;

  it('previews the day: ticket states, open work, revenue by category, tips, colour product cost, cash and card', async () => {
    const day = await preview();
    expect(day.ticketsByStatus).toEqual({ open: 1, closed: 2, void: 1 });
    expect(day.openTickets).toEqual([expect.objectContaining({ due: '80.00' })]);
    expect(day.colourLinesWithoutBowl.map((l) => l.serviceName)).toEqual(['Test Root Colour']);
    // Open tickets count towards the day's revenue; void ones never do.
    expect(day.revenueByCategory).toEqual([
      { category: 'Colour', amount: '190.00' },
      { category: 'Cuts', amount: '55.00' },
    ]);
    expect(day).toMatchObject({ serviceRevenue: '245.00', retailRevenue: '24.00', retailTax: '1.98', expectedCash: '90.98', cardTotalTickets: '110.00', readyToClose: false });
    expect(day.tipsByStaff).toEqual([{ staffId: floor.staff.jonah.id, staffName: 'Test Jonah', amount: '10.00' }]);
    // 45 g × $0.10 + 45 g × $0.012 = 4.50 + 0.54
    expect(day.colourProductCost).toBe('5.04');
    // The card processor's own records agree with the tickets.
    expect(day.cardTotalProcessor).toBe('110.00');
  });

  it('agrees with an independent SQL query over the same day', async () => {
    const day = await preview();
    const [cash] = rowsOf<{ total: string }>(
      await t.database.db.execute(sql`
        select coalesce(sum(p.amount), 0)::numeric(12,2)::text as total from payments p join tickets t on t.id = p.ticket_id
        where t.branch_id = ${floor.riverside.id} and p.booked_on = ${today} and p.method = 'cash' and p.status = 'succeeded'`),
    );
    const [card] = rowsOf<{ total: string }>(
      await t.database.db.execute(sql`
        select coalesce(sum(p.amount), 0)::numeric(12,2)::text as total from payments p join tickets t on t.id = p.ticket_id
        where t.branch_id = ${floor.riverside.id} and p.booked_on = ${today} and p.method = 'card' and p.status = 'succeeded'`),
    );
    const [services] = rowsOf<{ total: string }>(
      await t.database.db.execute(sql`
        select coalesce(sum(l.price), 0)::numeric(12,2)::text as total from ticket_service_lines l join tickets t on t.id = l.ticket_id
        where t.branch_id = ${floor.riverside.id} and l.booked_on = ${today} and t.status <> 'void'`),
    );
    const [bowlCost] = rowsOf<{ total: string }>(
      await t.database.db.execute(sql`
        select coalesce(sum(b.cost), 0)::numeric(12,2)::text as total from bowls b join ticket_service_lines l on l.id = b.service_line_id
        join tickets t on t.id = l.ticket_id where t.branch_id = ${floor.riverside.id} and l.booked_on = ${today} and t.status <> 'void'`),
    );
    const statuses = rowsOf<{ status: string; n: number }>(
      await t.database.db.execute(sql`select status, count(*)::int as n from tickets where branch_id = ${floor.riverside.id} and business_date = ${today} group by status`),
    );
    expect(day.expectedCash).toBe(cash!.total);
    expect(day.cardTotalTickets).toBe(card!.total);
    expect(day.serviceRevenue).toBe(services!.total);
    expect(day.colourProductCost).toBe(bowlCost!.total);
    expect(Object.fromEntries(statuses.map((s) => [s.status, s.n]))).toEqual({ open: 1, closed: 2, void: 1 });
  });

  it('refuses to close with an open ticket, then asks for a note when the drawer is off by more than the threshold', async () => {
    const manager = await auth('manager');
    const refused = await t.http().post('/api/day-close').set('Authorization', manager).send({ branchId: floor.riverside.id, businessDate: today, countedCash: '90.98' }).expect(409);
    expect(refused.body.code).toBe('day.open_tickets');
    await t.http().post(`/api/tickets/${ids.openTicket}/void`).set('Authorization', manager).send({ reason: 'Client rebooked for next week' }).expect(200);

    const short = { branchId: floor.riverside.id, businessDate: today, denominations: { '20': 4, '0.25': 3 } };
    const noNote = await t.http().post('/api/day-close').set('Authorization', manager).send(short).expect(400);
    expect(noNote.body.details).toEqual([{ field: 'note', message: expect.stringContaining('-10.23') }]);
    expect(await t.database.db.select().from(dayCloses)).toHaveLength(0);

    const closed = await t.http().post('/api/day-close').set('Authorization', manager).send({ ...short, note: 'Paid the window cleaner from the drawer' }).expect(201);
    expect(closed.body.close).toMatchObject({ countedCash: '80.75', cashVariance: '-10.23', cardVariance: '0.00', note: 'Paid the window cleaner from the drawer' });
  });

  it('locks the closed day: its tickets answer 409 and a second close is refused', async () => {
    const manager = await auth('manager');
    const locked = await t.http().post(`/api/tickets/${ids.cashTicket}/void`).set('Authorization', manager).send({ reason: 'Late change' }).expect(409);
    expect(locked.body).toMatchObject({ code: 'day.locked', message: expect.stringContaining('dated adjustments') });
    const again = await t.http().post('/api/day-close').set('Authorization', manager).send({ branchId: floor.riverside.id, businessDate: today, countedCash: '90.98' }).expect(409);
    expect(again.body.code).toBe('day.already_closed');
    await t.http().post('/api/tickets').set('Authorization', await auth('front_desk')).send({ branchId: floor.riverside.id }).expect(409);
  });

  it('books a correction to an earlier closed day as a dated adjustment on today, counted in today’s cash', async () => {
    const [owner] = await t.database.db.select().from(users).where(eq(users.role, 'owner'));
    const yesterday = businessDateIn(floor.oldMill.timeZone, new Date(Date.now() - 86_400_000));
    const [old] = await t.database.db
      .insert(tickets)
      .values({ organisationId: floor.organisationId, branchId: floor.oldMill.id, businessDate: yesterday, number: 1, status: 'closed', openedById: owner!.id })
      .returning();
    const manager = await auth('manager');
    const early = await t
      .http()
      .post('/api/day-close/adjustments')
      .set('Authorization', manager)
      .send({ branchId: floor.oldMill.id, ticketId: old!.id, category: 'cash', amount: '-5.00', reason: 'Change given twice' })
      .expect(400);
    expect(early.body.details[0].field).toBe('ticketId');
    await t.database.db.insert(dayCloses).values({
      organisationId: floor.organisationId,
      branchId: floor.oldMill.id,
      businessDate: yesterday,
      expectedCash: '0',
      countedCash: '0',
      cashVariance: '0',
      cardTotalTickets: '0',
      cardTotalProcessor: '0',
      cardVariance: '0',
      closedById: owner!.id,
    });
    const zero = await t.http().post('/api/day-close/adjustments').set('Authorization', manager).send({ branchId: floor.oldMill.id, category: 'cash', amount: '0.00', reason: 'Nothing' }).expect(400);
    expect(zero.body.details[0].field).toBe('amount');
    await t
      .http()
      .post('/api/day-close/adjustments')
      .set('Authorization', manager)
      .send({ branchId: floor.oldMill.id, ticketId: old!.id, category: 'cash', amount: '-5.00', reason: 'Change given twice' })
      .expect(201);
    const day = await preview(floor.oldMill.id);
    expect(day.adjustments).toEqual([expect.objectContaining({ category: 'cash', amount: '-5.00' })]);
    expect(day.expectedCash).toBe('-5.00');
    await t
      .http()
      .post('/api/day-close/adjustments')
      .set('Authorization', await auth('front_desk'))
      .send({ branchId: floor.oldMill.id, category: 'cash', amount: '1.00', reason: 'Not mine' })
      .expect(403);
  });

  it('lets exactly one of two managers closing the same day at once succeed', async () => {
    const body = { branchId: floor.oldMill.id, businessDate: today, countedCash: '0.00', note: 'Drawer short by the adjustment' };
    const [owner, manager] = [await auth('owner'), await auth('manager')];
    const results = await Promise.all([
      t.http().post('/api/day-close').set('Authorization', owner).send(body),
      t.http().post('/api/day-close').set('Authorization', manager).send(body),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
  });

  it('keeps day closes to managers of the branch and the owner', async () => {
    await t.http().get(`/api/day-close?branchId=${floor.riverside.id}&businessDate=${today}`).set('Authorization', await auth('front_desk')).expect(403);
    await t.http().get(`/api/day-close?branchId=${floor.riverside.id}&businessDate=${today}`).set('Authorization', await auth('accountant')).expect(200);
    const [harbor] = rowsOf<{ id: string }>(await t.database.db.execute(sql`select id from branches where name = 'Harbor Point'`));
    await t.http().get(`/api/day-close?branchId=${harbor!.id}&businessDate=${today}`).set('Authorization', await auth('manager')).expect(404);
  });
});
