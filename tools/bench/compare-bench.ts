// Branch comparison at scale (issue 6): an organisation of 60 branches with a year of closed tickets (about
// 3 million service lines, bowls, retail, tips, payments, refunds, voids, day closes, timesheets and approved
// payroll), generated with set-based SQL straight into the tables. Then the read models are built and the
// comparison for 90 days and for a year is timed through them (the API's own code path) and through the
// best plain SQL aggregate over the source tables, with both printed and their ratio. Not a timed test.
//
//   npm run bench:compare                            PGlite in a temporary directory
//   DATABASE_URL=postgres://… npm run bench:compare  a fresh database on that server (dropped afterwards)
//   COMPARE_BENCH_KEEP=/tmp/bench-data (or a database name with DATABASE_URL) keeps the data for another run
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { type SQL, sql } from 'drizzle-orm';
import { type BranchSums, CompareFigures } from '../../apps/api/src/compare/compare-figures.js';
import { rebuildProjections, rowsOf } from '../../apps/api/src/compare/compare-projections.js';
import { addSums, toFiguresView } from '../../apps/api/src/compare/compare-views.js';
import type { Database } from '../../apps/api/src/database/database.js';
import { openDatabase } from '../../apps/api/src/database/open-database.js';

// COMPARE_BENCH_BRANCHES shrinks the organisation for a quick trial of the script itself.
const BRANCHES = Number(process.env.COMPARE_BENCH_BRANCHES ?? 60);
const STAFF_PER_BRANCH = 25;
const CLIENTS_PER_BRANCH = 5_000;
const REBOOKING_DAYS = 42;
const RUNS = 5;

const print = (line: string) => process.stdout.write(`${line}\n`);
const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;
const millis = (ms: number) => `${ms.toFixed(0)} ms`;
const dayAfter = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

const ORG = '00000000-0000-4000-8000-000000000001';
const OWNER = '00000000-0000-4000-8000-000000000002';
const LEVEL = '00000000-0000-4000-8000-000000000003';
const PLAN = '00000000-0000-4000-8000-000000000004';
const PLAN_VERSION = '00000000-0000-4000-8000-000000000005';

async function main(): Promise<void> {
  const server = process.env.DATABASE_URL?.trim() || null;
  // COMPARE_BENCH_KEEP (a PGlite directory, or a database name on the server) keeps the generated data, and a
  // later run with the same value only times the queries again.
  const kept = process.env.COMPARE_BENCH_KEEP?.trim() || null;
  const target = server ? await serverDatabase(server, kept) : { url: null, drop: async () => undefined };
  const dataDir = server ? '' : (kept ?? mkdtempSync(join(tmpdir(), 'tressury-compare-bench-')));
  const opened = await openDatabase({ databaseUrl: target.url, dataDir });
  const { database } = opened;
  try {
    print(`Branch comparison benchmark on ${server ? 'PostgreSQL' : `PGlite (${dataDir})`}`);
    const [existing] = rowsOf<{ last: string | null }>(await database.db.execute(sql`select max(business_date)::text as last from day_closes where organisation_id = ${ORG}`));
    if (existing?.last) {
      await timeQueries(database, existing.last);
      return;
    }
    const last = dayAfter(new Date().toISOString().slice(0, 10), -1);
    const first = dayAfter(last, -364);

    let started = performance.now();
    const counts = await generate(database, first, last);
    const generated = performance.now() - started;
    print(
      `generated and loaded ${counts.tickets.toLocaleString('en-US')} tickets, ${counts.lines.toLocaleString('en-US')} service lines, ` +
        `${counts.bowls.toLocaleString('en-US')} bowls, ${counts.retail.toLocaleString('en-US')} retail lines, ${counts.tips.toLocaleString('en-US')} tips, ` +
        `${counts.payments.toLocaleString('en-US')} payments, ${counts.hours.toLocaleString('en-US')} timesheet entries (${first} to ${last}) in ${seconds(generated)}`,
    );
    started = performance.now();
    await database.db.execute(sql`vacuum analyze`);
    print(`vacuum analyze: ${seconds(performance.now() - started)}`);
    started = performance.now();
    await database.transaction(() => rebuildProjections(database.db, ORG));
    await database.db.execute(sql`vacuum analyze branch_day_figures`);
    await database.db.execute(sql`vacuum analyze client_visits`);
    const [built] = rowsOf<{ days: number; staff: number; visits: number }>(
      await database.db.execute(
        sql`select (select count(*)::int from branch_day_figures) as days, (select count(*)::int from staff_day_figures) as staff, (select count(*)::int from client_visits) as visits`,
      ),
    );
    print(`built the read models (${built!.days} branch-days, ${built!.staff} staff-days, ${built!.visits} client visits) in ${seconds(performance.now() - started)}`);
    await timeQueries(database, last);
  } finally {
    await opened.close();
    await target.drop();
    if (dataDir && !kept) rmSync(dataDir, { recursive: true, force: true });
  }
}

/** The comparison for 90 days and a year up to `last`, through the read models and through plain SQL. */
async function timeQueries(database: Database, last: string): Promise<void> {
  const branchIds = rowsOf<{ id: string }>(await database.db.execute(sql`select id from branches where organisation_id = ${ORG} order by name`)).map((r) => r.id);
  print('');
  print('range     read models (median of 5)   plain SQL over source tables (median of 5)   ratio   target');
  for (const [label, days, limit] of [
    ['90 days', 90, 300],
    ['365 days', 365, 1000],
  ] as const) {
    const range = { organisationId: ORG, branchIds, from: dayAfter(last, 1 - days), to: last };
    const viaModels = async () => {
      const sums = await new CompareFigures(database.db).branchSums(range, REBOOKING_DAYS);
      const rows = branchIds.map((id, i) => toFiguresView({ id, name: `${i}` }, `${i}`, sums.get(id)!));
      return { sums, rows, totals: toFiguresView(null, 'All branches', addSums([...sums.values()])) };
    };
    const viaPlain = () => plainBranchSums(database, range, REBOOKING_DAYS);
    const models = await timed(viaModels);
    const plain = await timed(viaPlain);
    const agree = branchIds.every((id) => JSON.stringify(normalise(models.result.sums.get(id)!)) === JSON.stringify(normalise(plain.result.get(id)!)));
    const ratio = models.median / plain.median;
    print(
      `${label.padEnd(9)} ${millis(models.median).padStart(8)} (${models.times.map((t) => t.toFixed(0)).join(', ')})`.padEnd(38) +
        `${millis(plain.median).padStart(9)} (${plain.times.map((t) => t.toFixed(0)).join(', ')})`.padEnd(47) +
        `${ratio.toFixed(3).padStart(5)}   < ${limit} ms and ≤ 2× plain: ${models.median < limit && ratio <= 2 ? 'met' : 'NOT met'}; figures agree: ${agree ? 'yes' : 'NO'}`,
    );
  }
}

async function timed<T>(work: () => Promise<T>): Promise<{ result: T; times: number[]; median: number }> {
  let result = await work();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const started = performance.now();
    result = await work();
    times.push(performance.now() - started);
  }
  return { result, times, median: median(times) };
}

/** Sums as numbers of cents and hundredths of hours, so '12.5' and '12.50' compare equal. */
function normalise(sums: BranchSums): Record<string, string | number | null> {
  return Object.fromEntries(Object.entries(sums).map(([key, value]) => [key, typeof value === 'string' ? Number(value).toFixed(3) : value]));
}

/**
 * The same figures straight from the source tables, written for speed: one pass over the range's service
 * lines (with their bowls pre-summed and their staff-day's hours joined), one over retail, tips, tickets,
 * refunds and adjustments each, and the clients' visits worked out with window functions over every closed
 * ticket (first visits and returns need the history around the range).
 */
async function plainBranchSums(database: Database, range: { organisationId: string; branchIds: string[]; from: string; to: string }, rebookingDays: number): Promise<Map<string, BranchSums>> {
  const db = database.db;
  const { organisationId: org, from, to } = range;
  const sums = new Map<string, BranchSums>(
    range.branchIds.map((id) => [
      id,
      {
        serviceRevenue: '0', colourServiceRevenue: '0', colourProductCost: '0', retailRevenue: '0', tips: '0', tickets: 0, voids: 0, refunds: 0, refundedAmount: '0',
        hours: '0', revenueWithHours: '0', clients: 0, newClients: 0, rebookedClients: 0, commissionCost: null, commissionBase: null, productChargeRecovered: null,
      },
    ]),
  );
  const each = async (statement: SQL, apply: (entry: BranchSums, row: Record<string, string | number>) => void) => {
    for (const row of rowsOf<Record<string, string | number>>(await db.execute(statement))) apply(sums.get(row.branch_id as string)!, row);
  };
  const add = (a: string, b: string | number | undefined) => String(Number(a) + Number(b ?? 0));
  const inRange = (column: SQL) => sql`${column} between ${from}::date and ${to}::date`;

  await each(
    sql`
      select t.branch_id, sum(l.price) as service, coalesce(sum(l.price) filter (where l.is_colour), 0) as colour,
        coalesce(sum(w.cost), 0) as cost, coalesce(sum(l.price) filter (where e.hours > 0), 0) as with_hours
      from ticket_service_lines l
      join tickets t on t.id = l.ticket_id
      left join (select service_line_id, sum(cost) as cost from bowls group by service_line_id) w on w.service_line_id = l.id
      left join timesheet_entries e on e.staff_id = l.staff_id and e.branch_id = t.branch_id and e.work_date = l.booked_on
      where t.organisation_id = ${org} and t.status = 'closed' and ${inRange(sql`l.booked_on`)}
      group by t.branch_id`,
    (s, r) => Object.assign(s, { serviceRevenue: add(s.serviceRevenue, r.service), colourServiceRevenue: r.colour, colourProductCost: r.cost, revenueWithHours: add(s.revenueWithHours, r.with_hours) }),
  );
  await each(
    sql`select t.branch_id, sum(r.amount) as retail from retail_lines r join tickets t on t.id = r.ticket_id
        where t.organisation_id = ${org} and t.status = 'closed' and ${inRange(sql`r.booked_on`)} group by t.branch_id`,
    (s, r) => (s.retailRevenue = add(s.retailRevenue, r.retail)),
  );
  await each(
    sql`select t.branch_id, sum(x.amount) as tips from tips x join tickets t on t.id = x.ticket_id
        where t.organisation_id = ${org} and t.status = 'closed' and ${inRange(sql`x.booked_on`)} group by t.branch_id`,
    (s, r) => (s.tips = add(s.tips, r.tips)),
  );
  await each(
    sql`select branch_id, count(*) filter (where status = 'closed')::int as closed, count(*) filter (where status = 'void')::int as voids
        from tickets where organisation_id = ${org} and ${inRange(sql`business_date`)} group by branch_id`,
    (s, r) => Object.assign(s, { tickets: r.closed, voids: r.voids }),
  );
  await each(
    sql`select t.branch_id, count(*)::int as refunds, -sum(m.amount) as refunded from payments m join tickets t on t.id = m.ticket_id
        where t.organisation_id = ${org} and t.status = 'closed' and m.kind = 'refund' and ${inRange(sql`m.booked_on`)} group by t.branch_id`,
    (s, r) => Object.assign(s, { refunds: r.refunds, refundedAmount: r.refunded }),
  );
  await each(
    sql`select a.branch_id,
          coalesce(sum(a.amount) filter (where a.category = 'service'), 0) as service,
          coalesce(sum(a.amount) filter (where a.category = 'retail'), 0) as retail,
          coalesce(sum(a.amount) filter (where a.category = 'tip'), 0) as tips,
          coalesce(sum(a.amount) filter (where a.category = 'service' and e.hours > 0), 0) as with_hours
        from adjustments a left join timesheet_entries e on e.staff_id = a.staff_id and e.branch_id = a.branch_id and e.work_date = a.booked_on
        where a.organisation_id = ${org} and ${inRange(sql`a.booked_on`)} group by a.branch_id`,
    (s, r) =>
      Object.assign(s, {
        serviceRevenue: add(s.serviceRevenue, r.service),
        retailRevenue: add(s.retailRevenue, r.retail),
        tips: add(s.tips, r.tips),
        revenueWithHours: add(s.revenueWithHours, r.with_hours),
      }),
  );
  await each(
    sql`select branch_id, sum(hours) as hours from timesheet_entries where organisation_id = ${org} and ${inRange(sql`work_date`)} group by branch_id`,
    (s, r) => (s.hours = r.hours as string),
  );
  await each(
    sql`
      with visits as (
        select client_id, branch_id, business_date from tickets
        where organisation_id = ${org} and status = 'closed' and client_id is not null
        group by client_id, branch_id, business_date
      ),
      around as (
        select branch_id, business_date,
          lag(business_date) over same_branch as previous, lead(business_date) over same_branch as next,
          min(business_date) over (partition by client_id) as first_ever
        from visits window same_branch as (partition by client_id, branch_id order by business_date)
      )
      select branch_id,
        count(*) filter (where previous is null or previous < ${from}::date)::int as clients,
        count(*) filter (where business_date = first_ever)::int as new_clients,
        count(*) filter (where (previous is null or previous < ${from}::date) and next - business_date <= ${rebookingDays})::int as rebooked
      from around where ${inRange(sql`business_date`)} group by branch_id`,
    (s, r) => Object.assign(s, { clients: r.clients, newClients: r.new_clients, rebookedClients: r.rebooked }),
  );
  const periods = rowsOf<{ start_date: string; end_date: string }>(
    await db.execute(sql`
      select p.start_date::text, p.end_date::text from pay_periods p join payroll_runs r on r.period_id = p.id
      where r.organisation_id = ${org} and r.status in ('approved', 'exported') and p.start_date >= ${from}::date and p.end_date <= ${to}::date`),
  );
  if (periods.length > 0) {
    for (const s of sums.values()) Object.assign(s, { commissionCost: '0', commissionBase: '0', productChargeRecovered: '0' });
    await each(
      sql`select l.branch_id, sum(l.service_commission + l.retail_commission) as commission, sum(l.product_charge) as charge
          from payroll_lines l join payroll_runs r on r.id = l.run_id join pay_periods p on p.id = r.period_id
          where r.organisation_id = ${org} and r.status in ('approved', 'exported') and p.start_date >= ${from}::date and p.end_date <= ${to}::date
          group by l.branch_id`,
      (s, r) => Object.assign(s, { commissionCost: r.commission, productChargeRecovered: r.charge }),
    );
    const covered = sql.join(
      periods.map((p) => sql`(d between ${p.start_date}::date and ${p.end_date}::date)`),
      sql` or `,
    );
    await each(
      sql`select branch_id, sum(amount) as base from (
            select t.branch_id, l.booked_on as d, l.price as amount from ticket_service_lines l join tickets t on t.id = l.ticket_id
            where t.organisation_id = ${org} and t.status = 'closed' and ${inRange(sql`l.booked_on`)}
            union all
            select branch_id, booked_on, amount from adjustments where organisation_id = ${org} and category = 'service' and ${inRange(sql`booked_on`)}
          ) s where ${covered} group by branch_id`,
      (s, r) => (s.commissionBase = r.base as string),
    );
  }
  return sums;
}

type Counts = { tickets: number; lines: number; bowls: number; retail: number; tips: number; payments: number; hours: number };

/**
 * The organisation, made with generate_series and random() after setseed, so every run builds the same
 * data. Foreign-key triggers are off while loading (the rows are consistent by construction); each table is
 * one statement in its own transaction.
 */
async function generate(database: Database, first: string, last: string): Promise<Counts> {
  const run = (statements: SQL[]) =>
    database.transaction(async () => {
      await database.db.execute(sql`set local session_replication_role = replica`);
      for (const statement of statements) await database.db.execute(statement);
    });
  const step = async (label: string, ...statements: SQL[]) => {
    const started = performance.now();
    await run(statements);
    print(`  ${label.padEnd(22)} ${seconds(performance.now() - started)}`);
  };
  await database.db.execute(sql`select setseed(0.2026)`);
  await step(
    'organisation',
    sql`
      insert into organisations (id, name) values (${ORG}, 'Bench Hair Group')`,
    sql`
      insert into users (id, organisation_id, email, display_name, password_hash, role) values (${OWNER}, ${ORG}, 'owner@bench.example', 'Bench Owner', '-', 'owner')`,
    sql`
      insert into levels (id, organisation_id, name, rank) values (${LEVEL}, ${ORG}, 'Bench stylist', 1)`,
    sql`
      insert into services (id, organisation_id, name, category, duration_minutes, is_colour)
        select md5('service' || k)::uuid, ${ORG}, 'Bench service ' || k, case when k < 3 then 'Colour' else 'Cuts' end, 60, k < 3 from generate_series(0, 7) k`,
    sql`
      insert into products (id, organisation_id, code, name, kind, container_size, container_unit, container_cost, cost_per_gram, retail_price)
        select md5('product' || k)::uuid, ${ORG}, 'BENCH-' || k, 'Bench product ' || k, (case when k < 4 then 'permanent' else 'retail' end)::product_kind,
          60, 'g', 6, 0.1, case when k >= 4 then 24 end
        from generate_series(0, 7) k`,
    sql`
      insert into branches (id, organisation_id, name, time_zone, currency, minimum_wage, overtime_after_hours, overtime_multiplier, retail_tax_rate, royalty_rate, marketing_fund_rate)
        select md5('branch' || b)::uuid, ${ORG}, 'Bench branch ' || lpad((b + 1)::text, 2, '0'), 'America/Chicago', 'USD', 7.25, 40, 1.5, 0.0825, 0.06, 0.02
        from generate_series(0, ${BRANCHES - 1}) b`,
    sql`
      insert into staff (id, organisation_id, home_branch_id, display_name, level_id)
        select md5('staff' || b || '-' || s)::uuid, ${ORG}, md5('branch' || b)::uuid, 'Stylist ' || (b + 1) || '-' || (s + 1), ${LEVEL}
        from generate_series(0, ${BRANCHES - 1}) b, generate_series(0, ${STAFF_PER_BRANCH - 1}) s`,
    sql`
      insert into clients (id, organisation_id, home_branch_id, first_name, last_name)
        select md5('client' || b || '-' || c)::uuid, ${ORG}, md5('branch' || b)::uuid, 'Client', b || '-' || c
        from generate_series(0, ${BRANCHES - 1}) b, generate_series(0, ${CLIENTS_PER_BRANCH - 1}) c`,
    sql`
      create table bench_branches as select b, md5('branch' || b)::uuid as id from generate_series(0, ${BRANCHES - 1}) b`,
    sql`
      create table bench_days as select d::date as d from generate_series(${first}::date, ${last}::date, interval '1 day') d where extract(isodow from d) <> 1`,
  );
  // Closed on Mondays; 60 to 109 tickets a day depending on the branch; one in a hundred voided; nine in ten with a client of the branch.
  await step(
    'tickets',
    sql`
      insert into tickets (id, organisation_id, branch_id, business_date, number, client_id, status, opened_by_id, opened_at, closed_by_id, closed_at, voided_by_id, voided_at, void_reason)
      select md5('ticket' || x.b || '-' || x.d || '-' || x.n)::uuid, ${ORG}, md5('branch' || x.b)::uuid, x.d, x.n,
        case when x.client < ${CLIENTS_PER_BRANCH} then md5('client' || x.b || '-' || x.client)::uuid end,
        (case when x.void then 'void' else 'closed' end)::ticket_status, ${OWNER}, x.d + interval '15 hours',
        case when not x.void then ${OWNER}::uuid end, case when not x.void then x.d + interval '16 hours' end,
        case when x.void then ${OWNER}::uuid end, case when x.void then x.d + interval '16 hours' end, case when x.void then 'Opened by mistake' end
      from (
        select b.b, d.d, n, random() < 0.01 as void, floor(random() * ${CLIENTS_PER_BRANCH / 0.9})::int as client
        from bench_branches b cross join bench_days d cross join lateral generate_series(1, 60 + (b.b * 7) % 50 + 0 * extract(day from d.d)::int) n
      ) x`,
  );
  // One or two services a ticket (about 1.9): three of the eight are colour.
  await step(
    'service lines',
    sql`
      insert into ticket_service_lines (ticket_id, service_id, service_name, is_colour, staff_id, level_id, list_price, discount, price, booked_on)
      select x.ticket_id, md5('service' || x.k)::uuid, 'Bench service ' || x.k, x.k < 3, md5('staff' || x.b || '-' || x.s)::uuid, ${LEVEL},
        p.price, x.discount, p.price - x.discount, x.d
      from (
        select t.id as ticket_id, t.business_date as d, b.b, floor(random() * 8)::int as k, floor(random() * ${STAFF_PER_BRANCH})::int as s,
          case when random() < 0.05 then 10 else 0 end as discount
        from tickets t join bench_branches b on b.id = t.branch_id
        cross join lateral generate_series(1, case when random() < 0.9 then 2 else 1 end + 0 * t.number) g
      ) x
      join (values (0, 120.00), (1, 165.00), (2, 95.00), (3, 65.00), (4, 55.00), (5, 45.00), (6, 35.00), (7, 30.00)) p(k, price) on p.k = x.k`,
  );
  await step(
    'bowls',
    sql`
      insert into bowls (service_line_id, mixed_by_staff_id, total_grams, cost, waste_grams, waste_cost)
      select l.id, l.staff_id, 90, round((4 + random() * 14)::numeric, 2), 5, 0.5 from ticket_service_lines l where l.is_colour`,
  );
  await step(
    'retail lines',
    sql`
      insert into retail_lines (ticket_id, product_id, product_name, quantity, unit_price, amount, tax_rate, tax, seller_staff_id, booked_on)
      select x.id, md5('product' || x.k)::uuid, 'Bench product ' || x.k, x.q, 24, 24 * x.q, 0.0825, round(24 * x.q * 0.0825, 2), md5('staff' || x.b || '-' || x.s)::uuid, x.d
      from (
        select t.id, t.business_date as d, b.b, 4 + floor(random() * 4)::int as k, case when random() < 0.2 then 2 else 1 end as q,
          floor(random() * ${STAFF_PER_BRANCH})::int as s, random() as r
        from tickets t join bench_branches b on b.id = t.branch_id
      ) x where x.r < 0.25`,
  );
  await step(
    'tips',
    sql`
      insert into tips (ticket_id, staff_id, amount, booked_on)
      select x.id, md5('staff' || x.b || '-' || x.s)::uuid, x.amount, x.d
      from (
        select t.id, t.business_date as d, b.b, floor(random() * ${STAFF_PER_BRANCH})::int as s, round((5 + random() * 20)::numeric, 2) as amount, random() as r
        from tickets t join bench_branches b on b.id = t.branch_id
      ) x where x.r < 0.6`,
  );
  // Each closed ticket paid in full by card.
  await step(
    'payments',
    sql`
      insert into payments (ticket_id, method, kind, status, amount, idempotency_key, booked_on, taken_by_id)
      select t.id, 'card', 'charge', 'succeeded', coalesce(l.amount, 0) + coalesce(r.amount, 0) + coalesce(x.amount, 0), 'bench-' || t.id, t.business_date, ${OWNER}
      from tickets t
      left join (select ticket_id, sum(price) as amount from ticket_service_lines group by ticket_id) l on l.ticket_id = t.id
      left join (select ticket_id, sum(amount + tax) as amount from retail_lines group by ticket_id) r on r.ticket_id = t.id
      left join (select ticket_id, sum(amount) as amount from tips group by ticket_id) x on x.ticket_id = t.id
      where t.status = 'closed'`,
  );
  // About one service in a thousand refunded one to six days later, to the card.
  await step(
    'refunds',
    sql`
      with refunded as (
        select l.*, least(l.booked_on + (1 + floor(random() * 6))::int, ${last}::date) as refund_on
        from ticket_service_lines l join tickets t on t.id = l.ticket_id where t.status = 'closed' and random() < 0.001
      ),
      lines as (
        insert into ticket_service_lines (ticket_id, service_id, service_name, is_colour, staff_id, level_id, list_price, discount, price, booked_on, refund_of_line_id)
        select ticket_id, service_id, service_name, is_colour, staff_id, level_id, -list_price, -discount, -price, refund_on, id from refunded
        returning ticket_id, price, booked_on
      )
      insert into payments (ticket_id, method, kind, status, amount, idempotency_key, booked_on, taken_by_id)
      select ticket_id, 'card', 'refund', 'succeeded', price, 'bench-refund-' || ticket_id || '-' || row_number() over (), booked_on, ${OWNER} from lines`,
  );
  await step(
    'day closes',
    sql`
      insert into day_closes (organisation_id, branch_id, business_date, expected_cash, counted_cash, cash_variance, card_total_tickets, card_total_processor, card_variance, closed_by_id)
      select ${ORG}, b.id, d.d, 0, 0, 0, 0, 0, 0, ${OWNER} from bench_branches b cross join bench_days d`,
  );
  await step(
    'adjustments',
    sql`
      insert into adjustments (organisation_id, branch_id, booked_on, staff_id, category, amount, reason, created_by_id)
      select ${ORG}, md5('branch' || x.b)::uuid, x.d, md5('staff' || x.b || '-' || x.s)::uuid,
        (array['service', 'retail', 'tip', 'cash'])[1 + x.c]::adjustment_category, x.amount, 'Correction of an earlier day', ${OWNER}
      from (
        select floor(random() * ${BRANCHES})::int as b, ${first}::date + floor(random() * 365)::int as d, floor(random() * ${STAFF_PER_BRANCH})::int as s,
          floor(random() * 4)::int as c, round((random() * 80 - 30)::numeric, 2) as amount
        from generate_series(1, 600)
      ) x`,
  );
  // Every stylist 6 to 9 hours on each open day at their branch.
  await step(
    'timesheets',
    sql`
      insert into timesheet_entries (organisation_id, staff_id, branch_id, work_date, hours, updated_by_id)
      select ${ORG}, md5('staff' || b.b || '-' || s)::uuid, b.id, d.d, 6 + floor(random() * 13) * 0.25, ${OWNER}
      from bench_branches b cross join generate_series(0, ${STAFF_PER_BRANCH - 1}) s cross join bench_days d`,
  );
  // Biweekly periods from the first Sunday; every finished period's run approved, with a line per stylist.
  await step(
    'payroll',
    sql`
      insert into pay_schedules (organisation_id, frequency, anchor_date, workweek_starts_on)
        values (${ORG}, 'biweekly', ${first}::date + ((7 - extract(dow from ${first}::date)::int) % 7), 0)`,
    sql`
      insert into pay_periods (organisation_id, start_date, end_date)
        select ${ORG}, s::date, s::date + 13 from generate_series(${first}::date + ((7 - extract(dow from ${first}::date)::int) % 7), ${last}::date - 13, interval '14 days') s`,
    sql`
      insert into pay_plans (id, organisation_id, name) values (${PLAN}, ${ORG}, 'Bench plan')`,
    sql`
      insert into pay_plan_versions (id, plan_id, effective_from, tier_mode, tiers, product_charge_mode, retail_rate, created_by_id)
        values (${PLAN_VERSION}, ${PLAN}, ${first}::date, 'marginal', '[{"from":"0","rate":"0.40"}]', 'actual-cost', 0.10, ${OWNER})`,
    sql`
      insert into payroll_runs (organisation_id, period_id, status, started_by_id, approved_by_id, approved_at, completed_at)
        select ${ORG}, id, 'approved', ${OWNER}, ${OWNER}, now(), now() from pay_periods where organisation_id = ${ORG}`,
    sql`
      insert into payroll_lines (run_id, organisation_id, staff_id, branch_id, staff_name, branch_name, plan_version_id, input, result, hours,
          service_revenue, product_charge, commissionable_revenue, service_commission, retail_commission, hourly_pay, tips, minimum_wage_top_up, overtime_premium, gross_pay)
        select r.id, ${ORG}, s.id, s.home_branch_id, s.display_name, '', ${PLAN_VERSION}, '{}', '{}', 80, x.revenue, x.charge, x.revenue - x.charge,
          round((x.revenue - x.charge) * 0.4, 2), 30, 0, 200, 0, 0, round((x.revenue - x.charge) * 0.4, 2) + 230
        from (
          select r.id as run_id, s.id as staff_id, round((3000 + random() * 3000)::numeric, 2) as revenue, round((150 + random() * 200)::numeric, 2) as charge
          from payroll_runs r cross join staff s where r.organisation_id = ${ORG} and s.organisation_id = ${ORG}
        ) x join payroll_runs r on r.id = x.run_id join staff s on s.id = x.staff_id`,
    sql`
      drop table bench_branches`,
    sql`
      drop table bench_days`,
  );
  const [counts] = rowsOf<Counts>(
    await database.db.execute(sql`
      select (select count(*)::int from tickets) as tickets, (select count(*)::int from ticket_service_lines) as lines, (select count(*)::int from bowls) as bowls,
        (select count(*)::int from retail_lines) as retail, (select count(*)::int from tips) as tips, (select count(*)::int from payments) as payments,
        (select count(*)::int from timesheet_entries) as hours`),
  );
  return counts!;
}

/** A new database on the server for this run (dropped afterwards), or the kept one of that name. */
async function serverDatabase(serverUrl: string, kept: string | null): Promise<{ url: string; drop: () => Promise<void> }> {
  const { default: pg } = await import('pg');
  const name = kept ?? `tressury_compare_bench_${Date.now()}`;
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`COMPARE_BENCH_KEEP must be a plain database name, not ${name}`);
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  const exists = (await admin.query('select 1 from pg_database where datname = $1', [name])).rowCount === 1;
  if (!exists) await admin.query(`create database ${name}`);
  await admin.end();
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      if (kept) return;
      const client = new pg.Client({ connectionString: serverUrl });
      await client.connect();
      await client.query(`drop database if exists ${name} with (force)`);
      await client.end();
    },
  };
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(1);
});
