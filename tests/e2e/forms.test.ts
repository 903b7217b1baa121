import { describe, expect, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser } from '../support/e2e-api.ts';

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

    await openSessionInBrowser(context, baseUrl, reviewer);
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

  it('a role change waits for confirmation and says it was saved', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const admin = await demoSession(baseUrl, 'admin');
    const invited = ok(
      await admin.call<{ data: { id: string } }>('POST', '/api/users', {
        email: `role-check-${Date.now()}@corrievale.example`,
        name: 'Role Check (demo)',
        role: 'writer',
      }),
      'invite',
    ).body.data;
    const roleNow = async () =>
      (await admin.call<{ data: Array<{ id: string; role: string }> }>('GET', '/api/users')).body.data.find(
        (u) => u.id === invited.id,
      )!.role;
    await openSessionInBrowser(context, baseUrl, admin);
    await page.goto(`${baseUrl}/admin/users`);
    const select = page.getByLabel('Role of Role Check (demo)');
    await expect.poll(() => select.count(), WAIT).toBe(1);
    await select.selectOption('editor');
    await expect.poll(() => page.getByText('Make Role Check (demo) editor?').count()).toBe(1);
    expect(await roleNow()).toBe('writer');
    await page.getByRole('button', { name: 'Save role' }).click();
    await expect.poll(() => page.getByText('Saved: Role Check (demo) is now editor.').count(), WAIT).toBe(1);
    expect(await roleNow()).toBe('editor');
    // Cancel puts the shown role back and changes nothing.
    await select.selectOption('reviewer');
    await page.getByRole('button', { name: 'Cancel' }).click();
    expect(await select.inputValue()).toBe('editor');
    expect(await roleNow()).toBe('editor');
  });
});
