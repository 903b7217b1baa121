import fs from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, openSessionInBrowser } from '../support/e2e-api.ts';

const require = createRequire(import.meta.url);
const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
const WAIT = { timeout: 20_000 };

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: string[]; failureSummary?: string }>;
}

/** Runs axe-core (WCAG 2.x A and AA rules) in the page; returns serious and critical findings, readably. */
async function seriousViolations(page: Page): Promise<string[]> {
  // Through the DevTools protocol, not a <script> tag: our Content-Security-Policy rightly refuses inline scripts.
  await page.evaluate(AXE_SOURCE);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: AxeViolation[] }> } }).axe;
    const result = await axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
      resultTypes: ['violations'],
    });
    return result.violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.impact} ${v.id}: ${v.help}\n${v.nodes
          .slice(0, 5)
          .map((n) => `    at ${n.target.join(' ')}${n.failureSummary ? ` — ${n.failureSummary.replace(/\s+/g, ' ')}` : ''}`)
          .join('\n')}`,
    );
}

/** Opens a screen, waits for its main heading (the app has loaded its data), and checks it. */
async function check(page: Page, baseUrl: string, url: string, ready: () => Promise<unknown>, name: string, found: string[]) {
  await page.goto(`${baseUrl}${url}`);
  await expect.poll(ready, { ...WAIT, message: `${name} did not load` }).toBeTruthy();
  await page.waitForLoadState('networkidle');
  for (const v of await seriousViolations(page)) found.push(`[${name}] ${v}`);
  await screenshot(page, `a11y-${name}`);
}

describe('accessibility', () => {
  it('the main screens and the kiosk pairing screen have no serious or critical axe-core findings', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const found: string[] = [];
    const h1 = () => page.getByRole('heading', { level: 1 }).count();
    // Signed out first: the sign-in form and a kiosk screen that is not paired yet.
    await check(page, baseUrl, '/sign-in', () => page.getByRole('button', { name: 'Sign in' }).count(), 'sign-in', found);
    await check(page, baseUrl, '/kiosk', () => page.locator('input').count(), 'kiosk-pairing', found);
    // The pairing form by keyboard alone: Tab reaches the field, Enter submits, the answer is announced.
    await page.locator('body').focus();
    for (let i = 0; i < 5 && !(await page.evaluate(() => document.activeElement?.tagName === 'INPUT')); i += 1)
      await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.tagName)).toBe('INPUT');
    await page.keyboard.type('ZZZ-ZZZ');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.getByRole('alert').textContent(), WAIT).toMatch(/\w/);

    await openSessionInBrowser(context, baseUrl, await demoSession(baseUrl, 'admin'));
    const screens: Array<[string, string]> = [
      ['overview', '/'],
      ['pages', '/pages'],
      ['catalogue', '/catalogue'],
      ['statements', '/statements'],
      ['media', '/media'],
      ['venues', '/venues'],
      ['publishing', '/publishing'],
      ['admin-users', '/admin/users'],
    ];
    for (const [name, url] of screens) await check(page, baseUrl, url, h1, name, found);
    expect(found, `axe-core findings:\n${found.join('\n')}`).toEqual([]);
  });
});
