import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot } from '../support/browser.ts';
import { StaffClient } from '../support/staff-client.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;
const ENGLISH = 'How far away is the Andromeda Galaxy? (demo)';
const FRENCH = 'À quelle distance se trouve la galaxie d’Andromède\u202f? (démo)';

describe('the kiosk player in several languages', () => {
  it('alternates between the channel’s languages, then plays only the screen’s own', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    const admin = await StaffClient.signIn(baseUrl, account('admin').email, account('admin').password);
    const venue = (await admin.call<Array<{ id: string; name: string }>>('GET', '/venues')).find(
      (v) => v.name === DEMO_VENUE.name,
    )!;
    const pages = await admin.call<Array<{ id: string; title: string; locale: string }>>('GET', '/pages?q=Andromeda');
    const english = pages.find((p) => p.title === ENGLISH)!;
    const channel = await admin.call<{ id: string }>('POST', '/channels', {
      venueId: venue.id,
      name: 'Two languages (player test)',
    });
    await admin.call('PATCH', `/channels/${channel.id}`, { name: 'Two languages (player test)', languages: ['en-GB', 'fr-FR'] });
    const detail = await admin.call<{ statements: Array<{ id: string }> }>('GET', `/pages/${english.id}`);
    const statementIds = detail.statements.map((st) => st.id);
    await admin.call('POST', `/channels/${channel.id}/slides`, { kind: 'page', pageId: english.id, statementIds, durationS: 5 });
    const added = await admin.call<{ pairingCode: string; screen: { id: string } }>('POST', `/venues/${venue.id}/screens`, {
      name: 'Two-language screen (player test)',
    });
    await admin.call('PUT', `/channels/${channel.id}/screens`, { screenIds: [added.screen.id] });

    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.goto(`${baseUrl}/kiosk`);
    await page.getByLabel('Pairing code').fill(added.pairingCode);
    await page.getByRole('button', { name: 'Pair this screen' }).click();

    const shown = page.locator('.slide.shown');
    await expect.poll(() => shown.getAttribute('lang'), { timeout: 20_000 }).toBe('en-GB');
    expect(await shown.locator('h1').textContent()).toBe(ENGLISH);
    expect(await shown.locator('.as-of').first().textContent()).toMatch(/^as of \d{1,2} [A-Z][a-z]+ \d{4}$/);
    await expect.poll(() => shown.getAttribute('lang'), { timeout: 15_000 }).toBe('fr-FR');
    expect(await shown.locator('h1').textContent()).toBe(FRENCH);
    // French words and number format in the statements: "millions d’années", a decimal comma.
    const statements = await shown.locator('.statement-text').allTextContents();
    expect(statements.join(' ')).toMatch(/années/);
    expect(await shown.locator('.as-of').first().textContent()).toMatch(/^en date du \d{1,2} [a-zé]+ \d{4}$/);
    await page.waitForTimeout(1700);
    await screenshot(page, 'kiosk-french-round');
    // And back to English: the rounds alternate.
    await expect.poll(() => shown.getAttribute('lang'), { timeout: 15_000 }).toBe('en-GB');

    // The screen gets a language of its own: from its next poll it plays only French.
    const newFeed = page.waitForResponse((r) => r.url().endsWith('/api/kiosk/feed') && r.status() === 200, { timeout: 45_000 });
    await admin.call('PATCH', `/venues/${venue.id}/screens/${added.screen.id}`, { language: 'fr-FR' });
    expect(((await (await newFeed).json()) as { _starproof: { languages: string[] } })._starproof.languages).toEqual(['fr-FR']);
    // The slide on screen finishes its 5 s (and its fade), then only French plays.
    await page.waitForTimeout(7000);
    const seen = new Set<string | null>();
    for (let i = 0; i < 12; i += 1) {
      await page.waitForTimeout(1000);
      seen.add(await page.locator('.slide.shown').last().getAttribute('lang'));
    }
    expect([...seen]).toEqual(['fr-FR']);
    expect(errors).toEqual([]);
  }, 150_000);
});
