import { describe, expect, it } from 'vitest';
import { startLocalPostgres, stopLocalPostgres } from '../../server/db/local-postgres.ts';
import { DEMO_VENUE } from '../../server/demo/accounts.ts';
import { TEST_CLUSTER } from '../setup/test-postgres.ts';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, readyImage, openSessionInBrowser } from '../support/e2e-api.ts';
import { solidImage } from '../support/media.ts';

const BEFORE = 'The Crab Nebula is what is left of a star that exploded. ';
const DURING = 'Its remnant still shines, powered by a spinning neutron star at its heart.';
const health = async (base: string) => (await fetch(`${base}/api/health`, { signal: AbortSignal.timeout(10_000) })).status;

describe.skipIf(!!process.env.STARPROOF_TEST_DATABASE_URL)('a database outage seen in the browser', () => {
  it('the writer is told saving is retrying, the autosave lands by itself afterwards, and the kiosk never stops playing', async () => {
    const { context, page: editor, errors, baseUrl } = await openBrowser();
    const [admin, writer] = await Promise.all([demoSession(baseUrl, 'admin'), demoSession(baseUrl, 'writer')]);

    // A venue of its own (the demo venue's screens are counted elsewhere), a channel with a picture
    // and tonight's sky, and a screen the kiosk pairs with below.
    const venue = ok(
      await admin.call<{ data: { id: string } }>('POST', '/api/venues', { ...DEMO_VENUE, name: 'Outage test dome (test)' }),
      'venue',
    ).body.data;
    const image = await readyImage(admin, await solidImage(1920, 1080, '#1b2a4a'), 'Corrie Vale Observatory (demo)');
    const channel = ok(
      await admin.call<{ data: { id: string } }>('POST', '/api/channels', { venueId: venue.id, name: 'Outage test loop' }),
      'channel',
    ).body.data;
    ok(
      await admin.call('POST', `/api/channels/${channel.id}/slides`, {
        kind: 'image',
        mediaId: image,
        caption: 'A quiet blue field (demo picture)',
        durationS: 5,
      }),
      'image slide',
    );
    ok(await admin.call('POST', `/api/channels/${channel.id}/slides`, { kind: 'sky_tonight', durationS: 5 }), 'sky slide');
    const added = ok(
      await admin.call<{ data: { pairingCode: string; screen: { id: string } } }>('POST', `/api/venues/${venue.id}/screens`, {
        name: 'Outage test screen',
      }),
      'screen',
    ).body.data;
    ok(await admin.call('PUT', `/api/channels/${channel.id}/screens`, { screenIds: [added.screen.id] }), 'assign screen');

    // The writer's page, opened in the editor.
    const crab = ok(
      await writer.call<{ data: { rows: Array<{ id: string; name: string }> } }>('GET', '/api/catalogue/objects?q=Crab'),
      'find object',
    ).body.data.rows.find((o) => o.name === 'Crab Nebula')!;
    const created = ok(
      await writer.call<{ data: { id: string } }>('POST', '/api/pages', {
        title: 'The Crab Nebula through an outage',
        objectId: crab.id,
        locale: 'en-GB',
      }),
      'page',
    ).body.data;

    const kiosk = await context.newPage();
    kiosk.on('pageerror', (e) => errors.push(`kiosk: ${e.message}`));
    const feedAnswers: Array<{ at: number; status: number }> = [];
    kiosk.on('response', (r) => {
      if (r.url().includes('/api/kiosk/feed')) feedAnswers.push({ at: Date.now(), status: r.status() });
    });
    await kiosk.setViewportSize({ width: 1280, height: 720 });
    await kiosk.goto(`${baseUrl}/kiosk`);
    await kiosk.getByLabel('Pairing code').fill(added.pairingCode);
    await kiosk.getByRole('button', { name: 'Pair this screen' }).click();
    await expect.poll(() => kiosk.locator('.slide.shown .credit').count(), { timeout: 30_000 }).toBe(1);

    await openSessionInBrowser(context, baseUrl, writer);
    await editor.goto(`${baseUrl}/pages/${created.id}`);
    const body = editor.getByRole('textbox', { name: 'Page text' });
    const status = editor.getByRole('status').filter({ hasText: /saved|Saving|retrying/i });
    await body.click();
    await editor.keyboard.type(BEFORE);
    await expect.poll(() => status.textContent(), { timeout: 20_000 }).toMatch(/All changes saved/);

    stopLocalPostgres(TEST_CLUSTER.dataDir);
    const outageStarted = Date.now();
    const seen = new Set<string>();
    try {
      expect(await health(baseUrl)).toBe(503);
      await body.focus();
      await editor.keyboard.press('End');
      await editor.keyboard.type(DURING);
      // The save fails: the writer reads that it is retrying by itself, and the text stays on screen.
      await expect
        .poll(() => status.textContent(), { timeout: 30_000 })
        .toMatch(/Not saved yet: retrying.*database is not answering.*tries again by itself/s);
      // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
      expect(await body.innerText()).toContain(BEFORE.trim());
      // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
      expect(await body.innerText()).toContain(DURING);
      await screenshot(editor, 'outage-editor-retrying');

      // Held for 15 s at least, and until the kiosk has asked for its feed during the outage (it polls every 30 s).
      while (Date.now() - outageStarted < 15_000 || !feedAnswers.some((a) => a.at > outageStarted && a.status >= 500)) {
        expect(Date.now() - outageStarted, 'the kiosk asked for its feed during the outage').toBeLessThan(60_000);
        await kiosk.waitForTimeout(1000);
        expect(await kiosk.locator('.slide.shown').count()).toBe(1);
        expect(await kiosk.getByRole('heading', { name: 'Pair this screen' }).count()).toBe(0);
        seen.add((await kiosk.locator('.slide.shown').getAttribute('data-slide-id')) ?? 'none');
      }
      await screenshot(kiosk, 'outage-kiosk-playing');
    } finally {
      await startLocalPostgres({ ...TEST_CLUSTER, database: 'postgres', fast: true });
    }
    const restarted = Date.now();
    expect(seen.size, 'the kiosk moved from slide to slide during the outage').toBe(2);

    await expect.poll(() => health(baseUrl), { timeout: 30_000, interval: 500 }).toBe(200);
    // No one touches anything: the planned retry saves the text typed during the outage.
    await expect.poll(() => status.textContent(), { timeout: 60_000, interval: 500 }).toMatch(/All changes saved/);
    const saved = ok(await writer.call<{ data: { doc: unknown } }>('GET', `/api/pages/${created.id}`), 'read page').body.data;
    expect(JSON.stringify(saved.doc)).toContain(BEFORE.trim());
    expect(JSON.stringify(saved.doc)).toContain(DURING);
    // Opened afresh, the page holds all of it, with nothing waiting in the browser.
    await editor.reload();
    // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
    await expect.poll(() => body.innerText()).toContain(DURING);
    expect(await editor.evaluate((id) => localStorage.getItem(`starproof:page-draft:${id}`), created.id)).toBeNull();
    await screenshot(editor, 'outage-editor-saved');

    // The kiosk is still paired and playing, and its feed answers again.
    await expect
      .poll(() => feedAnswers.some((a) => a.at > restarted && (a.status === 200 || a.status === 304)), {
        timeout: 60_000,
        interval: 1000,
      })
      .toBe(true);
    expect(await kiosk.locator('.slide.shown').count()).toBe(1);
    ok(await admin.call('POST', `/api/venues/${venue.id}/screens/${added.screen.id}/revoke`), 'revoke the test screen');
    expect(errors.filter((e) => !/Failed to load resource: the server responded with a status of 503/.test(e))).toEqual([]);
  }, 240_000);
});
