import fs from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { type Browser, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Step } from '../../shared/engine/working.ts';
import type { PublicPageDto } from '../../shared/schemas/public-page.ts';
import { measurementName } from '../../shared/statements/working-names.ts';
import { workingSources } from '../../shared/statements/public-evidence.ts';
import { demoSession, ok, openSessionInBrowser } from '../support/e2e-api.ts';

const require = createRequire(import.meta.url);
const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
const baseUrl = inject('baseUrl');
let browser: Browser;

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: string[] }>;
}

/** A visitor's browser with JavaScript turned off: the public pages must work without it. */
async function visitor(width: number): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 }, javaScriptEnabled: false });
  return context.newPage();
}

/** axe-core's serious and critical findings (WCAG 2.x A and AA), run in a scripted copy of the same address. */
async function seriousViolations(url: string, prepare?: (page: Page) => Promise<void>): Promise<string[]> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await page.goto(url);
  if (prepare) await prepare(page);
  await page.evaluate(AXE_SOURCE);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: AxeViolation[] }> } }).axe;
    const result = await axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
      resultTypes: ['violations'],
    });
    return result.violations;
  });
  await context.close();
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${url}: ${v.impact} ${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

async function shot(page: Page, name: string): Promise<void> {
  const dir = path.resolve('tests/e2e/screenshots');
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}

/**
 * Publishes a page whose title and text hold one long unbroken word (a made-up survey designation),
 * so the layout check never depends on what other tests happened to publish first.
 */
async function publishLongWordPage(): Promise<void> {
  const [writer, reviewer, editor] = await Promise.all(
    (['writer', 'reviewer', 'editor'] as const).map((r) => demoSession(baseUrl, r)),
  );
  type Data<T> = { data: T };
  const word = 'CorrieValeDeepFieldSurveyObjectSeventeenThousandTwelveNorthEastQuadrant';
  const title = `Catalogued as ${word}`;
  const objects = (await writer.call('GET', '/api/catalogue/objects')).body as Data<{ rows: Array<{ id: string }> }>;
  const created = ok(
    await writer.call('POST', '/api/pages', { title, objectId: objects.data.rows[0].id, locale: 'en-GB' }),
    'page',
  ).body as Data<{ id: string; version: number }>;
  const doc = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: `Its survey name is ${word}.` }] }] };
  const saved = ok(
    await writer.call('PUT', `/api/pages/${created.data.id}`, { version: created.data.version, title, doc }),
    'save',
  ).body as Data<{ version: number }>;
  ok(await writer.call('POST', `/api/pages/${created.data.id}/submit`, { version: saved.data.version }), 'submit');
  ok(await reviewer.call('POST', `/api/pages/${created.data.id}/signoffs/page`), 'sign off');
  ok(await editor.call('POST', `/api/pages/${created.data.id}/publish`), 'publish');
}

/** The demo's published pages, from the public API. */
async function publishedPages(): Promise<PublicPageDto[]> {
  return ((await (await fetch(`${baseUrl}/api/public/pages`)).json()) as { data: PublicPageDto[] }).data;
}

beforeAll(async () => {
  browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking'],
  });
});

afterAll(async () => {
  await browser?.close();
});

describe('the public pages in a browser', () => {
  it('a visitor without JavaScript goes from the index to a page and opens "How we know"', async () => {
    const pages = await publishedPages();
    // Other browser tests change demo data: a statement whose data moved after sign-off shows no
    // working until a reviewer looks again, so pick a page with a working to show.
    const shows = (p: PublicPageDto) => p.statements.some((s) => s.howWeKnow);
    const demo = pages.find((p) => p.title.includes('3C 48') && shows(p)) ?? pages.find(shows);
    expect(demo, 'a published demo page with a checked statement').toBeTruthy();
    const page = await visitor(1280);
    await page.goto(`${baseUrl}/explore`);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: 'Explore the sky' }).count()).toBe(1);
    await page.getByRole('link', { name: demo!.title }).click();
    await page.waitForURL(`**/explore/${demo!.slug}`);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: demo!.title }).count()).toBe(1);
    const details = page.locator(`details#how-${demo!.statements.findIndex((st) => st.howWeKnow) + 1}`);
    expect(await details.getAttribute('open')).toBeNull();
    await details.locator('summary').click();
    expect(await details.getAttribute('open')).not.toBeNull();
    await expect.poll(() => details.getByText('How it is worked out').isVisible()).toBe(true);
    // The keyboard reaches the disclosure, and it opens with Enter.
    // Another disclosure, still closed (statement 1 may be the one just opened).
    const second = page.locator('details.how:not([open])').first();
    if ((await second.count()) > 0) {
      const id = await second.getAttribute('id');
      await second.locator('summary').focus();
      await page.keyboard.press('Enter');
      expect(await page.locator(`details#${id}`).getAttribute('open')).not.toBeNull();
    }
  });

  it('an editor goes from the live version in the desk to its public page', async () => {
    const editor = await demoSession(baseUrl, 'editor');
    const demo = (await publishedPages())[0];
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    await openSessionInBrowser(context, baseUrl, editor);
    const page = await context.newPage();
    await page.goto(`${baseUrl}/pages/${demo.id}/review`);
    await page.getByRole('button', { name: /^What visitors see now/ }).click();
    const link = page.getByRole('link', { name: 'Open the public page' });
    await expect.poll(() => link.getAttribute('href'), { timeout: 20_000 }).toBe(demo.url);
    await link.click();
    await page.waitForURL(`**/explore/${demo.slug}`);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: demo.title }).count()).toBe(1);
    await context.close();
  });

  it('"How we know" names every source the staff working names, and no id', async () => {
    const reviewer = await demoSession(baseUrl, 'reviewer');
    const page = await visitor(1280);
    let checked = 0;
    for (const published of await publishedPages()) {
      if (!published.statements.length) continue;
      await page.goto(`${baseUrl}/explore/${published.slug}`);
      for (const [i, statement] of published.statements.entries()) {
        // Its data moved after sign-off (another test's change): the disclosure says it is being checked again.
        if (!statement.howWeKnow) continue;
        const staff = await reviewer.call<{
          data: {
            object: { name: string };
            working: Step[];
            inputs: Array<{ citation: string; quantity: string; band: string | null }>;
          };
        }>('GET', `/api/statements/${statement.id}`);
        expect(staff.status).toBe(200);
        const details = page.locator(`details#how-${i + 1}`);
        await details.locator('summary').click();
        // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
        const shown = await details.innerText();
        // The staff view names each measurement ("(3C 48: redshift)"); visitors read that in the list of measurements.
        const named = staff.body.data.inputs.map((input) => ` (${measurementName(staff.body.data.object.name, input)})`);
        for (const source of workingSources(staff.body.data.working)) {
          const bare = named.reduce((text, name) => text.replace(name, ''), source);
          expect(shown, `${published.slug}: ${bare}`).toContain(bare);
        }
        for (const input of staff.body.data.inputs) expect(shown).toContain(input.citation);
        expect(shown).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i);
        checked += 1;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });

  it('reads at 390, 768 and 1280 px without sideways scrolling, and prints with the working open', async () => {
    await publishLongWordPage();
    const pages = await publishedPages();
    const addresses = ['/explore', ...pages.map((p) => `/explore/${p.slug}`), '/explore/no-such-page'];
    const venueLink = /href="(\/explore\/venues\/[^"]+)"/.exec(await (await fetch(`${baseUrl}/explore`)).text());
    if (venueLink) addresses.push(venueLink[1]);
    for (const width of [390, 768, 1280]) {
      const page = await visitor(width);
      for (const address of addresses) {
        await page.goto(`${baseUrl}${address}`);
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        expect(overflow, `${address} at ${width} px`).toBeLessThanOrEqual(0);
        await shot(page, `public-${address.replace(/[^a-z0-9]+/gi, '-')}-${width}`);
      }
      await page.context().close();
    }
    const print = await visitor(1280);
    const withWorking = pages.find((p) => p.statements.length)!;
    await print.goto(`${baseUrl}/explore/${withWorking.slug}`);
    expect(await print.locator('.how-body').first().isVisible()).toBe(false);
    await print.emulateMedia({ media: 'print' });
    expect(await print.locator('.how-body').first().isVisible()).toBe(true);
    expect(await print.locator('footer.site nav').isVisible()).toBe(false);
  });

  it('axe-core finds no serious or critical violation on the index, a page with its working open, the sky tonight and the 404', async () => {
    const pages = await publishedPages();
    const found: string[] = [];
    found.push(...(await seriousViolations(`${baseUrl}/explore`)));
    for (const p of pages)
      found.push(
        ...(await seriousViolations(`${baseUrl}/explore/${p.slug}`, async (page) => {
          for (const d of await page.locator('details').all()) await d.locator('summary').click();
        })),
      );
    const venueLink = /href="(\/explore\/venues\/[^"]+)"/.exec(await (await fetch(`${baseUrl}/explore`)).text());
    if (venueLink) found.push(...(await seriousViolations(`${baseUrl}${venueLink[1]}`)));
    found.push(...(await seriousViolations(`${baseUrl}/explore/no-such-page`)));
    expect(found).toEqual([]);
  });
});
