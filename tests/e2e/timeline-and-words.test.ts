import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;
const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/;

describe('Earth’s timeline and numbers for people, in the browser', () => {
  it('an admin reads and edits the timeline at 390, 768 and 1280 px; a bad entry is explained by field', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, account('admin').email, account('admin').password);
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.goto(`${baseUrl}/admin/timeline`);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Earth’s timeline');
    await expect.poll(() => page.getByText(/International Chronostratigraphic Chart v2023\/09/).count()).toBeGreaterThan(0);
    for (const [width, height] of [
      [390, 844],
      [768, 1024],
      [1280, 900],
    ]) {
      await page.setViewportSize({ width, height });
      await screenshot(page, `timeline-${width}`);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth), `${width} px`).toBe(true);
    }
    await page.getByRole('button', { name: 'Add an entry' }).click();
    const form = page.getByRole('form', { name: 'New entry' });
    await form.getByLabel('Short name (for staff)').fill('Invented entry (browser test)');
    await form.getByLabel('Date (years ago)').fill('1000');
    await form.getByLabel('Uncertainty (± years, as the source gives it)').fill('2000');
    await form.getByRole('button', { name: 'Add the entry' }).click();
    await expect.poll(() => form.getByText('The uncertainty must be smaller than the date itself').count()).toBe(1);
    await expect.poll(() => form.getByText('Name the published source of the date').count()).toBe(1);
    await screenshot(page, 'timeline-form-errors');
    await form.getByRole('button', { name: 'Cancel' }).click();
    expect(errors).toEqual([]);
  }, 120_000);

  it('the sky’s Night of field shows the night on screen; the working names measurements, never their ids', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, account('editor').email, account('editor').password);
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Venues' }).click();
    await page.getByRole('link', { name: DEMO_VENUE.name }).click();
    await expect.poll(() => page.getByRole('table').getByRole('rowheader').count()).toBe(7);
    const night = page.getByLabel('Night of');
    await expect.poll(() => night.inputValue()).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const shown = await night.inputValue();
    // The browser's locale writes the date; the field and the sentence name the same night.
    expect(await page.getByText(/^Night of .+\. Positions at/).textContent()).toContain(
      await page.evaluate(
        (d) => new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' }).format(new Date(`${d}T12:00:00Z`)),
        shown,
      ),
    );
    await screenshot(page, 'sky-night-of');

    // A demo statement's working: sources name the object and quantity.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Statements' }).click();
    await page
      .getByRole('link', { name: /^The Andromeda Galaxy is about/ })
      .first()
      .click();
    await page.waitForURL(/\/statements\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByText(/Andromeda Galaxy: distance/).count()).toBeGreaterThan(0);
    const main = (await page.locator('main').textContent()) ?? '';
    expect(main).not.toMatch(UUID);
    await screenshot(page, 'statement-working-names');
    expect(errors).toEqual([]);
  }, 120_000);
});
