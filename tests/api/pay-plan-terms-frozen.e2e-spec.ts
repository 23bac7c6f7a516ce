import { sql } from 'drizzle-orm';
import { startTestApp, type TestApp } from './support/test-app.js';

type Role = Parameters<TestApp['tokenFor']>[0];
const rowsOf = <T>(result: unknown): T[] => (Array.isArray(result) ? result : (result as { rows: T[] }).rows);
const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

// Invented terms (common-practice shape: one flat tier, no product charge).
const FLAT = { tierMode: 'marginal', tiers: [{ from: '0', rate: '0.40' }], productCharge: { mode: 'none' }, retailRate: '0.10' } as const;

describe('plan terms and assignments after an approved payroll', () => {
  let t: TestApp;
  const auth = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const anchor = addDays(new Date().toISOString().slice(0, 10), -35);
  let planId: string;
  let staffIds: string[];

  beforeAll(async () => {
    t = await startTestApp({ TRESSURY_SEED_DEMO: 'tickets' });
    await t.http().put('/api/payroll/schedule').set('Authorization', await auth('owner')).send({ frequency: 'biweekly', anchorDate: anchor, workweekStartsOn: 0 }).expect(200);
    planId = (await t.http().post('/api/payroll/plans').set('Authorization', await auth('owner')).send({ name: 'Flat', terms: { ...FLAT, effectiveFrom: anchor } }).expect(201)).body.id;
    staffIds = rowsOf<{ id: string }>(await t.database.db.execute(sql`select id from staff order by display_name`)).map((r) => r.id);
    for (const staffId of staffIds.slice(1)) {
      await t.http().post(`/api/payroll/plans/${planId}/assignments`).set('Authorization', await auth('owner')).send({ staffId, effectiveFrom: anchor }).expect(201);
    }
  }, 180_000);
  afterAll(() => t.close());

  it('refuses terms or assignments that would start inside an approved period, and takes them from the next one', async () => {
    // The first staff member has no plan yet; give them one before the run so it can complete.
    await t.http().post(`/api/payroll/plans/${planId}/assignments`).set('Authorization', await auth('owner')).send({ staffId: staffIds[0], effectiveFrom: anchor }).expect(201);
    const period = (await t.http().post('/api/payroll/periods').set('Authorization', await auth('accountant')).send({ date: anchor }).expect(201)).body;
    const started = (await t.http().post(`/api/payroll/periods/${period.id}/runs`).set('Authorization', await auth('accountant')).expect(202)).body;
    let status = started.status;
    for (let i = 0; i < 600 && status === 'computing'; i++) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      status = (await t.http().get(`/api/payroll/runs/${started.id}`).set('Authorization', await auth('accountant')).expect(200)).body.status;
    }
    expect(status).toBe('draft');
    await t.http().post(`/api/payroll/runs/${started.id}/approve`).set('Authorization', await auth('accountant')).expect(200);

    const version = await t
      .http()
      .post(`/api/payroll/plans/${planId}/versions`)
      .set('Authorization', await auth('owner'))
      .send({ ...FLAT, effectiveFrom: anchor, retailRate: '0.20' })
      .expect(409);
    expect(version.body).toMatchObject({ code: 'pay_plan.period_frozen', details: [expect.objectContaining({ field: 'effectiveFrom' })] });
    expect(version.body.message).toContain(addDays(anchor, 13));

    const other = (await t.http().post('/api/payroll/plans').set('Authorization', await auth('owner')).send({ name: 'Other', terms: { ...FLAT, effectiveFrom: anchor } }).expect(201)).body;
    const moved = await t.http().post(`/api/payroll/plans/${other.id}/assignments`).set('Authorization', await auth('owner')).send({ staffId: staffIds[0], effectiveFrom: anchor }).expect(409);
    expect(moved.body.code).toBe('pay_plan.period_frozen');

    await t.http().post(`/api/payroll/plans/${planId}/versions`).set('Authorization', await auth('owner')).send({ ...FLAT, effectiveFrom: addDays(anchor, 14), retailRate: '0.20' }).expect(201);
    await t.http().post(`/api/payroll/plans/${other.id}/assignments`).set('Authorization', await auth('owner')).send({ staffId: staffIds[0], effectiveFrom: addDays(anchor, 14) }).expect(201);
  });
});
