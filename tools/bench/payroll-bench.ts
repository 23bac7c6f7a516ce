// Payroll at scale (issue 5): 60 branches, 1,500 staff and two weeks of closed tickets (about 120,000
// service lines with bowls), loaded straight into the tables; then the built API computes the draft and
// writes the workbook over HTTP while its resident memory is sampled. Prints its figures; it is not a timed test.
//
//   npm run build && npm run bench:payroll                    PGlite in a temporary directory
//   DATABASE_URL=postgres://… npm run bench:payroll           a fresh database on that server (dropped afterwards)
//   bash tools/test/with-postgres.sh bash -c 'DATABASE_URL=$TEST_DATABASE_URL npm run bench:payroll'
//                                                             the same on a throwaway local cluster
import { randomUUID } from 'node:crypto';
import { type ChildProcess, spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import pg from 'pg';

const BRANCHES = 60;
const STAFF_PER_BRANCH = 25;
const DAYS = 14;
const OPEN_WEEKDAYS = new Set([2, 3, 4, 5, 6, 0]); // closed on Mondays, like the demo group

type Row = Record<string, unknown>;
type Api = { process: ChildProcess; pid: number; base: string };
/** Where the API keeps its data: a PGlite directory, or a database on a PostgreSQL server. */
type Target = { engine: 'PGlite' | 'PostgreSQL'; env: Record<string, string>; open: () => Promise<Client>; drop: () => Promise<void> };
type Client = { query: (text: string, params?: unknown[]) => Promise<{ rows: Row[] }>; close: () => Promise<void> };

const root = resolve(import.meta.dirname, '../..');
const print = (line: string) => process.stdout.write(`${line}\n`);
const seconds = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
/** A process's resident set now, from Linux /proc, in MB. */
const rssMb = (pid: number) => {
  const kb = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1];
  return kb ? Number(kb) / 1024 : NaN;
};

/** CPU time a process has used so far (user and system, Linux /proc), in ms: steadier than wall time on a busy machine. */
const cpuMs = (pid: number) => {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100; // utime and stime, in ticks of 1/100 s
};

/** Samples the API's resident set every 50 ms; `peak()` is the highest seen since the last `reset()`. */
function rssSampler(pid: number) {
  let highest = 0;
  const timer = setInterval(() => (highest = Math.max(highest, rssMb(pid))), 50);
  return {
    reset: () => (highest = rssMb(pid)),
    peak: () => Math.max(highest, rssMb(pid)).toFixed(0),
    stop: () => clearInterval(timer),
  };
}
const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

// A small seeded generator so every run builds the same organisation.
let state = 20_261_202;
const random = () => ((state = (Math.imul(state, 1_664_525) + 1_013_904_223) >>> 0) / 2 ** 32);
const pick = <T>(items: T[]): T => items[Math.floor(random() * items.length)]!;
const money = (min: number, max: number) => (Math.round((min + random() * (max - min)) * 100) / 100).toFixed(2);

async function main(): Promise<void> {
  if (!existsSync(resolve(root, 'apps/api/dist/main.js'))) throw new Error('Build first: npm run build');
  const server = process.env.DATABASE_URL?.trim() || null;
  const target = server ? await serverTarget(server) : pgliteTarget();
  try {
    await bench(target);
  } finally {
    await target.drop();
  }
}

async function bench(target: Target): Promise<void> {
  const started = performance.now();
  // The organisation, branches and sign-ins come from the API's own basic seed; then the API stops and
  // the bench loads the rest straight into the same database.
  let api = await startApi(target.env);
  await stopApi(api);
  const client = await target.open();
  const one = async (text: string) => (await client.query(text)).rows[0]!;
  const insert = async (table: string, rows: Row[]) => {
    const columns = Object.keys(rows[0]!).map((c) => `"${c}"`).join(', ');
    for (let i = 0; i < rows.length; i += 2000) {
      await client.query(`insert into ${table} (${columns}) select ${columns} from json_populate_recordset(null::${table}, $1::json)`, [JSON.stringify(rows.slice(i, i + 2000))]);
    }
  };

  const org = await one('select id, name from organisations limit 1');
  const organisationId = org.id as string;
  const owner = await one("select id from users where role = 'owner' limit 1");
  const ownerId = owner.id as string;
  const levelId = randomUUID();
  await insert('levels', [{ id: levelId, organisation_id: organisationId, name: 'Bench stylist', rank: 1 }]);
  const serviceIds = { cut: randomUUID(), colour: randomUUID() };
  await insert('services', [
    { id: serviceIds.cut, organisation_id: organisationId, name: 'Bench cut', category: 'cut', duration_minutes: 45, is_colour: false },
    { id: serviceIds.colour, organisation_id: organisationId, name: 'Bench colour', category: 'colour', duration_minutes: 90, is_colour: true },
  ]);
  const productId = randomUUID();
  await insert('products', [
    { id: productId, organisation_id: organisationId, code: 'BENCH-RT-1', name: 'Bench shampoo', kind: 'retail', container_size: '300', container_unit: 'mL', container_cost: '6.00', cost_per_gram: '0.020000', retail_price: '24.00' },
  ]);

  // Two weeks ending a week ago, so every day is in the past and closed.
  const firstDay = addDays(new Date().toISOString().slice(0, 10), -21);
  const counts = { tickets: 0, serviceLines: 0, bowls: 0, retailLines: 0, tips: 0, dayCloses: 0, timesheet: 0 };
  const allStaff: string[] = [];
  for (let b = 0; b < BRANCHES; b++) {
    const branchId = randomUUID();
    await insert('branches', [
      {
        id: branchId,
        organisation_id: organisationId,
        name: `Bench branch ${String(b + 1).padStart(2, '0')}`,
        time_zone: 'America/Chicago',
        currency: 'USD',
        minimum_wage: '7.25',
        overtime_after_hours: '40',
        overtime_multiplier: '1.5',
        commission_exemption: b % 2 === 0,
        retail_tax_rate: '0.0825',
      },
    ]);
    const staffIds = Array.from({ length: STAFF_PER_BRANCH }, () => randomUUID());
    allStaff.push(...staffIds);
    await insert(
      'staff',
      staffIds.map((id, i) => ({ id, organisation_id: organisationId, home_branch_id: branchId, display_name: `Stylist ${b + 1}-${i + 1}`, level_id: levelId })),
    );
    const tickets: Row[] = [];
    const lines: Row[] = [];
    const bowls: Row[] = [];
    const retail: Row[] = [];
    const tips: Row[] = [];
    const closes: Row[] = [];
    const hours: Row[] = [];
    for (let d = 0; d < DAYS; d++) {
      const date = addDays(firstDay, d);
      if (!OPEN_WEEKDAYS.has(new Date(`${date}T00:00:00Z`).getUTCDay())) continue;
      let number = 0;
      closes.push({
        id: randomUUID(), organisation_id: organisationId, branch_id: branchId, business_date: date, expected_cash: '0', counted_cash: '0', cash_variance: '0',
        card_total_tickets: '0', card_total_processor: '0', card_variance: '0', closed_by_id: ownerId,
      });
      for (const staffId of staffIds) {
        hours.push({ id: randomUUID(), organisation_id: organisationId, staff_id: staffId, branch_id: branchId, work_date: date, hours: pick(['7.5', '8', '8.5', '9']), updated_by_id: ownerId });
        const served = random() < 2 / 3 ? 7 : 6;
        for (let s = 0; s < served; s++) {
          const ticketId = randomUUID();
          tickets.push({ id: ticketId, organisation_id: organisationId, branch_id: branchId, business_date: date, number: ++number, status: 'closed', opened_by_id: ownerId });
          const colour = random() < 0.45;
          const lineId = randomUUID();
          const price = colour ? money(90, 240) : money(35, 85);
          const assisted = colour && random() < 0.1;
          lines.push({
            id: lineId, ticket_id: ticketId, service_id: colour ? serviceIds.colour : serviceIds.cut, service_name: colour ? 'Bench colour' : 'Bench cut', is_colour: colour,
            staff_id: staffId, level_id: levelId, assistant_staff_id: assisted ? pick(staffIds.filter((x) => x !== staffId)) : null, assistant_share: assisted ? '0.25' : null,
            list_price: price, discount: '0', price, booked_on: date,
          });
          if (colour) {
            for (let k = random() < 0.5 ? 1 : 2; k > 0; k--) {
              bowls.push({ id: randomUUID(), service_line_id: lineId, mixed_by_staff_id: staffId, total_grams: '90', cost: money(4, 18), waste_grams: '5', waste_cost: '0.60' });
            }
          }
          if (random() < 0.15) {
            const amount = money(18, 48);
            retail.push({ id: randomUUID(), ticket_id: ticketId, product_id: productId, product_name: 'Bench shampoo', quantity: 1, unit_price: amount, amount, tax_rate: '0.0825', tax: '1.50', seller_staff_id: staffId, booked_on: date });
          }
          if (random() < 0.5) tips.push({ id: randomUUID(), ticket_id: ticketId, staff_id: staffId, amount: money(3, 25), booked_on: date });
        }
      }
    }
    await insert('tickets', tickets);
    await insert('ticket_service_lines', lines);
    await insert('bowls', bowls);
    if (retail.length) await insert('retail_lines', retail);
    await insert('tips', tips);
    await insert('day_closes', closes);
    await insert('timesheet_entries', hours);
    counts.tickets += tickets.length;
    counts.serviceLines += lines.length;
    counts.bowls += bowls.length;
    counts.retailLines += retail.length;
    counts.tips += tips.length;
    counts.dayCloses += closes.length;
    counts.timesheet += hours.length;
  }
  const planId = randomUUID();
  await insert('pay_schedules', [{ organisation_id: organisationId, frequency: 'biweekly', anchor_date: firstDay, workweek_starts_on: 0 }]);
  await insert('pay_plans', [{ id: planId, organisation_id: organisationId, name: 'Bench plan' }]);
  await insert('pay_plan_versions', [
    {
      id: randomUUID(), plan_id: planId, effective_from: firstDay, tier_mode: 'marginal', tiers: [{ from: '0', rate: '0.35' }, { from: '3000', rate: '0.42' }],
      product_charge_mode: 'actual-cost', product_charge_markup: '0.1', retail_rate: '0.1', created_by_id: ownerId,
    },
  ]);
  await insert('pay_plan_assignments', allStaff.map((staffId) => ({ id: randomUUID(), organisation_id: organisationId, staff_id: staffId, plan_id: planId, effective_from: firstDay, created_by_id: ownerId })));
  // A server's autovacuum gathers planner statistics soon after a bulk load; on PGlite the API gathers
  // them when it opens the database (apps/api/src/database/planner-statistics.ts).
  await client.query(target.engine === 'PostgreSQL' ? 'analyze' : 'checkpoint');
  await client.close();
  const loaded = performance.now();
  print(
    `Loaded ${BRANCHES} branches, ${allStaff.length} staff, ${counts.tickets} tickets, ${counts.serviceLines} service lines, ${counts.bowls} bowls, ` +
      `${counts.retailLines} retail lines, ${counts.tips} tips, ${counts.timesheet} timesheet days into ${target.engine} in ${seconds(loaded - started)}`,
  );
  api = await startApi(target.env);
  const base = api.base;
  const memory = rssSampler(api.pid);
  const { DEMO_PASSWORD, demoBusiness } = await import('@tressury/fixtures');

  const login = async (role: string) => {
    const user = demoBusiness.users.find((u) => u.role === role)!;
    const response = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: user.email, password: DEMO_PASSWORD }) });
    return `Bearer ${((await response.json()) as { accessToken: string }).accessToken}`;
  };
  const accountantAuth = await login('accountant');
  const call = async (method: string, path: string, authorization: string, body?: unknown): Promise<Response> => {
    const send = () =>
      fetch(`${base}/api${path}`, { method, headers: { authorization, 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
    // While PGlite works on the API's event loop, the server can drop an idle keep-alive socket just as
    // a poll reuses it; a GET is safe to send again.
    const response = await send().catch((error: unknown) => {
      if (method !== 'GET') throw error;
      return send();
    });
    if (!response.ok) throw new Error(`${method} ${path}: ${response.status} ${await response.text()}`);
    return response;
  };

  const period = (await (await call('POST', '/payroll/periods', accountantAuth, { date: firstDay })).json()) as { id: string };

  // Measured once the API is idle: on its first start over the loaded data it builds the comparison's read models.
  const idleRss = rssMb(api.pid).toFixed(0);
  memory.reset();
  const runCpu = cpuMs(api.pid);
  const runStarted = performance.now();
  let run = (await (await call('POST', `/payroll/periods/${period.id}/runs`, accountantAuth)).json()) as { id: string; status: string; processedStaff: number; totalStaff: number; error: string | null };
  const progress: string[] = [];
  while (run.status === 'computing') {
    await new Promise((r) => setTimeout(r, 250));
    run = (await (await call('GET', `/payroll/runs/${run.id}`, accountantAuth)).json()) as typeof run;
    progress.push(`${run.processedStaff}/${run.totalStaff}`);
  }
  const runDone = performance.now();
  const runCpuUsed = cpuMs(api.pid) - runCpu;
  if (run.status !== 'draft') throw new Error(`run ended ${run.status}: ${run.error}`);
  print(`Progress seen while polling: ${[...new Set(progress)].slice(0, 8).join(', ')}${progress.length > 8 ? ', …' : ''}`);
  const runRss = memory.peak();

  await call('POST', `/payroll/runs/${run.id}/approve`, accountantAuth);
  memory.reset();
  const workbookCpu = cpuMs(api.pid);
  const workbookStarted = performance.now();
  const workbook = Buffer.from(await (await call('GET', `/payroll/runs/${run.id}/workbook`, accountantAuth)).arrayBuffer());
  const workbookDone = performance.now();
  const workbookCpuUsed = cpuMs(api.pid) - workbookCpu;
  const workbookRss = memory.peak();
  memory.stop();

  print('');
  print(`${target.engine}, ${run.totalStaff} payroll lines; load average ${loadavg().map((l) => l.toFixed(1)).join(' ')} on ${availableParallelism()} cores`);
  print(`payroll run (compute and store the draft): ${seconds(runDone - runStarted)} (API CPU ${seconds(runCpuUsed)})   [issue 5 target: under 10 s]`);
  print(`workbook (${(workbook.length / 1024 / 1024).toFixed(1)} MB .xlsx):          ${seconds(workbookDone - workbookStarted)} (API CPU ${seconds(workbookCpuUsed)})   [target: under 5 s]`);
  print(`API resident memory: ${idleRss} MB idle before the run, peak ${runRss} MB during it, peak ${workbookRss} MB during the workbook   [target: under 400 MB]`);
  await stopApi(api);
}

function pgliteTarget(): Target {
  const dataDir = mkdtempSync(join(tmpdir(), 'tressury-payroll-bench-'));
  return {
    engine: 'PGlite',
    env: { TRESSURY_DATA_DIR: dataDir, DATABASE_URL: '' },
    open: async () => {
      const { PGlite } = await import('@electric-sql/pglite');
      const client = await PGlite.create(dataDir);
      return { query: (text, params) => client.query<Row>(text, params), close: () => client.close() };
    },
    drop: async () => rmSync(dataDir, { recursive: true, force: true }),
  };
}

async function serverTarget(serverUrl: string): Promise<Target> {
  const name = `tressury_payroll_bench_${process.pid}`;
  const admin = async (statement: string) => {
    const client = new pg.Client({ connectionString: serverUrl });
    await client.connect();
    await client.query(statement).finally(() => client.end());
  };
  await admin(`create database ${name}`);
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return {
    engine: 'PostgreSQL',
    env: { DATABASE_URL: url.toString() },
    open: async () => {
      const client = new pg.Client({ connectionString: url.toString() });
      await client.connect();
      return { query: (text, params) => client.query<Row>(text, params), close: () => client.end() };
    },
    drop: () => admin(`drop database if exists ${name} with (force)`),
  };
}

// The built API in its own Node process (never under tsx: no decorator metadata, and its CommonJS
// require hook would load a second @nestjs/core for the throttler).
const children = new Set<ChildProcess>();

async function startApi(databaseEnv: Record<string, string>): Promise<Api> {
  const port = await new Promise<number>((done) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port: free } = probe.address() as AddressInfo;
      probe.close(() => done(free));
    });
  });
  const child = spawn(process.execPath, [resolve(root, 'apps/api/dist/main.js')], {
    env: { ...process.env, ...databaseEnv, TRESSURY_SEED_DEMO: 'basic', LOGIN_THROTTLE_LIMIT: '10000', PORT: String(port), HOST: '127.0.0.1' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  children.add(child);
  child.once('exit', (code, signal) => {
    children.delete(child);
    if (code !== 0) process.stderr.write(`The API process ended with ${signal ?? `exit code ${code}`}\n`);
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`the API exited with ${child.exitCode}`);
    const ok = await fetch(`${base}/api/health`).then((r) => r.ok, () => false);
    if (ok) return { process: child, pid: child.pid!, base };
    await new Promise((r) => setTimeout(r, 100));
  }
  await stopApi({ process: child, pid: child.pid!, base });
  throw new Error('the API did not start');
}

async function stopApi(api: Api): Promise<void> {
  const exited = new Promise((done) => api.process.once('exit', done));
  api.process.kill('SIGTERM');
  await exited;
}

main().catch((error: unknown) => {
  console.error(error);
  for (const child of children) child.kill('SIGKILL');
  process.exit(1);
});
