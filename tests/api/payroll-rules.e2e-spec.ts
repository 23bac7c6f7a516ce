import { bowls, dayCloses, ticketServiceLines, tickets, users } from '@tressury/schema';
import { Decimal } from 'decimal.js';
import { and, eq, sql } from 'drizzle-orm';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { InterruptedRuns } from '../../apps/api/src/payroll/interrupted-runs.js';
import { buildFloor, type Floor } from './support/floor-builders.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Role = Parameters<TestApp['tokenFor']>[0];
type Run = { id: string; status: string; error: string | null; stalled: boolean; totalStaff: number; startDate: string; endDate: string };
type Line = { id: string; staffId: string; staffName: string; serviceRevenue: string; productCharge: string; serviceCommission: string; grossPay: string } & Record<string, string>;
type Member = Floor['staff'][keyof Floor['staff']];

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
// Expected figures are recomputed with decimal.js (npm registry), rounded half-up to the cent once.
const money = (value: Decimal.Value) => new Decimal(value).toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2);

// Invented plan terms: a 40 % / 45 % marginal tier and a product charge at actual cost are common practice
// in the trade, not a source's figures. No markup, so a product-charge correction passes through unchanged.
const FIRST_TERMS = {
  tierMode: 'marginal',
  tiers: [
    { from: '0', rate: '0.40' },
    { from: '1000', rate: '0.45' },
  ],
  productCharge: { mode: 'actual-cost' },
  retailRate: '0.10',
} as const;
const LATER_TERMS = { ...FIRST_TERMS, tiers: [{ from: '0', rate: '0.50' }] } as const;

/** Helpers over one test app: past closed days are written straight to the tables, as the floor builders do. */
function payrollHelpers(t: TestApp) {
  const auth = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const query = async <T>(statement: ReturnType<typeof sql>) => rowsOf<T>(await t.database.db.execute(statement));
  const poll = async (runId: string): Promise<Run> => {
    for (let i = 0; i < 600; i++) {
      const run = (await t.http().get(`/api/payroll/runs/${runId}`).set('Authorization', await auth('accountant')).expect(200)).body as Run;
      if (run.status !== 'computing') return run;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    throw new Error('the run did not finish');
  };
  const run = async (periodId: string): Promise<Run> => {
    const started = await t.http().post(`/api/payroll/periods/${periodId}/runs`).set('Authorization', await auth('accountant')).expect(202);
    return poll(started.body.id);
  };
  const lines = async (runId: string): Promise<Line[]> =>
    (await t.http().get(`/api/payroll/runs/${runId}/lines`).set('Authorization', await auth('accountant')).expect(200)).body;
  /** A closed ticket per service on `date` at the member's home branch, with a bowl of `bowlCost` on colour services, and the day closed. */
  const closedDay = async (floor: Floor, date: string, services: { member: Member; colour: boolean; bowlCost?: string }[]) => {
    const db = t.database.db;
    const [owner] = await db.select({ id: users.id }).from(users).where(and(eq(users.organisationId, floor.organisationId), eq(users.role, 'owner')));
    const at = new Date(`${date}T16:00:00Z`);
    const ticketIds: string[] = [];
    for (const [i, { member, colour, bowlCost }] of services.entries()) {
      const service = colour ? floor.services.rootColour : floor.services.cut;
      const level = member.levelId;
      const [price] = await query<{ price: string }>(sql`select price::text from service_prices where service_id = ${service.id} and level_id = ${level}`);
      const [ticket] = await db
        .insert(tickets)
        .values({ organisationId: floor.organisationId, branchId: member.homeBranchId, businessDate: date, number: i + 1, status: 'closed', openedById: owner!.id, openedAt: at, closedById: owner!.id, closedAt: at })
        .returning();
      const [line] = await db
        .insert(ticketServiceLines)
        .values({ ticketId: ticket!.id, serviceId: service.id, serviceName: service.name, isColour: colour, staffId: member.id, levelId: level, listPrice: price!.price, price: price!.price, bookedOn: date })
        .returning();
      if (bowlCost) await db.insert(bowls).values({ serviceLineId: line!.id, mixedByStaffId: member.id, totalGrams: '90', cost: bowlCost, wasteGrams: '0', wasteCost: '0.00' });
      ticketIds.push(ticket!.id);
    }
    const branchIds = new Set(services.map((s) => s.member.homeBranchId));
    for (const branchId of branchIds) {
      await db.insert(dayCloses).values({
        organisationId: floor.organisationId,
        branchId,
        businessDate: date,
        expectedCash: '0.00',
        countedCash: '0.00',
        cashVariance: '0.00',
        cardTotalTickets: '0.00',
        cardTotalProcessor: '0.00',
        cardVariance: '0.00',
        closedById: owner!.id,
        closedAt: at,
      });
    }
    return ticketIds;
  };
  return { auth, query, poll, run, lines, closedDay };
}

describe('payroll rules', () => {
  let t: TestApp;
  let h: ReturnType<typeof payrollHelpers>;
  let floor: Floor;
  let today: string;
  // Biweekly: the second period holds today, the first is the fortnight before it.
  let second: string;
  let first: string;
  let planId: string;
  const period: Record<'first' | 'second', { id: string; runId?: string }> = { first: { id: '' }, second: { id: '' } };
  let colourTicketInSecond: string;

  beforeAll(async () => {
    t = await startTestApp();
    h = payrollHelpers(t);
    floor = await buildFloor(t.database);
    today = businessDateIn(floor.riverside.timeZone);
    second = addDays(today, -3);
    first = addDays(second, -14);
    const owner = await h.auth('owner');
    await t.http().put('/api/payroll/schedule').set('Authorization', owner).send({ frequency: 'biweekly', anchorDate: first, workweekStartsOn: 0 }).expect(200);
    await h.closedDay(floor, addDays(first, 2), [
      { member: floor.staff.rhea, colour: true, bowlCost: '5.40' },
      { member: floor.staff.rhea, colour: false },
      { member: floor.staff.jonah, colour: false },
    ]);
    const secondTickets = await h.closedDay(floor, addDays(second, 1), [
      { member: floor.staff.rhea, colour: true, bowlCost: '6.20' },
      { member: floor.staff.jonah, colour: false },
    ]);
    colourTicketInSecond = secondTickets[0]!;
    for (const member of [floor.staff.rhea, floor.staff.jonah]) {
      for (const date of [addDays(first, 2), addDays(second, 1)]) {
        await t.http().put('/api/payroll/timesheets').set('Authorization', owner).send({ staffId: member.id, date, hours: '7.5' }).expect(200);
      }
    }
    const plan = (await t.http().post('/api/payroll/plans').set('Authorization', owner).send({ name: 'Test Tiers', terms: { ...FIRST_TERMS, effectiveFrom: first } }).expect(201)).body;
    planId = plan.id;
    await t.http().post(`/api/payroll/plans/${planId}/assignments`).set('Authorization', owner).send({ staffId: floor.staff.rhea.id, effectiveFrom: first }).expect(201);
    const accountant = await h.auth('accountant');
    period.first.id = (await t.http().post('/api/payroll/periods').set('Authorization', accountant).send({ date: first }).expect(201)).body.id;
    period.second.id = (await t.http().post('/api/payroll/periods').set('Authorization', accountant).send({}).expect(201)).body.id;
  }, 180_000);
  afterAll(() => t.close());

  it('fails a run with a plain reason while a staff member with lines has no plan, and computes it once one is assigned', async () => {
    const failed = await h.run(period.first.id);
    expect(failed.status).toBe('failed');
    expect(failed.error).toBe(`No pay plan is in effect on ${first} for Test Jonah; assign one and run the period again.`);
    const [lines] = await h.query<{ n: number }>(sql`select count(*)::int as n from payroll_lines where run_id = ${failed.id}`);
    expect(lines!.n).toBe(0);

    await t.http().post(`/api/payroll/plans/${planId}/assignments`).set('Authorization', await h.auth('owner')).send({ staffId: floor.staff.jonah.id, effectiveFrom: first }).expect(201);
    const computed = await h.run(period.first.id);
    expect(computed).toMatchObject({ status: 'draft', error: null, totalStaff: 2, stalled: false });
    period.first.runId = computed.id;
  });

  it('applies a plan version from the second period to the second period only, and never changes the approved first run', async () => {
    await t.http().post(`/api/payroll/runs/${period.first.runId}/approve`).set('Authorization', await h.auth('accountant')).expect(200);
    const before = await h.lines(period.first.runId!);
    const rheaBefore = (await t.http().get(`/api/payroll/runs/${period.first.runId}/lines/${before.find((l) => l.staffId === floor.staff.rhea.id)!.id}`).set('Authorization', await h.auth('owner')).expect(200)).body;

    await t.http().post(`/api/payroll/plans/${planId}/versions`).set('Authorization', await h.auth('owner')).send({ ...LATER_TERMS, effectiveFrom: second }).expect(201);
    const secondRun = await h.run(period.second.id);
    expect(secondRun.status).toBe('draft');
    period.second.runId = secondRun.id;

    // First period, first terms: Rhea's colour (senior price 110.00, bowl 5.40) and cut (85.00) at 40 %.
    const [rheaFirst] = before.filter((l) => l.staffId === floor.staff.rhea.id);
    expect(rheaFirst).toMatchObject({ serviceRevenue: '195.00', productCharge: '5.40', serviceCommission: money(new Decimal('195.00').minus('5.40').times('0.40')) });
    // Second period, later terms: her colour (110.00, bowl 6.20) at 50 %; Jonah's cut (junior price 55.00) at 50 %.
    const secondLines = await h.lines(secondRun.id);
    expect(secondLines.find((l) => l.staffId === floor.staff.rhea.id)).toMatchObject({ serviceRevenue: '110.00', productCharge: '6.20', serviceCommission: money(new Decimal('110.00').minus('6.20').times('0.50')) });
    expect(secondLines.find((l) => l.staffId === floor.staff.jonah.id)).toMatchObject({ serviceRevenue: '55.00', serviceCommission: money(new Decimal('55.00').times('0.50')) });

    // The approved first run is frozen: same figures, same stored terms, and it cannot be run again.
    expect(await h.lines(period.first.runId!)).toEqual(before);
    const rheaAfter = (await t.http().get(`/api/payroll/runs/${period.first.runId}/lines/${rheaFirst!.id}`).set('Authorization', await h.auth('owner')).expect(200)).body;
    expect(rheaAfter).toEqual(rheaBefore);
    expect(rheaAfter.input.plan.tiers).toEqual(FIRST_TERMS.tiers);
    const again = await t.http().post(`/api/payroll/periods/${period.first.id}/runs`).set('Authorization', await h.auth('accountant')).expect(409);
    expect(again.body.code).toBe('payroll_run.frozen');
  });

  it('takes a product-charge adjustment on a closed day into the product charge and the commission', async () => {
    const before = (await h.lines(period.second.runId!)).find((l) => l.staffId === floor.staff.rhea.id)!;
    const manager = await h.auth('manager');
    // Booked today (an open day) against the closed day's colour ticket; it counts once today is closed too.
    await t
      .http()
      .post('/api/day-close/adjustments')
      .set('Authorization', manager)
      .send({ branchId: floor.riverside.id, ticketId: colourTicketInSecond, staffId: floor.staff.rhea.id, category: 'product_charge', amount: '3.40', reason: 'Second bowl of toner left off the ticket' })
      .expect(201);
    const unclosed = await h.run(period.second.id);
    expect((await h.lines(unclosed.id)).find((l) => l.staffId === floor.staff.rhea.id)).toMatchObject({ productCharge: before.productCharge, serviceCommission: before.serviceCommission });

    await t.http().post('/api/day-close').set('Authorization', manager).send({ branchId: floor.riverside.id, businessDate: today, countedCash: '0.00' }).expect(201);
    const rerun = await h.run(period.second.id);
    period.second.runId = rerun.id;
    // An independent SQL total of her bowls in the period plus the correction; commission at the later 50 %.
    const [bowlCost] = await h.query<{ total: string }>(sql`
      select sum(b.cost)::text as total from bowls b join ticket_service_lines l on l.id = b.service_line_id
      where l.staff_id = ${floor.staff.rhea.id} and l.booked_on between ${second} and ${addDays(second, 13)}`);
    const charge = new Decimal(bowlCost!.total).plus('3.40');
    const after = (await h.lines(rerun.id)).find((l) => l.staffId === floor.staff.rhea.id)!;
    expect(after).toMatchObject({ serviceRevenue: '110.00', productCharge: money(charge), serviceCommission: money(new Decimal('110.00').minus(charge).times('0.50')) });
    expect(new Decimal(before.serviceCommission).minus(after.serviceCommission).toFixed(2)).toBe(money(new Decimal('3.40').times('0.50')));
    // Stored as a correction of its own, beside lines whose product cost is still their bowls'.
    const [stored] = await h.query<{ adjustments: { date: string; amount: string }[]; costs: string }>(sql`
      select input->'productChargeAdjustments' as adjustments,
             (select sum((l->>'productCost')::numeric) from jsonb_array_elements(input->'serviceLines') l)::text as costs
      from payroll_lines where run_id = ${rerun.id} and staff_id = ${floor.staff.rhea.id}`);
    expect(stored!.adjustments).toEqual([expect.objectContaining({ date: today, amount: '3.40' })]);
    expect(new Decimal(stored!.costs).toFixed(2)).toBe(new Decimal(bowlCost!.total).toFixed(2));
  });

  it('answers 409 over a run still computing, and replaces one whose heartbeat stopped a minute ago', async () => {
    const runId = period.second.runId!;
    const [beat] = await h.query<{ fresh: boolean }>(sql`select heartbeat_at >= started_at as fresh from payroll_runs where id = ${runId}`);
    expect(beat!.fresh).toBe(true);

    // Another instance is still working on it: its heartbeat is seconds old.
    await t.database.db.execute(sql`update payroll_runs set status = 'computing', completed_at = null, heartbeat_at = now() - interval '5 seconds' where id = ${runId}`);
    const alive = (await t.http().get(`/api/payroll/runs/${runId}`).set('Authorization', await h.auth('accountant')).expect(200)).body as Run;
    expect(alive).toMatchObject({ status: 'computing', stalled: false });
    const busy = await t.http().post(`/api/payroll/periods/${period.second.id}/runs`).set('Authorization', await h.auth('accountant')).expect(409);
    expect(busy.body.code).toBe('payroll_run.computing');

    // That instance died: no heartbeat for 90 seconds.
    await t.database.db.execute(sql`update payroll_runs set heartbeat_at = now() - interval '90 seconds' where id = ${runId}`);
    const stalled = (await t.http().get(`/api/payroll/runs/${runId}`).set('Authorization', await h.auth('accountant')).expect(200)).body as Run;
    expect(stalled).toMatchObject({ status: 'computing', stalled: true });
    const replaced = await t.http().post(`/api/payroll/periods/${period.second.id}/runs`).set('Authorization', await h.auth('accountant')).expect(202);
    expect(replaced.body.id).not.toBe(runId);
    expect(replaced.body.stalled).toBe(false);
    expect(await h.poll(replaced.body.id)).toMatchObject({ status: 'draft', stalled: false });
    await t.http().get(`/api/payroll/runs/${runId}`).set('Authorization', await h.auth('accountant')).expect(404);
    const [event] = await h.query<{ replaces: string; stalled: boolean }>(sql`
      select payload->>'replaces' as replaces, (payload->>'replacesStalled')::boolean as stalled from domain_events
      where type = 'PayrollRunStarted' and aggregate_id = ${replaced.body.id}`);
    expect(event).toEqual({ replaces: runId, stalled: true });
  });
});

describe('semi-monthly payroll', () => {
  // On the embedded database a second start reopens the same directory; on a PostgreSQL server each test app has its own database.
  const onPglite = !process.env.TEST_DATABASE_URL;
  const dataDir = mkdtempSync(join(tmpdir(), 'tressury-semi-monthly-'));
  let t: TestApp;
  let h: ReturnType<typeof payrollHelpers>;
  let floor: Floor;
  const periodIds = new Map<string, string>();

  beforeAll(async () => {
    t = await startTestApp(onPglite ? { TRESSURY_DATA_DIR: dataDir } : {});
    h = payrollHelpers(t);
    floor = await buildFloor(t.database);
  }, 180_000);
  afterAll(async () => {
    await t.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('splits months at the 15th, February included, and runs and approves the second half of a leap February', async () => {
    const owner = await h.auth('owner');
    const accountant = await h.auth('accountant');
    await t.http().put('/api/payroll/schedule').set('Authorization', owner).send({ frequency: 'semi-monthly', anchorDate: '2024-02-01', workweekStartsOn: 0 }).expect(200);
    const create = async (body: object) => (await t.http().post('/api/payroll/periods').set('Authorization', accountant).send(body).expect(201)).body as { id: string; startDate: string; endDate: string };
    // US semi-monthly payrolls (common practice): the 1st to the 15th and the 16th to the month's last day.
    const created = [await create({ date: '2024-02-03' }), await create({}), await create({}), await create({ date: '2025-02-20' })];
    expect(created.map((p) => [p.startDate, p.endDate])).toEqual([
      ['2024-02-01', '2024-02-15'],
      ['2024-02-16', '2024-02-29'],
      ['2024-03-01', '2024-03-15'],
      ['2025-02-16', '2025-02-28'],
    ]);
    for (const p of created) periodIds.set(p.startDate, p.id);
    await t.http().post('/api/payroll/periods').set('Authorization', accountant).send({ date: '2024-02-21' }).expect(409);

    const plan = (await t.http().post('/api/payroll/plans').set('Authorization', owner).send({ name: 'Test Half Months', terms: { ...FIRST_TERMS, effectiveFrom: '2024-02-01' } }).expect(201)).body;
    await t.http().post(`/api/payroll/plans/${plan.id}/versions`).set('Authorization', owner).send({ ...FIRST_TERMS, effectiveFrom: '2024-02-10' }).expect(400);
    for (const member of [floor.staff.rhea, floor.staff.jonah]) {
      await t.http().post(`/api/payroll/plans/${plan.id}/assignments`).set('Authorization', owner).send({ staffId: member.id, effectiveFrom: '2024-02-01' }).expect(201);
    }
    // The edges of the period: the 15th and 1 March fall outside it, the 16th and the leap day inside.
    await h.closedDay(floor, '2024-02-15', [{ member: floor.staff.rhea, colour: false }]);
    await h.closedDay(floor, '2024-02-16', [{ member: floor.staff.rhea, colour: true, bowlCost: '4.10' }]);
    await h.closedDay(floor, '2024-02-29', [
      { member: floor.staff.rhea, colour: false },
      { member: floor.staff.jonah, colour: false },
    ]);
    await h.closedDay(floor, '2024-03-01', [{ member: floor.staff.jonah, colour: false }]);
    for (const [date, hours] of [
      ['2024-02-16', '8'],
      ['2024-02-29', '6.5'],
    ] as const) {
      await t.http().put('/api/payroll/timesheets').set('Authorization', owner).send({ staffId: floor.staff.rhea.id, date, hours }).expect(200);
    }

    const run = await h.run(periodIds.get('2024-02-16')!);
    expect(run).toMatchObject({ status: 'draft', startDate: '2024-02-16', endDate: '2024-02-29', totalStaff: 2 });
    const lines = await h.lines(run.id);
    const rhea = lines.find((l) => l.staffId === floor.staff.rhea.id)!;
    // Colour 110.00 less its 4.10 bowl, and a cut at 85.00, at 40 % (under the 1,000 tier).
    expect(rhea).toMatchObject({ hours: '14.5', serviceRevenue: '195.00', productCharge: '4.10', serviceCommission: money(new Decimal('195.00').minus('4.10').times('0.40')) });
    expect(lines.find((l) => l.staffId === floor.staff.jonah.id)).toMatchObject({ serviceRevenue: '55.00' });

    const approved = await t.http().post(`/api/payroll/runs/${run.id}/approve`).set('Authorization', accountant).expect(200);
    expect(approved.body.status).toBe('approved');
    await t.http().put('/api/payroll/timesheets').set('Authorization', owner).send({ staffId: floor.staff.rhea.id, date: '2024-02-29', hours: '9' }).expect(409);
  });

  (onPglite ? it : it.skip)('marks a run left computing by the previous start failed when the app starts again on the same data (PGlite)', async () => {
    const periodId = periodIds.get('2024-03-01')!;
    const [owner] = await h.query<{ id: string }>(sql`select id from users where role = 'owner'`);
    // A crash mid-run: the row says computing and nothing will ever finish it.
    const [left] = await h.query<{ id: string }>(sql`
      insert into payroll_runs (organisation_id, period_id, status, started_by_id, heartbeat_at)
      values (${floor.organisationId}, ${periodId}, 'computing', ${owner!.id}, now()) returning id`);
    await t.close();
    t = await startTestApp({ TRESSURY_DATA_DIR: dataDir });
    h = payrollHelpers(t);
    const run = (await t.http().get(`/api/payroll/runs/${left!.id}`).set('Authorization', await h.auth('accountant')).expect(200)).body as Run;
    expect(run).toMatchObject({ status: 'failed', stalled: false, error: 'The app stopped while this run was being computed; run the period again.' });
    expect((await h.run(periodId)).status).toBe('draft');
  }, 120_000);

  (onPglite ? it.skip : it)('leaves runs computing on a PostgreSQL server at start, where other instances may be working on them', async () => {
    const periodId = periodIds.get('2024-03-01')!;
    const [owner] = await h.query<{ id: string }>(sql`select id from users where role = 'owner'`);
    const [left] = await h.query<{ id: string }>(sql`
      insert into payroll_runs (organisation_id, period_id, status, started_by_id, heartbeat_at)
      values (${floor.organisationId}, ${periodId}, 'computing', ${owner!.id}, now()) returning id`);
    await t.app.get(InterruptedRuns).onApplicationBootstrap();
    const run = (await t.http().get(`/api/payroll/runs/${left!.id}`).set('Authorization', await h.auth('accountant')).expect(200)).body as Run;
    expect(run).toMatchObject({ status: 'computing', stalled: false });
  });
});
