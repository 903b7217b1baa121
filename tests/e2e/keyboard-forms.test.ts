import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot } from '../support/browser.ts';
import { solidImage } from '../support/media.ts';

const admin = DEMO_ACCOUNTS.find((a) => a.role === 'admin')!;
const stamp = Date.now().toString(36);

const isFocused = (target: Locator) => target.evaluate((el) => el === document.activeElement);

/** Whether the focused element shows it: the browser counts it as keyboard focus and draws an outline or a ring. */
const focusDrawn = (target: Locator) =>
  target.evaluate((el) => {
    const s = getComputedStyle(el);
    const transparent = /rgba\(0, 0, 0, 0\)|transparent/;
    const outline = s.outlineStyle !== 'none' && parseFloat(s.outlineWidth) >= 1 && !transparent.test(s.outlineColor);
    const ring =
      s.boxShadow !== 'none' &&
      s.boxShadow.split(/,(?![^(]*\))/).some((layer) => !transparent.test(layer) && /[1-9][\d.]*px/.test(layer));
    return el.matches(':focus-visible') && (outline || ring);
  });

/** Presses Tab (or Shift+Tab) until the target has focus, then checks the focus can be seen. */
async function tabTo(page: Page, target: Locator, { back = false, max = 80 } = {}) {
  await expect.poll(() => target.isVisible(), { message: 'the control is on screen' }).toBe(true);
  for (let i = 0; i < max && !(await isFocused(target)); i += 1) await page.keyboard.press(back ? 'Shift+Tab' : 'Tab');
  expect(await isFocused(target), `reached by ${back ? 'Shift+Tab' : 'Tab'} within ${max} presses`).toBe(true);
  expect(await focusDrawn(target), 'focus is visible on it').toBe(true);
}

/** Moves a focused drop-down to an option with the arrow keys. */
async function arrowTo(page: Page, select: Locator, matches: (value: string) => boolean) {
  await page.keyboard.press('Home');
  for (let i = 0; i < 60 && !matches(await select.inputValue()); i += 1) await page.keyboard.press('ArrowDown');
  expect(matches(await select.inputValue()), 'an option reached with the arrow keys').toBe(true);
}

/** A GET from inside the page, with the browser's own session. */
const apiGet = <T>(page: Page, url: string) =>
  page.evaluate(async (u) => ((await (await fetch(`/api${u}`)).json()) as { data: unknown }).data, url) as Promise<T>;
const idFromUrl = (page: Page) => page.url().split('?')[0].split('/').pop()!;

describe('the main forms by keyboard alone', () => {
  it('sign-in, invite, object and measurement, venue, channel, page and image details: filled and sent with keys only, focus always visible', async ({
    onTestFailed,
  }) => {
    const { context, page, errors, baseUrl } = await openBrowser();
    onTestFailed(() => screenshot(page, 'keyboard-forms-failed'));
    // Its own test address, so this form sign-in does not use up the allowance the other browser tests share.
    await context.setExtraHTTPHeaders({ 'X-Forwarded-For': `198.19.${process.pid % 250}.7` });
    const kb = page.keyboard;

    // Sign in: Tab to each field, Enter in the password field sends the form.
    await page.goto(`${baseUrl}/sign-in`);
    await tabTo(page, page.getByLabel('E-mail address'));
    await kb.type(admin.email);
    await tabTo(page, page.getByLabel('Password'));
    await kb.type(admin.password);
    await kb.press('Enter');
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await expect.poll(() => page.getByRole('button', { name: 'Sign out' }).count()).toBe(1);

    // Invite someone: the opening button goes away, so focus must land in the form, not on the page.
    await page.goto(`${baseUrl}/admin/users`);
    await tabTo(page, page.getByRole('button', { name: 'Invite someone' }));
    await kb.press('Enter');
    const invite = page.getByRole('form', { name: 'Invite someone' });
    await expect.poll(() => isFocused(invite.getByLabel('Name'))).toBe(true);
    await kb.type('Keyboard Kestrel (test)');
    await tabTo(page, invite.getByLabel('E-mail address'));
    await kb.type(`kestrel.${stamp}@example.test`);
    await tabTo(page, invite.getByLabel('Role'));
    await arrowTo(page, invite.getByLabel('Role'), (v) => v === 'reviewer');
    await tabTo(page, invite.getByRole('button', { name: 'Send invitation' }));
    await kb.press('Enter');
    await expect.poll(() => page.getByText('Invitation sent').count()).toBe(1);
    // The form closes and focus goes back to the button that opened it, not to the top of the page.
    await expect.poll(() => isFocused(page.getByRole('button', { name: 'Invite someone' }))).toBe(true);
    const users = await apiGet<Array<{ email: string; role: string }>>(page, '/users');
    expect(users.find((u) => u.email === `kestrel.${stamp}@example.test`)?.role).toBe('reviewer');

    // A catalogue object: Space opens the form, arrows choose the kind, Enter on the button adds it.
    await page.goto(`${baseUrl}/catalogue`);
    await tabTo(page, page.getByRole('button', { name: 'Add object' }));
    await kb.press('Space');
    const objectForm = page.getByRole('form', { name: 'Add an object' });
    await expect.poll(() => isFocused(objectForm.getByLabel('Name'))).toBe(true);
    await kb.type(`Kestrel Cloud ${stamp}`);
    await tabTo(page, objectForm.getByLabel('Kind'));
    await arrowTo(page, objectForm.getByLabel('Kind'), (v) => v === 'nebula');
    await tabTo(page, objectForm.getByLabel('Right ascension (J2000)'));
    await kb.type('05h 35m 17.3s');
    await tabTo(page, objectForm.getByLabel('Declination (J2000)'));
    await kb.type('-05 23 28');
    await tabTo(page, objectForm.getByLabel('Notes'));
    await kb.type('Made with the keyboard alone (test object).');
    await tabTo(page, objectForm.getByRole('button', { name: 'Add object' }));
    await kb.press('Enter');
    await page.waitForURL(/\/catalogue\/[0-9a-f-]{36}$/);
    const objectId = idFromUrl(page);
    const object = await apiGet<{ name: string; kind: string; raDeg: number }>(page, `/catalogue/objects/${objectId}`);
    expect(object).toMatchObject({ name: `Kestrel Cloud ${stamp}`, kind: 'nebula' });
    expect(object.raDeg).toBeCloseTo(83.822, 2);

    // Its first measurement: radio buttons by arrow keys, Shift+Tab back to a field, Enter to add.
    await tabTo(page, page.getByRole('button', { name: 'Add measurement' }));
    await kb.press('Enter');
    const measurementForm = page.getByRole('form', { name: 'Add a measurement' });
    await expect.poll(() => isFocused(measurementForm.getByLabel('Quantity'))).toBe(true);
    await tabTo(page, measurementForm.getByLabel('Value'));
    await kb.type('0.0019');
    await tabTo(page, measurementForm.getByLabel('Symmetric (±)'));
    await kb.press('ArrowRight');
    expect(await measurementForm.getByLabel('Asymmetric (− and +)').isChecked()).toBe(true);
    await kb.press('ArrowLeft');
    expect(await measurementForm.getByLabel('Symmetric (±)').isChecked()).toBe(true);
    await tabTo(page, measurementForm.getByLabel('± uncertainty'));
    await kb.type('0.0001');
    await tabTo(page, measurementForm.getByLabel('Source'));
    await arrowTo(page, measurementForm.getByLabel('Source'), (v) => v !== '');
    await tabTo(page, measurementForm.getByLabel('± uncertainty'), { back: true });
    await kb.press('End');
    await kb.type('5');
    await tabTo(page, measurementForm.getByRole('button', { name: 'Add measurement' }));
    await kb.press('Enter');
    await expect.poll(() => measurementForm.count()).toBe(0);
    const measurements = await apiGet<
      Array<{ quantity: string; value: number; uncertainty: number | null; source: { id: string } | null }>
    >(page, `/catalogue/objects/${objectId}/measurements`);
    expect(measurements).toHaveLength(1);
    expect(measurements[0]).toMatchObject({ quantity: 'redshift', value: 0.0019, uncertainty: 0.00015 });
    expect(measurements[0].source?.id).toBeTruthy();

    // A venue: typed into every field, sent with Enter from the last one.
    await page.goto(`${baseUrl}/venues`);
    await tabTo(page, page.getByRole('button', { name: 'Add a venue' }));
    await kb.press('Enter');
    const venueForm = page.getByRole('form', { name: 'Add a venue' });
    await expect.poll(() => isFocused(venueForm.getByLabel('Name'))).toBe(true);
    await kb.type(`Kestrel Hill Dome ${stamp} (test)`);
    await tabTo(page, venueForm.getByLabel('Time zone'));
    await kb.press('ControlOrMeta+A');
    await kb.type('Europe/London');
    await tabTo(page, venueForm.getByLabel('Latitude (°)'));
    await kb.type('54.5');
    await tabTo(page, venueForm.getByLabel('Longitude (°)'));
    await kb.type('-3.1');
    await tabTo(page, venueForm.getByLabel('Elevation (m)'));
    await kb.press('ControlOrMeta+A');
    await kb.type('210');
    await kb.press('Enter');
    await page.waitForURL(/\/venues\/[0-9a-f-]{36}$/);
    expect(
      await apiGet<{ name: string; timeZone: string; elevationM: number }>(page, `/venues/${idFromUrl(page)}`),
    ).toMatchObject({ name: `Kestrel Hill Dome ${stamp} (test)`, timeZone: 'Europe/London', elevationM: 210 });

    // A channel at the demo venue.
    await page.goto(`${baseUrl}/publishing`);
    await tabTo(page, page.getByRole('button', { name: 'New channel' }));
    await kb.press('Enter');
    const channelForm = page.getByRole('form', { name: 'New channel' });
    await expect.poll(() => isFocused(channelForm.getByLabel('Channel name'))).toBe(true);
    await kb.type(`Kestrel loop ${stamp}`);
    await tabTo(page, channelForm.getByLabel('Venue'));
    const venues = await apiGet<Array<{ id: string; name: string }>>(page, '/venues');
    await arrowTo(page, channelForm.getByLabel('Venue'), (v) => v === venues.find((x) => x.name === DEMO_VENUE.name)!.id);
    await tabTo(page, channelForm.getByRole('button', { name: 'Create channel' }));
    await kb.press('Enter');
    await page.waitForURL(/\/publishing\/channels\/[0-9a-f-]{36}$/);
    expect(await apiGet<{ name: string }>(page, `/channels/${idFromUrl(page)}`)).toMatchObject({ name: `Kestrel loop ${stamp}` });

    // A page about the new object: search, then pick it in the list with the arrow keys.
    await page.goto(`${baseUrl}/pages`);
    await tabTo(page, page.getByRole('button', { name: 'New page' }));
    await kb.press('Enter');
    const pageForm = page.getByRole('form', { name: 'New page' });
    // Cancelled, the form gives focus back to its button; opened again, it starts in its first field.
    await tabTo(page, pageForm.getByRole('button', { name: 'Cancel' }));
    await kb.press('Enter');
    await expect.poll(() => isFocused(page.getByRole('button', { name: 'New page' }))).toBe(true);
    await kb.press('Enter');
    await expect.poll(() => isFocused(pageForm.getByLabel('Title'))).toBe(true);
    await kb.type(`Kestrel Cloud, written by keyboard ${stamp}`);
    const listbox = pageForm.getByRole('listbox');
    const matches = listbox.getByRole('option');
    /** Waits until every option listed matches the search (a whole name here, so the results have settled). */
    const settled = (name: RegExp) =>
      expect
        .poll(async () => (await matches.count()) > 0 && (await matches.allTextContents()).every((t) => name.test(t)))
        .toBe(true);
    await tabTo(page, pageForm.getByRole('searchbox'));
    await kb.type('Crab Nebula');
    await settled(/Crab Nebula/);
    // Nothing looks chosen until something is.
    expect(await listbox.inputValue()).toBe('');
    await tabTo(page, listbox);
    await kb.press('ArrowDown');
    const crab = (await matches.first().getAttribute('value'))!;
    expect(await listbox.inputValue()).toBe(crab);
    // Searching again keeps the first choice listed and chosen until another is picked.
    await tabTo(page, pageForm.getByRole('searchbox'), { back: true });
    await kb.press('ControlOrMeta+A');
    await kb.type(`Kestrel Cloud ${stamp}`);
    await expect.poll(() => listbox.getByRole('option', { name: new RegExp(`Kestrel Cloud ${stamp}`) }).count()).toBe(1);
    expect(await listbox.inputValue()).toBe(crab);
    await tabTo(page, listbox);
    await arrowTo(page, listbox, (v) => v === objectId);
    await tabTo(page, pageForm.getByRole('button', { name: 'Create and start writing' }));
    await kb.press('Enter');
    await page.waitForURL(/\/pages\/[0-9a-f-]{36}$/);
    expect(await apiGet<{ title: string; object: { id: string } }>(page, `/pages/${idFromUrl(page)}`)).toMatchObject({
      title: `Kestrel Cloud, written by keyboard ${stamp}`,
      object: { id: objectId },
    });

    // An image: chosen through the button (Enter opens the file chooser), then described in its panel.
    // Listening from before the page loads: Playwright takes over the file chooser asynchronously.
    const chooser = page.waitForEvent('filechooser', { timeout: 90_000 });
    await page.goto(`${baseUrl}/media`);
    await tabTo(page, page.getByRole('button', { name: 'choose files' }));
    await kb.press('Enter');
    await (await chooser).setFiles({
      name: `kestrel-${stamp}.jpg`,
      mimeType: 'image/jpeg',
      buffer: await solidImage(1200, 800, '#243a5e'),
    });
    await tabTo(page, page.getByRole('button', { name: 'Describe it' }));
    await kb.press('Enter');
    const details = page.getByRole('form', { name: 'Image details' });
    await tabTo(page, details.getByLabel('Alt text'));
    await kb.type('A plain deep blue square with nothing else in it (test picture)');
    await tabTo(page, details.getByLabel('Credit line'));
    await kb.type('Corrie Vale Planetarium (demo)');
    await tabTo(page, details.getByLabel('Licence'));
    await arrowTo(page, details.getByLabel('Licence'), (v) => v === 'cc-by-4.0');
    await tabTo(page, details.getByLabel('Source web address'));
    await kb.type('https://example.org/kestrel-picture');
    await tabTo(page, details.getByRole('button', { name: 'Save details' }));
    await kb.press('Enter');
    await expect.poll(() => details.getByRole('status').textContent()).toBe('Saved.');
    const mediaId = new URL(page.url()).searchParams.get('image')!;
    expect(
      await apiGet<{ altText: string; credit: string; licence: { id: string } | null; sourceUrl: string }>(
        page,
        `/media/${mediaId}`,
      ),
    ).toMatchObject({
      altText: 'A plain deep blue square with nothing else in it (test picture)',
      credit: 'Corrie Vale Planetarium (demo)',
      licence: { id: 'cc-by-4.0' },
      sourceUrl: 'https://example.org/kestrel-picture',
    });
    await screenshot(page, 'keyboard-image-details');
    // Escape closes the panel.
    await kb.press('Escape');
    await expect.poll(() => details.count()).toBe(0);
    expect(errors).toEqual([]);
  }, 180_000);
});
