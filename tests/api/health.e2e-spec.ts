import { startTestApp, type TestApp } from './support/test-app.js';

describe('health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('reports the database engine and the newest applied migration without a token', async () => {
    const response = await t.http().get('/api/health').expect(200);
    expect(response.body).toEqual({
      status: 'ok',
      database: process.env.TEST_DATABASE_URL ? 'postgres' : 'pglite',
      migration: expect.stringMatching(/^\d{4}_/),
    });
  });
});
