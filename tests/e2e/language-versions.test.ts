import { describe, expect, it } from 'vitest';
import { DEMO_VENUE } from '../../server/demo/accounts.ts';
import { seriousAxeFindings } from '../support/axe.ts';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser } from '../support/e2e-api.ts';

const ENGLISH = 'How far away is the Andromeda Galaxy? (demo)';
const FRENCH = 'À quelle distance se trouve la galaxie d’Andromède\u202f? (démo)';
const WIDTHS = [390, 768, 1280];

/** How far the document is wider than the window (0 when nothing scrolls sideways). */
const sideways = (page: Awaited<ReturnType<typeof openBrowser>>['page']) =>
  page.evaluate(() => Math.max(document.documentElement.scrollWidth, document.body.scrollWidth) - window.innerWidth);

describe('language versions on the desk', () => {
  it('each version lists the others with links; a writer adds a version in one click; channels and screens take languages', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const editor = await demoSession(baseUrl, 'editor');
    await openSessionInBrowser(context, baseUrl, editor);
    const pages = ok(await editor.call<{ data: Array<{ id: string; title: string }> }>('GET', '/api/pages?q=Andromeda'), 'pages')
      .body.data;
    const english = pages.find((p) => p.title === ENGLISH)!;

    for (const width of WIDTHS) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/pages/${english.id}`);
      const panel = page.getByRole('region', { name: 'Languages' });
      await expect.poll(() => panel.getByRole('link', { name: FRENCH }).count(), { timeout: 15_000 }).toBe(1);
      expect(await panel.getByText('default for other languages').count()).toBe(1);
      expect(await sideways(page)).toBe(0);
      await panel.scrollIntoViewIfNeeded();
      await screenshot(page, `language-versions-english-${width}`);
    }
    await page.waitForLoadState('networkidle');
    expect(await seriousAxeFindings(page, 'section[aria-labelledby="languages"]')).toEqual([]);
    // From the English version to the French one, which reads its statements in French.
    await page.getByRole('region', { name: 'Languages' }).getByRole('link', { name: FRENCH }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe(FRENCH);
    await expect.poll(() => page.getByRole('region', { name: 'Languages' }).getByRole('link', { name: ENGLISH }).count()).toBe(1);
    expect(await page.getByText(/Français · revision/).count()).toBe(1);

    // "Add an English (US) version": a new draft, opened at once, listed on the others.
    await page.getByRole('button', { name: 'Add an English (US) version' }).click();
    await expect.poll(() => page.getByText(/English \(US\) · revision 1/).count(), { timeout: 15_000 }).toBe(1);
    const panel = page.getByRole('region', { name: 'Languages' });
    await expect.poll(() => panel.getByRole('listitem').count()).toBe(3);
    expect(await page.getByRole('button', { name: /^Add an? .* version$/ }).count()).toBe(0);
    await page.setViewportSize({ width: 390, height: 900 });
    expect(await sideways(page)).toBe(0);
    await screenshot(page, 'language-versions-new-us-390');

    // The channel's languages, and a screen's own language.
    const admin = await demoSession(baseUrl, 'admin');
    await openSessionInBrowser(context, baseUrl, admin);
    const channels = ok(await admin.call<{ data: Array<{ id: string; name: string }> }>('GET', '/api/channels'), 'channels').body
      .data;
    const bilingual = channels.find((c) => c.name === 'Foyer loop in English and French (demo)')!;
    for (const width of WIDTHS) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/publishing/channels/${bilingual.id}`);
      const form = page.getByRole('form', { name: 'Languages this channel plays' });
      await expect.poll(() => form.getByRole('checkbox', { name: 'Français' }).isChecked(), { timeout: 15_000 }).toBe(true);
      expect(await form.getByRole('checkbox', { name: 'English (UK)' }).isChecked()).toBe(true);
      expect(await form.getByRole('checkbox', { name: 'English (US)' }).isChecked()).toBe(false);
      expect(await sideways(page)).toBe(0);
      await form.scrollIntoViewIfNeeded();
      await screenshot(page, `channel-languages-${width}`);
    }
    await page.waitForLoadState('networkidle');
    expect(await seriousAxeFindings(page, 'form[aria-label="Languages this channel plays"]')).toEqual([]);
    const venues = ok(await admin.call<{ data: Array<{ id: string; name: string }> }>('GET', '/api/venues'), 'venues').body.data;
    const venue = venues.find((v) => v.name === DEMO_VENUE.name)!;
    for (const width of WIDTHS) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/venues/${venue.id}`);
      const select = page.getByRole('combobox', { name: 'Language Lobby screen (demo) plays' });
      await expect.poll(() => select.count(), { timeout: 15_000 }).toBe(1);
      expect(await sideways(page)).toBe(0);
      await select.scrollIntoViewIfNeeded();
      await screenshot(page, `screen-language-${width}`);
    }
    await page.waitForLoadState('networkidle');
    expect(await seriousAxeFindings(page, 'section[aria-labelledby="screens-heading"]')).toEqual([]);
    await page.getByRole('combobox', { name: 'Language Lobby screen (demo) plays' }).selectOption('fr-FR');
    await expect
      .poll(async () => {
        const screens = (
          await admin.call<{ data: Array<{ name: string; language: string | null }> }>('GET', `/api/venues/${venue.id}/screens`)
        ).body.data;
        return screens.find((s) => s.name === 'Lobby screen (demo)')?.language;
      })
      .toBe('fr-FR');
    expect(errors).toEqual([]);
  }, 150_000);
});
