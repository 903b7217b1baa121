import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

const reviewer = DEMO_ACCOUNTS.find((a) => a.role === 'reviewer')!;

describe('the catalogue, as a reviewer uses it', () => {
  it('adds an object, a source and measurements, chooses the preferred one, imports a CSV with bad rows and reads the history', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    page.on('dialog', (d) => void d.accept('Superseded by the new reduction.'));
    await signInThroughForm(page, baseUrl, reviewer.email, reviewer.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalogue' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Catalogue');
    // The demo catalogue is there, filtered by kind on the server.
    await page.getByLabel('Kind').selectOption('quasar');
    await expect.poll(() => page.getByRole('link', { name: '3C 279' }).count()).toBe(1);
    await page.getByRole('button', { name: /^Name/ }).click();
    await expect.poll(() => page.getByRole('row').nth(1).getByRole('link').first().textContent()).toBe('TON 618');
    await screenshot(page, 'catalogue-table');

    // A source first (Hipparcos new reduction; bibcode as published).
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sources' }).click();
    await page.getByRole('button', { name: 'Add source' }).click();
    const sourceForm = page.getByRole('form', { name: 'Add a source' });
    await sourceForm.getByLabel('Citation').fill('van Leeuwen, F. (2007), A&A 474, 653');
    await sourceForm.getByLabel('Bibcode').fill('2007A&A...474..653V');
    await sourceForm.getByRole('button', { name: 'Add source' }).click();
    await expect.poll(() => page.getByRole('cell', { name: /van Leeuwen/ }).count()).toBe(1);
    await screenshot(page, 'catalogue-sources');

    // The object, with an inline error first.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalogue' }).click();
    await page.getByRole('button', { name: 'Add object' }).click();
    const objectForm = page.getByRole('form', { name: 'Add an object' });
    await objectForm.getByLabel('Name').fill('Arcturus');
    await objectForm.getByLabel('Other designations').fill('α Boo, HD 124897');
    await objectForm.getByLabel('Right ascension (J2000)').fill('14h 15m 39.7s');
    await objectForm.getByLabel('Declination (J2000)').fill('+95');
    await objectForm.getByRole('button', { name: 'Add object' }).click();
    await expect.poll(() => objectForm.getByText('Declination must be between −90° and +90°.').count()).toBe(1);
    // Arcturus, position recalled from memory: it lies in Boötes.
    await objectForm.getByLabel('Declination (J2000)').fill('+19° 10′ 57″');
    await objectForm.getByRole('button', { name: 'Add object' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Arcturus');
    await expect.poll(() => page.getByText('Boötes (Boo)').count()).toBe(1);

    // Two sourced parallaxes (values recalled from memory, for the test only).
    for (const [value, sigma] of [
      ['88.83', '0.54'],
      ['88.85', '0.74'],
    ]) {
      await page.getByRole('button', { name: 'Add measurement' }).click();
      const form = page.getByRole('form', { name: 'Add a measurement' });
      await form.getByLabel('Quantity').selectOption('parallax');
      await form.getByLabel('Value').fill(value === '88.85' ? 'about 88' : value);
      await form.getByLabel('± uncertainty').fill(sigma);
      await form.getByLabel('Source').selectOption({ label: 'van Leeuwen, F. (2007), A&A 474, 653' });
      await form.getByRole('button', { name: 'Add measurement' }).click();
      if (value === '88.85') {
        await expect.poll(() => form.getByText(/"about 88" is not a number/).count()).toBe(1);
        await form.getByLabel('Value').fill(value);
        await form.getByRole('button', { name: 'Add measurement' }).click();
      }
      await expect
        .poll(() => page.getByRole('region', { name: 'Parallax' }).getByText(`${value} ± ${sigma} mas`).count())
        .toBe(1);
    }
    const group = page.getByRole('region', { name: 'Parallax' });
    await group.getByRole('button', { name: 'Make preferred' }).first().click();
    await expect.poll(() => group.getByText('Preferred', { exact: true }).count()).toBe(1);
    await group.getByRole('button', { name: 'Make preferred' }).click();
    await expect.poll(() => group.getByRole('button', { name: 'Make preferred' }).count()).toBe(1);
    const trail = page.getByRole('list', { name: 'Measurement history' });
    await expect.poll(() => trail.getByText(/chose parallax 88\.8[35] ± 0\.[57]4 mas as preferred/).count()).toBe(2);
    await expect.poll(() => trail.getByText(/unmarked parallax 88\.85 ± 0\.74 mas as preferred/).count()).toBe(1);
    await screenshot(page, 'catalogue-object');

    // A CSV with a byte-order mark, a quoted comma and three bad rows.
    await page.getByRole('link', { name: '← Catalogue' }).click();
    await page.getByRole('link', { name: 'Import CSV' }).click();
    const csv =
      '\uFEFFobject,quantity,value,unit,band,uncertainty,source\n' +
      'Arcturus,apparent_magnitude,-0.05,mag,V,0.01,2007A&A...474..653V\n' +
      '"Arcturus",radius,25.4,R_sun,,0.2,"van Leeuwen, F. (2007), A&A 474, 653"\n' +
      'Nowhere Star,redshift,0.1,,,,2007A&A...474..653V\n' +
      'Arcturus,distance,eleven,pc,,,2007A&A...474..653V\n' +
      'Arcturus,distance,11.3,kg,,,2007A&A...474..653V\n';
    await page
      .getByLabel('CSV file (UTF-8, up to 10 MB)')
      .setInputFiles({ name: 'arcturus.csv', mimeType: 'text/csv', buffer: Buffer.from(csv, 'utf8') });
    await page.getByRole('button', { name: 'Check file' }).click();
    const rejected = page.getByRole('table', { name: 'Rejected rows' });
    await expect.poll(() => rejected.getByRole('row').count()).toBe(4);
    await expect
      .poll(() => rejected.textContent())
      .toMatch(/4Unknown object.*5Value is not a number.*6Unit does not fit the quantity/);
    await screenshot(page, 'catalogue-import-report');
    await page.getByRole('button', { name: 'Import 2 rows' }).click();
    await expect.poll(() => page.getByText('2 measurements were added').count()).toBe(1);

    // The history shows the import and the preferred choices.
    await page.goto(`${baseUrl}/catalogue?q=Arcturus`);
    await page.getByRole('link', { name: 'Arcturus' }).click();
    const history = page.getByRole('list', { name: 'Measurement history' });
    await expect
      .poll(() => history.getByText(/imported (apparent magnitude \(V\) −0\.05 ± 0\.01 mag|radius 25\.4 ± 0\.2 R☉)/).count())
      .toBe(2);
    await expect.poll(() => history.getByText('“Imported from arcturus.csv”').count()).toBe(2);
    await screenshot(page, 'catalogue-history');
    expect(errors).toEqual([]);
  });
});
