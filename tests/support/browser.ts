import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { type Browser, chromium, type Page } from 'playwright-core';
import { repoRoot } from './running-app.js';

export const screenshotDir = join(repoRoot, 'tests/output/screenshots');

// Playwright gives each launch a fresh temporary profile of its own (it refuses a --user-data-dir argument).
export async function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}

export const DEMO_PASSWORD = 'tressury-demo';
const demoEmail = (who: string) => (who.includes('@') ? who : `${who}@thistlewick.example`);

/** Signs a demo user in through the sign-in page (`who` is the part before @thistlewick.example, or a whole address). */
export async function signInPage(
  browser: Browser,
  baseUrl: string,
  who: string,
  options: { viewport?: { width: number; height: number }; acceptDownloads?: boolean } = {},
): Promise<Page> {
  const page = await browser.newPage({ viewport: options.viewport ?? { width: 1366, height: 900 }, acceptDownloads: options.acceptDownloads });
  await page.goto(baseUrl);
  await page.getByLabel('E-mail').fill(demoEmail(who));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  return page;
}

/** Calls the running app's API directly, for setting a scenario up before the browser takes over. */
export function demoApi(baseUrl: () => string) {
  return {
    async tokenOf(who: string): Promise<string> {
      const response = await fetch(`${baseUrl()}/api/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: demoEmail(who), password: DEMO_PASSWORD }),
      });
      return ((await response.json()) as { accessToken: string }).accessToken;
    },
    async call<T>(path: string, token: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
      const response = await fetch(`${baseUrl()}${path}`, {
        method: init.method ?? 'GET',
        headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
        body: init.body === undefined ? undefined : JSON.stringify(init.body),
      });
      if (!response.ok) throw new Error(`${init.method ?? 'GET'} ${path}: ${response.status} ${await response.text()}`);
      return (await response.json()) as T;
    },
  };
}
