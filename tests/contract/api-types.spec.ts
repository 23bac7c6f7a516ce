import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import openapiTS, { astToString } from 'openapi-typescript';
import { describe, expect, it } from 'vitest';
import { repoRoot } from '../support/running-app.js';

// CONVENTIONS.md: the web's API types are generated from the API's OpenAPI document, never hand-written.
describe('the web app’s API types', () => {
  const fresh = join(mkdtempSync(join(tmpdir(), 'tressury-openapi-')), 'openapi.json');
  execFileSync(process.execPath, [join(repoRoot, 'apps/api/dist/write-openapi.js'), fresh]);

  it('the committed OpenAPI document matches the built API (run `npm run api-types` after changing a DTO)', () => {
    expect(readFileSync(join(repoRoot, 'apps/api/openapi.json'), 'utf8')).toBe(readFileSync(fresh, 'utf8'));
  });

  it('the committed apps/web/src/lib/api-schema.d.ts is what openapi-typescript makes of it', async () => {
    const generated = astToString(await openapiTS(new URL(`file://${fresh}`)));
    const committed = readFileSync(join(repoRoot, 'apps/web/src/lib/api-schema.d.ts'), 'utf8');
    expect(committed.replace(/^\/\*\*[\s\S]*?\*\/\s*/, '').trim()).toBe(generated.replace(/^\/\*\*[\s\S]*?\*\/\s*/, '').trim());
  });

  it('lists every route with its request and response schemas', () => {
    const doc = JSON.parse(readFileSync(fresh, 'utf8')) as { paths: Record<string, Record<string, { responses: Record<string, { content?: unknown }>; requestBody?: unknown }>> };
    const create = doc.paths['/api/branches']!.post!;
    expect(create.requestBody).toBeDefined();
    expect(create.responses['201']!.content).toBeDefined();
    expect(doc.paths['/api/auth/me']!.get!.responses['200']!.content).toBeDefined();
  });
});
