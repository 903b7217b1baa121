import { describe, expect, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser, type E2eSession } from '../support/e2e-api.ts';

const WAIT = { timeout: 20_000 };

async function draftPage(writer: E2eSession, title: string) {
  const objects = await writer.call<{ data: { rows: Array<{ id: string }> } }>('GET', '/api/catalogue/objects?q=3C%20279');
  return ok(
    await writer.call<{ data: { id: string; version: number } }>('POST', '/api/pages', {
      title,
      objectId: objects.body.data.rows[0]!.id,
      locale: 'en-GB',
    }),
    'create page',
  ).body.data;
}

describe('archive and delete pages', () => {
  it('a writer deletes their draft after giving a reason; an editor archives a page, finds it under "Show archived" and restores it', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const writer = await demoSession(baseUrl, 'writer');
    const editor = await demoSession(baseUrl, 'editor');
    const doomed = await draftPage(writer, 'Started by mistake (demo)');

    await openSessionInBrowser(context, baseUrl, writer);
    await page.goto(`${baseUrl}/pages/${doomed.id}`);
    await page.getByRole('button', { name: 'Delete', exact: true }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete this page for good?' });
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(true);
    // No reason: refused in words, nothing deleted.
    await dialog.getByRole('button', { name: 'Delete for good' }).click();
    await expect.poll(() => dialog.getByText('Give a reason: it is kept with the history.').count()).toBe(1);
    await dialog.getByLabel(/Why is it deleted/).fill('A duplicate of another draft');
    await dialog.getByRole('button', { name: 'Delete for good' }).click();
    await page.waitForURL(/\/pages$/, WAIT);
    await expect.poll(() => page.getByText('Page deleted').count(), WAIT).toBe(1);
    expect((await writer.call('GET', `/api/pages/${doomed.id}`)).status).toBe(404);

    const kept = await draftPage(writer, 'Parked for next season (demo)');
    await context.clearCookies();
    await openSessionInBrowser(context, baseUrl, editor);
    await page.goto(`${baseUrl}/pages/${kept.id}`);
    await page.getByRole('button', { name: 'Archive', exact: true }).click();
    const archive = page.getByRole('dialog', { name: 'Archive this page?' });
    await archive.getByLabel(/Why is it archived/).fill('Not needed this season');
    await archive.getByRole('button', { name: 'Archive' }).click();
    await expect.poll(() => page.getByText(/hidden from the page lists and from every public output/).count(), WAIT).toBe(1);
    await screenshot(page, 'desk-flow-archived');

    await page.goto(`${baseUrl}/pages`);
    await page.getByLabel('Title contains').fill('Parked for next season');
    await expect.poll(() => page.getByText('No pages match these filters.').count(), WAIT).toBe(1);
    await page.getByLabel('Archived pages').selectOption('include');
    const row = page.getByRole('row', { name: /Parked for next season/ });
    await expect.poll(() => row.count(), WAIT).toBe(1);
    expect(await row.getByText('Archived', { exact: true }).count()).toBe(1);
    await row.getByRole('link').click();
    await page.getByRole('button', { name: 'Restore', exact: true }).click();
    const restore = page.getByRole('dialog', { name: 'Restore this page?' });
    await restore.getByLabel(/Why is it coming back/).fill('Needed after all');
    await restore.getByRole('button', { name: 'Restore' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Archive', exact: true }).count(), WAIT).toBe(1);
    expect(await page.getByText(/hidden from the page lists/).count()).toBe(0);
  });
});

describe('the new-page object picker', () => {
  it('says how many objects there are, and searches the server from the first key', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const writer = await demoSession(baseUrl, 'writer');
    const count = async (q: string) =>
      (await writer.call<{ data: { total: number } }>('GET', `/api/catalogue/objects?pageSize=1&q=${encodeURIComponent(q)}`)).body
        .data.total;
    const all = await count('');
    await openSessionInBrowser(context, baseUrl, writer);
    await page.goto(`${baseUrl}/pages`);
    await page.getByRole('button', { name: 'New page' }).click();
    const form = page.getByRole('form', { name: 'New page' });
    const expected =
      all > 20
        ? `20 of ${all.toLocaleString('en-GB')} objects shown — type to search`
        : `All ${all} object${all === 1 ? '' : 's'} shown`;
    await expect.poll(() => form.getByText(expected).count(), WAIT).toBe(1);
    await form.getByRole('searchbox').fill('N');
    const nCount = await count('N');
    await expect
      .poll(
        () => form.getByText(new RegExp(`${nCount.toLocaleString('en-GB')} (matching )?objects? (shown|match)`)).count(),
        WAIT,
      )
      .toBe(1);
    const listed = await form.getByRole('listbox').getByRole('option').allTextContents();
    expect(listed.length).toBe(Math.min(20, nCount));
    await screenshot(page, 'desk-flow-object-picker');
  });
});

describe('the pairing dialog', () => {
  it('shows the player’s address and a QR code of it beside the code, at 390 px too', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const admin = await demoSession(baseUrl, 'admin');
    // A venue of its own: other browser tests count the demo venue's screens.
    const venue = ok(
      await admin.call<{ data: { id: string } }>('POST', '/api/venues', {
        name: `Pairing check ${Date.now()} (demo)`,
        latitude: 54.62,
        longitude: -2.95,
        elevationM: 160,
        timeZone: 'Europe/London',
      }),
      'venue',
    ).body.data;
    await openSessionInBrowser(context, baseUrl, admin);
    await page.goto(`${baseUrl}/venues/${venue.id}`);
    await page.getByLabel('New screen’s name').fill('Planetarium shop screen');
    await page.getByRole('button', { name: 'Add screen' }).click();
    const dialog = page.getByRole('dialog', { name: 'Pairing code for Planetarium shop screen' });
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(true);
    const address = `${new URL(baseUrl).origin}/kiosk`;
    expect(await dialog.getByRole('link', { name: address }).count()).toBe(1);
    expect(await dialog.getByRole('img', { name: `QR code of the player’s address, ${address}` }).count()).toBe(1);
    await screenshot(page, 'desk-flow-pairing-1280');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await screenshot(page, 'desk-flow-pairing-390');
  });
});

describe('messages that belong to an earlier attempt go', () => {
  it('the calculator drops its result when a later input is refused', async () => {
    const { context, page, baseUrl } = await openBrowser();
    await openSessionInBrowser(context, baseUrl, await demoSession(baseUrl, 'reviewer'));
    await page.goto(`${baseUrl}/calculator`);
    const form = page.getByRole('form', { name: 'Calculation' });
    await form.getByLabel('Quantity').selectOption('lookback_time');
    await form.getByRole('textbox', { name: 'Redshift z', exact: true }).fill('1.5');
    await form.getByRole('radio', { name: /Planck 2018/ }).check();
    await form.getByRole('button', { name: 'Calculate' }).click();
    await expect.poll(() => page.getByTestId('calc-value').count(), WAIT).toBe(1);
    await form.getByRole('textbox', { name: 'Redshift z', exact: true }).fill('one and a half');
    await form.getByRole('button', { name: 'Calculate' }).click();
    await expect.poll(() => page.getByTestId('calc-value').count(), WAIT).toBe(0);
    await screenshot(page, 'desk-flow-calculator-refused');
  });

  it('"Choose a time in the future" goes once the page is published', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const editor = await demoSession(baseUrl, 'editor');
    const pages = await editor.call<{ data: Array<{ id: string; status: string }> }>('GET', '/api/pages?pageSize=100');
    const target = pages.body.data.find((p) => p.status === 'approved') ?? pages.body.data.find((p) => p.status === 'published')!;
    if (target.status === 'published') ok(await editor.call('POST', `/api/pages/${target.id}/unpublish`), 'unpublish');
    await openSessionInBrowser(context, baseUrl, editor);
    await page.goto(`${baseUrl}/pages/${target.id}/review`);
    const panel = page.getByRole('region', { name: 'Publishing' });
    await panel.getByLabel('Publish at').fill('2020-01-01T10:00');
    await panel.getByRole('button', { name: 'Schedule' }).click();
    await expect.poll(() => panel.getByText(/Choose a time in the future/).count(), WAIT).toBe(1);
    await panel.getByRole('button', { name: /^Publish/ }).click();
    await expect.poll(() => panel.getByText(/^Live: revision/).count(), WAIT).toBe(1);
    expect(await panel.getByText(/Choose a time in the future/).count()).toBe(0);
    // The version switch says which is the working draft and which is what visitors see, never two bare numbers.
    const which = page.getByRole('group', { name: 'Which version' });
    await expect.poll(() => which.getByRole('button', { name: /^What visitors see now \(revision \d+/ }).count(), WAIT).toBe(1);
    const labels = await which.getByRole('button').allTextContents();
    expect(labels[0]).toMatch(/^(Revision \d+ with today’s wording|Working draft \(revision \d+\))$/);
    expect(await page.getByText(/^Both are revision \d+|visitors still see revision/).count()).toBe(1);
  });
});

describe('an invitation link is checked when the page opens', () => {
  it('a fresh link shows the password form; a used or garbage link says so at once, with no password form', async () => {
    const { page, baseUrl } = await openBrowser();
    const admin = await demoSession(baseUrl, 'admin');
    const email = `invited-${Date.now()}@example.test`;
    ok(await admin.call('POST', '/api/users', { email, name: 'Invited Guide (demo)', role: 'writer' }), 'invite');
    let token = '';
    for (let i = 0; i < 100 && !token; i += 1) {
      const outbox = await admin.call<{ data: Array<{ to: string; text: string }> }>('GET', '/api/outbox');
      const mail = outbox.body.data.find((m) => m.to.includes(email));
      token = mail ? decodeURIComponent(/token=([A-Za-z0-9_%-]+)/.exec(mail.text)![1]!) : '';
      if (!token) await new Promise((r) => setTimeout(r, 100));
    }
    expect(token).not.toBe('');

    await page.goto(`${baseUrl}/welcome?token=not-a-real-token`);
    await expect.poll(() => page.getByText('This invitation link does not work').count(), WAIT).toBe(1);
    expect(await page.getByLabel('New password').count()).toBe(0);
    await screenshot(page, 'desk-flow-invitation-invalid');

    await page.goto(`${baseUrl}/welcome?token=${encodeURIComponent(token)}`);
    await expect.poll(() => page.getByLabel('New password').count(), WAIT).toBeGreaterThan(0);
    // Used by someone else meanwhile: opening the link again says so before any password is typed.
    const accepted = await fetch(`${baseUrl}/api/auth/invitation/accept`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ token, newPassword: 'nebula-lantern-harbour-92' }),
    });
    expect(accepted.status).toBe(200);
    await page.goto(`${baseUrl}/welcome?token=${encodeURIComponent(token)}`);
    await expect.poll(() => page.getByText('This invitation has already been used').count(), WAIT).toBe(1);
    expect(await page.getByLabel('New password').count()).toBe(0);
  });
});

describe('removing a slide', () => {
  it('can be undone for a few seconds (nothing reaches the server meanwhile), then goes for good', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const editor = await demoSession(baseUrl, 'editor');
    const venues = await editor.call<{ data: Array<{ id: string }> }>('GET', '/api/venues');
    const channel = ok(
      await editor.call<{ data: { id: string } }>('POST', '/api/channels', {
        venueId: venues.body.data[0]!.id,
        name: `Undo check ${Date.now()} (demo)`,
      }),
      'channel',
    ).body.data;
    ok(await editor.call('POST', `/api/channels/${channel.id}/slides`, { kind: 'sky_tonight' }), 'sky slide');
    const slidesOnServer = async () =>
      (await editor.call<{ data: { slides: unknown[] } }>('GET', `/api/channels/${channel.id}`)).body.data.slides.length;
    const before = await slidesOnServer();

    await openSessionInBrowser(context, baseUrl, editor);
    await page.goto(`${baseUrl}/publishing/channels/${channel.id}`);
    await expect.poll(() => page.getByRole('button', { name: 'Remove “The sky tonight”' }).count(), WAIT).toBe(1);
    await page.getByRole('button', { name: 'Remove “The sky tonight”' }).click();
    const toast = page.getByRole('status').filter({ hasText: '“The sky tonight” removed from the channel.' });
    await expect.poll(() => toast.count(), WAIT).toBe(1);
    expect(await page.getByRole('button', { name: 'Remove “The sky tonight”' }).count()).toBe(0);
    await screenshot(page, 'desk-flow-slide-undo');
    expect(await slidesOnServer()).toBe(before);
    await toast.getByRole('button', { name: /^Undo/ }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Remove “The sky tonight”' }).count(), WAIT).toBe(1);
    expect(await toast.count()).toBe(0);
    expect(await slidesOnServer()).toBe(before);

    await page.getByRole('button', { name: 'Remove “The sky tonight”' }).click();
    await expect.poll(() => toast.count(), WAIT).toBe(1);
    // After the undo window the removal is sent, once.
    await expect.poll(() => slidesOnServer(), { timeout: 20_000 }).toBe(before - 1);
    await expect.poll(() => toast.count(), WAIT).toBe(0);
  });
});
