import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { localToMs } from '../../shared/sky/time-zone.ts';
import { DEMO_VENUE } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser, readyImage } from '../support/e2e-api.ts';

type Venue = { id: string; name: string };
type Feed = { _starproof: { sun_days: Array<{ date: string; sunset: string }> } };

/** Every laid-out box on the slide shown now that reaches outside the screen, by class and size. */
async function overflowing(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const w = window.innerWidth;
    const h = window.innerHeight;
    const out: string[] = [];
    for (const el of document.querySelectorAll('.slide.shown *')) {
      // The picture and its shade are cropped by design (object-fit: cover inside the slide).
      if (el.closest('.picture, .shade, .visually-hidden')) continue;
      const r = el.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue;
      if (r.left < -1 || r.top < -1 || r.right > w + 1 || r.bottom > h + 1)
        out.push(
          `${el.tagName.toLowerCase()}.${el.getAttribute('class') ?? ''} ${Math.round(r.left)},${Math.round(r.top)}–${Math.round(r.right)},${Math.round(r.bottom)}`,
        );
    }
    const panel = document.querySelector('.slide.shown .panel');
    if (panel && panel.scrollHeight > panel.clientHeight + 1) out.push('panel scrolls');
    return out;
  });
}

describe('smarter screens in the browser', () => {
  it('lays out every slide kind at 1080 × 1920 and 1920 × 1080 with nothing off the screen, QR codes readable', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const editor = await demoSession(baseUrl, 'editor');
    await openSessionInBrowser(context, baseUrl, editor);
    const venue = (ok(await editor.call<{ data: Venue[] }>('GET', '/api/venues'), 'venues').body.data as Venue[]).find(
      (v) => v.name === DEMO_VENUE.name,
    )!;
    const sources = ok(
      await editor.call<{ data: { pages: Array<{ id: string; title: string; statements: Array<{ id: string }> }> } }>(
        'GET',
        '/api/channels/slide-sources',
      ),
      'sources',
    ).body.data;
    const page1 = sources.pages.find((p) => p.title.startsWith('How far away is the Andromeda Galaxy'))!;
    const admin = await demoSession(baseUrl, 'admin');
    const imageId = await readyImage(admin, await glow(), 'Corrie Vale Observatory (demo)');

    const kinds: Array<[string, Record<string, unknown>]> = [
      ['text', { kind: 'page', pageId: page1.id, statementIds: page1.statements.slice(0, 2).map((s) => s.id) }],
      [
        'image-text',
        { kind: 'page', pageId: page1.id, statementIds: page1.statements.slice(0, 2).map((s) => s.id), mediaId: imageId },
      ],
      [
        'image',
        {
          kind: 'image',
          mediaId: imageId,
          caption: 'A glowing cloud of gas and dust, as a small telescope and a long exposure show it (demo picture)',
        },
      ],
      ['sky-table', { kind: 'sky_tonight' }],
    ];
    for (const [layout, slide] of kinds) {
      const channel = ok(
        await editor.call<{ data: { id: string } }>('POST', '/api/channels', { venueId: venue.id, name: `Layout ${layout}` }),
        'channel',
      ).body.data;
      ok(await editor.call('POST', `/api/channels/${channel.id}/slides`, slide), `slide ${layout}`);
      for (const [width, height] of [
        [1080, 1920],
        [1920, 1080],
      ]) {
        await page.setViewportSize({ width, height });
        await page.goto(`${baseUrl}/kiosk?preview=${channel.id}`);
        await expect.poll(() => page.locator(`.slide.shown.layout-${layout}`).count(), { timeout: 20_000 }).toBe(1);
        await page.waitForTimeout(1700); // the cross-fade
        const portrait = height > width;
        expect(await page.evaluate(() => document.documentElement.className)).toContain(portrait ? 'portrait' : 'landscape');
        expect(await overflowing(page), `${layout} at ${width}×${height}`).toEqual([]);
        // Readable across a room in both orientations (DESIGN.md: title ≥ 64 px, body ≥ 40 px at 1080 px across the short side).
        const title = page.locator('.slide.shown .title');
        if (await title.count())
          expect(parseFloat(await title.evaluate((el) => getComputedStyle(el).fontSize))).toBeGreaterThanOrEqual(64);
        if (layout === 'text' || layout === 'image-text') {
          const qr = page.locator('.slide.shown .qr svg');
          const box = (await qr.boundingBox())!;
          expect(box.width).toBeGreaterThanOrEqual(200);
          expect(await page.locator('.slide.shown .qr').getAttribute('data-url')).toMatch(
            /\/explore\/how-far-away-is-the-andromeda-galaxy-demo$/,
          );
        }
        await screenshot(page, `kiosk-${portrait ? 'portrait' : 'landscape'}-${layout}`);
      }
    }
    // The holding screen and the pairing form, portrait.
    await page.setViewportSize({ width: 1080, height: 1920 });
    const empty = ok(
      await editor.call<{ data: { id: string } }>('POST', '/api/channels', { venueId: venue.id, name: 'Layout holding' }),
      'channel',
    ).body.data;
    await page.goto(`${baseUrl}/kiosk?preview=${empty.id}`);
    await expect.poll(() => page.locator('.slide.shown.layout-holding .holding-venue').textContent()).toBe(DEMO_VENUE.name);
    await page.waitForTimeout(1700);
    expect(await overflowing(page)).toEqual([]);
    await screenshot(page, 'kiosk-portrait-holding');
    await context.clearCookies();
    await page.goto(`${baseUrl}/kiosk`);
    await expect.poll(() => page.getByRole('heading', { name: 'Pair this screen' }).isVisible()).toBe(true);
    expect(await overflowing(page)).toEqual([]);
    await screenshot(page, 'kiosk-portrait-pairing');
    // A display hung on its side whose computer still sends 1920 × 1080: the screen's setting turns the slides.
    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.evaluate(() => localStorage.setItem('starproof.kiosk.orientation', 'portrait'));
    await page.reload();
    await expect.poll(() => page.getByRole('heading', { name: 'Pair this screen' }).isVisible()).toBe(true);
    expect(await page.evaluate(() => document.documentElement.className)).toMatch(/(?=.*\bportrait\b)(?=.*\brotated\b)/);
    const turned = (await page.locator('#kiosk').boundingBox())!;
    expect([Math.round(turned.width), Math.round(turned.height)]).toEqual([1920, 1080]); // the turned box fills the screen
    await screenshot(page, 'kiosk-rotated-pairing');
    expect(errors.filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
  }, 240_000);

  it('follows a sunset schedule by its own (mocked) clock, with the network gone', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const admin = await demoSession(baseUrl, 'admin');
    const venue = (ok(await admin.call<{ data: Venue[] }>('GET', '/api/venues'), 'venues').body.data as Venue[]).find(
      (v) => v.name === DEMO_VENUE.name,
    )!;
    const imageId = await readyImage(admin, await glow('38%'), 'Corrie Vale Observatory (demo)');
    const channel = ok(
      await admin.call<{ data: { id: string } }>('POST', '/api/channels', { venueId: venue.id, name: 'Schedule test' }),
      'channel',
    ).body.data;
    const always = ok(
      await admin.call<{ data: { slides: Array<{ id: string }> } }>('POST', `/api/channels/${channel.id}/slides`, {
        kind: 'image',
        mediaId: imageId,
        caption: 'Always on (demo)',
        durationS: 5,
      }),
      'slide',
    ).body.data.slides[0].id;
    const evening = ok(
      await admin.call<{ data: { slides: Array<{ id: string }> } }>('POST', `/api/channels/${channel.id}/slides`, {
        kind: 'sky_tonight',
        durationS: 5,
        schedule: { from: { at: 'sunset', offsetMin: -60 }, until: { at: 'clock', time: '23:00' } },
      }),
      'scheduled slide',
    ).body.data.slides[1].id;
    const added = ok(
      await admin.call<{ data: { pairingCode: string; screen: { id: string } } }>('POST', `/api/venues/${venue.id}/screens`, {
        name: 'Schedule test screen',
      }),
      'screen',
    ).body.data;
    ok(await admin.call('PUT', `/api/channels/${channel.id}/screens`, { screenIds: [added.screen.id] }), 'assign');
    const paired = await (
      await fetch(`${baseUrl}/api/kiosk/pair`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ code: added.pairingCode }),
      })
    ).json();
    const token = paired.data.token as string;
    const feedRes = await fetch(`${baseUrl}/api/kiosk/feed`, { headers: { Authorization: `Bearer ${token}` } });
    const feedText = await feedRes.text();
    const feed = JSON.parse(feedText) as Feed;
    const days = feed._starproof.sun_days;
    const today = days[1]; // days[0] is yesterday
    const sunset = Date.parse(today.sunset);

    // The player knows only the feed, served once without a Date header: its own clock is the only clock.
    let served = false;
    await context.route('**/api/kiosk/feed', async (route) => {
      if (served) return route.abort();
      served = true;
      await route.fulfill({
        status: 200,
        headers: { 'content-type': 'application/feed+json', etag: '"schedule-test"' },
        body: feedText,
      });
    });
    await context.route('**/api/kiosk/heartbeat', (route) => route.abort());
    await context.addInitScript(
      ([t, id]) => {
        if (!localStorage.getItem('starproof.kiosk.pairing'))
          localStorage.setItem(
            'starproof.kiosk.pairing',
            JSON.stringify({
              token: t,
              screenId: id,
              screenName: 'Schedule test screen',
              venueName: 'Corrie Vale Planetarium (demo)',
            }),
          );
      },
      [token, added.screen.id],
    );
    await page.clock.install({ time: new Date(sunset - 90 * 60_000) });
    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.goto(`${baseUrl}/kiosk`);
    const seen = async (seconds: number) => {
      const ids = new Set<string>();
      for (let i = 0; i < seconds; i += 1) {
        await page.waitForTimeout(1000);
        ids.add(
          (await page
            .locator('.slide.shown')
            .getAttribute('data-slide-id')
            .catch(() => null)) ?? 'none',
        );
      }
      return ids;
    };
    await expect.poll(() => page.locator(`.slide.shown[data-slide-id="${always}"]`).count(), { timeout: 20_000 }).toBe(1);
    expect([...(await seen(12))]).toEqual([always]); // 1 h 30 min before sunset: the sky slide waits
    await screenshot(page, 'kiosk-schedule-before');

    await page.clock.setSystemTime(new Date(sunset - 30 * 60_000)); // within the hour before sunset
    await expect.poll(() => page.locator(`.slide.shown[data-slide-id="${evening}"]`).count(), { timeout: 20_000 }).toBe(1);
    expect(await seen(12)).toEqual(new Set([always, evening]));
    await page.waitForTimeout(500);
    await screenshot(page, 'kiosk-schedule-evening');

    // 23:30 local: the evening is over, still with no network.
    await page.clock.setSystemTime(new Date(localToMs(today.date, 23 * 60 + 30, 'Europe/London')));
    await page.waitForTimeout(11_000);
    expect([...(await seen(12))]).toEqual([always]);
    // Three days on, half an hour before that day's own sunset (from the feed's days), it shows again.
    await page.clock.setSystemTime(new Date(Date.parse(days[4].sunset) - 30 * 60_000));
    await expect.poll(() => page.locator(`.slide.shown[data-slide-id="${evening}"]`).count(), { timeout: 20_000 }).toBe(1);
    expect(errors.filter((e) => !/Failed to load resource|ERR_FAILED/.test(e))).toEqual([]);
  }, 180_000);

  it('admins set a slide’s schedule and see each screen’s health, at 390, 768 and 1280 px', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const admin = await demoSession(baseUrl, 'admin');
    await openSessionInBrowser(context, baseUrl, admin);
    const venue = (ok(await admin.call<{ data: Venue[] }>('GET', '/api/venues'), 'venues').body.data as Venue[]).find(
      (v) => v.name === DEMO_VENUE.name,
    )!;
    const channel = ok(
      await admin.call<{ data: { id: string } }>('POST', '/api/channels', { venueId: venue.id, name: 'Schedule editor test' }),
      'channel',
    ).body.data;
    ok(await admin.call('POST', `/api/channels/${channel.id}/slides`, { kind: 'sky_tonight' }), 'slide');

    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto(`${baseUrl}/publishing/channels/${channel.id}`);
    await page.getByRole('button', { name: 'Timing' }).click();
    await page.getByLabel('Show only on certain days, times or dates').check();
    for (const day of ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun']) await page.getByLabel(day, { exact: true }).uncheck();
    await page.getByRole('button', { name: 'Save timing' }).click();
    await expect.poll(() => page.getByRole('alert').filter({ hasText: 'at least one day' }).count()).toBe(1);
    await screenshot(page, 'channel-schedule-error-1280');
    await page.getByLabel('Fri', { exact: true }).check();
    await page.getByLabel('Sat', { exact: true }).check();
    await page.getByLabel('From', { exact: true }).selectOption('sunset');
    await page.getByLabel('Minutes from sunset (− before)').fill('-60');
    await page.getByLabel('Until', { exact: true }).selectOption('clock');
    await page.getByLabel('Time', { exact: true }).fill('23:00');
    await page.getByRole('button', { name: 'Save timing' }).click();
    await expect.poll(() => page.getByText('Shown Fri, Sat, from 1 h before sunset until 23:00 (venue time)').count()).toBe(1);
    await page.getByLabel('QR code on object slides').uncheck();
    await page.getByLabel('E-mail admins when a screen is silent for (minutes)').fill('3');
    await page.getByRole('button', { name: 'Save options' }).click();
    // The browser itself holds the 5-minute floor (the server refuses it too: tests/api/smarter-screens.test.ts).
    expect(
      await page
        .getByLabel('E-mail admins when a screen is silent for (minutes)')
        .evaluate((el) => (el as HTMLInputElement).validity.rangeUnderflow),
    ).toBe(true);
    await page.getByLabel('E-mail admins when a screen is silent for (minutes)').fill('20');
    await page.getByRole('button', { name: 'Save options' }).click();
    await expect
      .poll(
        async () =>
          (await admin.call<{ data: { showQr: boolean; silenceAlertMinutes: number } }>('GET', `/api/channels/${channel.id}`))
            .body.data,
      )
      .toMatchObject({ showQr: false, silenceAlertMinutes: 20 });

    for (const width of [390, 768, 1280]) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/publishing/channels/${channel.id}`);
      await page.getByRole('button', { name: 'Timing' }).click();
      await expect.poll(() => page.getByLabel('Minutes from sunset (− before)').inputValue()).toBe('-60');
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      await screenshot(page, `channel-schedule-${width}`);
      await page.goto(`${baseUrl}/venues/${venue.id}`);
      await expect.poll(() => page.getByText('Stairwell portrait screen (demo)').count()).toBe(1);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      await screenshot(page, `venue-screens-health-${width}`);
    }
    // The admin turns the demo portrait screen back to "as the display reports".
    const row = page.getByRole('listitem').filter({ hasText: 'Stairwell portrait screen (demo)' });
    expect(await row.getByText('showing How far away is the Andromeda Galaxy? (demo) (portrait)').count()).toBe(1);
    await row.getByLabel('Hangs').selectOption('auto');
    await expect
      .poll(
        async () =>
          (
            await admin.call<{ data: Array<{ name: string; orientation: string }> }>('GET', `/api/venues/${venue.id}/screens`)
          ).body.data.find((s) => s.name === 'Stairwell portrait screen (demo)')?.orientation,
      )
      .toBe('auto');
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
  });
});

/** A generated picture: a soft reddish glow on dark blue, like a nebula. */
async function glow(centre = '62%'): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="2400" height="1500"><defs>
    <radialGradient id="g" cx="${centre}" cy="45%" r="45%"><stop offset="0" stop-color="#f2a07b"/><stop offset="0.35" stop-color="#a8425a"/><stop offset="0.7" stop-color="#2b1d4a"/><stop offset="1" stop-color="#070b18"/></radialGradient></defs>
    <rect width="2400" height="1500" fill="#070b18"/><rect width="2400" height="1500" fill="url(#g)"/></svg>`;
  return sharp(Buffer.from(svg)).jpeg().toBuffer();
}
