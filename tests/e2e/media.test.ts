import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

// The server shares two cores with the browser: give each step time to land.
const WAIT = { timeout: 10_000 };
const writer = DEMO_ACCOUNTS.find((a) => a.role === 'writer')!;

/** A made-up star field: dark sky, a glow, a few stars (drawn by sharp, no outside imagery). */
async function starField(): Promise<Buffer> {
  const stars = Array.from(
    { length: 60 },
    (_, i) => `<circle cx="${(i * 97) % 1600}" cy="${(i * 53) % 900}" r="${1 + (i % 3)}" fill="#fff"/>`,
  ).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1600" height="900"><rect width="1600" height="900" fill="#05070d"/>
    <radialGradient id="g"><stop offset="0" stop-color="#c86b9a" stop-opacity="0.9"/><stop offset="1" stop-color="#05070d" stop-opacity="0"/></radialGradient>
    <ellipse cx="1100" cy="420" rx="380" ry="240" fill="url(#g)"/>${stars}</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 88 }).toBuffer();
}

describe('the media library, as a writer uses it', () => {
  it('drops images, sees each upload’s progress, describes one until it is ready to publish', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, writer.email, writer.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Media' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), WAIT).toBe('Media');

    // Drag and drop: a real image and a text file pretending to be one.
    const image = (await starField()).toString('base64');
    const dataTransfer = await page.evaluateHandle((b64) => {
      const dt = new DataTransfer();
      const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
      dt.items.add(new File([bytes], 'orion-wide-field.jpg', { type: 'image/jpeg' }));
      dt.items.add(new File(['not an image at all'], 'notes.jpg', { type: 'image/jpeg' }));
      return dt;
    }, image);
    // The demo data may already hold pictures: count what is there first.
    const before = await page.getByRole('list', { name: 'Images' }).getByRole('button').count();
    await page.getByTestId('drop-zone').dispatchEvent('drop', { dataTransfer });

    const uploads = page.getByRole('list', { name: 'Uploads' });
    await expect
      .poll(
        () => uploads.getByRole('progressbar', { name: 'Upload of orion-wide-field.jpg' }).getAttribute('aria-valuenow'),
        WAIT,
      )
      .toBe('100');
    await expect.poll(() => uploads.getByRole('alert').textContent(), WAIT).toMatch(/not an image Starproof can read/);
    await expect.poll(() => page.getByRole('list', { name: 'Images' }).getByRole('button').count(), WAIT).toBe(before + 1);
    await screenshot(page, 'media-uploaded');

    await uploads.getByRole('button', { name: 'Describe it' }).click();
    const panel = page.getByRole('dialog');
    await expect.poll(() => panel.getByRole('heading', { name: 'orion-wide-field.jpg' }).count(), WAIT).toBe(1);
    // The thumbnail grid card says what is missing, in words.
    await expect
      .poll(() => page.getByRole('list', { name: 'Images' }).textContent(), WAIT)
      .toMatch(/Needs alt text|Making renditions/);

    const form = panel.getByRole('form', { name: 'Image details' });
    await form.getByLabel('Source web address').fill('not a web address');
    await form.getByRole('button', { name: 'Save details' }).click();
    await expect.poll(() => form.getByText('Enter a full web address starting with https:// or http://').count(), WAIT).toBe(1);

    await form.getByLabel('Alt text').fill('A pink glow of gas among scattered stars');
    await form.getByLabel('Credit line').fill('Corrie Vale imaging team (demo)');
    await form.getByLabel('Licence').selectOption('cc-by-4.0');
    await form.getByLabel('Source web address').fill('https://example.org/corrie-vale/orion');
    await panel.getByRole('slider', { name: 'Focal point' }).click({ position: { x: 300, y: 100 } });
    await form.getByRole('button', { name: 'Save details' }).click();
    await expect.poll(() => form.getByRole('status').textContent(), WAIT).toBe('Saved.');
    await expect.poll(() => panel.getByText('Ready to publish').count(), { timeout: 30_000 }).toBe(1);
    await expect.poll(() => panel.getByRole('heading', { name: 'Renditions' }).count(), WAIT).toBe(1);
    await screenshot(page, 'media-details');
    // A later save refused by the form takes "Saved." away: it spoke of the save before.
    await form.getByLabel('Source web address').fill('not a web address');
    await form.getByRole('button', { name: 'Save details' }).click();
    await expect.poll(() => form.getByText('Enter a full web address starting with https:// or http://').count(), WAIT).toBe(1);
    expect(await form.getByText('Saved.', { exact: true }).count()).toBe(0);
    await form.getByLabel('Source web address').fill('https://example.org/corrie-vale/orion');

    // Search by credit finds it; a licence it does not have hides it.
    await panel.getByRole('button', { name: 'Close details' }).click();
    await page.getByLabel('Search in').selectOption('credit');
    await page.getByLabel('Search', { exact: true }).fill('imaging team');
    await expect.poll(() => page.getByText('1 image').count(), WAIT).toBe(1);
    await page.getByLabel('Licence').selectOption('cc0-1.0');
    await expect.poll(() => page.getByText('No image matches this search.').count(), WAIT).toBe(1);
    await page.getByLabel('Licence').selectOption('');

    // Unused and the writer's own: it can be deleted.
    await page.getByRole('list', { name: 'Images' }).getByRole('button').first().click();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete image' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete', exact: true }).click();
    await expect.poll(() => page.getByRole('dialog').count(), WAIT).toBe(0);
    // The credit search is still set, and nothing matches it any more.
    await expect.poll(() => page.getByText('No image matches this search.').count(), WAIT).toBe(1);
    // The only console error is Chromium logging the refused notes.jpg upload (400).
    expect(errors).toEqual(['Failed to load resource: the server responded with a status of 400 (Bad Request)']);
  });
});
