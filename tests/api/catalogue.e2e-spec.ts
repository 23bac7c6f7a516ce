import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { demoLevels, demoProducts, demoServices } from '@tressury/fixtures';
import { domainEvents, levels, products, servicePrices, services } from '@tressury/schema';
import { count, desc, eq } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { startTestApp, type TestApp } from './support/test-app.js';

type Level = { id: string; name: string; rank: number };
type Price = { levelId: string; levelName: string; price: string };
type Service = { id: string; name: string; category: string; durationMinutes: number; isColour: boolean; active: boolean; prices: Price[] };
type Product = {
  id: string;
  code: string;
  name: string;
  kind: string;
  developerVolume: string | null;
  containerSize: string;
  containerUnit: string;
  densityGramsPerMl: string | null;
  containerCost: string;
  retailPrice: string | null;
  costPerGram: string;
  costPerGramApproximate: boolean;
  active: boolean;
};
type ImportRow = { row: number; action: string; values: Record<string, string>; errors: { field: string; message: string }[] };
type ImportResult = { committed: boolean; rows: ImportRow[]; validRows: number; invalidRows: number; creates: number; updates: number; unchanged: number };

const XLSX_MIME = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
const fixtureFile = (name: string) => readFileSync(join(__dirname, 'files', name));
const toCsv = (headers: string[], rows: string[][]) =>
  Buffer.from([headers, ...rows].map((cells) => cells.map((cell) => `"${cell.replace(/"/g, '""')}"`).join(',')).join('\n'));

describe('catalogue', () => {
  let t: TestApp;
  let levelByName: Map<string, Level>;
  let serviceByName: Map<string, Service>;
  let productByCode: Map<string, Product>;

  type Role = Parameters<TestApp['tokenFor']>[0];
  const as = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const call = async (role: Role, method: 'get' | 'post' | 'patch', path: string, body?: object, status?: number) => {
    const request = t.http()[method](`/api/catalogue/${path}`).set('Authorization', await as(role));
    return (body === undefined ? request : request.send(body)).expect(status ?? (method === 'post' ? 201 : 200));
  };
  const tableCount = async (table: typeof products | typeof services | typeof levels | typeof servicePrices | typeof domainEvents) =>
    (await t.database.db.select({ n: count() }).from(table))[0]!.n;
  const latestEvent = async (aggregateId: string) =>
    (await t.database.db.select().from(domainEvents).where(eq(domainEvents.aggregateId, aggregateId)).orderBy(desc(domainEvents.id)).limit(1))[0];

  // The levels go in one by one; the menu and the products through the uploads, as a salon would load them.
  beforeAll(async () => {
    t = await startTestApp();
    for (const level of demoLevels) await call('owner', 'post', 'levels', level);
    levelByName = new Map(((await call('owner', 'get', 'levels')).body as Level[]).map((l) => [l.name, l]));
    const menu = toCsv(
      ['name', 'category', 'duration_minutes', 'is_colour', ...demoLevels.map((l) => `price:${l.name}`)],
      demoServices.map((s) => [s.name, s.category, String(s.durationMinutes), s.isColour ? 'yes' : 'no', ...demoLevels.map((l) => s.prices[l.name] ?? '')]),
    );
    const columns = ['code', 'name', 'kind', 'developerVolume', 'containerSize', 'containerUnit', 'densityGramsPerMl', 'containerCost', 'retailPrice'] as const;
    const catalogue = toCsv(
      ['code', 'name', 'kind', 'developer_volume', 'container_size', 'container_unit', 'density_g_per_ml', 'container_cost', 'retail_price'],
      demoProducts.map((p) => columns.map((column) => p[column] ?? '')),
    );
    const owner = await as('owner');
    for (const [kind, file] of [['services', menu], ['products', catalogue]] as const) {
      await t.http().post(`/api/catalogue/${kind}/import?commit=true`).set('Authorization', owner).attach('file', file, { filename: `${kind}.csv`, contentType: 'text/csv' }).expect(200);
    }
    serviceByName = new Map(((await call('owner', 'get', 'services')).body as Service[]).map((s) => [s.name, s]));
    productByCode = new Map(((await call('owner', 'get', 'products')).body as Product[]).map((p) => [p.code, p]));
  }, 120_000);
  afterAll(() => t.close());

  describe('the demo catalogue', () => {
    it('loads whole through the API: levels by rank, every service with a price per level, every product', () => {
      expect([...levelByName.values()].map((l) => [l.name, l.rank])).toEqual(demoLevels.map((l) => [l.name, l.rank]));
      expect(serviceByName.size).toBe(demoServices.length);
      expect(serviceByName.get('Root Colour')).toMatchObject({
        category: 'Colour',
        isColour: true,
        active: true,
        prices: demoLevels.map((level) => ({ levelId: levelByName.get(level.name)!.id, levelName: level.name, price: demoServices.find((s) => s.name === 'Root Colour')!.prices[level.name] })),
      });
      expect(productByCode.size).toBe(demoProducts.length);
    });
  });

  describe('levels', () => {
    it('the owner renames a level and changes its rank; the event keeps before and after', async () => {
      const level = await call('owner', 'post', 'levels', { name: 'Guest Artist', rank: 9 });
      const renamed = await call('manager', 'patch', `levels/${level.body.id}`, { name: 'Visiting Artist', rank: 8 });
      expect(renamed.body).toEqual({ id: level.body.id, name: 'Visiting Artist', rank: 8 });
      expect(await latestEvent(level.body.id)).toMatchObject({
        type: 'LevelUpdated',
        payload: { before: { name: 'Guest Artist', rank: 9 }, after: { name: 'Visiting Artist', rank: 8 } },
      });
    });

    it('refuses a name already used with 409 naming "name", and writes nothing', async () => {
      const before = await tableCount(levels);
      const response = await call('owner', 'post', 'levels', { name: 'Senior', rank: 5 }, 409);
      expect(response.body).toMatchObject({ code: 'level.name_taken', details: [{ field: 'name' }] });
      const stylist = levelByName.get('Stylist')!;
      await call('owner', 'patch', `levels/${stylist.id}`, { name: 'Principal' }, 409);
      expect(await tableCount(levels)).toBe(before);
    });

    it('names every bad field', async () => {
      const response = await call('owner', 'post', 'levels', { name: '', rank: 0.5 }, 400);
      expect([...new Set(response.body.details.map((d: { field: string }) => d.field))].sort()).toEqual(['name', 'rank']);
      const cleared = await call('owner', 'patch', `levels/${levelByName.get('Senior')!.id}`, { name: null }, 400);
      expect(cleared.body.details).toEqual([expect.objectContaining({ field: 'name' })]);
    });

    it('front desk and stylists read levels but may not change them (403 with a plain reason)', async () => {
      await call('front_desk', 'get', 'levels');
      const refused = await call('front_desk', 'post', 'levels', { name: 'Trainee', rank: 1 }, 403);
      expect(refused.body.message).toBe('Front desk may not create the service menu and product catalogue.');
      await call('stylist', 'patch', `levels/${levelByName.get('Senior')!.id}`, { rank: 7 }, 403);
    });

    it('answers 404 for an unknown level and 400 naming the id when it is not a UUID', async () => {
      await call('owner', 'patch', 'levels/00000000-0000-4000-8000-000000000000', { rank: 2 }, 404);
      const bad = await call('owner', 'patch', 'levels/senior', { rank: 2 }, 400);
      expect(bad.body.details).toEqual([expect.objectContaining({ field: 'id' })]);
    });
  });

  describe('services', () => {
    const priceAt = (name: string, price: string) => ({ levelId: levelByName.get(name)!.id, price });

    it('a manager adds a service with prices by level; they come back most junior level first', async () => {
      const created = await call('manager', 'post', 'services', { name: '  Silk Press ', category: 'Styling', durationMinutes: 75, prices: [priceAt('Senior', '90'), priceAt('Associate', '70.5')] });
      expect(created.body).toMatchObject({
        name: 'Silk Press',
        category: 'Styling',
        durationMinutes: 75,
        isColour: false,
        active: true,
        prices: [
          { levelName: 'Associate', price: '70.50' },
          { levelName: 'Senior', price: '90.00' },
        ],
      });
      expect(await latestEvent(created.body.id)).toMatchObject({ type: 'ServiceCreated', aggregateType: 'Service' });
      const fetched = await call('stylist', 'get', `services/${created.body.id}`);
      expect(fetched.body).toEqual(created.body);
    });

    it('replaces the prices as a set when they are sent, and leaves them alone when they are not', async () => {
      const service = serviceByName.get('Blow-Dry')!;
      const changed = await call('owner', 'patch', `services/${service.id}`, { prices: [priceAt('Stylist', '47.00'), priceAt('Principal', '70.00')] });
      expect(changed.body.prices).toEqual([
        { levelId: levelByName.get('Stylist')!.id, levelName: 'Stylist', price: '47.00' },
        { levelId: levelByName.get('Principal')!.id, levelName: 'Principal', price: '70.00' },
      ]);
      const renamed = await call('owner', 'patch', `services/${service.id}`, { durationMinutes: 50 });
      expect(renamed.body).toMatchObject({ durationMinutes: 50, prices: changed.body.prices });
      const event = await latestEvent(service.id);
      expect(event).toMatchObject({ type: 'ServiceUpdated', payload: { before: { durationMinutes: 45 }, after: { durationMinutes: 50 } } });
    });

    it('takes a service off the menu and lists active and inactive ones apart', async () => {
      const service = serviceByName.get('Curl Set')!;
      await call('owner', 'patch', `services/${service.id}`, { active: false });
      const inactive = await call('front_desk', 'get', 'services?active=false');
      expect(inactive.body.map((s: Service) => s.name)).toEqual(['Curl Set']);
      const active = await call('front_desk', 'get', 'services?active=true');
      expect(active.body.map((s: Service) => s.name)).not.toContain('Curl Set');
    });

    it('names each bad price and unknown level as prices[i]…, and writes nothing', async () => {
      const service = serviceByName.get('Gloss')!;
      const pricesBefore = await t.database.db.select().from(servicePrices).where(eq(servicePrices.serviceId, service.id));
      const response = await call('owner', 'patch', `services/${service.id}`, {
          category: 'Colour services',
          prices: [priceAt('Associate', '41.00'), { levelId: '00000000-0000-4000-8000-000000000000', price: '50.00' }, priceAt('Associate', '42.00')],
        }, 400);
      expect(response.body.details).toEqual([
        expect.objectContaining({ field: 'prices[1].levelId' }),
        expect.objectContaining({ field: 'prices[2].levelId' }),
      ]);
      const formats = await call('owner', 'post', 'services', { name: 'Fringe Cut', category: 'Cuts', durationMinutes: 0, prices: [{ levelId: levelByName.get('Senior')!.id, price: 12 }, priceAt('Stylist', '-1.00'), priceAt('Principal', '1.005')] }, 400);
      expect(formats.body.details.map((d: { field: string }) => d.field)).toEqual(['durationMinutes', 'prices[0].price', 'prices[1].price', 'prices[2].price']);
      expect(await t.database.db.select().from(servicePrices).where(eq(servicePrices.serviceId, service.id))).toEqual(pricesBefore);
      expect((await call('owner', 'get', `services/${service.id}`)).body.category).toBe('Colour');
    });

    it('refuses a second service with the same name with 409 naming "name"', async () => {
      const response = await call('owner', 'post', 'services', { name: 'Gloss', category: 'Colour', durationMinutes: 30 }, 409);
      expect(response.body.details).toEqual([expect.objectContaining({ field: 'name' })]);
    });

    it('front desk reads the menu but may not change it', async () => {
      await call('front_desk', 'get', 'services');
      await call('front_desk', 'post', 'services', { name: 'Desk Special', category: 'Cuts', durationMinutes: 30 }, 403);
      await call('front_desk', 'patch', `services/${serviceByName.get('Gloss')!.id}`, { durationMinutes: 30 }, 403);
      await call('front_desk', 'get', 'services/00000000-0000-4000-8000-000000000000', undefined, 404);
    });
  });

  describe('products and their cost per gram', () => {
    const tube = { code: 'T-COST-1', name: 'Cost Check Tube', kind: 'permanent', containerSize: '2', containerUnit: 'oz', containerCost: '8.00' };

    it('derives the cost of a gram of a 2 oz tube by the exact ounce', async () => {
      const response = await call('owner', 'post', 'products', tube);
      // NIST Handbook 44, Appendix C: 1 oz (avoirdupois) = 28.349523125 g exactly.
      // 8.00 / (2 × 28.349523125) = 0.1410958477… → 0.141096 (6 places, half up).
      expect(response.body).toMatchObject({ costPerGram: '0.141096', costPerGramApproximate: false, containerSize: '2', containerUnit: 'oz' });
      expect(await latestEvent(response.body.id)).toMatchObject({ type: 'ProductCreated', payload: { after: { costPerGram: '0.141096' } } });
    });

    it('flags a developer sold by the fluid ounce as approximate only when it has no density', async () => {
      const developer = { kind: 'developer', developerVolume: '20', containerSize: '32', containerUnit: 'fl oz', containerCost: '11.50' };
      const withDensity = await call('owner', 'post', 'products', { ...developer, code: 'T-DEV-1', name: 'Density Known', densityGramsPerMl: '1.0' });
      const without = await call('owner', 'post', 'products', { ...developer, code: 'T-DEV-2', name: 'Density Unknown' });
      // NIST Handbook 44, Appendix C: 1 US fl oz = 1/128 gal of 231 in³ = 29.5735295625 mL exactly.
      // 11.50 / (32 × 29.5735295625 mL × 1.0 g/mL) = 0.0121519144… → 0.012152.
      expect(withDensity.body).toMatchObject({ costPerGram: '0.012152', costPerGramApproximate: false, densityGramsPerMl: '1', developerVolume: '20' });
      // Without a density 1 g/mL is assumed: the same figure, flagged so the web can mark it.
      expect(without.body).toMatchObject({ costPerGram: '0.012152', costPerGramApproximate: true, densityGramsPerMl: null });
      const demo = productByCode.get('TW-DV-020')!;
      // 11.50 / (32 × 29.5735295625 × 1.02) = 0.0119136415… → 0.011914.
      expect(demo).toMatchObject({ costPerGram: '0.011914', costPerGramApproximate: false });
    });

    it('derives the cost again when the container changes, and never takes it from the client', async () => {
      const product = productByCode.get('TW-LT-500')!;
      expect(product.costPerGram).toBe('0.064000');
      const changed = await call('manager', 'patch', `products/${product.id}`, { containerCost: '33.00' });
      expect(changed.body.costPerGram).toBe('0.066000');
      const sneaky = await call('owner', 'patch', `products/${product.id}`, { costPerGram: '0.01' }, 400);
      expect(sneaky.body.details).toEqual([expect.objectContaining({ field: 'costPerGram' })]);
    });

    it('wants a developer volume for developers only, and a retail price for retail products', async () => {
      const post = async (body: object) => (await call('owner', 'post', 'products', body, 400)).body;
      const base = { code: 'T-RULE', name: 'Rule Check', containerSize: '1000', containerUnit: 'mL', containerCost: '12.00' };
      expect((await post({ ...base, kind: 'developer' })).details).toEqual([expect.objectContaining({ field: 'developerVolume' })]);
      expect((await post({ ...base, kind: 'treatment', developerVolume: '20' })).details).toEqual([expect.objectContaining({ field: 'developerVolume' })]);
      expect((await post({ ...base, kind: 'retail' })).details).toEqual([expect.objectContaining({ field: 'retailPrice' })]);
      expect((await post({ ...base, kind: 'developer', developerVolume: '41' })).details).toEqual([expect.objectContaining({ field: 'developerVolume' })]);
      // 15 volume is an in-between strength some colourists use (common practice); any 0–40 is accepted.
      await call('owner', 'post', 'products', { ...base, kind: 'developer', developerVolume: '15' });
    });

    it('checks a change against the product as it will be: a developer becoming a treatment must drop its volume', async () => {
      const product = productByCode.get('TW-DV-010')!;
      const refused = await call('owner', 'patch', `products/${product.id}`, { kind: 'treatment' }, 400);
      expect(refused.body.details).toEqual([expect.objectContaining({ field: 'developerVolume' })]);
      const changed = await call('owner', 'patch', `products/${product.id}`, { kind: 'treatment', developerVolume: null });
      expect(changed.body).toMatchObject({ kind: 'treatment', developerVolume: null });
      await call('owner', 'patch', `products/${product.id}`, { kind: 'developer', developerVolume: '10' });
    });

    it('names every bad field at once', async () => {
      const response = await call('owner', 'post', 'products', { code: '', name: 'Bad', kind: 'bleach', containerSize: '0', containerUnit: 'lb', containerCost: 8, densityGramsPerMl: '1.00001' }, 400);
      expect([...new Set(response.body.details.map((d: { field: string }) => d.field))].sort()).toEqual(['code', 'containerCost', 'containerSize', 'containerUnit', 'densityGramsPerMl', 'kind']);
      const cleared = await call('owner', 'patch', `products/${productByCode.get('TW-RT-301')!.id}`, { code: null, retailPrice: null }, 400);
      expect(cleared.body.details).toEqual([expect.objectContaining({ field: 'code' })]);
    });

    it('refuses a code already in the catalogue with 409 naming "code"', async () => {
      const response = await call('owner', 'post', 'products', { ...tube, code: 'TW-PC-104' }, 409);
      expect(response.body).toMatchObject({ code: 'product.code_taken', details: [{ field: 'code' }] });
      await call('owner', 'patch', `products/${productByCode.get('TW-PC-105')!.id}`, { code: 'TW-PC-104' }, 409);
    });

    it('filters by kind, and names the kind when it is unknown', async () => {
      const developers = await call('stylist', 'get', 'products?kind=developer');
      expect(developers.body.length).toBeGreaterThanOrEqual(5);
      expect(developers.body.every((p: Product) => p.kind === 'developer')).toBe(true);
      const bad = await call('stylist', 'get', 'products?kind=bleach', undefined, 400);
      expect(bad.body.details).toEqual([expect.objectContaining({ field: 'kind' })]);
    });

    it('front desk reads products but may not change them', async () => {
      const product = productByCode.get('TW-RT-302')!;
      const read = await call('front_desk', 'get', `products/${product.id}`);
      expect(read.body).toMatchObject({ code: 'TW-RT-302', retailPrice: '26.00' });
      await call('front_desk', 'patch', `products/${product.id}`, { retailPrice: '1.00' }, 403);
      await call('front_desk', 'post', 'products', { ...tube, code: 'DESK-1' }, 403);
      await call('front_desk', 'get', 'products/00000000-0000-4000-8000-000000000000', undefined, 404);
    });
  });

  describe('product catalogue upload', () => {
    type Options = { commit?: boolean; role?: Role; contentType?: string; status?: number };
    const upload = async (file: Buffer, filename: string, { commit = false, role = 'owner', contentType = 'text/csv', status = 200 }: Options = {}) =>
      t
        .http()
        .post(`/api/catalogue/products/import?commit=${commit}`)
        .set('Authorization', await as(role))
        .attach('file', file, { filename, contentType })
        .expect(status);

    it('previews a file with bad rows, naming each bad row and cell as the spreadsheet numbers them, and writes nothing', async () => {
      const [productsBefore, eventsBefore] = [await tableCount(products), await tableCount(domainEvents)];
      const response = await upload(fixtureFile('products-with-bad-rows.csv'), 'products-with-bad-rows.csv');
      const result = response.body as ImportResult;
      expect(result).toMatchObject({ committed: false, validRows: 1, invalidRows: 6, creates: 1, updates: 0 });
      const errorsByRow = Object.fromEntries(result.rows.map((r) => [r.row, r.errors.map((e) => e.field)]));
      expect(errorsByRow).toEqual({
        2: [],
        3: ['kind'],
        4: ['developer_volume'],
        5: ['container_cost'],
        6: ['code'],
        7: ['retail_price'],
        8: ['container_size', 'container_unit'],
      });
      expect(result.rows[3]!.errors[0]!.message).toMatch(/formula/);
      expect(result.rows[4]!.errors[0]!.message).toMatch(/row 2/);
      expect(result.rows[0]!.values).toMatchObject({ code: 'TW-X-001', container_cost: '8.00' });
      expect([await tableCount(products), await tableCount(domainEvents)]).toEqual([productsBefore, eventsBefore]);
    });

    it('refuses to commit it: 400 with every bad cell by row, and nothing in the database', async () => {
      const [productsBefore, eventsBefore] = [await tableCount(products), await tableCount(domainEvents)];
      const response = await upload(fixtureFile('products-with-bad-rows.csv'), 'products-with-bad-rows.csv', { commit: true, status: 400 });
      expect(response.body.message).toBe('Nothing was saved: 6 of 7 rows have errors (rows 3, 4, 5, 6, 7, 8).');
      expect(response.body.details.map((d: { row: number; field: string }) => `${d.row}:${d.field}`)).toEqual([
        '3:kind',
        '4:developer_volume',
        '5:container_cost',
        '6:code',
        '7:retail_price',
        '8:container_size',
        '8:container_unit',
      ]);
      expect([await tableCount(products), await tableCount(domainEvents)]).toEqual([productsBefore, eventsBefore]);
      expect(await t.database.db.select().from(products).where(eq(products.code, 'TW-X-001'))).toEqual([]);
    });

    it('commits a good file: creates and updates by code in one go, one event per record written', async () => {
      const eventsBefore = await tableCount(domainEvents);
      const preview = (await upload(fixtureFile('products-good.csv'), 'products-good.csv')).body as ImportResult;
      expect(preview).toMatchObject({ committed: false, validRows: 6, invalidRows: 0, creates: 4, updates: 1, unchanged: 1 });
      expect(await tableCount(domainEvents)).toBe(eventsBefore);

      const result = (await upload(fixtureFile('products-good.csv'), 'products-good.csv', { commit: true })).body as ImportResult;
      expect(result).toMatchObject({ committed: true, creates: 4, updates: 1, unchanged: 1 });
      expect(await tableCount(domainEvents)).toBe(eventsBefore + 5);

      const list = (await call('owner', 'get', 'products')).body as Product[];
      const byCode = new Map(list.map((p) => [p.code, p]));
      expect(byCode.get('TW-PC-106')).toMatchObject({ containerCost: '8.40', id: productByCode.get('TW-PC-106')!.id });
      expect(byCode.get('TW-N-002')).toMatchObject({ kind: 'developer', developerVolume: '15', containerUnit: 'mL', densityGramsPerMl: '1.015', costPerGramApproximate: false });
      expect(byCode.get('TW-N-003')).toMatchObject({ kind: 'retail', containerUnit: 'fl oz', retailPrice: '9.00', costPerGramApproximate: true });
      expect(byCode.get('TW-N-004')).toMatchObject({ kind: 'demi_permanent' });
      const [updated] = await t.database.db.select().from(domainEvents).where(eq(domainEvents.aggregateId, productByCode.get('TW-PC-106')!.id)).orderBy(desc(domainEvents.id)).limit(1);
      expect(updated).toMatchObject({
        type: 'ProductUpdated',
        payload: { before: { containerCost: '8.00' }, after: { containerCost: '8.40' }, importedFrom: { file: 'products-good.csv', row: 2 } },
      });
    });

    // OWASP, "CSV Injection": a cell beginning with = is a formula to a spreadsheet program; we store it as typed.
    it('keeps a CSV cell that begins with "=" as text', async () => {
      const [row] = await t.database.db.select().from(products).where(eq(products.code, 'TW-N-001'));
      expect(row!.name).toBe('=SUM(1,2) Trial Tube');
    });

    it('finds nothing to write when the same file comes again', async () => {
      const eventsBefore = await tableCount(domainEvents);
      const result = (await upload(fixtureFile('products-good.csv'), 'products-good.csv', { commit: true })).body as ImportResult;
      expect(result).toMatchObject({ committed: true, creates: 0, updates: 0, unchanged: 6 });
      expect(await tableCount(domainEvents)).toBe(eventsBefore);
    });

    it('reads .xlsx too, and a formula cell is its formula text, not a number', async () => {
      const workbook = new ExcelJS.Workbook();
      const sheet = workbook.addWorksheet('Products');
      sheet.addRow(['Code', 'Name', 'Kind', 'Container Size', 'Container Unit', 'Container Cost']);
      sheet.addRow(['TW-XL-1', 'Workbook Lightener', 'lightener', 450, 'g', 30.5]);
      sheet.addRow(['TW-XL-2', 'Workbook Formula', 'lightener', 450, 'g', { formula: 'F2*2', result: 61 }]);
      const buffer = Buffer.from(await workbook.xlsx.writeBuffer());
      const preview = (await upload(buffer, 'catalogue.xlsx', { contentType: XLSX_MIME })).body as ImportResult;
      expect(preview.rows.map((r) => [r.row, r.values.container_cost, r.errors.map((e) => e.field)])).toEqual([
        [2, '30.5', []],
        [3, '=F2*2', ['container_cost']],
      ]);
      sheet.getRow(3).getCell(6).value = 61;
      const fixed = Buffer.from(await workbook.xlsx.writeBuffer());
      await upload(fixed, 'catalogue.xlsx', { commit: true, contentType: XLSX_MIME });
      const [row] = await t.database.db.select().from(products).where(eq(products.code, 'TW-XL-2'));
      // 61.00 / 450 g = 0.135555… → 0.135556
      expect(row).toMatchObject({ containerCost: '61.00', costPerGram: '0.135556' });
    });

    it('refuses a file over 2 MB with 413 and a plain message', async () => {
      const big = Buffer.alloc(2 * 1024 * 1024 + 1, 'a');
      const response = await upload(big, 'huge.csv', { status: 413 });
      expect(response.body).toMatchObject({ statusCode: 413, message: 'The request is too large.' });
    });

    it('refuses other file types, a missing file and another field name with 400 naming "file"', async () => {
      const pdf = await upload(Buffer.from('%PDF-1.4'), 'catalogue.pdf', { contentType: 'application/pdf', status: 400 });
      expect(pdf.body.details).toEqual([{ field: 'file', message: 'Upload a .csv or .xlsx file.' }]);
      const disguised = await upload(Buffer.from('code,name\nA,B\n'), 'catalogue.csv', { contentType: 'image/png', status: 400 });
      expect(disguised.body.details).toEqual([expect.objectContaining({ field: 'file' })]);
      const none = await call('owner', 'post', 'products/import', undefined, 400);
      expect(none.body.details).toEqual([expect.objectContaining({ field: 'file' })]);
      const otherField = await t
        .http()
        .post('/api/catalogue/products/import')
        .set('Authorization', await as('owner'))
        .attach('upload', Buffer.from('code\nA\n'), { filename: 'a.csv', contentType: 'text/csv' })
        .expect(400);
      expect(otherField.body.details).toEqual([expect.objectContaining({ field: 'file' })]);
    });

    it('refuses a header row that does not fit, naming "file", unknown and missing headings', async () => {
      const response = await upload(Buffer.from('code,name,kind,colour,container_size,container_unit\nA,B,permanent,red,2,oz\n'), 'headers.csv', { status: 400 });
      expect(response.body.details).toEqual([expect.objectContaining({ field: 'file' })]);
      expect(response.body.message).toMatch(/unknown heading "colour"/);
      expect(response.body.message).toMatch(/"container_cost" is missing/);
    });

    it('is for those who may change the catalogue: front desk gets 403 even for a preview', async () => {
      const response = await upload(fixtureFile('products-good.csv'), 'products-good.csv', { role: 'front_desk', status: 403 });
      expect(response.body.message).toBe('Front desk may not create the service menu and product catalogue.');
    });
  });

  describe('service menu upload', () => {
    const upload = async (file: Buffer, filename: string, commit = false, status = 200) =>
      t
        .http()
        .post(`/api/catalogue/services/import?commit=${commit}`)
        .set('Authorization', await as('manager'))
        .attach('file', file, { filename, contentType: 'text/csv' })
        .expect(status);

    it('names each bad row and cell, and a commit writes nothing', async () => {
      const [servicesBefore, pricesBefore, eventsBefore] = [await tableCount(services), await tableCount(servicePrices), await tableCount(domainEvents)];
      const preview = (await upload(fixtureFile('services-with-bad-rows.csv'), 'menu.csv')).body as ImportResult;
      expect(Object.fromEntries(preview.rows.map((r) => [r.row, r.errors.map((e) => e.field)]))).toEqual({
        2: ['duration_minutes'],
        3: ['name'],
        4: ['is_colour', 'price:Associate', 'price:Stylist'],
        5: ['name'],
        6: [],
      });
      const refused = await upload(fixtureFile('services-with-bad-rows.csv'), 'menu.csv', true, 400);
      expect(refused.body.details.map((d: { row: number; field: string }) => `${d.row}:${d.field}`)).toEqual([
        '2:duration_minutes',
        '3:name',
        '4:is_colour',
        '4:price:Associate',
        '4:price:Stylist',
        '5:name',
      ]);
      expect([await tableCount(services), await tableCount(servicePrices), await tableCount(domainEvents)]).toEqual([servicesBefore, pricesBefore, eventsBefore]);
    });

    it('commits a good menu: price columns by level name in any case, creates and updates by name', async () => {
      const result = (await upload(fixtureFile('services-good.csv'), 'menu.csv', true)).body as ImportResult;
      expect(result).toMatchObject({ committed: true, validRows: 4, creates: 2, updates: 1, unchanged: 1 });
      const menu = new Map(((await call('owner', 'get', 'services')).body as Service[]).map((s) => [s.name, s]));
      expect(menu.get('Cut & Finish')!.prices.map((p) => [p.levelName, p.price])).toEqual([
        ['Associate', '58.00'],
        ['Stylist', '68.00'],
        ['Senior', '82.00'],
        ['Principal', '98.00'],
      ]);
      expect(menu.get('Express Gloss')).toMatchObject({ category: 'Colour', durationMinutes: 20, isColour: true });
      expect(menu.get('Express Gloss')!.prices.map((p) => p.levelName)).toEqual(['Associate', 'Stylist']);
      expect(menu.get('Braid, Two Strands')).toMatchObject({ isColour: false, prices: expect.arrayContaining([expect.objectContaining({ levelName: 'Principal', price: '50.00' })]) });
      expect(await latestEvent(menu.get('Cut & Finish')!.id)).toMatchObject({ type: 'ServiceUpdated', payload: { importedFrom: { file: 'menu.csv', row: 2 } } });
    });

    it('refuses a price column for a level that does not exist, naming "file"', async () => {
      const response = await upload(Buffer.from('name,category,duration_minutes,price:Wizard\nSpell Cut,Cuts,30,99\n'), 'menu.csv', false, 400);
      expect(response.body.details).toEqual([expect.objectContaining({ field: 'file' })]);
      expect(response.body.message).toMatch(/unknown heading "price:Wizard".*price:Associate/);
    });
  });
});
