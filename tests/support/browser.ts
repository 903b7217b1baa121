import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, inject } from 'vitest';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/**
 * Debian's Chromium driven by playwright-core; a fresh profile per call. Closed after the file.
 * Console errors and page errors are collected so tests can assert there were none.
 */
export async function openBrowser(): Promise<{ context: BrowserContext; page: Page; errors: string[]; baseUrl: string }> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1280, height: 860 },
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('console', (m) => {
    // A 401 from /api/auth/me is how the client learns nobody is signed in.
    if (m.type() === 'error' && !/401/.test(m.text())) errors.push(m.text());
  });
  afterAll(async () => {
    await context.close();
    fs.rmSync(profile, { recursive: true, force: true });
  });
  return { context, page, errors, baseUrl: inject('baseUrl') };
}

/** Signs in through the form as a person would. */
export async function signInThroughForm(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Saves a screenshot under tests/e2e/screenshots (git-ignored) for a human look. */
export async function screenshot(page: Page, name: string): Promise<void> {
  const dir = path.resolve('tests/e2e/screenshots');
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}
