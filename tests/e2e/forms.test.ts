import { describe, expect, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, useSessionInBrowser } from '../support/e2e-api.ts';

const WAIT = { timeout: 20_000 };

describe('forms that never lie', () => {
  it('retiring a measurement asks for its reason in a dialog and refuses an empty one', async () => {
    const { context, page, errors, baseUrl } = await openBrowser();
    const reviewer = await demoSession(baseUrl, 'reviewer');
    const objects = await reviewer.call<{ data: { rows: Array<{ id: string }> } }>('GET', '/api/catalogue/objects?q=3C%20279');
    const objectId = objects.body.data.rows[0]!.id;
    const source = ok(
      await reviewer.call<{ data: { id: string } }>('POST', '/api/catalogue/sources', {
        citation: 'Corrie Vale spectroscopy log, night 12 (demo)',
      }),
      'source',
    ).body.data;
    const measurement = ok(
      await reviewer.call<{ data: { id: string } }>('POST', `/api/catalogue/objects/${objectId}/measurements`, {
        quantity: 'redshift',
        value: '0.51',
        uncertainty: '0.02',
        sourceId: source.id,
      }),
      'measurement',
    ).body.data;

    await useSessionInBrowser(context, baseUrl, reviewer);
    await page.goto(`${baseUrl}/catalogue/${objectId}`);
    const row = page.getByRole('region', { name: 'Redshift' }).getByRole('listitem').filter({ hasText: '0.51 ± 0.02' });
    await expect.poll(() => row.count(), WAIT).toBe(1);
    await row.getByRole('button', { name: 'Retire' }).click();
    const dialog = page.getByRole('dialog', { name: /^Retire 0\.51 ± 0\.02/ });
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(true);
    await dialog.getByRole('button', { name: 'Retire' }).click();
    await expect.poll(() => dialog.getByText('Give a reason: it is kept with the history.').count()).toBe(1);
    expect(await dialog.isVisible()).toBe(true);
    await screenshot(page, 'forms-retire-dialog');
    await dialog.getByLabel(/Why is it retired/).fill('Superseded by the night 14 spectrum.');
    await dialog.getByRole('button', { name: 'Retire' }).click();
    await expect.poll(() => dialog.count(), WAIT).toBe(0);
    const after = await reviewer.call<{ data: Array<{ id: string; retired: boolean; retireReason: string | null }> }>(
      'GET',
      `/api/catalogue/objects/${objectId}/measurements`,
    );
    const retired = after.body.data.find((m) => m.id === measurement.id)!;
    expect(retired.retired).toBe(true);
    expect(retired.retireReason).toBe('Superseded by the night 14 spectrum.');
    expect(errors).toEqual([]);
  });
});
