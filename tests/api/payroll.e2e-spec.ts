import { computePay, type PayInput, type PayResult } from '@tressury/domain';
import Big from 'big.js';
import { sql } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { HyperFormula, type RawCellContent } from 'hyperformula';
import { startTestApp, type TestApp } from './support/test-app.js';

type Role = Parameters<TestApp['tokenFor']>[0];
type Run = { id: string; status: string; totalStaff: number; processedStaff: number; startDate: string; endDate: string; error: string | null };
type Line = { id: string; staffId: string; staffName: string; branchId: string; branchName: string; hours: string; grossPay: string } & Record<string, string>;

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const binary = (res: import('supertest').Response, callback: (error: Error | null, body: Buffer) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => callback(null, Buffer.concat(chunks)));
};

const SUMMARY_MONEY = [
  'serviceRevenue',
  'productCharge',
  'commissionableRevenue',
  'serviceCommission',
  'retailCommission',
  'hourlyPay',
  'tips',
  'minimumWageTopUp',
  'overtimePremium',
  'grossPay',
] as const;

// Two invented plans: tiers, product charge and retail rate are common practice in the trade, not a source's figures.
const STANDARD = {
  tierMode: 'marginal',
  tiers: [
    { from: '0', rate: '0.35' },
    { from: '1500', rate: '0.40' },
    { from: '3000', rate: '0.45' },
  ],
  productCharge: { mode: 'actual-cost', markup: '0.10' },
  retailRate: '0.10',
} as const;
const SENIOR = {
  tierMode: 'whole-period',
  tiers: [
    { from: '0', rate: '0.38' },
    { from: '2500', rate: '0.45' },
  ],
  productCharge: { mode: 'percent-of-price', value: '0.08' },
  retailRate: '0.12',
  hourlyRate: '2.50',
} as const;

describe('payroll over the demo business', () => {
  let t: TestApp;
  const auth = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const query = async <T>(statement: ReturnType<typeof sql>) => rowsOf<T>(await t.database.db.execute(statement));
  // A fortnight starting five weeks ago: every day in it is closed in the demo.
  const anchor = addDays(new Date().toISOString().slice(0, 10), -35);
  const end = addDays(anchor, 13);
  let periodId: string;
  let run: Run;
  let planOf: Map<string, typeof STANDARD | typeof SENIOR>;
  let evilStaffId: string;

  const poll = async (runId: string): Promise<Run> => {
    for (let i = 0; i < 600; i++) {
      const current = (await t.http().get(`/api/payroll/runs/${runId}`).set('Authorization', await auth('accountant')).expect(200)).body as Run;
      expect(current.processedStaff).toBeLessThanOrEqual(Math.max(current.totalStaff, 0));
      if (current.status !== 'computing') return current;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    throw new Error('the run did not finish');
  };

  beforeAll(async () => {
    // Groups of four staff: the run reads, computes and stores many groups, and assistants' shares cross them.
    t = await startTestApp({ TRESSURY_SEED_DEMO: 'tickets', PAYROLL_GROUP_SIZE: '4' });
  }, 180_000);
  afterAll(() => t.close());

  it('sets the schedule, plans and assignments (owner only)', async () => {
    await t.http().put('/api/payroll/schedule').set('Authorization', await auth('manager')).send({ frequency: 'biweekly', anchorDate: anchor, workweekStartsOn: 0 }).expect(403);
    await t.http().put('/api/payroll/schedule').set('Authorization', await auth('owner')).send({ frequency: 'biweekly', anchorDate: anchor, workweekStartsOn: 0 }).expect(200);

    const bad = await t
      .http()
      .post('/api/payroll/plans')
      .set('Authorization', await auth('owner'))
      .send({ name: 'Broken', terms: { ...STANDARD, effectiveFrom: anchor, tiers: [{ from: '100', rate: '0.3' }] } })
      .expect(400);
    expect(bad.body.details.map((d: { field: string }) => d.field)).toEqual(['terms.tiers[0].from']);
    const offPeriod = await t
      .http()
      .post('/api/payroll/plans')
      .set('Authorization', await auth('owner'))
      .send({ name: 'Broken', terms: { ...STANDARD, effectiveFrom: addDays(anchor, 1) } })
      .expect(400);
    expect(offPeriod.body.details[0].field).toBe('terms.effectiveFrom');
    const refused = await t
      .http()
      .post('/api/payroll/plans')
      .set('Authorization', await auth('accountant'))
      .send({ name: 'Standard', terms: { ...STANDARD, effectiveFrom: anchor } })
      .expect(403);
    expect(refused.body.message).toBe('An accountant may not create pay plans.');
    const [plans] = await query<{ n: number }>(sql`select count(*)::int as n from pay_plans`);
    expect(plans!.n).toBe(0);

    const standard = (await t.http().post('/api/payroll/plans').set('Authorization', await auth('owner')).send({ name: 'Standard', terms: { ...STANDARD, effectiveFrom: anchor } }).expect(201)).body;
    const senior = (await t.http().post('/api/payroll/plans').set('Authorization', await auth('owner')).send({ name: 'Senior', terms: { ...SENIOR, effectiveFrom: anchor } }).expect(201)).body;
    // Terms from the period after this one must not reach this period's run.
    await t
      .http()
      .post(`/api/payroll/plans/${standard.id}/versions`)
      .set('Authorization', await auth('owner'))
      .send({ ...STANDARD, effectiveFrom: addDays(anchor, 14), retailRate: '0.99' })
      .expect(201);

    const staff = await query<{ id: string }>(sql`select id from staff order by display_name`);
    planOf = new Map();
    for (const [i, member] of staff.entries()) {
      const plan = i % 3 === 0 ? senior : standard;
      await t.http().post(`/api/payroll/plans/${plan.id}/assignments`).set('Authorization', await auth('owner')).send({ staffId: member.id, effectiveFrom: anchor }).expect(201);
      planOf.set(member.id, plan === senior ? SENIOR : STANDARD);
    }
    const listed = (await t.http().get('/api/payroll/plans').set('Authorization', await auth('accountant')).expect(200)).body;
    expect(listed.map((p: { name: string }) => p.name)).toEqual(['Senior', 'Standard']);
    await t.http().get('/api/payroll/plans').set('Authorization', await auth('front_desk')).expect(403);
  });

  it('creates the period and takes hours from an uploaded timesheet', async () => {
    const period = (await t.http().post('/api/payroll/periods').set('Authorization', await auth('accountant')).send({ date: addDays(anchor, 3) }).expect(201)).body;
    expect(period).toMatchObject({ startDate: anchor, endDate: end, runId: null });
    periodId = period.id;
    const listed = (await t.http().get('/api/payroll/periods').set('Authorization', await auth('stylist')).expect(200)).body;
    expect(listed.periods.map((p: { id: string }) => p.id)).toEqual([periodId]);
    expect(listed.next).toEqual({ startDate: addDays(anchor, 14), endDate: addDays(anchor, 27) });

    // Nine and a half hours on every day a staff member served a client: six such days in a week is overtime.
    const days = await query<{ staffId: string; date: string }>(sql`
      select distinct l.staff_id as "staffId", l.booked_on::text as date from ticket_service_lines l
      where l.booked_on between ${anchor} and ${end} order by 1, 2`);
    const csv = ['staff_id,date,hours', ...days.map((d, i) => `${d.staffId},${d.date},${i % 7 === 0 ? '4.25' : '9.5'}`)].join('\n');
    const preview = await t
      .http()
      .post(`/api/payroll/periods/${periodId}/timesheets/import`)
      .set('Authorization', await auth('owner'))
      .attach('file', Buffer.from(csv), { filename: 'hours.csv', contentType: 'text/csv' })
      .expect(200);
    expect(preview.body).toMatchObject({ committed: false, invalidRows: 0, validRows: days.length });
    const [before] = await query<{ n: number }>(sql`select count(*)::int as n from timesheet_entries`);
    expect(before!.n).toBe(0);
    await t
      .http()
      .post(`/api/payroll/periods/${periodId}/timesheets/import?commit=true`)
      .set('Authorization', await auth('owner'))
      .attach('file', Buffer.from(csv), { filename: 'hours.csv', contentType: 'text/csv' })
      .expect(200);
    const entries = (await t.http().get(`/api/payroll/periods/${periodId}/timesheets`).set('Authorization', await auth('accountant')).expect(200)).body;
    expect(entries).toHaveLength(days.length);
  });

  it('refuses a timesheet with bad rows as a whole and names each row', async () => {
    const [outsider] = await query<{ id: string }>(sql`
      select s.id from staff s join branches b on b.id = s.home_branch_id where b.name = 'Harbor Point' limit 1`);
    const [mine] = await query<{ id: string }>(sql`
      select s.id from staff s join branches b on b.id = s.home_branch_id where b.name = 'Riverside' limit 1`);
    const csv = [
      'staff_id,date,hours',
      `${mine!.id},${anchor},8`,
      `00000000-0000-4000-8000-000000000000,${anchor},8`,
      `${outsider!.id},${anchor},8`,
      `${mine!.id},${addDays(end, 1)},8`,
      `${mine!.id},${addDays(anchor, 1)},-2`,
      `${mine!.id},${addDays(anchor, 2)},25`,
    ].join('\n');
    const [before] = await query<{ n: string }>(sql`select count(*)::int as n, sum(hours)::text as total from timesheet_entries`);
    const response = await t
      .http()
      .post(`/api/payroll/periods/${periodId}/timesheets/import?commit=true`)
      .set('Authorization', await auth('manager'))
      .attach('file', Buffer.from(csv), { filename: 'hours.csv', contentType: 'text/csv' })
      .expect(400);
    const problems = response.body.details as { row: number; field: string }[];
    // Row 4: a Harbor Point stylist is outside this manager's branches, so unknown to them.
    expect(problems.map((p) => [p.row, p.field])).toEqual([
      [3, 'staff_id'],
      [4, 'staff_id'],
      [5, 'date'],
      [6, 'hours'],
      [7, 'hours'],
    ]);
    expect(response.body.message).toMatch(/rows 3, 4, 5, 6, 7/);
    const [after] = await query<{ n: string }>(sql`select count(*)::int as n, sum(hours)::text as total from timesheet_entries`);
    expect(after).toEqual(before);

    const single = await t.http().put('/api/payroll/timesheets').set('Authorization', await auth('manager')).send({ staffId: mine!.id, date: anchor, hours: '24.5' }).expect(400);
    expect(single.body.details.map((d: { field: string }) => d.field)).toEqual(['hours']);
    await t.http().put('/api/payroll/timesheets').set('Authorization', await auth('manager')).send({ staffId: outsider!.id, date: anchor, hours: '8' }).expect(404);
  });

  it('computes the run in the background and reports progress', async () => {
    // A name a spreadsheet would read as a formula, to check the export neutralises it.
    [{ id: evilStaffId }] = await query<{ id: string }>(sql`
      select staff_id as id from ticket_service_lines where booked_on between ${anchor} and ${end} limit 1`) as [{ id: string }];
    await t.http().patch(`/api/staff/${evilStaffId}`).set('Authorization', await auth('owner')).send({ displayName: '=HYPERLINK("http://x.example","Pay")' }).expect(200);

    await t.http().post(`/api/payroll/periods/${periodId}/runs`).set('Authorization', await auth('manager')).expect(403);
    const started = await t.http().post(`/api/payroll/periods/${periodId}/runs`).set('Authorization', await auth('accountant')).expect(202);
    expect(started.body.status).toBe('computing');
    run = await poll(started.body.id);
    expect(run).toMatchObject({ status: 'draft', error: null });
    expect(run.processedStaff).toBe(run.totalStaff);
    expect(run.totalStaff).toBeGreaterThan(5);

    // Re-running a draft replaces it.
    const again = await t.http().post(`/api/payroll/periods/${periodId}/runs`).set('Authorization', await auth('owner')).expect(202);
    run = await poll(again.body.id);
    expect(run.status).toBe('draft');
    const runs = await query<{ id: string }>(sql`select id from payroll_runs`);
    expect(runs).toEqual([{ id: run.id }]);
  }, 120_000);

  it('equals an independent recomputation from the database with computePay', async () => {
    // Written by hand, apart from the API's reader: closed tickets on closed days, bowls summed per line.
    const services = await query<{ id: string; staffId: string; assistantId: string | null; assistantShare: string | null; price: string; isColour: boolean; date: string; cost: string }>(sql`
      select l.id, l.staff_id as "staffId", l.assistant_staff_id as "assistantId", l.assistant_share::text as "assistantShare",
             l.price::text as price, l.is_colour as "isColour", l.booked_on::text as date, coalesce(sum(b.cost), 0)::text as cost
      from ticket_service_lines l
      join tickets t on t.id = l.ticket_id and t.status = 'closed'
      join day_closes d on d.branch_id = t.branch_id and d.business_date = l.booked_on
      left join bowls b on b.service_line_id = l.id
      where l.booked_on between ${anchor} and ${end}
      group by l.id`);
    const retail = await query<{ id: string; staffId: string; date: string; amount: string }>(sql`
      select r.id, r.seller_staff_id as "staffId", r.booked_on::text as date, r.amount::text as amount
      from retail_lines r join tickets t on t.id = r.ticket_id and t.status = 'closed'
      join day_closes d on d.branch_id = t.branch_id and d.business_date = r.booked_on
      where r.booked_on between ${anchor} and ${end}`);
    const tips = await query<{ staffId: string; date: string; amount: string }>(sql`
      select p.staff_id as "staffId", p.booked_on::text as date, p.amount::text as amount
      from tips p join tickets t on t.id = p.ticket_id and t.status = 'closed'
      join day_closes d on d.branch_id = t.branch_id and d.business_date = p.booked_on
      where p.booked_on between ${anchor} and ${end}`);
    const hours = await query<{ staffId: string; date: string; hours: string }>(sql`
      select staff_id as "staffId", work_date::text as date, hours::text as hours from timesheet_entries where work_date between ${anchor} and ${end}`);
    const people = await query<{ id: string; hourlyRate: string | null; minimumWage: string; overtimeAfter: string; multiplier: string; exemption: boolean }>(sql`
      select s.id, s.hourly_rate::text as "hourlyRate", b.minimum_wage::text as "minimumWage", b.overtime_after_hours::text as "overtimeAfter",
             b.overtime_multiplier::text as multiplier, b.commission_exemption as exemption
      from staff s join branches b on b.id = s.home_branch_id`);

    const inputs = new Map<string, Omit<PayInput, 'plan' | 'wageRules'>>();
    const of = (staffId: string) => {
      if (!inputs.has(staffId)) inputs.set(staffId, { serviceLines: [], retailLines: [], tips: [], hours: [] });
      return inputs.get(staffId)!;
    };
    for (const s of services) {
      const line = { date: s.date, price: s.price, isColour: s.isColour, productCost: s.cost };
      if (s.assistantId && s.assistantShare && !new Big(s.assistantShare).eq(0)) {
        of(s.staffId).serviceLines.push({ id: s.id, ...line, share: new Big(1).minus(s.assistantShare).toString() });
        of(s.assistantId).serviceLines.push({ id: `${s.id}/a`, ...line, share: new Big(s.assistantShare).toString() });
      } else of(s.staffId).serviceLines.push({ id: s.id, ...line });
    }
    for (const r of retail) of(r.staffId).retailLines.push({ id: r.id, date: r.date, amount: r.amount });
    for (const p of tips) of(p.staffId).tips.push({ date: p.date, amount: p.amount });
    for (const h of hours) of(h.staffId).hours.push({ date: h.date, hours: h.hours });
    expect(services.length).toBeGreaterThan(100);
    // The period holds the cases the reader must get right: assistant shares and refunds.
    expect(services.some((s) => s.assistantId)).toBe(true);
    expect(services.some((s) => new Big(s.price).lt(0))).toBe(true);

    const expected = new Map<string, PayResult>();
    for (const [staffId, activity] of inputs) {
      const person = people.find((p) => p.id === staffId)!;
      const terms = planOf.get(staffId)!;
      const hourlyRate = person.hourlyRate ?? ('hourlyRate' in terms ? terms.hourlyRate : undefined);
      const plan = {
        tierMode: terms.tierMode,
        tiers: terms.tiers.map((tier) => ({ ...tier })),
        productCharge: { ...terms.productCharge },
        retailRate: terms.retailRate,
        ...(hourlyRate ? { hourlyRate } : {}),
      };
      const wageRules = {
        minimumWage: person.minimumWage,
        overtimeAfterHours: person.overtimeAfter,
        overtimeMultiplier: person.multiplier,
        workweekStartsOn: 0 as const,
        commissionExemption: person.exemption,
      };
      expected.set(staffId, computePay({ plan, ...activity, wageRules }));
    }

    const lines = (await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('accountant')).expect(200)).body as Line[];
    expect(lines.map((l) => l.staffId).sort()).toEqual([...expected.keys()].sort());
    let gross = new Big(0);
    for (const line of lines) {
      const want = expected.get(line.staffId)!;
      for (const field of SUMMARY_MONEY) expect([line.staffName, field, line[field]]).toEqual([line.staffName, field, want[field]]);
      const detail = (await t.http().get(`/api/payroll/runs/${run.id}/lines/${line.id}`).set('Authorization', await auth('owner')).expect(200)).body;
      expect(detail.result).toEqual(want);
      gross = gross.plus(line.grossPay);
    }
    // The demo's rules and hours produce the wage figures the workbook has columns for.
    expect(lines.some((l) => new Big(l.overtimePremium!).gt(0))).toBe(true);
    expect(lines.some((l) => new Big(l.minimumWageTopUp!).gt(0))).toBe(true);
    expect(gross.gt(0)).toBe(true);
  });

  it('shows each role only the lines it may see', async () => {
    const all = (await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('owner')).expect(200)).body as Line[];
    const [rhea] = await query<{ id: string }>(sql`select staff_id as id from users where role = 'stylist'`);
    const own = (await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('stylist')).expect(200)).body as Line[];
    expect(own.map((l) => l.staffId)).toEqual([rhea!.id]);
    const other = all.find((l) => l.staffId !== rhea!.id)!;
    const hidden = await t.http().get(`/api/payroll/runs/${run.id}/lines/${other.id}`).set('Authorization', await auth('stylist')).expect(404);
    expect(hidden.body.code).toBe('payroll_line.not_found');

    const managed = (await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('manager')).expect(200)).body as Line[];
    expect(new Set(managed.map((l) => l.branchName))).toEqual(new Set(['Riverside', 'Old Mill']));
    expect(managed).toHaveLength(all.filter((l) => l.branchName === 'Riverside' || l.branchName === 'Old Mill').length);
    await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('front_desk')).expect(403);
    await t.http().get(`/api/payroll/runs/${run.id}/workbook`).set('Authorization', await auth('manager')).expect(403);
  });

  it('lets the accountant approve but never change tickets', async () => {
    const [ticket] = await query<{ id: string; staffId: string }>(sql`
      select t.id, l.staff_id as "staffId" from tickets t join ticket_service_lines l on l.ticket_id = t.id where t.status = 'closed' limit 1`);
    const refused = await t.http().post(`/api/tickets/${ticket!.id}/tips`).set('Authorization', await auth('accountant')).send({ staffId: ticket!.staffId, amount: '5.00' }).expect(403);
    expect(refused.body.message).toBe('An accountant may not change tickets.');

    await t.http().get(`/api/payroll/runs/${run.id}/workbook`).set('Authorization', await auth('accountant')).expect(409);
    await t.http().post(`/api/payroll/runs/${run.id}/approve`).set('Authorization', await auth('manager')).expect(403);
    const approved = await t.http().post(`/api/payroll/runs/${run.id}/approve`).set('Authorization', await auth('accountant')).expect(200);
    expect(approved.body.status).toBe('approved');
  });

  it('keeps an approved run frozen (409)', async () => {
    const before = await query<{ result: unknown }>(sql`select result from payroll_lines order by id`);
    const rerun = await t.http().post(`/api/payroll/periods/${periodId}/runs`).set('Authorization', await auth('owner')).expect(409);
    expect(rerun.body.code).toBe('payroll_run.frozen');
    await t.http().post(`/api/payroll/runs/${run.id}/approve`).set('Authorization', await auth('owner')).expect(409);
    const [anyone] = await query<{ id: string }>(sql`select staff_id as id from timesheet_entries limit 1`);
    await t.http().put('/api/payroll/timesheets').set('Authorization', await auth('owner')).send({ staffId: anyone!.id, date: anchor, hours: '1' }).expect(409);
    const after = await query<{ result: unknown }>(sql`select result from payroll_lines order by id`);
    expect(after).toEqual(before);
    // The manager's view is of drafts only.
    const managed = (await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('manager')).expect(200)).body;
    expect(managed).toEqual([]);
  });

  it('exports a workbook whose totals equal the run to the cent, with formulas, formats and neutralised text', async () => {
    const lines = (await t.http().get(`/api/payroll/runs/${run.id}/lines`).set('Authorization', await auth('accountant')).expect(200)).body as Line[];
    const response = await t.http().get(`/api/payroll/runs/${run.id}/workbook`).set('Authorization', await auth('accountant')).buffer(true).parse(binary).expect(200);
    expect(response.headers['content-disposition']).toContain(`Thistlewick-Hair-Collective-payroll-${anchor}-to-${end}.xlsx`);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(response.body as ArrayBuffer);
    const branchNames = [...new Set(lines.map((l) => l.branchName))].sort();
    expect(workbook.worksheets.map((w) => w.name)).toEqual(['Summary', ...branchNames, 'Lines']);

    const summary = workbook.getWorksheet('Summary')!;
    expect(String(summary.getCell('A2').value)).toMatch(/confirmed by a payroll professional/);
    expect(summary.getRow(4).getCell(14).value).toBe('Gross pay');
    // The totals' formulas are evaluated by hyperformula, a spreadsheet engine independent of exceljs and of the
    // API, over the figure sheets as the file holds them; each result must equal the cached value and the run.
    const contentOf = (sheet: ExcelJS.Worksheet): RawCellContent[][] =>
      Array.from({ length: sheet.rowCount }, (_, r) =>
        Array.from({ length: sheet.columnCount }, (_, c) => {
          const value = sheet.getRow(r + 1).getCell(c + 1).value;
          if (value !== null && typeof value === 'object' && 'formula' in value) return `=${value.formula}`;
          return typeof value === 'number' || typeof value === 'string' ? value : null;
        }),
      );
    const figureSheets = [summary, ...branchNames.map((name) => workbook.getWorksheet(name)!)];
    const engine = HyperFormula.buildFromSheets(Object.fromEntries(figureSheets.map((sheet) => [sheet.name, contentOf(sheet)])), { licenseKey: 'gpl-v3' });
    const checkTotals = (sheet: ExcelJS.Worksheet, expectedLines: Line[]) => {
      let totalRow: ExcelJS.Row | undefined;
      sheet.eachRow((row) => {
        if (row.getCell(1).value === 'Total') totalRow = row;
      });
      expect(totalRow).toBeDefined();
      const fields = ['hours', ...SUMMARY_MONEY];
      fields.forEach((field, i) => {
        const cell = totalRow!.getCell(4 + i);
        const { formula, result: read } = cell.value as ExcelJS.CellFormulaValue;
        // exceljs 4.4.0 reads a cached <v>0</v> back as no result at all (the file does hold the zero).
        const result = read ?? 0;
        const match = /^SUM\(([A-Z]+)(\d+):([A-Z]+)(\d+)\)$/.exec(formula)!;
        expect(match[1]).toBe(match[3]);
        expect(match[1]).toBe(cell.address.replace(/\d+$/, ''));
        const evaluated = engine.getCellValue({ sheet: engine.getSheetId(sheet.name)!, row: Number(cell.row) - 1, col: Number(cell.col) - 1 });
        expect(typeof evaluated).toBe('number');
        const decimals = field === 'hours' ? 3 : 2;
        expect([field, new Big(evaluated as number).toFixed(decimals)]).toEqual([field, new Big(String(result)).toFixed(decimals)]);
        const fromRun = expectedLines.reduce((sum, l) => sum.plus(l[field]!), new Big(0));
        expect([field, new Big(String(result)).toFixed(decimals)]).toEqual([field, fromRun.toFixed(decimals)]);
        if (field !== 'hours') expect(cell.numFmt).toMatch(/#,##0\.00/);
      });
    };
    checkTotals(summary, lines);
    for (const name of branchNames) checkTotals(workbook.getWorksheet(name)!, lines.filter((l) => l.branchName === name));
    engine.destroy();

    // OWASP "CSV Injection": a cell that begins with = is written as text with a leading apostrophe.
    const evilRow = summary.getRows(5, lines.length)!.find((row) => row.getCell(1).value === evilStaffId)!;
    expect(evilRow.getCell(2).type).toBe(ExcelJS.ValueType.String);
    expect(evilRow.getCell(2).value).toBe('\'=HYPERLINK("http://x.example","Pay")');

    const linesSheet = workbook.getWorksheet('Lines')!;
    const lineDetails = await query<{ n: number }>(sql`
      select (sum(jsonb_array_length(input->'serviceLines')) + sum(jsonb_array_length(input->'retailLines')))::int as n from payroll_lines`);
    expect(linesSheet.rowCount - 1).toBe(lineDetails[0]!.n);
    const date = linesSheet.getCell('F2');
    expect(date.value).toBeInstanceOf(Date);
    expect((date.value as Date).toISOString()).toMatch(/T00:00:00\.000Z$/);
    expect(date.numFmt).toBe('yyyy-mm-dd');

    const csv = await t.http().get(`/api/payroll/runs/${run.id}/summary.csv`).set('Authorization', await auth('accountant')).expect(200);
    expect(csv.headers['content-disposition']).toContain(`Thistlewick-Hair-Collective-payroll-summary-${anchor}-to-${end}.csv`);
    const csvLines = (csv.text as string).trim().split('\r\n');
    expect(csvLines).toHaveLength(lines.length + 1);
    expect(csvLines.every((line) => /^"(?:[^"]|"")*"(,"(?:[^"]|"")*")*$/.test(line))).toBe(true);
    expect(csv.text).toContain(`"'=HYPERLINK(""http://x.example"",""Pay"")"`);

    const exported = (await t.http().get(`/api/payroll/runs/${run.id}`).set('Authorization', await auth('owner')).expect(200)).body;
    expect(exported.status).toBe('exported');
    await t.http().post(`/api/payroll/periods/${periodId}/runs`).set('Authorization', await auth('accountant')).expect(409);
  });
});
