import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { DEMO_SOURCE_CITATION } from '../../server/demo/catalogue.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';
import { StaffClient } from '../support/staff-client.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

/** Screenshots at a phone's, a tablet's and a desktop's width, for a human look; back to desktop after. */
async function atThreeWidths(page: Page, name: string) {
  for (const width of [390, 768, 1280]) {
    await page.setViewportSize({ width, height: 860 });
    await screenshot(page, `${name}-${width}`);
  }
  await page.setViewportSize({ width: 1280, height: 860 });
}

/** Signs in as the demo account of a role and waits for the desk, so the next navigation does not cut the sign-in short. */
async function signInAs(page: Page, baseUrl: string, role: string) {
  await signInThroughForm(page, baseUrl, account(role).email, account(role).password);
  await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).count(), { timeout: 30_000 }).toBe(1);
}

describe('catalogue forms that never lie', () => {
  it('a writer proposes an object with its source; a reviewer accepts it into the catalogue', async () => {
    const writer = await openBrowser();
    await signInAs(writer.page, writer.baseUrl, 'writer');
    await writer.page.goto(`${writer.baseUrl}/catalogue`);
    // The writer is told who adds objects, and proposes instead.
    await expect.poll(() => writer.page.getByText(/Reviewers and admins add objects/).count()).toBe(1);
    await writer.page.getByRole('button', { name: 'Propose an object' }).click();
    const form = writer.page.getByRole('form', { name: 'Propose an object' });
    await form.getByLabel('Name').fill('Corrie Vale Proposed Cluster (demo)');
    await form.getByLabel('Kind').selectOption('cluster');
    await form.getByLabel('Right ascension (J2000)').fill('05h 35m 17.3s');
    await form.getByLabel('Declination (J2000)').fill('-05° 23′ 28″');
    // Without a source the proposal is refused, naming the field.
    await form.getByRole('button', { name: 'Propose object' }).click();
    await expect.poll(() => form.getByText(/^Source: choose the source/).count()).toBe(1);
    await form.getByLabel('Source').selectOption({ label: DEMO_SOURCE_CITATION });
    await form.getByRole('button', { name: 'Propose object' }).click();
    await expect.poll(() => writer.page.getByText(/is waiting for a reviewer/).count()).toBe(1);
    const proposals = writer.page.getByRole('region', { name: 'Proposed objects' });
    await expect.poll(() => proposals.getByText('Corrie Vale Proposed Cluster (demo)').count()).toBe(1);
    await expect.poll(() => proposals.getByRole('button', { name: 'Accept object' }).count()).toBe(0);
    await atThreeWidths(writer.page, 'catalogue-proposal-writer');
    await writer.page.goto(`${writer.baseUrl}/sources`);
    await writer.page.getByRole('button', { name: 'Propose a source' }).click();
    await atThreeWidths(writer.page, 'sources-proposal-writer');
    expect(writer.errors).toEqual([]);

    const reviewer = await openBrowser();
    await signInAs(reviewer.page, reviewer.baseUrl, 'reviewer');
    await reviewer.page.goto(`${reviewer.baseUrl}/catalogue`);
    const waiting = reviewer.page.getByRole('region', { name: 'Proposed objects' });
    const row = waiting.getByRole('listitem').filter({ hasText: 'Corrie Vale Proposed Cluster (demo)' });
    await expect.poll(() => row.getByText(`Source: ${DEMO_SOURCE_CITATION}`).count()).toBe(1);
    await atThreeWidths(reviewer.page, 'catalogue-proposal-reviewer');
    await row.getByRole('button', { name: 'Accept object' }).click();
    await expect.poll(() => row.getByText('Accepted').count()).toBe(1);
    await row.getByRole('link', { name: 'Open the object' }).click();
    await expect
      .poll(() => reviewer.page.getByRole('heading', { level: 1 }).textContent())
      .toBe('Corrie Vale Proposed Cluster (demo)');
    await expect.poll(() => reviewer.page.getByText('Orion (Ori)').count()).toBe(1);
    expect(reviewer.errors).toEqual([]);
  });

  it('a double click on "Import" imports once and says so, with no error', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInAs(page, baseUrl, 'reviewer');
    await page.goto(`${baseUrl}/catalogue/import`);
    const csv =
      `object,quantity,value,unit,band,uncertainty,source\nDeneb,angular_size,2.4,mas,,0.1,${DEMO_SOURCE_CITATION}\n`.replace(
        'mas,',
        'arcsec,',
      );
    await page
      .getByLabel('CSV file (UTF-8, up to 10 MB)')
      .setInputFiles({ name: 'double-click.csv', mimeType: 'text/csv', buffer: Buffer.from(csv, 'utf8') });
    await page.getByRole('button', { name: 'Check file' }).click();
    const importButton = page.getByRole('button', { name: 'Import 1 rows' });
    await importButton.dblclick();
    await expect.poll(() => page.getByText(/1 measurements were added from double-click\.csv/).count()).toBe(1);
    await expect.poll(() => page.getByText('Dry run: nothing has been imported yet').count()).toBe(0);
    await expect.poll(() => page.getByRole('alert').count()).toBe(0);
    await atThreeWidths(page, 'catalogue-import-double-click');
    // Deneb has the one angular size, not two.
    await page.goto(`${baseUrl}/catalogue?q=Deneb`);
    await page.getByRole('link', { name: 'Deneb' }).click();
    await expect.poll(() => page.getByRole('region', { name: 'Angular size' }).getByText('2.4 ± 0.1 arcsec').count()).toBe(1);
    expect(errors).toEqual([]);
  });

  it('a negative parallax is explained as it is typed; a likely sign error and a preferred negative parallax need a yes', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    // A star with a published parallax of +130.2 ± 0.4 mas (a bright nearby star's, recalled from memory)
    // and a distance statement that uses it, made through the API.
    const api = await StaffClient.signIn(baseUrl, account('reviewer').email, account('reviewer').password);
    const source = (await api.call<Array<{ id: string; citation: string }>>('GET', '/catalogue/sources')).find(
      (s) => s.citation === DEMO_SOURCE_CITATION,
    )!;
    const star = await api.call<{ id: string }>('POST', '/catalogue/objects', {
      name: 'Corrie Vale Parallax Star (demo)',
      kind: 'star',
      ra: '18h 36m 56s',
      dec: '+38° 47′ 01″',
    });
    const published = await api.call<{ id: string }>('POST', `/catalogue/objects/${star.id}/measurements`, {
      quantity: 'parallax',
      value: '130.2',
      unit: 'mas',
      uncertainty: '0.4',
      sourceId: source.id,
    });
    await api.call('PUT', `/catalogue/measurements/${published.id}/preferred`, { preferred: true });
    const statement = await api.call<{ id: string }>('POST', '/statements', { objectId: star.id, templateId: 'distance-today' });

    await signInAs(page, baseUrl, 'reviewer');
    await page.goto(`${baseUrl}/catalogue/${star.id}`);
    await page.getByRole('button', { name: 'Add measurement' }).click();
    const form = page.getByRole('form', { name: 'Add a measurement' });
    await form.getByLabel('Quantity').selectOption('parallax');
    await form.getByLabel('Value').fill('−130');
    await form.getByLabel('± uncertainty').fill('0.5');
    await expect.poll(() => form.getByText(/−130 mas gives no distance/).count()).toBe(1);
    await form.getByLabel('Source').selectOption({ label: DEMO_SOURCE_CITATION });
    await form.getByRole('button', { name: 'Add measurement' }).click();
    const check = form.getByRole('alertdialog', { name: 'Check before saving' });
    await expect.poll(() => check.getByText(/most likely a sign error/).count()).toBe(1);
    await atThreeWidths(page, 'catalogue-parallax-sign-error');
    await check.getByRole('button', { name: 'Keep this value' }).click();
    const group = page.getByRole('region', { name: 'Parallax' });
    await expect.poll(() => group.getByText('−130 ± 0.5 mas').count()).toBe(1);
    // Kept once, and the form has closed.
    await expect.poll(() => page.getByRole('form', { name: 'Add a measurement' }).count()).toBe(0);

    // Made preferred, it says which statement loses its distance, and waits for a yes.
    const row = group.getByRole('listitem').filter({ hasText: '−130 ± 0.5 mas' });
    await row.getByRole('button', { name: 'Make preferred' }).click();
    const confirm = page.getByRole('alertdialog', { name: 'Check before saving' });
    await expect.poll(() => confirm.getByText(/leaves 1 statement of this object without a distance/).count()).toBe(1);
    await expect.poll(() => confirm.getByText('Statements that will no longer work out:').count()).toBe(1);
    await atThreeWidths(page, 'catalogue-parallax-preferred');
    await confirm.getByRole('button', { name: 'Make it preferred anyway' }).click();
    await expect.poll(() => row.getByText('Preferred', { exact: true }).count()).toBe(1);

    // The statement says why in words, and that the measurements it lists are those of its last working.
    await expect
      .poll(async () => (await api.call<{ status: string }>('GET', `/statements/${statement.id}`)).status, {
        timeout: 60_000,
        interval: 500,
      })
      .toBe('broken');
    await page.goto(`${baseUrl}/statements/${statement.id}`);
    const why = page.getByText('The calculation failed: parallax (mas) must be greater than 0 (the value is −130).', {
      exact: false,
    });
    await expect.poll(() => why.count()).toBe(1);
    await expect.poll(() => page.getByText(/^When it was last worked out\./).count()).toBe(1);
    expect(await page.getByText('parallax_mas').count()).toBe(0);
    expect(errors.filter((e) => !/409 \(Conflict\)/.test(e))).toEqual([]);
  });

  it('organisation settings: a custom cosmology and the H0 range say which field is wrong and why', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInAs(page, baseUrl, 'admin');
    await page.goto(`${baseUrl}/admin/organisation`);
    await page.getByLabel('Model', { exact: true }).selectOption('custom');
    await page.getByLabel('ΩΛ (dark energy today)').fill('3');
    await expect.poll(() => page.getByText(/With this much dark energy \(ΩΛ = 3\).*no big bang/).count()).toBe(1);
    await expect.poll(() => page.getByText('Correct the field marked above to preview this model.').count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Preview the change' }).isDisabled()).toBe(true);
    await page.getByLabel('H0 (km/s/Mpc)').fill('seventy');
    await expect.poll(() => page.getByText(/“seventy” is not a number/).count()).toBe(1);
    await page.getByLabel('H0 (km/s/Mpc)').fill('70');
    await page.getByLabel('ΩΛ (dark energy today)').fill('0.7');
    await expect.poll(() => page.getByRole('button', { name: 'Preview the change' }).isDisabled()).toBe(false);

    const h0 = page.getByRole('form', { name: 'H0 range' });
    await h0.getByLabel('Low end of the H0 range (km/s/Mpc)').fill('75');
    await h0.getByRole('button', { name: 'Save the H0 range' }).click();
    await expect.poll(() => h0.getByText('High end of the H0 range: it must be above the low end').count()).toBe(1);
    await h0.getByLabel('Low end of the H0 range (km/s/Mpc)').fill('sixty');
    await h0.getByRole('button', { name: 'Save the H0 range' }).click();
    await expect.poll(() => h0.getByText(/^Low end of the H0 range: write a number/).count()).toBe(1);
    await atThreeWidths(page, 'organisation-settings-errors');
    await h0.getByLabel('Low end of the H0 range (km/s/Mpc)').fill('67.2');
    await h0.getByLabel('High end of the H0 range (km/s/Mpc)').fill('68.2');
    await h0.getByLabel('Source of the H0 range').fill('Corrie Vale demo choice: CMB only (demo)');
    await h0.getByRole('button', { name: 'Save the H0 range' }).click();
    await expect.poll(() => h0.getByText('Saved. Every statement is being recomputed.').count()).toBe(1);
    await expect.poll(() => h0.getByText('Your organisation’s own range is in use.').count()).toBe(1);
    // Back to the default, for the other browser tests.
    await h0.getByRole('button', { name: 'Use the default' }).click();
    await expect.poll(() => h0.getByText(/The default range is in use again/).count()).toBe(1);
    expect(errors).toEqual([]);
  });
});
