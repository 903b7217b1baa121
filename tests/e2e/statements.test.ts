import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser } from '../support/e2e-api.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

describe('checked statements in the browser', () => {
  it('a reviewer reads a statement’s wording, inputs and working', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, account('reviewer').email, account('reviewer').password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Statements' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Statements');
    await page
      .getByRole('link', { name: /TON 618 set out about/ })
      .first()
      .click();
    await expect.poll(() => page.getByRole('heading', { name: 'Public wording', exact: true }).count()).toBe(1);
    await expect.poll(() => page.getByText('Worked out with the Planck 2018').count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByRole('heading', { name: 'Working', exact: true }).count()).toBe(1);
    await expect.poll(() => page.getByText('Public wording: round to what the data supports').count()).toBeGreaterThan(0);
    await screenshot(page, 'statement-detail');
    expect(errors).toEqual([]);
  });

  it('a writer works out a planet’s light time tonight for the venue, and sees the venue and night on the statement', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const writer = await demoSession(baseUrl, 'writer');
    await openSessionInBrowser(context, baseUrl, writer);
    const found = ok(
      await writer.call<{ data: { rows: Array<{ id: string; name: string }> } }>('GET', '/api/catalogue/objects?q=Mars'),
      'find Mars',
    ).body.data.rows;
    await page.goto(`${baseUrl}/catalogue/${found.find((o) => o.name === 'Mars')!.id}`);
    await page.getByLabel('Add a statement').selectOption({ label: 'How long a planet’s light takes to reach us tonight' });
    const venue = page.getByLabel('Venue whose night it is');
    // Other browser tests add venues of their own, so the demo venue is chosen by name.
    await venue.selectOption({ label: 'Corrie Vale Planetarium (demo) (Europe/London)' });
    await expect.poll(() => venue.locator('option:checked').textContent()).toBe('Corrie Vale Planetarium (demo) (Europe/London)');
    await page.getByRole('button', { name: 'Work it out' }).click();
    const made = page.getByRole('link', { name: /^Light from Mars takes about [\d.]+ minutes to reach us tonight\.$/ });
    await expect.poll(() => made.count()).toBe(1);
    await expect.poll(() => page.getByText(/for Corrie Vale Planetarium \(demo\), night of/).count()).toBeGreaterThan(0);
    await made.click();
    await expect.poll(() => page.getByText(/^The night of .+ at Corrie Vale Planetarium \(demo\)$/).count()).toBe(1);
    await expect.poll(() => page.getByText('Mars’s distance from the Earth at the observation time').count()).toBe(1);
    await expect.poll(() => page.getByText(/^La lumière de Mars met environ/).count()).toBe(1);
    await screenshot(page, 'statement-tonight');
    expect(errors).toEqual([]);
  });

  it('an admin previews a cosmology change side by side, switches, and a reviewer accepts a changed statement', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, account('admin').email, account('admin').password);
    await page.getByRole('link', { name: 'Organisation' }).click();
    await page.getByLabel('Model').selectOption('wmap9');
    await page.getByRole('button', { name: 'Preview the change' }).click();
    await expect.poll(() => page.getByRole('columnheader', { name: 'After the change' }).count()).toBe(1);
    await screenshot(page, 'cosmology-preview');
    await page.getByRole('button', { name: /Switch to WMAP/ }).click();
    await expect.poll(() => page.getByText(/Switched\. Every statement is being recomputed/).count()).toBe(1);
    // A new preview starts a new decision: the last switch's confirmation goes.
    await page.getByRole('button', { name: 'Preview the change' }).click();
    await expect.poll(() => page.getByText(/Switched\. Every statement is being recomputed/).count()).toBe(0);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/sign-in/);

    await signInThroughForm(page, baseUrl, account('reviewer').email, account('reviewer').password);
    // Wait for the sign-in to land: navigating away earlier would cancel it and leave no session.
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    const first = page.getByRole('link', { name: /3C 279/ }).first();
    // The recompute runs in the background and the list does not refresh itself: look again until it is done.
    await expect
      .poll(
        async () => {
          await page.goto(`${baseUrl}/statements?status=changed`);
          await page.waitForLoadState('networkidle');
          return first.count();
        },
        { timeout: 90_000, interval: 1000 },
      )
      .toBeGreaterThan(0);
    await first.click();
    await expect.poll(() => page.getByText('Accepted wording (on pages now)').count()).toBeGreaterThan(0);
    await screenshot(page, 'statement-changed');
    await page.getByRole('button', { name: 'Accept new wording' }).click();
    await expect.poll(() => page.getByText('Accepted wording (on pages now)').count()).toBe(0);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/sign-in/);

    // Back to Planck 2018, so later tests see the demo as shipped.
    await signInThroughForm(page, baseUrl, account('admin').email, account('admin').password);
    await page.getByRole('link', { name: 'Organisation' }).click();
    await page.getByLabel('Model').selectOption('planck18');
    await page.getByRole('button', { name: 'Preview the change' }).click();
    await page.getByRole('button', { name: /Switch to Planck 2018/ }).click();
    await expect.poll(() => page.getByText(/Switched\. Every statement is being recomputed/).count()).toBe(1);
    expect(errors).toEqual([]);
  });
});
