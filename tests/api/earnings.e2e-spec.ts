import { computePay, type PayInput } from '@tressury/domain';
import { DEMO_PASSWORD } from '@tressury/fixtures';
import { dayCloses, retailLines, ticketServiceLines, tickets, tips, users, bowls } from '@tressury/schema';
import Big from 'big.js';
import { eq, sql } from 'drizzle-orm';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { buildFloor, type Floor } from './support/floor-builders.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Role = Parameters<TestApp['tokenFor']>[0];
type Earnings = {
  staffId: string;
  staffName: string;
  branch: { name: string; currency: string };
  today: string;
  missing: string[];
  period: { startDate: string; endDate: string; id: string | null } | null;
  throughDate: string | null;
  plan: { name: string; tierMode: string } | null;
  figures: Record<string, unknown> | null;
  nextTier: Record<string, unknown> | null;
  days: { date: string; serviceRevenue: string; productCharge: string; retailRevenue: string; tips: string }[];
  statements: { runId: string; lineId: string; startDate: string; endDate: string; grossPay: string; status: string }[];
};

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

// An invented plan; tiers, product charge and retail rate are common practice in the trade, not a source's figures.
const PLAN = {
  tierMode: 'marginal',
  tiers: [
    { from: '0', rate: '0.35' },
    { from: '200', rate: '0.40' },
    { from: '400', rate: '0.45' },
  ],
  productCharge: { mode: 'actual-cost', markup: '0.10' },
  retailRate: '0.10',
} as const;

describe("a stylist's own earnings", () => {
  let t: TestApp;
  let floor: Floor;
  const auth = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const query = async <T>(statement: ReturnType<typeof sql>) => rowsOf<T>(await t.database.db.execute(statement));
  const earnings = async (authorization: string, expected = 200) =>
    (await t.http().get('/api/payroll/earnings/me').set('Authorization', authorization).expect(expected)).body as Earnings;
  // A weekly schedule whose current period began three days ago: two of those days closed, the third not.
  let today: string;
  let anchor: string;
  let previousRunId: string;

  beforeAll(async () => {
    t = await startTestApp();
    floor = await buildFloor(t.database);
    today = businessDateIn(floor.riverside.timeZone);
    anchor = addDays(today, -3);
  }, 60_000);
  afterAll(() => t.close());

  /** One ticket at Riverside: service lines (price, staff, optional assistant share and bowl cost), retail, tips. */
  const ticket = async (
    date: string,
    spec: {
      status?: 'open' | 'closed' | 'void';
      services?: { staffId: string; price: string; colour?: boolean; bowlCost?: string; assistant?: { staffId: string; share: string }; bookedOn?: string }[];
      retail?: { staffId: string; amount: string }[];
      tips?: { staffId: string; amount: string }[];
    },
  ) => {
    const db = t.database.db;
    const [owner] = await db.select().from(users).where(eq(users.email, 'owner@thistlewick.example'));
    const [{ n }] = rowsOf<{ n: number }>(await db.execute(sql`select count(*)::int as n from tickets where branch_id = ${floor.riverside.id} and business_date = ${date}`)) as [{ n: number }];
    const [row] = await db
      .insert(tickets)
      .values({ organisationId: floor.organisationId, branchId: floor.riverside.id, businessDate: date, number: n + 1, status: spec.status ?? 'closed', openedById: owner!.id })
      .returning();
    for (const s of spec.services ?? []) {
      const service = s.colour ? floor.services.rootColour : floor.services.cut;
      const [line] = await db
        .insert(ticketServiceLines)
        .values({
          ticketId: row!.id,
          serviceId: service.id,
          serviceName: service.name,
          isColour: s.colour ?? false,
          staffId: s.staffId,
          levelId: floor.levels.senior.id,
          assistantStaffId: s.assistant?.staffId ?? null,
          assistantShare: s.assistant?.share ?? null,
          listPrice: s.price,
          price: s.price,
          bookedOn: s.bookedOn ?? date,
        })
        .returning();
      if (s.bowlCost) {
        await db.insert(bowls).values({ serviceLineId: line!.id, mixedByStaffId: s.staffId, totalGrams: '90', cost: s.bowlCost, wasteGrams: '0', wasteCost: '0.00' });
      }
    }
    for (const r of spec.retail ?? []) {
      await db.insert(retailLines).values({
        ticketId: row!.id,
        productId: floor.products.shampoo.id,
        productName: floor.products.shampoo.name,
        quantity: 1,
        unitPrice: r.amount,
        amount: r.amount,
        taxRate: '0.0825',
        tax: new Big(r.amount).times('0.0825').round(2, Big.roundHalfUp).toFixed(2),
        sellerStaffId: r.staffId,
        bookedOn: date,
      });
    }
    for (const tip of spec.tips ?? []) await db.insert(tips).values({ ticketId: row!.id, staffId: tip.staffId, amount: tip.amount, bookedOn: date });
    return row!.id;
  };
  const closeDay = async (date: string) => {
    const [owner] = await t.database.db.select().from(users).where(eq(users.email, 'owner@thistlewick.example'));
    await t.database.db.insert(dayCloses).values({
      organisationId: floor.organisationId,
      branchId: floor.riverside.id,
      businessDate: date,
      expectedCash: '0.00',
      countedCash: '0.00',
      cashVariance: '0.00',
      cardTotalTickets: '0.00',
      cardTotalProcessor: '0.00',
      cardVariance: '0.00',
      closedById: owner!.id,
    });
  };

  it('answers 404 to a sign-in without a staff record, whatever the role', async () => {
    for (const role of ['owner', 'manager', 'front_desk', 'accountant'] as const) {
      const refused = await t.http().get('/api/payroll/earnings/me').set('Authorization', await auth(role)).expect(404);
      expect(refused.body.code).toBe('earnings.no_staff_link');
    }
    await t.http().get('/api/payroll/earnings/me').expect(401);
  });

  it('says what is missing before the pay schedule and a plan are set, instead of failing', async () => {
    const before = await earnings(await auth('stylist'));
    expect(before).toMatchObject({ staffId: floor.staff.rhea.id, staffName: 'Test Rhea', today, missing: ['pay_schedule'], period: null, figures: null, statements: [] });
    expect(before.branch).toMatchObject({ name: 'Riverside', currency: 'USD' });

    await t.http().put('/api/payroll/schedule').set('Authorization', await auth('owner')).send({ frequency: 'weekly', anchorDate: anchor, workweekStartsOn: 0 }).expect(200);
    const noPlan = await earnings(await auth('stylist'));
    expect(noPlan).toMatchObject({ missing: ['pay_plan'], period: { startDate: anchor, endDate: addDays(anchor, 6), id: null }, throughDate: null, figures: null, nextTier: null });
  });

  it('shows the period so far from closed days only, equal to an independent recomputation', async () => {
    const { rhea, jonah, milla } = floor.staff;
    const previous = addDays(anchor, -7);
    const plan = (await t.http().post('/api/payroll/plans').set('Authorization', await auth('owner')).send({ name: 'Floor', terms: { ...PLAN, effectiveFrom: previous } }).expect(201)).body;
    for (const member of [rhea, jonah, milla]) {
      await t.http().post(`/api/payroll/plans/${plan.id}/assignments`).set('Authorization', await auth('owner')).send({ staffId: member.id, effectiveFrom: previous }).expect(201);
    }

    // Nothing booked yet: every figure zero, the first tier's threshold ahead.
    const empty = await earnings(await auth('stylist'));
    expect(empty).toMatchObject({ missing: [], plan: { name: 'Floor', tierMode: 'marginal' }, throughDate: null, days: [] });
    expect(empty.figures).toMatchObject({ serviceRevenue: '0.00', serviceCommission: '0.00', tips: '0.00', hours: '0' });
    expect(empty.nextTier).toMatchObject({ revenueToNextTier: '200.00', commissionAdded: '70.00', progress: '0' });

    // The period before: one closed day for both stylists, run and approved, so each has a statement.
    await ticket(addDays(previous, 1), { services: [{ staffId: rhea.id, price: '85.00' }, { staffId: jonah.id, price: '55.00' }], tips: [{ staffId: jonah.id, amount: '4.00' }] });
    await closeDay(addDays(previous, 1));
    const period = (await t.http().post('/api/payroll/periods').set('Authorization', await auth('accountant')).send({ date: previous }).expect(201)).body;
    const started = (await t.http().post(`/api/payroll/periods/${period.id}/runs`).set('Authorization', await auth('accountant')).expect(202)).body;
    for (let i = 0; i < 100; i++) {
      const run = (await t.http().get(`/api/payroll/runs/${started.id}`).set('Authorization', await auth('accountant')).expect(200)).body;
      if (run.status !== 'computing') break;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    await t.http().post(`/api/payroll/runs/${started.id}/approve`).set('Authorization', await auth('accountant')).expect(200);
    previousRunId = started.id;

    // This period: two closed days with colour, an assistant's share, a refund, retail and tips; then a day not closed yet,
    // an open ticket and a void one, none of which may count.
    const first = await ticket(anchor, {
      services: [
        { staffId: rhea.id, price: '110.00', colour: true, bowlCost: '12.00' },
        { staffId: rhea.id, price: '85.00', assistant: { staffId: jonah.id, share: '0.2' } },
      ],
      retail: [{ staffId: rhea.id, amount: '24.00' }],
      tips: [{ staffId: rhea.id, amount: '15.00' }],
    });
    await ticket(addDays(anchor, 1), {
      services: [{ staffId: rhea.id, price: '110.00', colour: true, bowlCost: '10.00' }, { staffId: jonah.id, price: '55.00' }],
      retail: [{ staffId: jonah.id, amount: '24.00' }],
      tips: [{ staffId: rhea.id, amount: '10.00' }, { staffId: jonah.id, amount: '5.00' }],
    });
    // A refund of part of the first ticket's cut, booked on the second day.
    await t.database.db.insert(ticketServiceLines).values({
      ticketId: first,
      serviceId: floor.services.cut.id,
      serviceName: floor.services.cut.name,
      isColour: false,
      staffId: rhea.id,
      levelId: floor.levels.senior.id,
      listPrice: '-40.00',
      price: '-40.00',
      bookedOn: addDays(anchor, 1),
    });
    await ticket(anchor, { status: 'open', services: [{ staffId: rhea.id, price: '85.00' }] });
    await ticket(anchor, { status: 'void', services: [{ staffId: rhea.id, price: '85.00' }] });
    await ticket(addDays(anchor, 2), { services: [{ staffId: rhea.id, price: '85.00' }], tips: [{ staffId: rhea.id, amount: '9.00' }] });
    await closeDay(anchor);
    await closeDay(addDays(anchor, 1));
    for (const [date, hours] of [
      [anchor, '8'],
      [addDays(anchor, 1), '7.5'],
    ]) {
      await t.http().put('/api/payroll/timesheets').set('Authorization', await auth('owner')).send({ staffId: rhea.id, date, hours }).expect(200);
    }

    const mine = await earnings(await auth('stylist'));
    expect(mine.throughDate).toBe(addDays(anchor, 1));

    // Written by hand, apart from the API's reader: closed tickets on closed days of this period, bowls summed per line.
    const end = addDays(anchor, 6);
    const services = await query<{ id: string; staffId: string; assistantId: string | null; share: string | null; price: string; isColour: boolean; date: string; cost: string }>(sql`
      select l.id, l.staff_id as "staffId", l.assistant_staff_id as "assistantId", l.assistant_share::text as share,
             l.price::text as price, l.is_colour as "isColour", l.booked_on::text as date, coalesce(sum(b.cost), 0)::text as cost
      from ticket_service_lines l
      join tickets t on t.id = l.ticket_id and t.status = 'closed'
      join day_closes d on d.branch_id = t.branch_id and d.business_date = l.booked_on
      left join bowls b on b.service_line_id = l.id
      where l.booked_on between ${anchor} and ${end} and (l.staff_id = ${rhea.id} or l.assistant_staff_id = ${rhea.id})
      group by l.id order by l.booked_on, l.id`);
    const retail = await query<{ id: string; date: string; amount: string }>(sql`
      select r.id, r.booked_on::text as date, r.amount::text as amount from retail_lines r
      join tickets t on t.id = r.ticket_id and t.status = 'closed'
      join day_closes d on d.branch_id = t.branch_id and d.business_date = r.booked_on
      where r.booked_on between ${anchor} and ${end} and r.seller_staff_id = ${rhea.id}`);
    const tipRows = await query<{ date: string; amount: string }>(sql`
      select p.booked_on::text as date, p.amount::text as amount from tips p
      join tickets t on t.id = p.ticket_id and t.status = 'closed'
      join day_closes d on d.branch_id = t.branch_id and d.business_date = p.booked_on
      where p.booked_on between ${anchor} and ${end} and p.staff_id = ${rhea.id}`);
    const hours = await query<{ date: string; hours: string }>(sql`
      select work_date::text as date, hours::text as hours from timesheet_entries where staff_id = ${rhea.id} and work_date between ${anchor} and ${end}`);
    const [rules] = await query<{ minimumWage: string; overtimeAfter: string; multiplier: string; exemption: boolean }>(sql`
      select minimum_wage::text as "minimumWage", overtime_after_hours::text as "overtimeAfter", overtime_multiplier::text as multiplier,
             commission_exemption as exemption from branches where id = ${floor.riverside.id}`);
    const input: PayInput = {
      plan: { tierMode: PLAN.tierMode, tiers: PLAN.tiers.map((tier) => ({ ...tier })), productCharge: { ...PLAN.productCharge }, retailRate: PLAN.retailRate },
      serviceLines: services.map((s) => {
        const line = { id: s.id, date: s.date, price: s.price, isColour: s.isColour, productCost: s.cost };
        if (!s.assistantId || !s.share) return line;
        return { ...line, share: s.staffId === rhea.id ? new Big(1).minus(s.share).toString() : s.share };
      }),
      retailLines: retail,
      tips: tipRows,
      hours,
      wageRules: { minimumWage: rules!.minimumWage, overtimeAfterHours: rules!.overtimeAfter, overtimeMultiplier: rules!.multiplier, workweekStartsOn: 0, commissionExemption: rules!.exemption },
    };
    const want = computePay(input);
    expect(mine.figures).toEqual({
      serviceRevenue: want.serviceRevenue,
      productCharge: want.productCharge,
      commissionableRevenue: want.commissionableRevenue,
      serviceCommission: want.serviceCommission,
      tierBreakdown: want.tierBreakdown,
      retailRevenue: retail.reduce((sum, r) => sum.plus(r.amount), new Big(0)).toFixed(2),
      retailCommission: want.retailCommission,
      tips: want.tips,
      hours: '15.5',
      hourlyPay: want.hourlyPay,
    });
    // The same figures worked by hand: 110 + 85 × 0.8 + 110 − 40 = 248.00 of services; (12 + 10) × 1.10 = 24.20 of product;
    // 223.80 commissionable: 200 × 0.35 + 23.80 × 0.40 = 79.52; retail 24.00 × 0.10 = 2.40; tips 15 + 10.
    expect(mine.figures).toMatchObject({
      serviceRevenue: '248.00',
      productCharge: '24.20',
      commissionableRevenue: '223.80',
      serviceCommission: '79.52',
      retailRevenue: '24.00',
      retailCommission: '2.40',
      tips: '25.00',
    });
    // 176.20 more reaches 400 and earns 0.40 on it: 70.48 (marginal tiers, common practice).
    expect(mine.nextTier).toEqual({
      currentTier: { index: 1, from: '200.00', to: '400.00', rate: '0.4' },
      nextTier: { index: 2, from: '400.00', rate: '0.45' },
      revenueToNextTier: '176.20',
      commissionAtNextTier: '150.00',
      commissionAdded: '70.48',
      progress: '0.119',
    });
    expect(mine.days).toEqual([
      { date: anchor, serviceRevenue: '178.00', productCharge: '13.20', retailRevenue: '24.00', tips: '15.00' },
      { date: addDays(anchor, 1), serviceRevenue: '70.00', productCharge: '11.00', retailRevenue: '0.00', tips: '10.00' },
    ]);
    const dayTotal = (field: 'serviceRevenue' | 'tips') => mine.days.reduce((sum, d) => sum.plus(d[field]), new Big(0)).toFixed(2);
    expect([dayTotal('serviceRevenue'), dayTotal('tips')]).toEqual([want.serviceRevenue, want.tips]);

    const [line] = await query<{ id: string; grossPay: string }>(sql`
      select id, gross_pay::text as "grossPay" from payroll_lines where run_id = ${previousRunId} and staff_id = ${rhea.id}`);
    expect(mine.statements).toEqual([{ runId: previousRunId, lineId: line!.id, startDate: previous, endDate: addDays(previous, 6), grossPay: line!.grossPay, status: 'approved' }]);
  });

  it("never shows anyone else's figures, and takes no staff id", async () => {
    const { rhea, jonah } = floor.staff;
    const [jonahLine] = await query<{ id: string }>(sql`select id from payroll_lines where staff_id = ${jonah.id}`);
    expect(jonahLine).toBeDefined();
    const asked = await t.http().get(`/api/payroll/earnings/me?staffId=${jonah.id}`).set('Authorization', await auth('stylist')).expect(200);
    const text = JSON.stringify(asked.body);
    expect(asked.body.staffId).toBe(rhea.id);
    expect(text).not.toContain(jonah.id);
    expect(text).not.toContain(jonahLine!.id);
    expect(text).not.toContain('Test Jonah');
    await t.http().get(`/api/payroll/earnings/${jonah.id}`).set('Authorization', await auth('stylist')).expect(404);

    // Front desk never reads pay figures, even with a staff record of their own (DESIGN.md §2): outside their scope, 404.
    await t.database.db.update(users).set({ staffId: jonah.id }).where(eq(users.email, 'frontdesk@thistlewick.example'));
    const login = await t.http().post('/api/auth/login').send({ email: 'frontdesk@thistlewick.example', password: DEMO_PASSWORD }).expect(200);
    const hidden = await t.http().get('/api/payroll/earnings/me').set('Authorization', `Bearer ${login.body.accessToken}`).expect(404);
    expect(hidden.body.code).toBe('earnings.not_found');
  });
});
