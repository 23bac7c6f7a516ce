import { DEMO_DAYS } from '@tressury/fixtures';
import { sql } from 'drizzle-orm';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { dayBefore } from '../../apps/api/src/seed/demo-dates.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Preview = {
  close: { expectedCash: string; countedCash: string; cashVariance: string; cardTotalTickets: string; cardTotalProcessor: string; cardVariance: string; note: string } | null;
  ticketsByStatus: { open: number; closed: number; void: number };
  serviceRevenue: string;
  retailRevenue: string;
  retailTax: string;
  tipsByStaff: { amount: string }[];
  colourProductCost: string;
  expectedCash: string;
  cardTotalTickets: string;
  cardTotalProcessor: string;
  readyToClose: boolean;
};
type Summary = { id: string; number: number; status: string; due: string; locked: boolean; staffNames: string[] };

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const weekday = (date: string) => new Date(`${date}T00:00:00Z`).getUTCDay();

describe('demo business', () => {
  let t: TestApp;
  let riverside: { id: string; timeZone: string };
  const auth = async (role: Parameters<TestApp['tokenFor']>[0]) => `Bearer ${await t.tokenFor(role)}`;
  const query = async <T>(statement: ReturnType<typeof sql>) => rowsOf<T>(await t.database.db.execute(statement));
  /** The last day a branch was open up to yesterday in its own time zone: every branch closes on Mondays. */
  const lastOpenDay = (timeZone: string) => {
    const yesterday = dayBefore(businessDateIn(timeZone));
    return weekday(yesterday) === 1 ? dayBefore(yesterday) : yesterday;
  };

  beforeAll(async () => {
    t = await startTestApp({ TRESSURY_SEED_DEMO: 'full' });
    riverside = (await query<{ id: string; timeZone: string }>(sql`select id, time_zone as "timeZone" from branches where name = 'Riverside'`))[0]!;
  }, 180_000);
  afterAll(() => t.close());

  it('loads 120 days of tickets per branch, every open day up to yesterday closed and nothing left open', async () => {
    const branches = await query<{ id: string; timeZone: string; days: number; first: string; last: string; mondays: number }>(sql`
      select b.id, b.time_zone as "timeZone", count(c.id)::int as days, min(c.business_date)::text as first, max(c.business_date)::text as last,
        count(*) filter (where extract(isodow from c.business_date) = 1)::int as mondays
      from branches b join day_closes c on c.branch_id = b.id group by b.id, b.time_zone`);
    expect(branches).toHaveLength(4);
    for (const branch of branches) {
      expect(branch.last).toBe(lastOpenDay(branch.timeZone));
      expect(branch.mondays).toBe(0);
      // 120 calendar days less the Mondays among them.
      expect(branch.days).toBeGreaterThanOrEqual(Math.floor((DEMO_DAYS * 6) / 7));
      expect(branch.days).toBeLessThanOrEqual(Math.ceil((DEMO_DAYS * 6) / 7));
    }
    const [unclosed] = await query<{ n: number }>(sql`
      select count(*)::int as n from tickets t
      where t.status = 'open' or not exists (select 1 from day_closes c where c.branch_id = t.branch_id and c.business_date = t.business_date)`);
    expect(unclosed!.n).toBe(0);
    const [events] = await query<{ n: number; tickets: number }>(sql`
      select count(*)::int as n, max((payload->>'tickets')::int) as tickets from domain_events where type = 'DemoBusinessLoaded'`);
    const [tickets] = await query<{ n: number }>(sql`select count(*)::int as n from tickets`);
    expect(events).toEqual({ n: 1, tickets: tickets!.n });
  });

  it("lists a recent open day's tickets at the desk, all settled and locked", async () => {
    const date = lastOpenDay(riverside.timeZone);
    const listed: Summary[] = (await t.http().get(`/api/tickets?branchId=${riverside.id}&date=${date}`).set('Authorization', await auth('front_desk')).expect(200)).body;
    const [count] = await query<{ n: number }>(sql`select count(*)::int as n from tickets where branch_id = ${riverside.id} and business_date = ${date}`);
    expect(listed.length).toBeGreaterThanOrEqual(10);
    expect(listed).toHaveLength(count!.n);
    expect(listed.map((s) => s.number)).toEqual(listed.map((_, i) => i + 1));
    for (const summary of listed) {
      expect(['closed', 'void']).toContain(summary.status);
      expect(summary.locked).toBe(true);
      if (summary.status === 'closed') expect(summary.due).toBe('0.00');
    }
  });

  describe.each([
    ['the last open day at Riverside', async () => ({ branchId: riverside.id, date: lastOpenDay(riverside.timeZone) })],
    [
      'a day with a refund booked on it',
      async () => {
        const [row] = await query<{ branchId: string; date: string }>(sql`
          select t.branch_id as "branchId", p.booked_on::text as date from payments p join tickets t on t.id = p.ticket_id
          where p.kind = 'refund' order by p.booked_on desc limit 1`);
        return row!;
      },
    ],
  ])('%s', (_label, pickDay) => {
    it('shows the day closed, with figures equal to an independent SQL aggregate', async () => {
      const { branchId, date } = await pickDay();
      const day: Preview = (await t.http().get(`/api/day-close?branchId=${branchId}&businessDate=${date}`).set('Authorization', await auth('owner')).expect(200)).body;
      const money = async (statement: ReturnType<typeof sql>) => (await query<{ total: string }>(statement))[0]!.total;
      const paid = (method: string) => sql`
        select coalesce(sum(p.amount), 0)::numeric(12,2)::text as total from payments p join tickets t on t.id = p.ticket_id
        where t.branch_id = ${branchId} and p.booked_on = ${date} and p.method = ${method} and p.status = 'succeeded'`;
      const cash = await money(paid('cash'));
      const card = await money(paid('card'));
      const services = await money(sql`
        select coalesce(sum(l.price), 0)::numeric(12,2)::text as total from ticket_service_lines l join tickets t on t.id = l.ticket_id
        where t.branch_id = ${branchId} and l.booked_on = ${date} and t.status <> 'void'`);
      const retail = await money(sql`
        select coalesce(sum(r.amount), 0)::numeric(12,2)::text as total from retail_lines r join tickets t on t.id = r.ticket_id
        where t.branch_id = ${branchId} and r.booked_on = ${date} and t.status <> 'void'`);
      const tipTotal = await money(sql`
        select coalesce(sum(x.amount), 0)::numeric(12,2)::text as total from tips x join tickets t on t.id = x.ticket_id
        where t.branch_id = ${branchId} and x.booked_on = ${date} and t.status <> 'void'`);
      const bowlCost = await money(sql`
        select coalesce(sum(b.cost), 0)::numeric(12,2)::text as total from bowls b join ticket_service_lines l on l.id = b.service_line_id
        join tickets t on t.id = l.ticket_id where t.branch_id = ${branchId} and l.booked_on = ${date} and t.status <> 'void'`);
      const statuses = await query<{ status: string; n: number }>(
        sql`select status, count(*)::int as n from tickets where branch_id = ${branchId} and business_date = ${date} group by status`,
      );

      expect(day.close).not.toBeNull();
      expect(day.readyToClose).toBe(false);
      expect(day.expectedCash).toBe(cash);
      expect(day.close!.expectedCash).toBe(cash);
      expect(day.cardTotalTickets).toBe(card);
      expect(day.close!.cardTotalTickets).toBe(card);
      expect(day.cardTotalProcessor).toBe(card);
      expect(day.close!.cardVariance).toBe('0.00');
      expect(Number(day.close!.cashVariance)).toBeCloseTo(Number(day.close!.countedCash) - Number(cash), 2);
      expect(day.serviceRevenue).toBe(services);
      expect(day.retailRevenue).toBe(retail);
      expect(day.tipsByStaff.reduce((total, tip) => total + Math.round(Number(tip.amount) * 100), 0)).toBe(Math.round(Number(tipTotal) * 100));
      expect(day.colourProductCost).toBe(bowlCost);
      expect(day.ticketsByStatus).toEqual({ open: 0, closed: 0, void: 0, ...Object.fromEntries(statuses.map((s) => [s.status, s.n])) });
    });
  });

  describe('payroll', () => {
    type Period = { id: string; startDate: string; endDate: string; runId: string | null; runStatus: string | null };
    type Line = { id: string; staffId: string; staffName: string; hours: string; serviceRevenue: string; minimumWageTopUp: string; overtimePremium: string; grossPay: string };
    let periods: Period[];
    const cents = (value: string) => Math.round(Number(value) * 100);

    beforeAll(async () => {
      const listed = (await t.http().get('/api/payroll/periods').set('Authorization', await auth('accountant')).expect(200)).body;
      expect(listed.schedule).toMatchObject({ frequency: 'biweekly', workweekStartsOn: 0 });
      expect(listed.current).toEqual({ startDate: listed.periods[0].startDate, endDate: listed.periods[0].endDate });
      periods = [...listed.periods].reverse();
    });

    it('has biweekly periods from Sunday to Saturday tiling the 120 days up to the current one, which has no run', async () => {
      const [first] = await query<{ date: string }>(sql`select min(business_date)::text as date from day_closes`);
      expect(periods[0]!.startDate <= first!.date).toBe(true);
      expect(periods[1]!.startDate > first!.date).toBe(true);
      for (const [i, period] of periods.entries()) {
        expect(weekday(period.startDate)).toBe(0);
        expect(weekday(period.endDate)).toBe(6);
        if (i > 0) expect(dayBefore(period.startDate)).toBe(periods[i - 1]!.endDate);
      }
      const current = periods.at(-1)!;
      for (const branch of await query<{ timeZone: string }>(sql`select time_zone as "timeZone" from branches`)) {
        const today = businessDateIn(branch.timeZone);
        expect(current.startDate <= today && today <= current.endDate).toBe(true);
      }
      expect(current.runId).toBeNull();
    });

    it('has every finished period run and approved by the accountant, the older ones exported', async () => {
      const finished = periods.slice(0, -1);
      expect(finished.length).toBeGreaterThanOrEqual(8);
      expect(finished.map((p) => p.runStatus)).toEqual([...finished.slice(0, -2).map(() => 'exported'), 'approved', 'approved']);
      const approvers = await query<{ role: string }>(sql`select distinct u.role from payroll_runs r join users u on u.id = r.approved_by_id`);
      expect(approvers).toEqual([{ role: 'accountant' }]);
      const [staffCount] = await query<{ n: number }>(sql`select count(*)::int as n from staff`);
      const [lastRun] = await query<{ lines: number }>(sql`select count(*)::int as lines from payroll_lines where run_id = ${finished.at(-1)!.runId}`);
      expect(lastRun!.lines).toBe(staffCount!.n);
      // Frozen like any approved run.
      await t.http().post(`/api/payroll/periods/${finished.at(-1)!.id}/runs`).set('Authorization', await auth('accountant')).expect(409);
    });

    it('has three plans, every staff member on one, and new terms part-way through', async () => {
      const plans: { name: string; versions: { effectiveFrom: string }[]; assignments: { staffId: string }[] }[] = (
        await t.http().get('/api/payroll/plans').set('Authorization', await auth('owner')).expect(200)
      ).body;
      expect(plans).toHaveLength(3);
      const changed = plans.filter((p) => p.versions.length > 1);
      expect(changed).toHaveLength(1);
      const from = changed[0]!.versions[1]!.effectiveFrom;
      expect(periods.some((p) => p.startDate === from) && from > periods[0]!.startDate && from < periods.at(-1)!.startDate).toBe(true);
      const staff = await query<{ id: string }>(sql`select id from staff`);
      const assigned = new Set(plans.flatMap((p) => p.assignments.map((a) => a.staffId)));
      expect(staff.every((s) => assigned.has(s.id))).toBe(true);
    });

    it('has hours on every day a staff member served a client, 5 to 9 a day, and some weeks over 40', async () => {
      const [missing] = await query<{ n: number }>(sql`
        select count(*)::int as n from (select distinct l.staff_id, l.booked_on from ticket_service_lines l join tickets t on t.id = l.ticket_id
          where t.status = 'closed' and l.refund_of_line_id is null) worked
        where not exists (select 1 from timesheet_entries e where e.staff_id = worked.staff_id and e.work_date = worked.booked_on)`);
      expect(missing!.n).toBe(0);
      const [range] = await query<{ least: string; most: string }>(sql`select min(hours)::text as least, max(hours)::text as most from timesheet_entries`);
      expect(Number(range!.least)).toBeGreaterThanOrEqual(5);
      expect(Number(range!.most)).toBeLessThanOrEqual(9);
      // Workweeks start on Sunday: date_trunc('week') starts on Monday, hence the day's shift.
      const [long] = await query<{ n: number }>(sql`
        select count(*)::int as n from (select staff_id, sum(hours) as total from timesheet_entries
          group by staff_id, date_trunc('week', work_date + 1)) weeks where total > 40`);
      expect(long!.n).toBeGreaterThan(0);
    });

    it('computes each approved run from the tickets and hours, with overtime and a minimum-wage top-up among the lines', async () => {
      const last = periods.at(-2)!;
      const lines: Line[] = (await t.http().get(`/api/payroll/runs/${last.runId}/lines`).set('Authorization', await auth('accountant')).expect(200)).body;
      // Independent SQL over the period: service revenue (assistant shares split off) and timesheet hours per staff member.
      const revenue = await query<{ staffId: string; total: string }>(sql`
        select staff_id as "staffId", sum(amount)::numeric(12,2)::text as total from (
          select l.staff_id, l.price * (1 - coalesce(l.assistant_share, 0)) as amount from ticket_service_lines l join tickets t on t.id = l.ticket_id
            where t.status = 'closed' and l.booked_on between ${last.startDate} and ${last.endDate}
          union all
          select l.assistant_staff_id, l.price * l.assistant_share from ticket_service_lines l join tickets t on t.id = l.ticket_id
            where t.status = 'closed' and l.assistant_staff_id is not null and l.booked_on between ${last.startDate} and ${last.endDate}
        ) parts group by staff_id`);
      const hours = await query<{ staffId: string; total: string }>(sql`
        select staff_id as "staffId", sum(hours)::text as total from timesheet_entries where work_date between ${last.startDate} and ${last.endDate} group by staff_id`);
      for (const line of lines) {
        expect([line.staffName, cents(line.serviceRevenue)]).toEqual([line.staffName, cents(revenue.find((r) => r.staffId === line.staffId)?.total ?? '0')]);
        expect([line.staffName, Number(line.hours)]).toEqual([line.staffName, Number(hours.find((h) => h.staffId === line.staffId)!.total)]);
      }
      const all = await query<{ topUps: number; overtime: number }>(sql`
        select count(*) filter (where minimum_wage_top_up > 0)::int as "topUps", count(*) filter (where overtime_premium > 0)::int as overtime
        from payroll_lines l join payroll_runs r on r.id = l.run_id where r.status in ('approved', 'exported')`);
      expect(all[0]!.topUps).toBeGreaterThan(0);
      expect(all[0]!.overtime).toBeGreaterThan(0);
      const [run] = await query<{ gross: string; sum: string }>(sql`
        select r.gross_pay::text as gross, sum(l.gross_pay)::text as sum from payroll_runs r join payroll_lines l on l.run_id = r.id where r.id = ${last.runId} group by r.gross_pay`);
      expect(run!.gross).toBe(run!.sum);
    });

    it("shows the demo stylist her own line in an approved run and nobody else's", async () => {
      const last = periods.at(-2)!;
      const mine: Line[] = (await t.http().get(`/api/payroll/runs/${last.runId}/lines`).set('Authorization', await auth('stylist')).expect(200)).body;
      expect(mine.map((l) => l.staffName)).toEqual(['Rhea Castellane']);
    });
  });

  it('shows the demo stylist only the tickets with her own lines, and 404 for the others', async () => {
    const [rhea] = await query<{ staffId: string }>(sql`select staff_id as "staffId" from users where role = 'stylist'`);
    expect(rhea!.staffId).not.toBeNull();
    const [day] = await query<{ date: string }>(sql`
      select max(t.business_date)::text as date from tickets t join ticket_service_lines l on l.ticket_id = t.id
      where t.branch_id = ${riverside.id} and l.staff_id = ${rhea!.staffId}`);
    const own = await query<{ id: string }>(sql`
      select t.id from tickets t where t.branch_id = ${riverside.id} and t.business_date = ${day!.date}
      and exists (select 1 from ticket_service_lines l where l.ticket_id = t.id and (l.staff_id = ${rhea!.staffId} or l.assistant_staff_id = ${rhea!.staffId}))
      order by t.number`);
    const stylist = await auth('stylist');
    const listed: Summary[] = (await t.http().get(`/api/tickets?branchId=${riverside.id}&date=${day!.date}`).set('Authorization', stylist).expect(200)).body;
    expect(own.length).toBeGreaterThan(0);
    expect(listed.map((s) => s.id)).toEqual(own.map((o) => o.id));
    expect(listed.every((s) => s.staffNames.includes('Rhea Castellane'))).toBe(true);

    const desk: Summary[] = (await t.http().get(`/api/tickets?branchId=${riverside.id}&date=${day!.date}`).set('Authorization', await auth('front_desk')).expect(200)).body;
    const someoneElses = desk.find((s) => !own.some((o) => o.id === s.id))!;
    expect(someoneElses).toBeDefined();
    await t.http().get(`/api/tickets/${someoneElses.id}`).set('Authorization', stylist).expect(404);
    await t.http().get(`/api/tickets/${own[0]!.id}`).set('Authorization', stylist).expect(200);
  });
});
