import { type SQL, sql } from 'drizzle-orm';
import type { Db } from '../database/database.js';

/** db.execute answers an array (some drivers) or an object with rows (node-postgres, PGlite). */
export function rowsOf<T>(result: unknown): T[] {
  return (Array.isArray(result) ? result : (result as { rows: T[] }).rows) as T[];
}

export type BranchDayKey = { branchId: string; businessDate: string };

/**
 * What a statement recomputes: some branch-days and clients (after an event), or a whole organisation (the
 * rebuild). Both run the very same SQL, so a rebuild and the live read models can only differ where an
 * event failed to name a branch-day or client it changed.
 */
export type ProjectionScope = { keys: BranchDayKey[]; clientIds: string[] } | { organisationId: string };

const byOrganisation = (scope: ProjectionScope): scope is { organisationId: string } => 'organisationId' in scope;

/** The condition "this row's branch-day is in scope" over the given columns. */
function dayInScope(scope: ProjectionScope, organisation: SQL, branch: SQL, date: SQL): SQL {
  if (byOrganisation(scope)) return sql`${organisation} = ${scope.organisationId}`;
  if (scope.keys.length === 0) return sql`false`;
  const keys = sql.join(
    scope.keys.map((k) => sql`(${k.branchId}::uuid, ${k.businessDate}::date)`),
    sql`, `,
  );
  return sql`(${branch}, ${date}) in (${keys})`;
}

function clientInScope(scope: ProjectionScope, organisation: SQL, client: SQL): SQL {
  if (byOrganisation(scope)) return sql`${organisation} = ${scope.organisationId}`;
  if (scope.clientIds.length === 0) return sql`false`;
  return sql`${client} in (${sql.join(
    scope.clientIds.map((id) => sql`${id}::uuid`),
    sql`, `,
  )})`;
}

/**
 * A staff member's day at a branch: service lines they own (whole lines; assistant shares are a pay matter),
 * the bowls on those lines, retail they sold, their tips, the closed tickets they served or sold on, service,
 * retail and tip adjustments booked to them, and their timesheet hours there. Only closed tickets count;
 * each line counts on the day it was booked, so a refund falls on the day it was given.
 */
async function recomputeStaffDays(db: Db, scope: ProjectionScope): Promise<void> {
  const line = dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`l.booked_on`);
  await db.execute(sql`delete from staff_day_figures f where ${dayInScope(scope, sql`f.organisation_id`, sql`f.branch_id`, sql`f.business_date`)}`);
  await db.execute(sql`
    insert into staff_day_figures
      (organisation_id, staff_id, branch_id, business_date, service_revenue, colour_service_revenue, colour_product_cost, retail_revenue, tips, tickets, hours)
    select b.organisation_id, p.staff_id, p.branch_id, p.business_date,
      sum(p.service), sum(p.colour), sum(p.cost), sum(p.retail), sum(p.tips), sum(p.tickets)::int, sum(p.hours)
    from (
      select t.branch_id, l.booked_on as business_date, l.staff_id,
        l.price as service, case when l.is_colour then l.price else 0 end as colour, 0 as cost, 0 as retail, 0 as tips, 0 as tickets, 0 as hours
      from ticket_service_lines l join tickets t on t.id = l.ticket_id
      where t.status = 'closed' and ${line}
      union all
      select t.branch_id, l.booked_on, l.staff_id, 0, 0, w.cost, 0, 0, 0, 0
      from bowls w join ticket_service_lines l on l.id = w.service_line_id join tickets t on t.id = l.ticket_id
      where t.status = 'closed' and ${line}
      union all
      select t.branch_id, r.booked_on, r.seller_staff_id, 0, 0, 0, r.amount, 0, 0, 0
      from retail_lines r join tickets t on t.id = r.ticket_id
      where t.status = 'closed' and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`r.booked_on`)}
      union all
      select t.branch_id, x.booked_on, x.staff_id, 0, 0, 0, 0, x.amount, 0, 0
      from tips x join tickets t on t.id = x.ticket_id
      where t.status = 'closed' and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`x.booked_on`)}
      union all
      select t.branch_id, t.business_date, s.staff_id, 0, 0, 0, 0, 0, 1, 0
      from tickets t
      join (
        select ticket_id, staff_id from ticket_service_lines where refund_of_line_id is null
        union
        select ticket_id, seller_staff_id from retail_lines where refund_of_line_id is null
      ) s on s.ticket_id = t.id
      where t.status = 'closed' and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`t.business_date`)}
      union all
      select a.branch_id, a.booked_on, a.staff_id,
        case when a.category = 'service' then a.amount else 0 end, 0, 0,
        case when a.category = 'retail' then a.amount else 0 end,
        case when a.category = 'tip' then a.amount else 0 end, 0, 0
      from adjustments a
      where a.staff_id is not null and a.category in ('service', 'retail', 'tip')
        and ${dayInScope(scope, sql`a.organisation_id`, sql`a.branch_id`, sql`a.booked_on`)}
      union all
      select e.branch_id, e.work_date, e.staff_id, 0, 0, 0, 0, 0, 0, e.hours
      from timesheet_entries e
      where ${dayInScope(scope, sql`e.organisation_id`, sql`e.branch_id`, sql`e.work_date`)}
    ) p
    join branches b on b.id = p.branch_id
    group by b.organisation_id, p.staff_id, p.branch_id, p.business_date
    order by p.branch_id, p.business_date`);
}

/**
 * A branch's business date: the same sources as the staff-days plus the tickets closed and voided that day,
 * the refunds given that day, adjustments without a staff member, and whether the day has been closed.
 * Hours and the revenue of staff-days with hours are taken from the staff-days, so run those first.
 */
async function recomputeBranchDays(db: Db, scope: ProjectionScope): Promise<void> {
  const line = dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`l.booked_on`);
  await db.execute(sql`delete from branch_day_figures f where ${dayInScope(scope, sql`f.organisation_id`, sql`f.branch_id`, sql`f.business_date`)}`);
  await db.execute(sql`
    insert into branch_day_figures
      (organisation_id, branch_id, business_date, service_revenue, colour_service_revenue, colour_product_cost, retail_revenue, tips,
       tickets, voids, refunds, refunded_amount, hours, revenue_with_hours, day_closed)
    select b.organisation_id, p.branch_id, p.business_date,
      sum(p.service), sum(p.colour), sum(p.cost), sum(p.retail), sum(p.tips),
      sum(p.tickets)::int, sum(p.voids)::int, sum(p.refunds)::int, sum(p.refunded), sum(p.hours), sum(p.with_hours), bool_or(p.closed)
    from (
      select t.branch_id, l.booked_on as business_date,
        l.price as service, case when l.is_colour then l.price else 0 end as colour, 0 as cost, 0 as retail, 0 as tips,
        0 as tickets, 0 as voids, 0 as refunds, 0 as refunded, 0 as hours, 0 as with_hours, false as closed
      from ticket_service_lines l join tickets t on t.id = l.ticket_id
      where t.status = 'closed' and ${line}
      union all
      select t.branch_id, l.booked_on, 0, 0, w.cost, 0, 0, 0, 0, 0, 0, 0, 0, false
      from bowls w join ticket_service_lines l on l.id = w.service_line_id join tickets t on t.id = l.ticket_id
      where t.status = 'closed' and ${line}
      union all
      select t.branch_id, r.booked_on, 0, 0, 0, r.amount, 0, 0, 0, 0, 0, 0, 0, false
      from retail_lines r join tickets t on t.id = r.ticket_id
      where t.status = 'closed' and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`r.booked_on`)}
      union all
      select t.branch_id, x.booked_on, 0, 0, 0, 0, x.amount, 0, 0, 0, 0, 0, 0, false
      from tips x join tickets t on t.id = x.ticket_id
      where t.status = 'closed' and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`x.booked_on`)}
      union all
      select t.branch_id, t.business_date, 0, 0, 0, 0, 0,
        case when t.status = 'closed' then 1 else 0 end, case when t.status = 'void' then 1 else 0 end, 0, 0, 0, 0, false
      from tickets t
      where t.status <> 'open' and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`t.business_date`)}
      union all
      select t.branch_id, m.booked_on, 0, 0, 0, 0, 0, 0, 0, 1, -m.amount, 0, 0, false
      from payments m join tickets t on t.id = m.ticket_id
      where m.kind = 'refund' and m.status = 'succeeded' and t.status = 'closed'
        and ${dayInScope(scope, sql`t.organisation_id`, sql`t.branch_id`, sql`m.booked_on`)}
      union all
      select a.branch_id, a.booked_on,
        case when a.category = 'service' then a.amount else 0 end, 0, 0,
        case when a.category = 'retail' then a.amount else 0 end,
        case when a.category = 'tip' then a.amount else 0 end, 0, 0, 0, 0, 0, 0, false
      from adjustments a
      where ${dayInScope(scope, sql`a.organisation_id`, sql`a.branch_id`, sql`a.booked_on`)}
      union all
      select s.branch_id, s.business_date, 0, 0, 0, 0, 0, 0, 0, 0, 0, s.hours, case when s.hours > 0 then s.service_revenue else 0 end, false
      from staff_day_figures s
      where ${dayInScope(scope, sql`s.organisation_id`, sql`s.branch_id`, sql`s.business_date`)}
      union all
      select c.branch_id, c.business_date, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, true
      from day_closes c
      where ${dayInScope(scope, sql`c.organisation_id`, sql`c.branch_id`, sql`c.business_date`)}
    ) p
    join branches b on b.id = p.branch_id
    group by b.organisation_id, p.branch_id, p.business_date
    order by p.branch_id, p.business_date`);
}

/**
 * A client's visits: each branch and business date with a closed ticket for them, with the visits before
 * and after it at the same branch and whether it was their first anywhere in the organisation.
 */
async function recomputeClientVisits(db: Db, scope: ProjectionScope): Promise<void> {
  await db.execute(sql`delete from client_visits v where ${clientInScope(scope, sql`v.organisation_id`, sql`v.client_id`)}`);
  await db.execute(sql`
    insert into client_visits (organisation_id, client_id, branch_id, business_date, previous_visit_on, next_visit_on, first_in_organisation)
    select organisation_id, client_id, branch_id, business_date,
      lag(business_date) over same_branch, lead(business_date) over same_branch,
      business_date = min(business_date) over (partition by client_id)
    from (
      select distinct t.organisation_id, t.client_id, t.branch_id, t.business_date
      from tickets t
      where t.status = 'closed' and t.client_id is not null and ${clientInScope(scope, sql`t.organisation_id`, sql`t.client_id`)}
    ) v
    window same_branch as (partition by client_id, branch_id order by business_date)
    -- Stored in the order ranges are read: a range of dates then lies on few pages.
    order by branch_id, business_date`);
}

/** Recomputes the read models in scope from the source tables; the caller holds the transaction. */
export async function recomputeProjections(db: Db, scope: ProjectionScope): Promise<void> {
  await recomputeStaffDays(db, scope);
  await recomputeBranchDays(db, scope);
  await recomputeClientVisits(db, scope);
}

/** Rebuilds one organisation's read models from scratch and records when. */
export async function rebuildProjections(db: Db, organisationId: string): Promise<void> {
  await recomputeProjections(db, { organisationId });
  await db.execute(sql`
    insert into compare_rebuilds (organisation_id, rebuilt_at) values (${organisationId}, now())
    on conflict (organisation_id) do update set rebuilt_at = excluded.rebuilt_at`);
}

/** The branch-days and client a ticket's figures touch: its own date and every date a line, tip or payment of it was booked on. */
export async function ticketScope(db: Db, ticketId: string): Promise<{ keys: BranchDayKey[]; clientIds: string[] }> {
  const result = await db.execute(sql`
    select t.branch_id, d.business_date::text as business_date, t.client_id
    from tickets t
    cross join lateral (
      select t.business_date
      union select booked_on from ticket_service_lines where ticket_id = t.id
      union select booked_on from retail_lines where ticket_id = t.id
      union select booked_on from tips where ticket_id = t.id
      union select booked_on from payments where ticket_id = t.id
    ) d
    where t.id = ${ticketId}`);
  const rows = rowsOf<{ branch_id: string; business_date: string; client_id: string | null }>(result);
  return {
    keys: rows.map((r) => ({ branchId: r.branch_id, businessDate: r.business_date })),
    clientIds: [...new Set(rows.map((r) => r.client_id).filter((id): id is string => id !== null))],
  };
}
