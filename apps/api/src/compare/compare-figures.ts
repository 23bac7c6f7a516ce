import { type SQL, sql } from 'drizzle-orm';
import type { Db } from '../database/database.js';
import { rowsOf } from './compare-projections.js';

/** A branch's (or a day's) figures over a range, as exact sums read from the read models. */
export type BranchSums = {
  serviceRevenue: string;
  colourServiceRevenue: string;
  colourProductCost: string;
  retailRevenue: string;
  tips: string;
  tickets: number;
  voids: number;
  refunds: number;
  refundedAmount: string;
  hours: string;
  revenueWithHours: string;
  clients: number;
  newClients: number;
  rebookedClients: number;
  /** null when no approved or exported payroll run's period lies wholly in the range. */
  commissionCost: string | null;
  commissionBase: string | null;
  productChargeRecovered: string | null;
};

export type RangeQuery = { organisationId: string; branchIds: string[]; from: string; to: string };

const ZERO_SUMS: BranchSums = {
  serviceRevenue: '0.00',
  colourServiceRevenue: '0.00',
  colourProductCost: '0.00',
  retailRevenue: '0.00',
  tips: '0.00',
  tickets: 0,
  voids: 0,
  refunds: 0,
  refundedAmount: '0.00',
  hours: '0.000',
  revenueWithHours: '0.00',
  clients: 0,
  newClients: 0,
  rebookedClients: 0,
  commissionCost: null,
  commissionBase: null,
  productChargeRecovered: null,
};

const uuids = (ids: string[]): SQL =>
  sql.join(
    ids.map((id) => sql`${id}::uuid`),
    sql`, `,
  );

type DayRow = {
  branch_id: string;
  business_date: string;
  service_revenue: string;
  colour_service_revenue: string;
  colour_product_cost: string;
  retail_revenue: string;
  tips: string;
  tickets: number;
  voids: number;
  refunds: number;
  refunded_amount: string;
  hours: string;
  revenue_with_hours: string;
  day_closed: boolean;
};

const dayFigures = (row: DayRow) => ({
  serviceRevenue: row.service_revenue,
  colourServiceRevenue: row.colour_service_revenue,
  colourProductCost: row.colour_product_cost,
  retailRevenue: row.retail_revenue,
  tips: row.tips,
  tickets: row.tickets,
  voids: row.voids,
  refunds: row.refunds,
  refundedAmount: row.refunded_amount,
  hours: row.hours,
  revenueWithHours: row.revenue_with_hours,
});

/**
 * Reads the comparison's figures straight from the read models: a few grouped scans over branch-days and
 * client visits, and the approved payroll runs of the range.
 */
export class CompareFigures {
  constructor(private readonly db: Db) {}

  /** Per branch over the range; every branch asked for gets an entry, zeros where nothing happened. */
  async branchSums(range: RangeQuery, rebookingDays: number): Promise<Map<string, BranchSums>> {
    const sums = new Map(range.branchIds.map((id) => [id, { ...ZERO_SUMS }]));
    if (range.branchIds.length === 0) return sums;
    const { organisationId, from, to } = range;
    const inBranches = uuids(range.branchIds);

    const days = rowsOf<Omit<DayRow, 'business_date' | 'day_closed'>>(
      await this.db.execute(sql`
        select branch_id,
          sum(service_revenue) as service_revenue, sum(colour_service_revenue) as colour_service_revenue,
          sum(colour_product_cost) as colour_product_cost, sum(retail_revenue) as retail_revenue, sum(tips) as tips,
          sum(tickets)::int as tickets, sum(voids)::int as voids, sum(refunds)::int as refunds, sum(refunded_amount) as refunded_amount,
          sum(hours) as hours, sum(revenue_with_hours) as revenue_with_hours
        from branch_day_figures
        where organisation_id = ${organisationId} and branch_id in (${inBranches}) and business_date between ${from}::date and ${to}::date
        group by branch_id`),
    );
    for (const row of days) Object.assign(sums.get(row.branch_id)!, dayFigures({ ...row, business_date: '', day_closed: false }));

    // A client counts once per branch, at the first of their visits there in the range: the one whose previous
    // visit is before the range. A first visit in the organisation has no previous visit, so it is among them.
    const visits = rowsOf<{ branch_id: string; clients: number; new_clients: number; rebooked: number }>(
      await this.db.execute(sql`
        select branch_id, count(*)::int as clients,
          count(*) filter (where first_in_organisation)::int as new_clients,
          count(*) filter (where next_visit_on - business_date <= ${rebookingDays})::int as rebooked
        from client_visits
        where organisation_id = ${organisationId} and branch_id in (${inBranches}) and business_date between ${from}::date and ${to}::date
          and (previous_visit_on is null or previous_visit_on < ${from}::date)
        group by branch_id`),
    );
    for (const row of visits) Object.assign(sums.get(row.branch_id)!, { clients: row.clients, newClients: row.new_clients, rebookedClients: row.rebooked });

    const periods = rowsOf<{ start_date: string; end_date: string }>(
      await this.db.execute(sql`
        select p.start_date::text as start_date, p.end_date::text as end_date
        from pay_periods p join payroll_runs r on r.period_id = p.id
        where r.organisation_id = ${organisationId} and r.status in ('approved', 'exported')
          and p.start_date >= ${from}::date and p.end_date <= ${to}::date`),
    );
    if (periods.length > 0) {
      for (const entry of sums.values()) Object.assign(entry, { commissionCost: '0.00', commissionBase: '0.00', productChargeRecovered: '0.00' });
      const pay = rowsOf<{ branch_id: string; commission: string; product_charge: string }>(
        await this.db.execute(sql`
          select l.branch_id, sum(l.service_commission + l.retail_commission) as commission, sum(l.product_charge) as product_charge
          from payroll_lines l join payroll_runs r on r.id = l.run_id join pay_periods p on p.id = r.period_id
          where r.organisation_id = ${organisationId} and r.status in ('approved', 'exported')
            and p.start_date >= ${from}::date and p.end_date <= ${to}::date and l.branch_id in (${inBranches})
          group by l.branch_id`),
      );
      for (const row of pay) Object.assign(sums.get(row.branch_id)!, { commissionCost: row.commission, productChargeRecovered: row.product_charge });
      const covered = sql.join(
        periods.map((p) => sql`business_date between ${p.start_date}::date and ${p.end_date}::date`),
        sql` or `,
      );
      const base = rowsOf<{ branch_id: string; service_revenue: string }>(
        await this.db.execute(sql`
          select branch_id, sum(service_revenue) as service_revenue
          from branch_day_figures
          where organisation_id = ${organisationId} and branch_id in (${inBranches}) and (${covered})
          group by branch_id`),
      );
      for (const row of base) sums.get(row.branch_id)!.commissionBase = row.service_revenue;
    }
    return sums;
  }

  /** One row per branch-day that has figures, in date order. */
  async branchDays(range: RangeQuery): Promise<(ReturnType<typeof dayFigures> & { branchId: string; date: string; dayClosed: boolean })[]> {
    if (range.branchIds.length === 0) return [];
    const rows = rowsOf<DayRow>(
      await this.db.execute(sql`
        select branch_id, business_date::text as business_date, service_revenue, colour_service_revenue, colour_product_cost, retail_revenue, tips,
          tickets, voids, refunds, refunded_amount, hours, revenue_with_hours, day_closed
        from branch_day_figures
        where organisation_id = ${range.organisationId} and branch_id in (${uuids(range.branchIds)})
          and business_date between ${range.from}::date and ${range.to}::date
        order by business_date`),
    );
    return rows.map((row) => ({ branchId: row.branch_id, date: row.business_date, dayClosed: row.day_closed, ...dayFigures(row) }));
  }

  /** Per business date of one branch: the clients seen that day and how many of them were new to the organisation. */
  async clientsByDay(range: RangeQuery): Promise<Map<string, { clients: number; newClients: number }>> {
    const rows = rowsOf<{ business_date: string; clients: number; new_clients: number }>(
      await this.db.execute(sql`
        select business_date::text as business_date, count(*)::int as clients, count(*) filter (where first_in_organisation)::int as new_clients
        from client_visits
        where organisation_id = ${range.organisationId} and branch_id in (${uuids(range.branchIds)})
          and business_date between ${range.from}::date and ${range.to}::date
        group by business_date`),
    );
    return new Map(rows.map((r) => [r.business_date, { clients: r.clients, newClients: r.new_clients }]));
  }

  /** Per branch: service revenue + retail revenue over the range (the base of franchise fees). */
  async grossSales(range: RangeQuery): Promise<Map<string, string>> {
    if (range.branchIds.length === 0) return new Map();
    const rows = rowsOf<{ branch_id: string; gross_sales: string }>(
      await this.db.execute(sql`
        select branch_id, sum(service_revenue + retail_revenue) as gross_sales
        from branch_day_figures
        where organisation_id = ${range.organisationId} and branch_id in (${uuids(range.branchIds)})
          and business_date between ${range.from}::date and ${range.to}::date
        group by branch_id`),
    );
    return new Map(rows.map((r) => [r.branch_id, r.gross_sales]));
  }

  /** Per staff member at one branch over the range, with their name. */
  async staffSums(range: RangeQuery) {
    return rowsOf<{
      staff_id: string;
      staff_name: string;
      service_revenue: string;
      colour_service_revenue: string;
      colour_product_cost: string;
      retail_revenue: string;
      tips: string;
      tickets: number;
      hours: string;
      revenue_with_hours: string;
    }>(
      await this.db.execute(sql`
        select f.staff_id, s.display_name as staff_name,
          sum(f.service_revenue) as service_revenue, sum(f.colour_service_revenue) as colour_service_revenue,
          sum(f.colour_product_cost) as colour_product_cost, sum(f.retail_revenue) as retail_revenue, sum(f.tips) as tips,
          sum(f.tickets)::int as tickets, sum(f.hours) as hours,
          coalesce(sum(f.service_revenue) filter (where f.hours > 0), 0) as revenue_with_hours
        from staff_day_figures f join staff s on s.id = f.staff_id
        where f.organisation_id = ${range.organisationId} and f.branch_id in (${uuids(range.branchIds)})
          and f.business_date between ${range.from}::date and ${range.to}::date
        group by f.staff_id, s.display_name
        order by s.display_name, f.staff_id`),
    );
  }
}
