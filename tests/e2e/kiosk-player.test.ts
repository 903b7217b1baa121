import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot } from '../support/browser.ts';
import { StaffClient } from '../support/staff-client.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

describe('the kiosk player', () => {
  it('pairs with a code, plays slides with credit and licence, keeps playing through an outage, and returns to pairing when revoked', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const admin = await StaffClient.signIn(baseUrl, account('admin').email, account('admin').password);
    const venue = (await admin.call<Array<{ id: string; name: string }>>('GET', '/venues')).find(
      (v) => v.name === DEMO_VENUE.name,
    )!;
    const image = await admin.uploadReadyImage('Corrie Vale Observatory (demo)', 'cc-by-sa-4.0');
    const channel = await admin.call<{ id: string }>('POST', '/channels', { venueId: venue.id, name: 'Player test loop' });
    await admin.call('POST', `/channels/${channel.id}/slides`, {
      kind: 'image',
      mediaId: image,
      caption: 'A glowing cloud of gas (demo picture)',
      durationS: 5,
    });
    await admin.call('POST', `/channels/${channel.id}/slides`, { kind: 'sky_tonight', durationS: 5 });
    const added = await admin.call<{ pairingCode: string; screen: { id: string } }>('POST', `/venues/${venue.id}/screens`, {
      name: 'Player test screen',
    });
    await admin.call('PUT', `/channels/${channel.id}/screens`, { screenIds: [added.screen.id] });

    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.goto(`${baseUrl}/kiosk`);
    await expect.poll(() => page.getByRole('heading', { name: 'Pair this screen' }).isVisible()).toBe(true);
    await page.getByLabel('Pairing code').fill('ZZZ-999');
    await page.getByRole('button', { name: 'Pair this screen' }).click();
    await expect.poll(() => page.getByRole('alert').textContent()).toMatch(/No screen is waiting for this pairing code/);
    await screenshot(page, 'kiosk-pairing-error');
    await page.getByLabel('Pairing code').fill(added.pairingCode.toLowerCase());
    await page.getByRole('button', { name: 'Pair this screen' }).click();

    const shownCredit = page.locator('.slide.shown .credit');
    await expect
      .poll(() => shownCredit.textContent(), { timeout: 20_000 })
      .toBe('Image: Corrie Vale Observatory (demo) · CC BY-SA 4.0');
    await page.waitForTimeout(1700); // let the cross-fade finish before the picture is taken
    // Readable across a room: credit at least 20 px, caption at least 40 px (at 1920 × 1080).
    expect(parseFloat(await shownCredit.evaluate((el) => getComputedStyle(el).fontSize))).toBeGreaterThanOrEqual(20);
    expect(
      parseFloat(await page.locator('.slide.shown .caption').evaluate((el) => getComputedStyle(el).fontSize)),
    ).toBeGreaterThanOrEqual(40);
    await screenshot(page, 'kiosk-image-slide');
    await expect
      .poll(() => page.locator('.slide.shown').getAttribute('class'), { timeout: 15_000 })
      .toContain('layout-sky-table');
    await page.waitForTimeout(1700);
    expect(
      parseFloat(await page.locator('.slide.shown h1').evaluate((el) => getComputedStyle(el).fontSize)),
    ).toBeGreaterThanOrEqual(64);
    await screenshot(page, 'kiosk-sky-slide');

    // The server stops answering: every request fails, as in a network outage.
    await context.route('**/api/**', (route) => route.abort());
    await context.route('**/media/**', (route) => route.abort());
    await context.setOffline(true);
    const seen = new Set<string>();
    for (let i = 0; i < 16; i += 1) {
      await page.waitForTimeout(1000);
      expect(await page.locator('.slide.shown').count()).toBe(1);
      seen.add((await page.locator('.slide.shown').getAttribute('data-slide-id')) ?? 'none');
    }
    expect(seen.size).toBe(2); // still cycling both slides, never a blank screen
    await expect.poll(() => page.locator('.slide.shown .credit').count(), { timeout: 10_000 }).toBe(1);
    await screenshot(page, 'kiosk-offline');

    // Back online; the admin revokes the screen: the player returns to the pairing form.
    await context.setOffline(false);
    await context.unroute('**/api/**');
    await context.unroute('**/media/**');
    await admin.call('POST', `/venues/${venue.id}/screens/${added.screen.id}/revoke`);
    await expect
      .poll(() => page.getByRole('heading', { name: 'Pair this screen' }).isVisible(), { timeout: 50_000, interval: 1000 })
      .toBe(true);
    expect(await page.getByText(/pairing was revoked/).count()).toBe(1);
    await screenshot(page, 'kiosk-revoked');
    expect(errors.filter((e) => !/Failed to load resource|ERR_INTERNET_DISCONNECTED|ERR_FAILED/.test(e))).toEqual([]);
  }, 150_000);

  it('an editor reorders slides with the keyboard and sees the live preview', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await page.setViewportSize({ width: 1440, height: 1000 });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel('E-mail address').fill(account('editor').email);
    await page.getByLabel('Password').fill(account('editor').password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Publishing' }).click();
    await page.getByRole('link', { name: 'Foyer loop (demo)' }).click();
    const slides = page.getByRole('list', { name: 'Slides in playing order' }).locator('li[data-slide-id]');
    await expect.poll(() => slides.count()).toBeGreaterThanOrEqual(2);
    const firstTitle = await slides.nth(0).locator('p.font-medium').textContent();
    await slides.nth(0).getByRole('button', { name: /down$/ }).focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => slides.nth(1).locator('p.font-medium').textContent()).toBe(firstTitle);
    // Focus follows the moved slide (to its Move up button once it is last), so a keyboard user can keep moving it.
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toMatch(
      new RegExp(`^Move “${firstTitle!.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}” (up|down)$`),
    );
    const frame = page.frameLocator('iframe[title="Live preview of the kiosk player"]');
    await expect.poll(() => frame.locator('.slide.shown').count(), { timeout: 15_000 }).toBe(1);
    await page.waitForTimeout(1700);
    await screenshot(page, 'publishing-channel-editor');
    expect(errors).toEqual([]);
  });
});
