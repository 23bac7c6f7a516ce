import { DEMO_PASSWORD } from '@tressury/fixtures';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataDirLockedError } from '../../apps/api/src/database/data-dir-lock.js';
import { openDatabase } from '../../apps/api/src/database/open-database.js';
import { startTestApp } from './support/test-app.js';

// The data-directory behaviour belongs to embedded PGlite; on a PostgreSQL server the server keeps the data.
const describePglite = process.env.TEST_DATABASE_URL ? describe.skip : describe;

describePglite('embedded database on disk', () => {
  const root = mkdtempSync(join(tmpdir(), 'tressury-persist-'));
  const dataDir = join(root, 'data');
  afterAll(() => rmSync(root, { recursive: true, force: true }));

  it('keeps what was created across a stop and a start, and loads the demo business only once', async () => {
    const first = await startTestApp({ TRESSURY_DATA_DIR: dataDir });
    const owner = `Bearer ${await first.tokenFor('owner')}`;
    await first.http().post('/api/branches').set('Authorization', owner).send({ name: 'Cinder Lane', timeZone: 'America/Phoenix' }).expect(201);
    await first.close();

    const second = await startTestApp({ TRESSURY_DATA_DIR: dataDir });
    const login = await second.http().post('/api/auth/login').send({ email: 'owner@thistlewick.example', password: DEMO_PASSWORD }).expect(200);
    const list = await second.http().get('/api/branches').set('Authorization', `Bearer ${login.body.accessToken}`).expect(200);
    const names = list.body.map((b: { name: string }) => b.name);
    expect(names).toContain('Cinder Lane');
    expect(names.filter((n: string) => n === 'Riverside')).toHaveLength(1);
    await second.close();
  });

  it('refuses to open a data directory another live process holds', async () => {
    const opened = await openDatabase({ databaseUrl: null, dataDir });
    try {
      await expect(openDatabase({ databaseUrl: null, dataDir })).rejects.toBeInstanceOf(DataDirLockedError);
    } finally {
      await opened.close();
    }
    const again = await openDatabase({ databaseUrl: null, dataDir });
    await again.close();
  });
});
