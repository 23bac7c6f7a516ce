import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { DEMO_PASSWORD, demoBusiness, type DemoRole } from '@tressury/fixtures';
import request from 'supertest';
import { AppModule } from '../../../apps/api/src/app.module.js';
import { configureApp } from '../../../apps/api/src/configure-app.js';
import { Database } from '../../../apps/api/src/database/database.js';

export type TestApp = {
  app: INestApplication;
  http: () => ReturnType<typeof request>;
  database: Database;
  tokenFor: (role: DemoRole) => Promise<string>;
  close: () => Promise<void>;
};

let counter = 0;

/**
 * The real AppModule on a fresh database with the demo organisation, branches and sign-ins loaded (pass
 * `{ TRESSURY_SEED_DEMO: 'full' }` for the whole demo business with its tickets): in-memory PGlite by default,
 * or the PostgreSQL server named by TEST_DATABASE_URL (each app gets its own new database there).
 */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  let dropDatabase: (() => Promise<void>) | null = null;
  const databaseUrl = serverUrl ? await createServerDatabase(serverUrl).then((created) => ((dropDatabase = created.drop), created.url)) : '';
  Object.assign(process.env, {
    TRESSURY_DATA_DIR: `memory://test-${process.pid}-${++counter}`,
    DATABASE_URL: databaseUrl,
    TRESSURY_SEED_DEMO: 'basic',
    LOGIN_THROTTLE_LIMIT: '1000',
    ...env,
  });
  const moduleRef = await Test.createTestingModule({ imports: [AppModule.register()] }).compile();
  const app = moduleRef.createNestApplication<INestApplication>({ logger: ['error'], rawBody: true });
  configureApp(app);
  await app.init();
  const tokens = new Map<DemoRole, string>();
  const http = () => request(app.getHttpServer());
  return {
    app,
    http,
    database: app.get(Database),
    async tokenFor(role) {
      const cached = tokens.get(role);
      if (cached) return cached;
      const user = demoBusiness.users.find((u) => u.role === role)!;
      const response = await http().post('/api/auth/login').send({ email: user.email, password: DEMO_PASSWORD }).expect(200);
      const token = (response.body as { accessToken: string }).accessToken;
      tokens.set(role, token);
      return token;
    },
    async close() {
      await app.close();
      await dropDatabase?.();
    },
  };
}

async function createServerDatabase(serverUrl: string): Promise<{ url: string; drop: () => Promise<void> }> {
  const { Client } = await import('pg');
  const name = `tressury_test_${process.pid}_${Date.now()}_${++counter}`;
  const admin = new Client({ connectionString: serverUrl });
  await admin.connect();
  await admin.query(`create database ${name}`);
  await admin.end();
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      const client = new Client({ connectionString: serverUrl });
      await client.connect();
      await client.query(`drop database if exists ${name} with (force)`);
      await client.end();
    },
  };
}
