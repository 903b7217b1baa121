import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

describe('signing in as a person would', () => {
  it('a writer signs in, sees the writer navigation, and signs out', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await page.goto(`${baseUrl}/admin/users`);
    await page.waitForURL(/\/sign-in\?next=/);
    await screenshot(page, 'sign-in');

    await page.getByLabel('E-mail address').fill(account('writer').email);
    await page.getByLabel('Password').fill('a-wrong-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').textContent()).toMatch(/do not match/);

    await page.getByLabel('Password').fill(account('writer').password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    // The writer asked for an admin screen: it says so instead of showing it.
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toMatch(/Not available to your role/);
    const admin = page.getByRole('navigation', { name: 'Administration' });
    expect(await admin.count()).toBe(0);
    await page.getByRole('link', { name: 'Overview' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toMatch(/Good to see you, Tobin/);
    await screenshot(page, 'writer-home');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in$/);
    await page.goto(`${baseUrl}/`);
    await page.waitForURL(/\/sign-in/);
    expect(errors).toEqual([]);
  });

  it('an admin sees the admin navigation and invites someone', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, account('admin').email, account('admin').password);
    await page.getByRole('navigation', { name: 'Administration' }).getByRole('link', { name: 'Users' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Users');
    await page.getByRole('button', { name: 'Invite someone' }).click();
    const form = page.getByRole('form', { name: 'Invite someone' });
    await form.getByLabel('Name').fill('Wren Astley');
    await form.getByLabel('E-mail address').fill('not-an-address');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => form.getByText('Enter a valid e-mail address').count()).toBe(1);
    await form.getByLabel('E-mail address').fill('wren.astley@example.test');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByText('wren.astley@example.test').count()).toBe(1);
    await screenshot(page, 'admin-users');
    await page.getByRole('link', { name: 'Outbox' }).click();
    await expect.poll(() => page.getByText('You have been invited to Starproof').count()).toBeGreaterThan(0);
    await screenshot(page, 'admin-outbox');
    expect(errors).toEqual([]);
  });
});
