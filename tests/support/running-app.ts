import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

export const repoRoot = resolve(import.meta.dirname, '../..');

export type RunningApp = { baseUrl: string; stop: () => Promise<void> };

/**
 * Starts the built app (API + web) as a user would, on its own port and a fresh data directory;
 * `env` adds or overrides settings, e.g. a higher LOGIN_THROTTLE_LIMIT for a test that signs in often.
 */
export async function startBuiltApp(port: number, env: Record<string, string> = {}): Promise<RunningApp> {
  const dataRoot = mkdtempSync(join(tmpdir(), 'tressury-browser-'));
  const child: ChildProcess = spawn(process.execPath, [join(repoRoot, 'apps/api/dist/main.js')], {
    env: { ...process.env, PORT: String(port), TRESSURY_DATA_DIR: join(dataRoot, 'data'), DATABASE_URL: '', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  // The full demo loads and builds its read models before listening: allow for a busy machine.
  const startSeconds = 180;
  const deadline = Date.now() + startSeconds * 1000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited early:\n${output}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      // Stop it here: the caller never gets a handle to stop it with.
      child.once('exit', () => rmSync(dataRoot, { recursive: true, force: true }));
      child.kill('SIGTERM');
      throw new Error(`the app did not start within ${startSeconds} s:\n${output}`);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return {
    baseUrl,
    stop: async () => {
      const exited = new Promise((done) => child.once('exit', done));
      child.kill('SIGTERM');
      await exited;
      rmSync(dataRoot, { recursive: true, force: true });
    },
  };
}
