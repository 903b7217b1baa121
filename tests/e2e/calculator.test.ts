import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

// The machine is shared with builds and other test runs: allow a busy server a few seconds.
const SLOW = { timeout: 15_000 };
const reviewer = DEMO_ACCOUNTS.find((a) => a.role === 'reviewer')!;

describe('the calculator, as a reviewer uses it', () => {
  it('computes a lookback time with its working and chart, then shows the Hubble-law warning', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    // Fail at the step that is wrong rather than at the test's overall timeout.
    page.setDefaultTimeout(10_000);
    await signInThroughForm(page, baseUrl, reviewer.email, reviewer.password);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), SLOW).toMatch(/Good to see you/);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculator' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), SLOW).toBe('Calculator');

    const form = page.getByRole('form', { name: 'Calculation' });
    await form.getByLabel('Quantity').selectOption('lookback_time');
    await form.getByRole('textbox', { name: 'Redshift z', exact: true }).fill('1.5');
    await form.getByRole('textbox', { name: 'Redshift z: uncertainty (±)' }).fill('0.01');
    await form.getByRole('radio', { name: /Planck 2018/ }).check();
    await form.getByRole('button', { name: 'Calculate' }).click();

    // Planck 2018 lookback time at z = 1.5: 9.518 Gyr (recalled from memory of astropy's Planck18.lookback_time(1.5); the engine's reference tests check it to 1e-5).
    const value = page.getByTestId('calc-value');
    await expect.poll(() => value.textContent(), SLOW).toMatch(/^9\.51\d+\s*Gyr/);
    const result = page.getByRole('region', { name: 'Lookback time: how long ago the light set out' });
    expect(await result.getByText(/^68 % interval/).count()).toBe(1);
    expect(await result.getByText(/9\.518\d+ billion years/).count()).toBe(1);

    const working = page.getByRole('region', { name: 'Working' });
    const steps = working.getByRole('list', { name: /steps$/ }).getByRole('listitem');
    expect(await steps.count()).toBeGreaterThanOrEqual(3);
    expect(await working.getByRole('heading', { name: /Lookback time: how long ago the light set out/ }).count()).toBe(1);
    expect(await working.getByRole('heading', { name: /68 % interval by Monte Carlo/ }).count()).toBe(1);
    await working.getByText('Show parameters').click();
    expect(await working.getByText(/Planck Collaboration \(2020\)/).count()).toBeGreaterThan(0);

    const chart = page.getByRole('figure');
    await expect.poll(() => chart.locator('.recharts-line').count(), SLOW).toBeGreaterThanOrEqual(7);
    expect(await chart.locator('figcaption').textContent()).toMatch(/z = 1\.5 \(1\.49 to 1\.51\)/);
    expect(await page.getByTestId('chart-summary').textContent()).toMatch(/overstates the distance today by \d+ %/);
    // The toggles work: hiding the luminosity distance removes both models' luminosity curves.
    await chart.getByRole('checkbox', { name: 'Luminosity distance' }).uncheck();
    await expect.poll(() => chart.locator('.recharts-line').count(), SLOW).toBe(5);
    await chart.getByRole('checkbox', { name: 'Luminosity distance' }).check();
    await page.getByTestId('distance-redshift-plot').hover();
    await screenshot(page, 'calculator-lookback-planck18');

    await form.getByLabel('Quantity').selectOption('luminosity_distance');
    await form.getByRole('textbox', { name: 'Redshift z', exact: true }).fill('0.3');
    await form.getByRole('textbox', { name: 'Redshift z: uncertainty (±)' }).fill('');
    await form.getByRole('radio', { name: /Simple Hubble law/ }).check();
    await form.getByRole('button', { name: 'Calculate' }).click();
    // d = cz/H0 = 299792.458 × 0.3 / 70 = 1284.82 Mpc (common practice: the Hubble law worked by hand).
    await expect.poll(() => value.textContent(), SLOW).toMatch(/^1284\.82\s*Mpc/);
    const warning = page.getByRole('status').filter({ hasText: 'only holds for small redshifts' });
    expect(await warning.count()).toBe(1);
    expect(await warning.isVisible()).toBe(true);
    await expect.poll(() => page.getByTestId('chart-summary').textContent(), SLOW).toMatch(/Under Planck 2018, for comparison,/);
    await screenshot(page, 'calculator-hubble-law-warning');

    await form.getByLabel('Quantity').selectOption('parallax_distance');
    await form.getByRole('textbox', { name: 'Parallax (mas)', exact: true }).fill('-2');
    await form.getByRole('button', { name: 'Calculate' }).click();
    const refusal = page.getByRole('alert').filter({ hasText: 'The calculation was refused' });
    await expect.poll(() => refusal.textContent(), SLOW).toMatch(/Parallax \(mas\) must be greater than 0/);
    expect(await form.getByRole('textbox', { name: 'Parallax (mas)', exact: true }).getAttribute('aria-invalid')).toBe('true');
    await screenshot(page, 'calculator-refused');

    // The refused calculation is a 400 the browser logs; nothing else may fail.
    expect(errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
  });
});
