import type { Page as BrowserPage } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

const writer = DEMO_ACCOUNTS.find((a) => a.role === 'writer')!;

async function newPage(page: BrowserPage, title: string, objectQuery: string) {
  await page.getByRole('link', { name: 'Pages' }).first().click();
  await page.getByRole('button', { name: 'New page' }).click();
  const form = page.getByRole('form', { name: 'New page' });
  await form.getByLabel('Title').fill(title);
  await form.getByRole('searchbox').fill(objectQuery);
  await expect.poll(() => form.getByRole('option').first().textContent()).toContain(objectQuery);
  await form.getByRole('listbox').selectOption((await form.getByRole('option').first().getAttribute('value'))!);
  await form.getByRole('button', { name: 'Create and start writing' }).click();
  await page.waitForURL(/\/pages\/[0-9a-f-]{36}$/);
}

describe('“Make it a statement” inside a sentence', () => {
  it('offers the phrase form, previews the sentence, and replaces only the number', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInThroughForm(page, baseUrl, writer.email, writer.password);
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await newPage(page, 'How far is 3C 279? (phrase test)', '3C 279');

    const body = page.getByRole('textbox', { name: 'Page text' });
    await body.click();
    await page.keyboard.type('Seen from Corrie Vale, it lies 2.4 billion light years away, and it still shines.');
    const panel = page.getByRole('region', { name: 'Number check' });
    await expect.poll(() => panel.textContent()).toMatch(/2\.4 billion light years/);
    await panel.getByRole('button', { name: 'Make it a statement' }).click();

    const picker = page.getByRole('dialog', { name: 'Insert a statement' });
    // The phrase forms come first, marked as fitting the sentence.
    const first = picker.getByRole('button').filter({ hasText: 'fits inside your sentence' }).first();
    await expect.poll(() => first.textContent()).toMatch(/Distance today in light-years, as a phrase/);
    await first.click();

    const check = page.getByRole('dialog', { name: 'Check the sentence' });
    const preview = check.getByTestId('replace-preview');
    await expect
      .poll(() => preview.textContent())
      .toMatch(/^Seen from Corrie Vale, it lies about [\d.]+ billion light-years away, and it still shines\.$/);
    // Nothing is replaced until the writer accepts.
    expect(await page.locator('.page-prose [data-statement-id]').count()).toBe(0);
    await screenshot(page, 'statement-phrase-preview-1280');
    await page.setViewportSize({ width: 390, height: 844 });
    await check.scrollIntoViewIfNeeded();
    await screenshot(page, 'statement-phrase-preview-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.setViewportSize({ width: 1280, height: 900 });

    await check.getByRole('button', { name: /^Replace “2\.4 billion light years”/ }).click();
    await expect.poll(() => page.locator('.page-prose [data-statement-id]').count()).toBe(1);
    await expect
      .poll(() => page.locator('.page-prose p').first().textContent())
      .toMatch(/^Seen from Corrie Vale, it lies about [\d.]+ billion light-years away, and it still shines\.$/);
    await expect.poll(() => page.locator('.page-prose .number-flag').count()).toBe(0);
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'All changes saved' }).count(), { timeout: 15_000 })
      .toBe(1);
    await screenshot(page, 'statement-phrase-replaced');
    expect(errors).toEqual([]);
  }, 120_000);
});
