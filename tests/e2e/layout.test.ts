import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, type E2eSession, openSessionInBrowser } from '../support/e2e-api.ts';

const WAIT = { timeout: 20_000 };
const ROLES = ['admin', 'editor', 'reviewer', 'writer'] as const;
type Role = (typeof ROLES)[number];
/** A phone (390 × 844, common practice for a current phone) and a tablet held upright (768 × 1024). */
const NARROW = [
  { width: 390, height: 844 },
  { width: 768, height: 1024 },
];

interface Screen {
  name: string;
  url: string;
  roles?: Role[];
  /** Run after the screen has loaded, before measuring (e.g. get a result on screen). */
  act?: (page: Page) => Promise<void>;
  /** Where the lists give way on a phone: at 390 px no table in there may scroll inside its own box either. */
  tablesFit?: string;
}

const firstId = async (s: E2eSession, path: string): Promise<string> => {
  const res = await s.call<{ data: Array<{ id: string }> | { rows: Array<{ id: string }> } }>('GET', path);
  const rows = Array.isArray(res.body.data) ? res.body.data : res.body.data.rows;
  const id = rows[0]?.id;
  if (!id) throw new Error(`no demo row at ${path}`);
  return id;
};

/** A made-up survey designation with no place to break, as real catalogues have. */
const LONG_WORD = 'CorrieValeDeepSkySurveySourceNineteenThousandAndFortyTwoSouthWest';

/** Every main screen of the desk, with the demo scenario's first page, object, statement, venue and channel. */
async function mainScreens(admin: E2eSession, reviewer: E2eSession): Promise<Screen[]> {
  // A page the reviewer sees is one every role may open (not a writer's private draft).
  const pageId = await firstId(reviewer, '/api/pages');
  const objectId = await firstId(admin, '/api/catalogue/objects');
  const statementId = await firstId(admin, '/api/statements');
  const venueId = await firstId(admin, '/api/venues');
  const channelId = await firstId(admin, '/api/channels');
  const staff: Role[] = ['admin', 'editor'];
  return [
    { name: 'overview', url: '/' },
    { name: 'pages', url: '/pages', tablesFit: 'main' },
    { name: 'editor', url: `/pages/${pageId}` },
    { name: 'review', url: `/pages/${pageId}/review` },
    { name: 'revisions', url: `/pages/${pageId}/revisions` },
    { name: 'statements', url: '/statements', tablesFit: 'main' },
    {
      name: 'statement',
      url: `/statements/${statementId}`,
      // Its measurements; the working's wide value tables still scroll in their box on a phone.
      tablesFit: '[aria-labelledby="inputs-heading"]',
    },
    { name: 'catalogue', url: '/catalogue', tablesFit: 'main' },
    // The object planted below, whatever else other tests have added to the first page.
    { name: 'catalogue-long-name', url: `/catalogue?q=${LONG_WORD}`, tablesFit: 'main' },
    { name: 'object', url: `/catalogue/${objectId}` },
    { name: 'sources', url: '/sources' },
    {
      name: 'calculator',
      url: '/calculator',
      act: async (page) => {
        const form = page.getByRole('form', { name: 'Calculation' });
        await form.getByLabel('Quantity').selectOption('lookback_time');
        await form.getByRole('textbox', { name: 'Redshift z', exact: true }).fill('1.5');
        await form.getByRole('button', { name: 'Calculate' }).click();
        await expect.poll(() => page.getByTestId('calc-value').count(), WAIT).toBe(1);
      },
    },
    { name: 'media', url: '/media' },
    { name: 'account', url: '/account' },
    { name: 'venues', url: '/venues', roles: staff },
    { name: 'venue', url: `/venues/${venueId}`, roles: staff, tablesFit: 'main' },
    { name: 'publishing', url: '/publishing', roles: staff },
    { name: 'channel', url: `/publishing/channels/${channelId}`, roles: staff },
    { name: 'organisation', url: '/admin/organisation', roles: ['admin'] },
    { name: 'users', url: '/admin/users', roles: ['admin'] },
    { name: 'outbox', url: '/admin/outbox', roles: ['admin'] },
    { name: 'timeline', url: '/admin/timeline', roles: ['admin'] },
  ];
}

/** How far the document is wider than the window (0 when nothing scrolls sideways). */
const sidewaysOverflow = (page: Page) =>
  page.evaluate(() => Math.max(document.documentElement.scrollWidth, document.body.scrollWidth) - window.innerWidth);

/** Captions or first headings of visible tables whose box scrolls sideways (a column cut off). */
const clippedTables = (page: Page, within: string) =>
  page.evaluate(
    (selector) =>
      [...document.querySelectorAll<HTMLTableElement>(`${selector} table`)]
        .filter((t) => t.offsetParent !== null && t.parentElement!.scrollWidth > t.parentElement!.clientWidth + 1)
        .map((t) => t.caption?.textContent ?? t.querySelector('th')?.textContent ?? 'a table'),
    within,
  );

/** The widest elements that stick out past the right edge, named for a readable failure. */
const culprits = (page: Page) =>
  page.evaluate(() =>
    [...document.querySelectorAll('body *')]
      .filter((el) => el.getBoundingClientRect().right > window.innerWidth + 0.5)
      .slice(-4)
      .map((el) => `${el.tagName.toLowerCase()}.${String(el.className).slice(0, 60)}`),
  );

describe('phones and tablets', () => {
  // About 70 screens in four sessions: longer than the project's two minutes per test.
  it('no main screen scrolls sideways at 390 px or 768 px, for any role', { timeout: 600_000 }, async () => {
    const { context, page, baseUrl } = await openBrowser();
    const admin = await demoSession(baseUrl, 'admin');
    const reviewer = await demoSession(baseUrl, 'reviewer');
    // An object whose name and designation cannot break, so the catalogue's check does not depend on
    // which other tests ran first (the name stays unique so reruns on a kept database add no twin).
    const planted = await admin.call('POST', '/api/catalogue/objects', {
      name: `${LONG_WORD}${Date.now().toString(36)} (demo)`,
      designations: `${LONG_WORD.toUpperCase().slice(0, 58)}`,
      kind: 'galaxy',
      ra: '12 00 00',
      dec: '+12 00 00',
    });
    expect(planted.status, JSON.stringify(planted.body)).toBe(201);
    const screens = await mainScreens(admin, reviewer);
    const wide: string[] = [];
    for (const role of ROLES) {
      await context.clearCookies();
      await openSessionInBrowser(
        context,
        baseUrl,
        role === 'admin' ? admin : role === 'reviewer' ? reviewer : await demoSession(baseUrl, role),
      );
      for (const screen of screens.filter((s) => !s.roles || s.roles.includes(role))) {
        await page.setViewportSize(NARROW[0]);
        await page.goto(`${baseUrl}${screen.url}`);
        await expect
          .poll(() => page.getByRole('heading', { level: 1 }).count(), { ...WAIT, message: `${screen.name} as ${role}` })
          .toBeGreaterThan(0);
        await page.waitForLoadState('networkidle');
        await screen.act?.(page);
        for (const size of NARROW) {
          await page.setViewportSize(size);
          // Layout settles on the next frame after a resize.
          await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
          const over = await sidewaysOverflow(page);
          if (over > 0) wide.push(`${screen.name} as ${role} at ${size.width} px: ${over} px too wide (${await culprits(page)})`);
          const clipped = screen.tablesFit && size.width === NARROW[0].width ? await clippedTables(page, screen.tablesFit) : [];
          if (clipped.length > 0)
            wide.push(`${screen.name} as ${role} at ${size.width} px: table cut off (${clipped.join(', ')})`);
          if (role === 'editor') await screenshot(page, `layout-${screen.name}-${size.width}`);
        }
        if (role === 'editor') {
          await page.setViewportSize({ width: 1440, height: 900 });
          await screenshot(page, `layout-${screen.name}-1440`);
        }
      }
    }
    expect(wide, wide.join('\n')).toEqual([]);
  });

  it('below the breakpoint the navigation is a menu button that opens, moves on and closes', async () => {
    const { context, page, baseUrl } = await openBrowser();
    await openSessionInBrowser(context, baseUrl, await demoSession(baseUrl, 'reviewer'));
    await page.setViewportSize(NARROW[0]);
    await page.goto(`${baseUrl}/`);
    const menu = page.getByRole('button', { name: 'Menu' });
    await expect.poll(() => menu.getAttribute('aria-expanded'), WAIT).toBe('false');
    // The rail's links are not on screen until the menu opens.
    expect(await page.getByRole('link', { name: 'Catalogue' }).isVisible()).toBe(false);
    await menu.click();
    expect(await menu.getAttribute('aria-expanded')).toBe('true');
    await page.getByRole('link', { name: 'Catalogue' }).click();
    await page.waitForURL(/\/catalogue$/);
    await expect.poll(() => menu.getAttribute('aria-expanded')).toBe('false');
    // Escape closes it and gives focus back to the button.
    await menu.click();
    await page.keyboard.press('Escape');
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    expect(await page.evaluate(() => document.activeElement?.textContent?.trim())).toBe('Menu');
    // Sign out and the look are in the menu too.
    await menu.click();
    expect(await page.getByRole('button', { name: 'Sign out' }).isVisible()).toBe(true);
    // On a desktop screen the rail is back and there is no menu button.
    await page.setViewportSize({ width: 1440, height: 900 });
    await expect.poll(() => menu.isVisible()).toBe(false);
    expect(await page.getByRole('link', { name: 'Catalogue' }).isVisible()).toBe(true);
  });

  it("the editor's working panel holds its parameters and every column of its values, at 768 px and 1440 px", async () => {
    const { context, page, baseUrl } = await openBrowser();
    const reviewer = await demoSession(baseUrl, 'reviewer');
    await openSessionInBrowser(context, baseUrl, await demoSession(baseUrl, 'editor'));
    // The first demo page whose text holds a statement (not every demo page has one).
    const pages = await reviewer.call<{ data: Array<{ id: string }> }>('GET', '/api/pages');
    let pageId = '';
    for (const { id } of pages.body.data) {
      const detail = await reviewer.call<{ data: { statements: unknown[] } }>('GET', `/api/pages/${id}`);
      if (detail.body.data.statements.length) {
        pageId = id;
        break;
      }
    }
    expect(pageId, 'a demo page with a statement').not.toBe('');
    for (const size of [NARROW[1], { width: 1440, height: 900 }]) {
      await page.setViewportSize(size);
      await page.goto(`${baseUrl}/pages/${pageId}`);
      await page.locator('.statement-ref-button').first().click();
      const panel = page.getByRole('complementary', { name: 'Statement working' });
      await expect.poll(() => panel.getByText('Show parameters').count(), WAIT).toBe(1);
      // The working's tables fill in as the statement loads.
      await expect.poll(() => panel.locator('table').count(), WAIT).toBeGreaterThan(0);
      await page.waitForLoadState('networkidle');
      const fits = await panel.evaluate((aside) => {
        const edge = aside.getBoundingClientRect().right + 0.5;
        const summary = aside.querySelector('summary')!;
        const tables = [...aside.querySelectorAll('table')];
        return {
          summary: [...summary.children].every((c) => c.getBoundingClientRect().right <= edge),
          // A table narrower than its box shows every column without scrolling.
          tables: tables.every((t) => t.parentElement!.scrollWidth <= t.parentElement!.clientWidth + 1),
        };
      });
      await screenshot(page, `layout-editor-working-${size.width}`);
      const debug = await panel.evaluate((aside) =>
        [...aside.querySelectorAll('table')]
          .filter((t) => t.parentElement!.scrollWidth > t.parentElement!.clientWidth + 1)
          .map(
            (t) =>
              `${t.parentElement!.scrollWidth}/${t.parentElement!.clientWidth}: ${[...t.querySelectorAll('td,th')]
                .sort((a, b) => b.scrollWidth - a.scrollWidth)
                .slice(0, 3)
                .map((c) => `${c.scrollWidth}:${c.textContent}`)
                .join(' | ')}`,
          )
          .join('\n'),
      );
      expect(fits, `at ${size.width} px ${debug}`).toEqual({ summary: true, tables: true });
    }
  });

  it('the red look filters every picture, the logo included, to red on black', async () => {
    const { context, page, baseUrl } = await openBrowser();
    await openSessionInBrowser(context, baseUrl, await demoSession(baseUrl, 'reviewer'));
    await page.setViewportSize({ width: 1440, height: 900 });
    await page.goto(`${baseUrl}/`);
    await page.getByLabel('Look').selectOption('red');
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe('red');
    const logo = page.locator('aside img.sp-logo');
    expect(await logo.evaluate((img) => getComputedStyle(img).filter)).toContain('sp-red-only');
    // The filter keeps only red: its matrix sends nothing to green or blue.
    const matrix = await page.evaluate(() => document.querySelector('#sp-red-only feColorMatrix')?.getAttribute('values'));
    expect(matrix?.split(/\s+/).map(Number).slice(5, 15)).toEqual([0, 0, 0, 0, 0, 0, 0, 0, 0, 0]);
    await screenshot(page, 'layout-red-look');
  });
});
