import { type CapturedMessage, type SmtpFake, startSmtpFake } from '@tressury/fakes';
import type { PayResult } from '@tressury/domain';
import Big from 'big.js';
import { sql } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { HyperFormula } from 'hyperformula';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { Mailer } from '../../apps/api/src/mail/mailer.js';
import { buildFloor, type Floor } from './support/floor-builders.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Role = Parameters<TestApp['tokenFor']>[0];
type Line = { id: string; staffId: string; staffName: string; grossPay: string } & Record<string, string>;
type Message = {
  id: string;
  kind: string;
  recipient: string;
  recipientStaffId: string | null;
  subject: string;
  textBody: string;
  attachmentName: string | null;
  subjectRef: string | null;
  status: 'sent' | 'failed';
  error: string | null;
  createdAt: string;
};
type Sent = { sent: number; failed: number; messages: Message[] };

const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const binary = (res: import('supertest').Response, callback: (error: Error | null, body: Buffer) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => callback(null, Buffer.concat(chunks)));
};

// The statement's labels for the figures of a payroll line.
const FIGURES = {
  serviceRevenue: 'Service revenue',
  productCharge: 'Product charge',
  commissionableRevenue: 'Commissionable revenue',
  serviceCommission: 'Service commission',
  retailCommission: 'Retail commission',
  hourlyPay: 'Hourly pay',
  tips: 'Tips',
  minimumWageTopUp: 'Minimum-wage top-up',
  overtimePremium: 'Overtime premium',
  grossPay: 'Gross pay',
} as const;

// An invented plan; tiers, product charge and retail rate are common practice in the trade, not a source's figures.
const PLAN = {
  tierMode: 'marginal',
  tiers: [
    { from: '0', rate: '0.35' },
    { from: '100', rate: '0.40' },
  ],
  productCharge: { mode: 'actual-cost', markup: '0.10' },
  retailRate: '0.10',
} as const;

const RHEA_EMAIL = 'rhea.test@thistlewick.example';
const JONAH_EMAIL = 'jonah.test@thistlewick.example';
const EVIL_NAME = '=HYPERLINK("http://x.example","Pay")';

/** The figure the e-mail body gives for `label`, as a plain decimal string ("1,234.50 USD" → "1234.50"). */
function bodyFigure(text: string, label: string): string | null {
  const escaped = label.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`^${escaped}\\s+(-?[\\d,]+\\.\\d{2}) USD$`, 'm').exec(text);
  return match ? match[1]!.replaceAll(',', '') : null;
}

/**
 * Floor, a closed day at Riverside with a colour service (Test Rhea) and a cut, retail and a tip (Test Jonah),
 * hours for those two and for Test Milla at Old Mill, who has no e-mail address; one pay period, computed.
 */
async function computedRun(t: TestApp): Promise<{ floor: Floor; runId: string; periodId: string }> {
  const auth = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const floor = await buildFloor(t.database);
  const today = businessDateIn(floor.riverside.timeZone);
  const owner = await auth('owner');
  await t.http().patch(`/api/staff/${floor.staff.rhea.id}`).set('Authorization', owner).send({ email: RHEA_EMAIL }).expect(200);
  // A name a spreadsheet would read as a formula, to check the statement neutralises it.
  await t.http().patch(`/api/staff/${floor.staff.jonah.id}`).set('Authorization', owner).send({ email: JONAH_EMAIL, displayName: EVIL_NAME }).expect(200);

  const desk = await auth('front_desk');
  const post = (path: string, body: object) => t.http().post(path).set('Authorization', desk).send(body);
  const cut = (await post('/api/tickets', { branchId: floor.riverside.id, clientId: floor.clients.tested.id }).expect(201)).body.id as string;
  await post(`/api/tickets/${cut}/service-lines`, { serviceId: floor.services.cut.id, staffId: floor.staff.jonah.id }).expect(201);
  await post(`/api/tickets/${cut}/retail-lines`, { productId: floor.products.shampoo.id, quantity: 1, sellerStaffId: floor.staff.jonah.id }).expect(201);
  await post(`/api/tickets/${cut}/tips`, { staffId: floor.staff.jonah.id, amount: '10.00' }).expect(201);
  await post(`/api/tickets/${cut}/payments`, { method: 'cash', amount: '90.98', tendered: '100.00', idempotencyKey: 'statements-cash-1' }).expect(201);
  await post(`/api/tickets/${cut}/close`, {}).expect(200);
  const colour = (await post('/api/tickets', { branchId: floor.riverside.id, clientId: floor.clients.tested.id }).expect(201)).body.id as string;
  const line = (await post(`/api/tickets/${colour}/service-lines`, { serviceId: floor.services.rootColour.id, staffId: floor.staff.rhea.id }).expect(201)).body.serviceLines[0];
  await post(`/api/tickets/${colour}/bowls`, {
    serviceLineId: line.id,
    components: [
      { productId: floor.products.shade.id, amount: '45', unit: 'g' },
      { productId: floor.products.developer20.id, amount: '45', unit: 'g' },
    ],
  }).expect(201);
  await post(`/api/tickets/${colour}/payments`, { method: 'cash', amount: '110.00', tendered: '110.00', idempotencyKey: 'statements-cash-2' }).expect(201);
  await post(`/api/tickets/${colour}/close`, {}).expect(200);
  const manager = await auth('manager');
  await t.http().post('/api/day-close').set('Authorization', manager).send({ branchId: floor.riverside.id, businessDate: today, countedCash: '200.98' }).expect(201);

  await t.http().put('/api/payroll/schedule').set('Authorization', owner).send({ frequency: 'biweekly', anchorDate: today, workweekStartsOn: 0 }).expect(200);
  const plan = (await t.http().post('/api/payroll/plans').set('Authorization', owner).send({ name: 'Test Standard', terms: { ...PLAN, effectiveFrom: today } }).expect(201)).body;
  for (const member of Object.values(floor.staff)) {
    await t.http().post(`/api/payroll/plans/${plan.id}/assignments`).set('Authorization', owner).send({ staffId: member.id, effectiveFrom: today }).expect(201);
  }
  const period = (await t.http().post('/api/payroll/periods').set('Authorization', await auth('accountant')).send({ date: today }).expect(201)).body;
  for (const [member, hours] of [
    [floor.staff.rhea, '8'],
    [floor.staff.jonah, '6.5'],
    [floor.staff.milla, '7.25'],
  ] as const) {
    await t.http().put('/api/payroll/timesheets').set('Authorization', owner).send({ staffId: member.id, date: today, hours }).expect(200);
  }
  const started = await t.http().post(`/api/payroll/periods/${period.id}/runs`).set('Authorization', await auth('accountant')).expect(202);
  for (let i = 0; i < 300; i++) {
    const run = (await t.http().get(`/api/payroll/runs/${started.body.id}`).set('Authorization', await auth('accountant')).expect(200)).body;
    if (run.status !== 'computing') {
      expect(run).toMatchObject({ status: 'draft', totalStaff: 3 });
      return { floor, runId: run.id, periodId: period.id };
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error('the run did not finish');
}

describe('pay statements by e-mail, through the SMTP fake that starts with the app', () => {
  let t: TestApp;
  let fake: SmtpFake;
  let floor: Floor;
  let runId: string;
  let lines: Line[];
  const auth = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const outbox = async (role: Role = 'accountant', query = '') =>
    (await t.http().get(`/api/mail/outbox${query}`).set('Authorization', await auth(role)).expect(200)).body as Message[];

  beforeAll(async () => {
    t = await startTestApp();
    fake = t.app.get(Mailer).fake!;
    ({ floor, runId } = await computedRun(t));
    lines = (await t.http().get(`/api/payroll/runs/${runId}/lines`).set('Authorization', await auth('accountant')).expect(200)).body;
  }, 120_000);
  afterAll(() => t.close());

  it('starts a local SMTP fake with the app', () => {
    expect(fake).not.toBeNull();
    expect(fake.host).toBe('127.0.0.1');
    expect(fake.messages()).toEqual([]);
  });

  it('sends statements of an approved run only (409 for a draft), and only for the owner and accountant', async () => {
    const draft = await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('accountant')).expect(409);
    expect(draft.body.code).toBe('payroll_run.not_approved');
    expect(draft.body.message).toMatch(/draft/);
    await t.http().post(`/api/payroll/runs/${runId}/approve`).set('Authorization', await auth('accountant')).expect(200);
    await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('manager')).expect(403);
    await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('front_desk')).expect(403);
    await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('stylist')).expect(403);
    await t.http().post('/api/payroll/runs/00000000-0000-4000-8000-000000000000/statements').set('Authorization', await auth('accountant')).expect(404);
    expect(fake.messages()).toEqual([]);
    expect(await outbox()).toEqual([]);
  });

  it('e-mails each staff member with an address their figures, to the cent, and lists the one without', async () => {
    const response = await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('accountant')).expect(200);
    const result = response.body as Sent;
    expect(result).toMatchObject({ sent: 2, failed: 1 });
    expect(result.messages).toHaveLength(3);

    expect(fake.messages()).toHaveLength(2);
    for (const [member, address] of [
      [floor.staff.rhea, RHEA_EMAIL],
      [floor.staff.jonah, JONAH_EMAIL],
    ] as const) {
      const [message, ...more] = fake.messagesTo(address);
      expect(more).toEqual([]);
      const line = lines.find((l) => l.staffId === member.id)!;
      for (const [field, label] of Object.entries(FIGURES)) expect([label, bodyFigure(message!.text, label)]).toEqual([label, line[field]]);
      expect(message!.text).toMatch(/confirmed by a payroll professional/);
      const detail = (await t.http().get(`/api/payroll/runs/${runId}/lines/${line.id}`).set('Authorization', await auth('accountant')).expect(200)).body;
      for (const tier of (detail.result as PayResult).tierBreakdown) {
        const from = new Big(tier.from).toFixed(2);
        expect(message!.text).toMatch(new RegExp(`^ {2}${from.replace('.', '\\.')}.* at ${new Big(tier.rate).times(100).toFixed()}% on .*\\s${tier.commission.replace('.', '\\.')} USD$`, 'm'));
      }
      const recorded = result.messages.find((m) => m.recipientStaffId === member.id)!;
      expect(recorded).toMatchObject({ status: 'sent', recipient: address, kind: 'pay_statement', subject: message!.subject, error: null, subjectRef: `payroll_run:${runId}` });
      expect(recorded.textBody.trim()).toBe(message!.text.replace(/\r\n/g, '\n').trim());
    }
    const milla = result.messages.find((m) => m.recipientStaffId === floor.staff.milla.id)!;
    expect(milla).toMatchObject({ status: 'failed', recipient: '', attachmentName: null });
    expect(milla.error).toMatch(/^No e-mail address on file for Test Milla/);
  });

  it('attaches a one-sheet workbook whose gross pay is the line’s, as a formula a spreadsheet evaluates to the same cents', async () => {
    const message = fake.messagesTo(RHEA_EMAIL)[0]!;
    const rhea = lines.find((l) => l.staffId === floor.staff.rhea.id)!;
    expect(message.attachments).toHaveLength(1);
    const [attachment] = message.attachments;
    expect(attachment!.filename).toMatch(/^pay-statement-Test-Rhea-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}\.xlsx$/);
    expect(attachment!.contentType).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');

    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(attachment!.content as unknown as ArrayBuffer);
    expect(workbook.worksheets.map((w) => w.name)).toEqual(['Statement']);
    const sheet = workbook.worksheets[0]!;
    const rowOf = (label: string) => {
      let found: ExcelJS.Row | undefined;
      sheet.eachRow((row) => {
        if (row.getCell(1).value === label) found = row;
      });
      return found!;
    };
    for (const [field, label] of Object.entries(FIGURES)) {
      if (field === 'grossPay') continue;
      const cell = rowOf(label).getCell(2);
      expect([label, new Big(String(cell.value)).toFixed(2)]).toEqual([label, rhea[field]]);
      expect(cell.numFmt).toMatch(/#,##0\.00/);
    }
    const gross = rowOf('Gross pay').getCell(2);
    const { formula, result } = gross.value as ExcelJS.CellFormulaValue;
    expect(new Big(String(result)).toFixed(2)).toBe(rhea.grossPay);
    expect(gross.numFmt).toBe('#,##0.00 "USD";-#,##0.00 "USD"');

    // hyperformula, an independent spreadsheet engine from the registry, evaluates the formula over the sheet's cells.
    const grid: (string | number | null)[][] = [];
    sheet.eachRow((row, r) => {
      const value = row.getCell(2).value;
      grid[r - 1] = [null, typeof value === 'number' ? value : value && typeof value === 'object' && 'formula' in value ? `=${value.formula}` : null];
    });
    const engine = HyperFormula.buildFromArray(Array.from(grid, (row) => row ?? [null, null]), { licenseKey: 'gpl-v3' });
    const evaluated = engine.getCellValue({ sheet: 0, row: Number(gross.row) - 1, col: 1 });
    engine.destroy();
    expect(formula).toMatch(/^B\d+(\+B\d+)+$/);
    expect(new Big(String(evaluated)).toFixed(2)).toBe(rhea.grossPay);

    let note = '';
    sheet.eachRow((row) => {
      if (String(row.getCell(1).value).includes('payroll professional')) note = String(row.getCell(1).value);
    });
    expect(note).toMatch(/confirmed by a payroll professional/);
  });

  it('neutralises a staff name a spreadsheet would read as a formula (OWASP, "CSV Injection")', async () => {
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(fake.messagesTo(JONAH_EMAIL)[0]!.attachments[0]!.content as unknown as ArrayBuffer);
    const name = workbook.worksheets[0]!.getCell('A2');
    expect(name.type).toBe(ExcelJS.ValueType.String);
    expect(name.value).toBe(`'${EVIL_NAME}`);
  });

  it('lists the outbox newest first, a page at a time, for the owner and accountant only', async () => {
    const all = await outbox('accountant');
    expect(all).toHaveLength(3);
    expect(all.map((m) => m.createdAt)).toEqual([...all.map((m) => m.createdAt)].sort().reverse());
    expect(all.filter((m) => m.status === 'sent').map((m) => m.recipient).sort()).toEqual([JONAH_EMAIL, RHEA_EMAIL].sort());
    expect(all.find((m) => m.recipient === RHEA_EMAIL)!.attachmentName).toMatch(/^pay-statement-Test-Rhea-/);
    expect(await outbox('owner')).toEqual(all);

    const first = await outbox('accountant', '?limit=2');
    const second = await outbox('accountant', '?limit=2&offset=2');
    expect([...first, ...second]).toEqual(all);
    const bad = await t.http().get('/api/mail/outbox?limit=0').set('Authorization', await auth('accountant')).expect(400);
    expect(JSON.stringify(bad.body)).toMatch(/limit/);

    for (const role of ['manager', 'front_desk', 'stylist'] as const) await t.http().get('/api/mail/outbox').set('Authorization', await auth(role)).expect(403);
  });

  it('serves a statement workbook under the line’s read rules: a stylist her own only', async () => {
    const rhea = lines.find((l) => l.staffId === floor.staff.rhea.id)!;
    const jonah = lines.find((l) => l.staffId === floor.staff.jonah.id)!;
    const own = await t.http().get(`/api/payroll/runs/${runId}/lines/${rhea.id}/statement.xlsx`).set('Authorization', await auth('stylist')).buffer(true).parse(binary).expect(200);
    expect(own.headers['content-type']).toContain('spreadsheetml');
    expect(own.headers['content-disposition']).toContain('pay-statement-Test-Rhea-');
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(own.body as ArrayBuffer);
    expect(workbook.worksheets[0]!.getCell('A2').value).toBe('Test Rhea');

    const other = await t.http().get(`/api/payroll/runs/${runId}/lines/${jonah.id}/statement.xlsx`).set('Authorization', await auth('stylist')).expect(404);
    expect(other.body.code).toBe('payroll_line.not_found');
    await t.http().get(`/api/payroll/runs/${runId}/lines/${jonah.id}/statement.xlsx`).set('Authorization', await auth('accountant')).expect(200);
    // A manager reads drafts only; this run is approved.
    await t.http().get(`/api/payroll/runs/${runId}/lines/${rhea.id}/statement.xlsx`).set('Authorization', await auth('manager')).expect(404);
    await t.http().get(`/api/payroll/runs/${runId}/lines/${rhea.id}/statement.xlsx`).set('Authorization', await auth('front_desk')).expect(403);
  });

  it('sends again on request, recording new outbox rows beside the old ones', async () => {
    const again = (await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('owner')).expect(200)).body as Sent;
    expect(again).toMatchObject({ sent: 2, failed: 1 });
    expect(fake.messagesTo(RHEA_EMAIL)).toHaveLength(2);
    expect(await outbox()).toHaveLength(6);
    const [events] = rowsOf<{ n: number }>(await t.database.db.execute(sql`select count(*)::int as n from domain_events where type = 'PayStatementsSent'`));
    expect(events!.n).toBe(2);
  });

  it('records every statement as failed, with the reason, when the mail server cannot be reached, and loses nothing', async () => {
    const before = await outbox();
    await fake.stop();
    const response = await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', await auth('accountant')).expect(200);
    const result = response.body as Sent;
    expect(result).toMatchObject({ sent: 0, failed: 3 });
    for (const message of result.messages.filter((m) => m.recipient !== '')) {
      expect(message.status).toBe('failed');
      expect(message.error).toMatch(/^The mail server could not be reached: .*ECONNREFUSED/);
      expect(message.textBody).toMatch(/^Gross pay\s/m);
    }
    const after = await outbox('accountant', '?limit=200');
    expect(after).toHaveLength(before.length + 3);
    expect(after.slice(3)).toEqual(before);
  });
});

describe('pay statements through a mail server named in the environment', () => {
  let server: SmtpFake;
  let t: TestApp;

  beforeAll(async () => {
    // A stand-in for the company's mail server, started by the test: the app itself starts no fake in this mode.
    server = await startSmtpFake();
    t = await startTestApp({ SMTP_HOST: server.host, SMTP_PORT: String(server.port), MAIL_FROM: 'Thistlewick Payroll <payroll@thistlewick.example>' });
  }, 60_000);
  afterAll(async () => {
    await t.close();
    await server.stop();
    // startTestApp writes its settings into process.env; later apps in this worker must be back in fake mode.
    Object.assign(process.env, { SMTP_HOST: '', SMTP_PORT: '', MAIL_FROM: '' });
  });

  it('sends to SMTP_HOST:SMTP_PORT from MAIL_FROM, with no local fake', async () => {
    expect(t.app.get(Mailer).fake).toBeNull();
    const { runId } = await computedRun(t);
    const accountant = `Bearer ${await t.tokenFor('accountant')}`;
    await t.http().post(`/api/payroll/runs/${runId}/approve`).set('Authorization', accountant).expect(200);
    const result = (await t.http().post(`/api/payroll/runs/${runId}/statements`).set('Authorization', accountant).expect(200)).body as Sent;
    expect(result).toMatchObject({ sent: 2, failed: 1 });
    const received: CapturedMessage[] = server.messages();
    expect(received.map((m) => m.envelope.to[0]).sort()).toEqual([JONAH_EMAIL, RHEA_EMAIL].sort());
    expect(received.every((m) => m.from === 'payroll@thistlewick.example' && m.envelope.from === 'payroll@thistlewick.example')).toBe(true);
  }, 120_000);
});
