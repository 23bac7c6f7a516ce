import { demoBusiness } from '@tressury/fixtures';
import { Decimal } from 'decimal.js';
import { sql } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { CompareProjector } from '../../apps/api/src/compare/events/compare.projector.js';
import { startTestApp, type TestApp } from './support/test-app.js';

// Every figure of the comparison is checked against SQL written here over the source tables (tickets, lines,
// bowls, retail, tips, payments, adjustments, timesheets, payroll runs), independent of the read models;
// ratios and fees are recomputed with decimal.js (npm registry), rounding half-up.

const D = Decimal.clone({ precision: 60, rounding: Decimal.ROUND_HALF_UP });
const fixed = (value: InstanceType<typeof D>, dp: number) => value.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP).toFixed(dp).replace(/^-(0\.0+)$/, '$1');
const share = (part: Num, base: Num) => (new D(base).lte(0) ? null : fixed(new D(part).dividedBy(base), 4));
const per = (amount: Num, count: Num) => (new D(count).lte(0) ? null : fixed(new D(amount).dividedBy(count), 2));
const money = (value: Num) => fixed(new D(value), 2);

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const dayAfter = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

type Figures = Record<string, string | number | boolean | null>;
type Dec = InstanceType<typeof D>;
type Num = string | number | Dec;
type Comparison = { from: string; to: string; rebookingDays: number; rows: Figures[]; totals: Figures };

/** Seeded pseudo-random numbers (mulberry32), so a failing run can be repeated. */
function seeded(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let x = Math.imul(state ^ (state >>> 15), 1 | state);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 2 ** 32;
  };
  return { next, pick: <T>(items: T[]): T => items[Math.floor(next() * items.length)]!, chance: (p: number) => next() < p };
}

describe('branch comparison on the demo business', () => {
  let t: TestApp;
  let organisationId: string;
  let branches: { id: string; name: string; timeZone: string; royaltyRate: string; marketingFundRate: string }[];
  let first: string;
  let last: string;
  const auth = async (role: Parameters<TestApp['tokenFor']>[0]) => `Bearer ${await t.tokenFor(role)}`;
  const query = async <T>(statement: ReturnType<typeof sql>) => rowsOf<T>(await t.database.db.execute(statement));
  const get = async (path: string, role: Parameters<TestApp['tokenFor']>[0] = 'owner', status = 200) =>
    (await t.http().get(path).set('Authorization', await auth(role)).expect(status)).body;

  beforeAll(async () => {
    t = await startTestApp({ TRESSURY_SEED_DEMO: 'full' });
    branches = await query(sql`
      select id, name, time_zone as "timeZone", royalty_rate::text as "royaltyRate", marketing_fund_rate::text as "marketingFundRate"
      from branches order by name`);
    organisationId = (await query<{ id: string }>(sql`select id from organisations`))[0]!.id;
    const [span] = await query<{ first: string; last: string }>(sql`select min(business_date)::text as first, max(business_date)::text as last from day_closes`);
    first = span!.first;
    last = span!.last;
  }, 300_000);
  afterAll(() => t.close());

  /** Each branch's figures over the range from the source tables, in SQL of its own. */
  async function independentFigures(from: string, to: string, rebookingDays: number) {
    const periods = await query<{ start_date: string; end_date: string }>(sql`
      select p.start_date::text, p.end_date::text from pay_periods p join payroll_runs r on r.period_id = p.id
      where r.status in ('approved', 'exported') and p.start_date >= ${from}::date and p.end_date <= ${to}::date`);
    const inPeriods = periods.length === 0 ? sql`false` : sql.join(periods.map((p) => sql`(d between ${p.start_date}::date and ${p.end_date}::date)`), sql` or `);
    const rows = await query<Record<string, string | number | boolean>>(sql`
      with closed_lines as (
        select t.branch_id, l.staff_id, l.booked_on as d, l.price, l.is_colour, l.id
        from ticket_service_lines l join tickets t on t.id = l.ticket_id where t.status = 'closed'
      ),
      service_by_staff_day as (
        select branch_id, staff_id, d, sum(price) as revenue from (
          select branch_id, staff_id, d, price from closed_lines
          union all select branch_id, staff_id, booked_on, amount from adjustments where category = 'service' and staff_id is not null
        ) s group by branch_id, staff_id, d
      ),
      visits as (select distinct client_id, branch_id, business_date from tickets where status = 'closed' and client_id is not null),
      first_ever as (select client_id, min(business_date) as d from visits group by client_id),
      first_in_range as (
        select client_id, branch_id, min(business_date) as d from visits
        where business_date between ${from}::date and ${to}::date group by client_id, branch_id
      )
      select b.id as branch_id,
        (select coalesce(sum(price), 0) from closed_lines where branch_id = b.id and d between ${from}::date and ${to}::date)
          + (select coalesce(sum(amount), 0) from adjustments where branch_id = b.id and category = 'service' and booked_on between ${from}::date and ${to}::date)
          as service_revenue,
        (select coalesce(sum(price), 0) from closed_lines where branch_id = b.id and is_colour and d between ${from}::date and ${to}::date) as colour_service_revenue,
        (select coalesce(sum(w.cost), 0) from bowls w join closed_lines l on l.id = w.service_line_id where l.branch_id = b.id and l.d between ${from}::date and ${to}::date) as colour_product_cost,
        (select coalesce(sum(r.amount), 0) from retail_lines r join tickets t on t.id = r.ticket_id where t.status = 'closed' and t.branch_id = b.id and r.booked_on between ${from}::date and ${to}::date)
          + (select coalesce(sum(amount), 0) from adjustments where branch_id = b.id and category = 'retail' and booked_on between ${from}::date and ${to}::date)
          as retail_revenue,
        (select count(*)::int from tickets where branch_id = b.id and status = 'closed' and business_date between ${from}::date and ${to}::date) as tickets,
        (select count(*)::int from tickets where branch_id = b.id and status = 'void' and business_date between ${from}::date and ${to}::date) as voids,
        (select coalesce(sum(x.amount), 0) from tips x join tickets t on t.id = x.ticket_id where t.status = 'closed' and t.branch_id = b.id and x.booked_on between ${from}::date and ${to}::date)
          + (select coalesce(sum(amount), 0) from adjustments where branch_id = b.id and category = 'tip' and booked_on between ${from}::date and ${to}::date)
          as tips,
        (select count(*)::int from payments m join tickets t on t.id = m.ticket_id where t.branch_id = b.id and t.status = 'closed' and m.kind = 'refund' and m.booked_on between ${from}::date and ${to}::date) as refunds,
        (select coalesce(-sum(m.amount), 0) from payments m join tickets t on t.id = m.ticket_id where t.branch_id = b.id and t.status = 'closed' and m.kind = 'refund' and m.booked_on between ${from}::date and ${to}::date) as refunded_amount,
        (select coalesce(sum(hours), 0) from timesheet_entries where branch_id = b.id and work_date between ${from}::date and ${to}::date) as hours,
        (select coalesce(sum(s.revenue), 0) from service_by_staff_day s
          where s.branch_id = b.id and s.d between ${from}::date and ${to}::date
            and exists (select 1 from timesheet_entries e where e.staff_id = s.staff_id and e.branch_id = s.branch_id and e.work_date = s.d and e.hours > 0)) as revenue_with_hours,
        (select count(distinct client_id)::int from visits where branch_id = b.id and business_date between ${from}::date and ${to}::date) as clients,
        (select count(*)::int from first_ever f where f.d between ${from}::date and ${to}::date
          and exists (select 1 from visits v where v.client_id = f.client_id and v.branch_id = b.id and v.business_date = f.d)) as new_clients,
        (select count(*)::int from first_in_range f where f.branch_id = b.id
          and exists (select 1 from visits v where v.client_id = f.client_id and v.branch_id = f.branch_id
                        and v.business_date > f.d and v.business_date <= f.d + ${rebookingDays}::int)) as rebooked,
        (select coalesce(sum(l.service_commission + l.retail_commission), 0) from payroll_lines l join payroll_runs r on r.id = l.run_id join pay_periods p on p.id = r.period_id
          where l.branch_id = b.id and r.status in ('approved', 'exported') and p.start_date >= ${from}::date and p.end_date <= ${to}::date) as commission,
        (select coalesce(sum(l.product_charge), 0) from payroll_lines l join payroll_runs r on r.id = l.run_id join pay_periods p on p.id = r.period_id
          where l.branch_id = b.id and r.status in ('approved', 'exported') and p.start_date >= ${from}::date and p.end_date <= ${to}::date) as product_charge,
        (select coalesce(sum(price), 0) from (select d, price from closed_lines where branch_id = b.id
            union all select booked_on as d, amount from adjustments where branch_id = b.id and category = 'service') s where ${inPeriods}) as commission_base
      from branches b order by b.name`);
    return rows.map((row) => ({ ...row, has_runs: periods.length > 0 }) as Record<string, string | number | boolean>);
  }

  /** The figures a branch row should show, from the independent sums. */
  function expected(row: Record<string, string | number | boolean>): Figures {
    const sales = new D(row.service_revenue as string).plus(row.retail_revenue as string);
    const runs = row.has_runs === true;
    return {
      serviceRevenue: money(row.service_revenue as string),
      retailRevenue: money(row.retail_revenue as string),
      tickets: row.tickets as number,
      averageTicket: per(sales.toFixed(2), row.tickets as number),
      colourServiceRevenue: money(row.colour_service_revenue as string),
      colourProductCost: money(row.colour_product_cost as string),
      colourCostShare: share(row.colour_product_cost as string, row.colour_service_revenue as string),
      productChargeRecovered: runs ? money(row.product_charge as string) : null,
      retailToServiceRatio: share(row.retail_revenue as string, row.service_revenue as string),
      stylistHours: new D(row.hours as string).toFixed(Math.max(2, new D(row.hours as string).decimalPlaces())),
      revenuePerStylistHour: per(row.revenue_with_hours as string, row.hours as string),
      newClients: row.new_clients as number,
      returningClients: (row.clients as number) - (row.new_clients as number),
      rebookingRate: share(row.rebooked as number, row.clients as number),
      tips: money(row.tips as string),
      commissionCost: runs ? money(row.commission as string) : null,
      commissionCostShare: runs ? share(row.commission as string, row.commission_base as string) : null,
      voids: row.voids as number,
      refunds: row.refunds as number,
      refundedAmount: money(row.refunded_amount as string),
    };
  }

  async function checkEveryFigure(from: string, to: string, rebookingDays: number) {
    const view: Comparison = await get(`/api/compare/branches?from=${from}&to=${to}&rebookingDays=${rebookingDays}`);
    const independent = await independentFigures(from, to, rebookingDays);
    const names = await query<{ id: string; name: string }>(sql`select id, name from branches order by name`);
    expect(view.rows.map((r) => r.branchName)).toEqual(names.map((b) => b.name));
    view.rows.forEach((row, i) => {
      const { branchId, branchName, ...figures } = row;
      expect({ branchName, branchId }).toEqual({ branchName: names[i]!.name, branchId: independent[i]!.branch_id });
      expect(figures).toEqual(expected(independent[i]!));
    });
    return view;
  }

  it('shows every figure of every branch as the source tables give it, over the last 90 days', async () => {
    const view = await checkEveryFigure(dayAfter(last, -89), last, 42);
    // The demo has tickets, colour, retail, refunds, voids, hours and approved payroll in this range: nothing is trivially empty.
    for (const row of view.rows) {
      expect(Number(row.tickets)).toBeGreaterThan(100);
      expect(row.colourCostShare).not.toBeNull();
      expect(row.revenuePerStylistHour).not.toBeNull();
      expect(row.commissionCost).not.toBeNull();
      expect(Number(row.returningClients)).toBeGreaterThan(0);
    }
    expect(view.rows.reduce((n, r) => n + Number(r.refunds), 0)).toBeGreaterThan(0);
    expect(view.rows.reduce((n, r) => n + Number(r.voids), 0)).toBeGreaterThan(0);
  });

  it('over the whole demo history with a 28-day rebooking window, new clients included', async () => {
    const view = await checkEveryFigure(first, last, 28);
    expect(view.rows.every((r) => Number(r.newClients) > 0)).toBe(true);
  });

  it('totals add up the rows and take their ratios from the sums', async () => {
    const view: Comparison = await get(`/api/compare/branches?from=${dayAfter(last, -59)}&to=${last}`);
    const sum = (key: string) => view.rows.reduce((total, row) => total.plus(String(row[key])), new D(0));
    expect(view.rebookingDays).toBe(42);
    expect(view.totals).toMatchObject({
      branchId: null,
      serviceRevenue: money(sum('serviceRevenue')),
      retailRevenue: money(sum('retailRevenue')),
      tickets: sum('tickets').toNumber(),
      averageTicket: per(sum('serviceRevenue').plus(sum('retailRevenue')), sum('tickets')),
      colourCostShare: share(sum('colourProductCost'), sum('colourServiceRevenue')),
      newClients: sum('newClients').toNumber(),
      returningClients: sum('returningClients').toNumber(),
      tips: money(sum('tips')),
      voids: sum('voids').toNumber(),
    });
  });

  it('shows null, not zero, where no hours or approved payroll runs exist', async () => {
    // Pay periods run two weeks: no approved period lies wholly inside a week.
    const week: Comparison = await get(`/api/compare/branches?from=${dayAfter(last, -6)}&to=${last}`);
    for (const row of week.rows) {
      expect(Number(row.tickets)).toBeGreaterThan(0);
      expect([row.commissionCost, row.commissionCostShare, row.productChargeRecovered]).toEqual([null, null, null]);
    }
    // Before the demo's first day nothing was sold and no hours were entered.
    const before: Comparison = await get(`/api/compare/branches?from=${dayAfter(first, -30)}&to=${dayAfter(first, -1)}`);
    for (const row of [...before.rows, before.totals]) {
      expect(row).toMatchObject({ tickets: 0, serviceRevenue: '0.00', stylistHours: '0.00', revenuePerStylistHour: null, averageTicket: null, colourCostShare: null, rebookingRate: null });
    }
  });

  it("shows a branch's days and stylists as the source tables give them", async () => {
    const branch = branches.find((b) => b.name === 'Riverside')!;
    const from = dayAfter(last, -13);
    const days = await get(`/api/compare/branches/${branch.id}/days?from=${from}&to=${last}`);
    expect(days.rows).toHaveLength(14);
    const independent = await query<{ d: string; service: string; retail: string; tickets: number; clients: number; new_clients: number; closed: boolean }>(sql`
      select g.d::date::text as d,
        (select coalesce(sum(l.price), 0) from ticket_service_lines l join tickets t on t.id = l.ticket_id where t.branch_id = ${branch.id} and t.status = 'closed' and l.booked_on = g.d)
          + (select coalesce(sum(amount), 0) from adjustments where branch_id = ${branch.id} and category = 'service' and booked_on = g.d) as service,
        (select coalesce(sum(r.amount), 0) from retail_lines r join tickets t on t.id = r.ticket_id where t.branch_id = ${branch.id} and t.status = 'closed' and r.booked_on = g.d)
          + (select coalesce(sum(amount), 0) from adjustments where branch_id = ${branch.id} and category = 'retail' and booked_on = g.d) as retail,
        (select count(*)::int from tickets where branch_id = ${branch.id} and status = 'closed' and business_date = g.d) as tickets,
        (select count(distinct client_id)::int from tickets where branch_id = ${branch.id} and status = 'closed' and business_date = g.d) as clients,
        (select count(*)::int from (select client_id, min(business_date) as d from tickets where status = 'closed' and client_id is not null group by client_id) f
          where f.d = g.d and exists (select 1 from tickets x where x.client_id = f.client_id and x.branch_id = ${branch.id} and x.status = 'closed' and x.business_date = g.d)) as new_clients,
        exists (select 1 from day_closes where branch_id = ${branch.id} and business_date = g.d) as closed
      from generate_series(${from}::date, ${last}::date, interval '1 day') g(d) order by g.d`);
    expect(days.rows.map((r: Figures) => ({ d: r.date, service: r.serviceRevenue, retail: r.retailRevenue, tickets: r.tickets, newClients: r.newClients, returning: r.returningClients, closed: r.dayClosed }))).toEqual(
      independent.map((r) => ({ d: r.d, service: money(r.service), retail: money(r.retail), tickets: r.tickets, newClients: r.new_clients, returning: r.clients - r.new_clients, closed: r.closed })),
    );

    const stylists = await get(`/api/compare/branches/${branch.id}/stylists?from=${from}&to=${last}`);
    const staffSql = await query<{ staff_id: string; service: string; retail: string; tickets: number; hours: string; tips: string }>(sql`
      select s.id as staff_id,
        (select coalesce(sum(l.price), 0) from ticket_service_lines l join tickets t on t.id = l.ticket_id
          where l.staff_id = s.id and t.branch_id = ${branch.id} and t.status = 'closed' and l.booked_on between ${from}::date and ${last}::date)
          + (select coalesce(sum(amount), 0) from adjustments where staff_id = s.id and branch_id = ${branch.id} and category = 'service' and booked_on between ${from}::date and ${last}::date) as service,
        (select coalesce(sum(r.amount), 0) from retail_lines r join tickets t on t.id = r.ticket_id
          where r.seller_staff_id = s.id and t.branch_id = ${branch.id} and t.status = 'closed' and r.booked_on between ${from}::date and ${last}::date)
          + (select coalesce(sum(amount), 0) from adjustments where staff_id = s.id and branch_id = ${branch.id} and category = 'retail' and booked_on between ${from}::date and ${last}::date) as retail,
        (select count(*)::int from tickets t where t.branch_id = ${branch.id} and t.status = 'closed' and t.business_date between ${from}::date and ${last}::date
          and (exists (select 1 from ticket_service_lines l where l.ticket_id = t.id and l.staff_id = s.id and l.refund_of_line_id is null)
            or exists (select 1 from retail_lines r where r.ticket_id = t.id and r.seller_staff_id = s.id and r.refund_of_line_id is null))) as tickets,
        (select coalesce(sum(hours), 0) from timesheet_entries where staff_id = s.id and branch_id = ${branch.id} and work_date between ${from}::date and ${last}::date) as hours,
        (select coalesce(sum(x.amount), 0) from tips x join tickets t on t.id = x.ticket_id
          where x.staff_id = s.id and t.branch_id = ${branch.id} and t.status = 'closed' and x.booked_on between ${from}::date and ${last}::date)
          + (select coalesce(sum(amount), 0) from adjustments where staff_id = s.id and branch_id = ${branch.id} and category = 'tip' and booked_on between ${from}::date and ${last}::date) as tips
      from staff s`);
    const active = staffSql.filter((s) => new D(s.service).abs().plus(new D(s.retail).abs()).plus(s.hours).plus(s.tips).gt(0) || s.tickets > 0);
    expect(stylists.rows.length).toBeGreaterThan(3);
    expect(new Set(stylists.rows.map((r: Figures) => r.staffId))).toEqual(new Set(active.map((s) => s.staff_id)));
    for (const row of stylists.rows as Figures[]) {
      const s = active.find((a) => a.staff_id === row.staffId)!;
      expect({ service: row.serviceRevenue, retail: row.retailRevenue, tickets: row.tickets, hours: new D(row.hours as string).toFixed(3), tips: row.tips }).toEqual({
        service: money(s.service),
        retail: money(s.retail),
        tickets: s.tickets,
        hours: new D(s.hours).toFixed(3),
        tips: money(s.tips),
      });
    }
  });

  it('draws the trend day by day with the same sums as the comparison', async () => {
    const from = dayAfter(last, -29);
    const trend = await get(`/api/compare/trend?from=${from}&to=${last}`);
    const view: Comparison = await get(`/api/compare/branches?from=${from}&to=${last}`);
    expect(trend.series).toHaveLength(branches.length);
    for (const series of trend.series as { branchId: string; points: Figures[] }[]) {
      expect(series.points).toHaveLength(30);
      const row = view.rows.find((r) => r.branchId === series.branchId)!;
      expect(money(series.points.reduce((total, p) => total.plus(p.serviceRevenue as string), new D(0)))).toBe(row.serviceRevenue);
      expect(series.points.reduce((n, p) => n + Number(p.tickets), 0)).toBe(row.tickets);
    }
  });

  it('works out the monthly franchise fees from gross sales and the branch rates (decimal.js)', async () => {
    const month = dayAfter(`${last.slice(0, 7)}-01`, -1).slice(0, 7);
    const fees = await get(`/api/compare/fees?month=${month}`);
    const gross = await query<{ branch_id: string; gross: string }>(sql`
      select b.id as branch_id,
        (select coalesce(sum(l.price), 0) from ticket_service_lines l join tickets t on t.id = l.ticket_id
          where t.branch_id = b.id and t.status = 'closed' and to_char(l.booked_on, 'YYYY-MM') = ${month})
        + (select coalesce(sum(r.amount), 0) from retail_lines r join tickets t on t.id = r.ticket_id
          where t.branch_id = b.id and t.status = 'closed' and to_char(r.booked_on, 'YYYY-MM') = ${month})
        + (select coalesce(sum(amount), 0) from adjustments where branch_id = b.id and category in ('service', 'retail') and to_char(booked_on, 'YYYY-MM') = ${month}) as gross
      from branches b order by b.name`);
    expect(fees.note).toMatch(/franchise agreement governs.*accountant/);
    const rows = fees.rows as Figures[];
    expect(rows).toHaveLength(4);
    rows.forEach((row, i) => {
      const branch = branches[i]!;
      const demo = demoBusiness.branches.find((b) => b.name === branch.name)!;
      const grossSales = money(gross[i]!.gross);
      const royaltyAmount = money(new D(grossSales).times(demo.royaltyRate));
      const marketingFundAmount = money(new D(grossSales).times(demo.marketingFundRate));
      expect(row).toEqual({
        branchId: branch.id,
        branchName: branch.name,
        grossSales,
        royaltyRate: demo.royaltyRate,
        royaltyAmount,
        marketingFundRate: demo.marketingFundRate,
        marketingFundAmount,
        totalFees: money(new D(royaltyAmount).plus(marketingFundAmount)),
      });
      expect(new D(grossSales).gt(10_000)).toBe(true);
    });
    expect(fees.totals.totalFees).toBe(money(rows.reduce((total, r) => total.plus(r.totalFees as string), new D(0))));

    const riverside = rows.find((r) => r.branchName === 'Riverside')!;
    const file = await t.http().get(`/api/compare/fees/${riverside.branchId}.xlsx?month=${month}`).set('Authorization', await auth('accountant')).buffer(true).parse(binary).expect(200);
    expect(file.headers['content-disposition']).toContain(`Riverside-franchise-fees-${month}.xlsx`);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(file.body as ArrayBuffer);
    const sheet = workbook.getWorksheet('Fee statement')!;
    const byLabel = new Map<string, ExcelJS.CellValue>();
    sheet.eachRow((row) => byLabel.set(String(row.getCell(1).value), row.getCell(4).value));
    const result = (label: string) => (byLabel.get(label) as { result: number }).result;
    expect(String(sheet.getCell('A2').value)).toContain('confirmed against it and by an accountant');
    expect(result('Gross sales').toFixed(2)).toBe(riverside.grossSales);
    expect(result('Royalty').toFixed(2)).toBe(riverside.royaltyAmount);
    expect(result('Marketing fund').toFixed(2)).toBe(riverside.marketingFundAmount);
    expect(result('Total fees').toFixed(2)).toBe(riverside.totalFees);
    expect((byLabel.get('Royalty') as { formula: string }).formula).toMatch(/^ROUND\(D\d+\*D\d+,2\)$/);
  });

  it('lets a manager compare only their branches: others are 404; front desk and stylists are refused', async () => {
    const view: Comparison = await get(`/api/compare/branches?from=${dayAfter(last, -6)}&to=${last}`, 'manager');
    expect(view.rows.map((r) => r.branchName)).toEqual(['Old Mill', 'Riverside']);
    const harbor = branches.find((b) => b.name === 'Harbor Point')!;
    const oldMill = branches.find((b) => b.name === 'Old Mill')!;
    await get(`/api/compare/branches/${harbor.id}/days?from=${last}&to=${last}`, 'manager', 404);
    await get(`/api/compare/branches/${harbor.id}/stylists?from=${last}&to=${last}`, 'manager', 404);
    await get(`/api/compare/fees/${harbor.id}.xlsx?month=${last.slice(0, 7)}`, 'manager', 404);
    await get(`/api/compare/branches/${oldMill.id}/days?from=${last}&to=${last}`, 'manager', 200);
    expect((await get(`/api/compare/fees?month=${last.slice(0, 7)}`, 'manager')).rows.map((r: Figures) => r.branchName)).toEqual(['Old Mill', 'Riverside']);
    expect((await get(`/api/compare/trend?from=${last}&to=${last}`, 'manager')).series.map((s: Figures) => s.branchName)).toEqual(['Old Mill', 'Riverside']);
    expect((await get(`/api/compare/branches?from=${last}&to=${last}`, 'accountant')).rows).toHaveLength(4);
    for (const role of ['front_desk', 'stylist'] as const) {
      await get(`/api/compare/branches?from=${last}&to=${last}`, role, 403);
      await get(`/api/compare/branches/${oldMill.id}/days?from=${last}&to=${last}`, role, 403);
      await get(`/api/compare/fees?month=${last.slice(0, 7)}`, role, 403);
      await get('/api/compare/definitions', role, 403);
    }
  });

  it('refuses a bad range, window or month with a 400 naming the field', async () => {
    const field = async (path: string) => ((await get(path, 'owner', 400)) as { details: { field: string }[] }).details.map((d) => d.field);
    expect(await field(`/api/compare/branches?from=${last}&to=${dayAfter(last, -1)}`)).toEqual(['to']);
    expect(await field(`/api/compare/branches?from=${dayAfter(last, -400)}&to=${last}`)).toEqual(['to']);
    expect(await field(`/api/compare/branches?from=2026-02-30&to=${last}`)).toContain('from');
    expect(await field(`/api/compare/branches?from=${last}&to=${last}&rebookingDays=0`)).toContain('rebookingDays');
    expect(await field(`/api/compare/fees?month=2026-13`)).toContain('month');
    expect(await field(`/api/compare/branches/not-an-id/days?from=${last}&to=${last}`)).toEqual(['branchId']);
  });

  it('keeps fee rates as branch settings from 0 up to (not including) 1', async () => {
    const owner = await auth('owner');
    const harbor = branches.find((b) => b.name === 'Harbor Point')!;
    for (const [field, value] of [['royaltyRate', '1'], ['royaltyRate', '-0.01'], ['marketingFundRate', '0.123456'], ['marketingFundRate', 0.05]] as const) {
      const refused = await t.http().patch(`/api/branches/${harbor.id}`).set('Authorization', owner).send({ [field]: value }).expect(400);
      expect(refused.body.details.map((d: { field: string }) => d.field)).toEqual([field]);
    }
    const changed = await t.http().patch(`/api/branches/${harbor.id}`).set('Authorization', owner).send({ royaltyRate: '0.99999', marketingFundRate: '0' }).expect(200);
    expect(changed.body).toMatchObject({ royaltyRate: '0.99999', marketingFundRate: '0' });
    await t.http().patch(`/api/branches/${harbor.id}`).set('Authorization', owner).send({ royaltyRate: harbor.royaltyRate, marketingFundRate: harbor.marketingFundRate }).expect(200);
    await t.http().patch(`/api/branches/${harbor.id}`).set('Authorization', await auth('manager')).send({ royaltyRate: '0.5' }).expect(403);
  });

  it('neutralises text a spreadsheet could run as a formula in the comparison workbook', async () => {
    const owner = await auth('owner');
    await t.http().post('/api/branches').set('Authorization', owner).send({ name: '=HYPERLINK("http://example.invalid","x")', timeZone: 'America/Chicago', royaltyRate: '0.04' }).expect(201);
    const file = await t.http().get(`/api/compare/branches.xlsx?from=${last}&to=${last}`).set('Authorization', owner).buffer(true).parse(binary).expect(200);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(file.body as ArrayBuffer);
    const names: string[] = [];
    workbook.getWorksheet('Comparison')!.eachRow((row) => names.push(String(row.getCell(1).value)));
    expect(names).toContain(`'=HYPERLINK("http://example.invalid","x")`);
    expect(names).not.toContain(`=HYPERLINK("http://example.invalid","x")`);
    expect(workbook.getWorksheet('Definitions')!.rowCount).toBeGreaterThan(20);
  });

  it('writes each definition word for word in the README', async () => {
    const { figures, fees, feeNote } = await get('/api/compare/definitions', 'manager');
    const readme = readFileSync(resolve(__dirname, '../../README.md'), 'utf8').replace(/\s+/g, ' ');
    for (const d of [...figures, ...fees] as { label: string; definition: string }[]) expect(readme).toContain(`**${d.label}.** ${d.definition}`);
    expect(readme).toContain(feeNote);
  });

  it('keeps the read models equal to a rebuild after a run of random commands through the API', async () => {
    const random = seeded(20_261_202);
    const manager = await auth('manager');
    const post = (path: string, body: object) => t.http().post(path).set('Authorization', manager).send(body);
    const local = branches.filter((b) => b.name === 'Old Mill' || b.name === 'Riverside');
    const staffOf = new Map<string, string[]>();
    for (const b of local) staffOf.set(b.id, (await query<{ id: string }>(sql`select id from staff where home_branch_id = ${b.id} and active order by id`)).map((r) => r.id));
    const services = await query<{ id: string; is_colour: boolean }>(sql`select id, is_colour from services where active order by name`);
    const colourProducts = await query<{ id: string }>(sql`select id from products where kind in ('permanent', 'lightener', 'developer') and active order by code limit 6`);
    const retail = await query<{ id: string }>(sql`select id from products where kind = 'retail' and active and retail_price is not null order by code limit 6`);
    const clients = await query<{ id: string; home_branch_id: string }>(sql`
      select c.id, c.home_branch_id from clients c where exists (select 1 from tickets t where t.client_id = c.id) order by c.id limit 40`);
    const open: { id: string; branchId: string }[] = [];
    const closed: { id: string; branchId: string; lineIds: string[] }[] = [];
    let key = 0;

    for (let step = 0; step < 70; step++) {
      const roll = random.next();
      if (roll < 0.35 || open.length === 0) {
        const branch = random.pick(local);
        const client = random.chance(0.85) ? random.pick(clients).id : undefined;
        const ticket = (await post('/api/tickets', { branchId: branch.id, clientId: client }).expect(201)).body;
        for (let n = 1 + Math.floor(random.next() * 2); n > 0; n--) {
          const service = random.pick(services);
          const staffId = random.pick(random.chance(0.9) ? staffOf.get(branch.id)! : [...staffOf.values()].flat());
          const added = (await post(`/api/tickets/${ticket.id}/service-lines`, { serviceId: service.id, staffId, acknowledgePatchTest: true }).expect(201)).body;
          const line = added.serviceLines.at(-1);
          if (service.is_colour) {
            await post(`/api/tickets/${ticket.id}/bowls`, {
              serviceLineId: line.id,
              components: [
                { productId: random.pick(colourProducts).id, amount: String(20 + Math.floor(random.next() * 60)), unit: 'g' },
                { productId: random.pick(colourProducts).id, amount: String(20 + Math.floor(random.next() * 60)), unit: 'g' },
              ],
            }).expect(201);
          }
        }
        if (random.chance(0.4)) await post(`/api/tickets/${ticket.id}/retail-lines`, { productId: random.pick(retail).id, quantity: 1 + Math.floor(random.next() * 2), sellerStaffId: random.pick(staffOf.get(branch.id)!) }).expect(201);
        if (random.chance(0.5)) await post(`/api/tickets/${ticket.id}/tips`, { staffId: random.pick(staffOf.get(branch.id)!), amount: `${5 + Math.floor(random.next() * 20)}.00` }).expect(201);
        open.push({ id: ticket.id, branchId: branch.id });
      } else if (roll < 0.65) {
        const [ticket] = open.splice(Math.floor(random.next() * open.length), 1);
        const view = (await t.http().get(`/api/tickets/${ticket!.id}`).set('Authorization', manager).expect(200)).body;
        await post(`/api/tickets/${ticket!.id}/payments`, { method: 'cash', amount: view.totals.due, idempotencyKey: `compare-pay-${++key}` }).expect(201);
        const done = (await post(`/api/tickets/${ticket!.id}/close`, {}).expect(200)).body;
        closed.push({ id: ticket!.id, branchId: ticket!.branchId, lineIds: done.serviceLines.map((l: { id: string }) => l.id) });
      } else if (roll < 0.75) {
        const [ticket] = open.splice(Math.floor(random.next() * open.length), 1);
        await post(`/api/tickets/${ticket!.id}/void`, { reason: 'Client left before the service' }).expect(200);
      } else if (roll < 0.85 && closed.some((c) => c.lineIds.length > 0)) {
        const ticket = random.pick(closed.filter((c) => c.lineIds.length > 0));
        const lineId = ticket.lineIds.splice(Math.floor(random.next() * ticket.lineIds.length), 1)[0]!;
        await post(`/api/tickets/${ticket.id}/refunds`, { serviceLineIds: [lineId], retail: [], method: 'cash', reason: 'Client unhappy with the result', idempotencyKey: `compare-refund-${++key}` }).expect(201);
      } else if (roll < 0.93) {
        const branch = random.pick(local);
        const category = random.pick(['service', 'retail', 'tip', 'cash'] as const);
        const amount = `${random.chance(0.3) ? '-' : ''}${1 + Math.floor(random.next() * 40)}.${String(Math.floor(random.next() * 100)).padStart(2, '0')}`;
        const staffId = category === 'cash' || random.chance(0.2) ? undefined : random.pick(staffOf.get(branch.id)!);
        await post('/api/day-close/adjustments', { branchId: branch.id, category, amount, staffId, reason: 'Correction of an earlier day' }).expect(201);
      } else {
        const branch = random.pick(local);
        const staffId = random.pick(staffOf.get(branch.id)!);
        const hours = `${Math.floor(random.next() * 9)}.${random.pick(['0', '25', '5', '75'])}`;
        await t.http().put('/api/payroll/timesheets').set('Authorization', manager).send({ staffId, branchId: branch.id, date: businessDateIn(branch.timeZone), hours }).expect(200);
      }
    }
    // Close Old Mill's day: its open tickets are voided first, then the drawer is counted as expected.
    const oldMill = local.find((b) => b.name === 'Old Mill')!;
    for (const ticket of open.filter((o) => o.branchId === oldMill.id)) await post(`/api/tickets/${ticket.id}/void`, { reason: 'Closing the day' }).expect(200);
    const today = businessDateIn(oldMill.timeZone);
    const preview = (await t.http().get(`/api/day-close?branchId=${oldMill.id}&businessDate=${today}`).set('Authorization', manager).expect(200)).body;
    await post('/api/day-close', { branchId: oldMill.id, businessDate: today, countedCash: preview.expectedCash }).expect(201);

    await t.app.get(CompareProjector).settled();
    const snapshot = async () => ({
      branchDays: await query(sql`select * from branch_day_figures order by branch_id, business_date`),
      staffDays: await query(sql`select * from staff_day_figures order by branch_id, business_date, staff_id`),
      visits: await query(sql`select * from client_visits order by branch_id, business_date, client_id`),
    });
    const live = await snapshot();
    const [closedToday] = await query<{ day_closed: boolean; tickets: number }>(
      sql`select day_closed, tickets from branch_day_figures where branch_id = ${oldMill.id} and business_date = ${today}::date`,
    );
    expect(closedToday).toMatchObject({ day_closed: true });
    await t.app.get(CompareProjector).rebuild(organisationId);
    expect(await snapshot()).toEqual(live);

    // And the live figures of the days just worked still match the source tables.
    const from = dayAfter(last, -6);
    const to = dayAfter(last, 2);
    await checkEveryFigure(from, to, 42);
  }, 240_000);
});

/** supertest leaves binary bodies unread unless told how to collect them. */
function binary(res: import('supertest').Response, done: (error: Error | null, body: Buffer) => void) {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
}
