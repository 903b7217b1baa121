import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { DEMO_SOURCE_CITATION } from '../../server/demo/catalogue.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

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
    await screenshot(writer.page, 'catalogue-proposal-writer');
    expect(writer.errors).toEqual([]);

    const reviewer = await openBrowser();
    await signInAs(reviewer.page, reviewer.baseUrl, 'reviewer');
    await reviewer.page.goto(`${reviewer.baseUrl}/catalogue`);
    const waiting = reviewer.page.getByRole('region', { name: 'Proposed objects' });
    const row = waiting.getByRole('listitem').filter({ hasText: 'Corrie Vale Proposed Cluster (demo)' });
    await expect.poll(() => row.getByText(`Source: ${DEMO_SOURCE_CITATION}`).count()).toBe(1);
    await screenshot(reviewer.page, 'catalogue-proposal-reviewer');
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
    await screenshot(page, 'catalogue-import-double-click');
    // Deneb has the one angular size, not two.
    await page.goto(`${baseUrl}/catalogue?q=Deneb`);
    await page.getByRole('link', { name: 'Deneb' }).click();
    await expect.poll(() => page.getByRole('region', { name: 'Angular size' }).getByText('2.4 ± 0.1 arcsec').count()).toBe(1);
    expect(errors).toEqual([]);
  });
});
