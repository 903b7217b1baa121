import type { Page as BrowserPage } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser.ts';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

async function signInAs(page: BrowserPage, baseUrl: string, role: string) {
  const signOut = page.getByRole('button', { name: 'Sign out' });
  if (await signOut.count()) {
    await signOut.click();
    await page.waitForURL(/\/sign-in/);
  }
  await signInThroughForm(page, baseUrl, account(role).email, account(role).password);
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** Calls the API from inside the page, so the session cookie and same-origin headers are the browser's own. */
async function apiCall<T>(page: BrowserPage, method: string, url: string, body?: unknown): Promise<T> {
  return page.evaluate(
    async ({ method, url, body }) => {
      const res = await fetch(`/api${url}`, {
        method,
        headers: { 'Content-Type': 'application/json' },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return res.json();
    },
    { method, url, body },
  ) as Promise<T>;
}

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
  return page.url().split('/').pop()!;
}

describe('object pages, from writing to re-check', () => {
  it('writer → reviewer → editor → a measurement changes → needs re-check, public version unchanged', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInAs(page, baseUrl, 'writer');
    const pageId = await newPage(page, 'The quasar 3C 48', '3C 48');

    const body = page.getByRole('textbox', { name: 'Page text' });
    await body.click();
    await page.keyboard.type('3C 48 was one of the first quasars found. Its light is about 5 billion light-years old. ');
    const panel = page.getByRole('region', { name: 'Number check' });
    await expect.poll(() => panel.textContent()).toMatch(/5 billion light-years/);
    await expect.poll(() => page.locator('.page-prose .number-flag').count()).toBe(1);
    await screenshot(page, 'pages-editor-flagged');

    // A first statement from the toolbar.
    await page.getByRole('button', { name: 'Insert statement' }).click();
    await page
      .getByRole('dialog', { name: 'Insert a statement' })
      .getByRole('button', { name: /Distance today in light-years/ })
      .click();
    await expect.poll(() => page.locator('.page-prose [data-statement-id]').count()).toBe(1);

    // The hand-typed number becomes the second statement: its phrase form, after the preview.
    await panel.getByRole('button', { name: 'Make it a statement' }).click();
    await page
      .getByRole('dialog', { name: 'Insert a statement' })
      .getByRole('button', { name: /How long its light has travelled, as a phrase/ })
      .click();
    const check = page.getByRole('dialog', { name: 'Check the sentence' });
    await expect
      .poll(() => check.getByTestId('replace-preview').textContent())
      .toMatch(/Its light is about [\d.]+ billion years old\./);
    await check.getByRole('button', { name: /^Replace/ }).click();
    await expect.poll(() => page.locator('.page-prose [data-statement-id]').count()).toBe(2);
    await expect.poll(() => page.locator('.page-prose .number-flag').count()).toBe(0);
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'All changes saved' }).count(), { timeout: 15_000 })
      .toBe(1);
    await screenshot(page, 'pages-editor-statements');

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await expect.poll(() => page.getByText('Submitted for review').count()).toBe(1);

    // The reviewer opens the working and signs off.
    await signInAs(page, baseUrl, 'reviewer');
    await expect.poll(() => page.getByRole('link', { name: 'The quasar 3C 48' }).count()).toBeGreaterThan(0);
    await page.getByRole('link', { name: 'The quasar 3C 48' }).first().click();
    await page.waitForURL(/\/review$/);
    const statements = page.getByRole('region', { name: /Statements on this page/ });
    await statements.getByRole('button', { name: 'Show working' }).first().click();
    const working = page.getByRole('complementary', { name: 'Statement working' });
    await expect.poll(() => working.textContent()).toMatch(/Public wording|Step|step/);
    await screenshot(page, 'pages-review-working');
    for (let i = 0; i < 2; i++) {
      await statements.getByRole('button', { name: 'Sign off statement' }).first().click();
      await expect.poll(() => statements.getByText('Signed off', { exact: true }).count()).toBe(i + 1);
    }
    await page.getByRole('button', { name: 'Sign off page' }).click();
    await expect.poll(() => page.getByText('Approved', { exact: true }).count()).toBeGreaterThan(0);

    // The editor publishes.
    await signInAs(page, baseUrl, 'editor');
    await page.goto(`${baseUrl}/pages/${pageId}/review`);
    await page.getByRole('button', { name: /Publish revision/ }).click();
    await expect.poll(() => page.getByText(/Live: revision \d+/).count()).toBe(1);
    const live = await apiCall<{ data: { html: string } }>(page, 'GET', `/pages/${pageId}/published`);
    const before = live.data.html;

    // A reviewer prefers a new redshift for 3C 48.
    await signInAs(page, baseUrl, 'reviewer');
    const objects = await apiCall<{ data: { rows: Array<{ id: string }> } }>(page, 'GET', '/catalogue/objects?q=3C%2048');
    const objectId = objects.data.rows[0].id;
    const measurements = await apiCall<{
      data: Array<{ id: string; quantity: string; preferred: boolean; source: { id: string } | null }>;
    }>(page, 'GET', `/catalogue/objects/${objectId}/measurements`);
    const oldZ = measurements.data.find((m) => m.quantity === 'redshift' && m.preferred)!;
    const added = await apiCall<{ data: { id: string } }>(page, 'POST', `/catalogue/objects/${objectId}/measurements`, {
      quantity: 'redshift',
      value: 0.45,
      unit: '',
      uncertainty: 0.001,
      sourceId: oldZ.source!.id,
    });
    await apiCall(page, 'PUT', `/catalogue/measurements/${added.data.id}/preferred`, { preferred: true, replaces: oldZ.id });

    await expect
      .poll(
        async () => {
          await page.goto(`${baseUrl}/pages/${pageId}/review`);
          return page
            .getByRole('heading', { level: 1 })
            .first()
            .textContent()
            .then(() => page.getByText('Needs re-check').count());
        },
        { timeout: 30_000, interval: 2000 },
      )
      .toBeGreaterThan(0);
    await expect.poll(() => page.getByText('Signed off (live now)').count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByText('New wording').count()).toBeGreaterThan(0);
    await screenshot(page, 'pages-needs-recheck');
    const after = await apiCall<{ data: { html: string } }>(page, 'GET', `/pages/${pageId}/published`);
    expect(after.data.html).toBe(before);

    await page.goto(`${baseUrl}/`);
    await expect
      .poll(() => page.getByRole('region', { name: 'Pages needing a re-check' }).textContent())
      .toMatch(/The quasar 3C 48/);
    await screenshot(page, 'pages-dashboard-reviewer');
    expect(errors).toEqual([]);
  }, 240_000);

  it('someone else saves while the writer types: both versions from the 409 alone, the saved one taken, saving goes on', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInAs(page, baseUrl, 'writer');
    const pageId = await newPage(page, 'Two hands on one page', 'Vega');
    const body = page.getByRole('textbox', { name: 'Page text' });
    const saved = () => page.getByRole('status').filter({ hasText: 'All changes saved' }).count();
    await body.click();
    await page.keyboard.type('First words.');
    await expect.poll(saved, { timeout: 15_000 }).toBe(1);

    // Another tab saves first, from the same version.
    const before = await apiCall<{ data: { version: number } }>(page, 'GET', `/pages/${pageId}`);
    const elsewhere = {
      type: 'doc',
      content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Words saved elsewhere.' }] }],
    };
    await apiCall(page, 'PUT', `/pages/${pageId}`, { version: before.data.version, title: 'Saved elsewhere', doc: elsewhere });

    // From here the editor must not read the page again to show the conflict: the 409 carries the server's version.
    const pageReads: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'GET' && new URL(r.url()).pathname === `/api/pages/${pageId}`) pageReads.push(r.url());
    });
    await body.click();
    await page.keyboard.press('End');
    await page.keyboard.type(' More of mine.');
    const conflict = page.getByRole('region', { name: 'Two versions of this page' });
    await expect.poll(() => conflict.count(), { timeout: 15_000 }).toBe(1);
    await expect.poll(() => conflict.textContent()).toContain('Words saved elsewhere.');
    expect(await conflict.textContent()).toContain('First words. More of mine.');
    expect(await conflict.textContent()).toContain('Saved elsewhere');
    expect(pageReads).toEqual([]);
    await screenshot(page, 'pages-conflict');

    await conflict.getByRole('button', { name: 'Use the saved version' }).click();
    await expect.poll(() => body.textContent()).toBe('Words saved elsewhere.');
    expect(await page.getByLabel('Title').inputValue()).toBe('Saved elsewhere');
    // Saving goes on from the version the 409 named.
    await body.click();
    await page.keyboard.press('End');
    await page.keyboard.type(' Then more.');
    await expect.poll(saved, { timeout: 15_000 }).toBe(1);
    const after = await apiCall<{ data: { title: string; doc: unknown } }>(page, 'GET', `/pages/${pageId}`);
    expect(after.data.title).toBe('Saved elsewhere');
    expect(JSON.stringify(after.data.doc)).toContain('Words saved elsewhere. Then more.');
    // The refused save is the one console line allowed: the browser reports every 409 answer.
    expect(errors.filter((e) => !/status of 409/.test(e))).toEqual([]);
  }, 120_000);

  it('pasting from a word processor and a web page keeps clean structure only', async () => {
    const { page, errors, baseUrl } = await openBrowser();
    await signInAs(page, baseUrl, 'writer');
    const pageId = await newPage(page, 'Pasted page', 'Vega');
    await page.getByRole('textbox', { name: 'Page text' }).click();
    // Clipboard HTML as a word processor writes it (recalled from memory: Office's MsoNormal classes,
    // inline styles, conditional comments) and as a web page carries it (script, event handlers, iframe).
    const wordHtml = `<html xmlns:o="urn:schemas-microsoft-com:office:office"><head><style>p.MsoNormal{margin:0}</style></head><body><!--StartFragment-->
      <h1 class="MsoTitle" style="mso-line-height-rule:exactly">Vega at a glance</h1>
      <p class="MsoNormal" style="margin:0cm;font-family:Calibri"><b><span style="color:red">Bright</span></b> and <i>blue-white</i><o:p></o:p></p>
      <p class="MsoListParagraphCxSpFirst" style="mso-list:l0 level1 lfo1"><![if !supportLists]>·<![endif]>One of the Summer Triangle</p>
      <!--EndFragment--></body></html>`;
    const webHtml = `<div style="font-size:20px"><h2 onclick="alert(1)">From the web</h2><script>window.hacked=true</script><ul><li><a href="javascript:alert(2)">bad link</a></li><li><a href="https://example.org/vega" target="_blank" style="color:pink">good link</a></li></ul><iframe src="https://evil.example"></iframe><img src="https://evil.example/x.png" onerror="window.hacked=true"></div>`;
    for (const html of [wordHtml, webHtml]) {
      await page.evaluate((h) => {
        const data = new DataTransfer();
        data.setData('text/html', h);
        data.setData('text/plain', h.replace(/<[^>]+>/g, ''));
        document
          .querySelector('.page-prose')!
          .dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
      }, html);
    }
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'All changes saved' }).count(), { timeout: 15_000 })
      .toBe(1);
    const saved = await apiCall<{ data: { doc: unknown } }>(page, 'GET', `/pages/${pageId}`);
    const json = JSON.stringify(saved.data.doc);
    const first = (
      saved.data.doc as { content: Array<{ type: string; attrs?: { level?: number }; content?: Array<{ text?: string }> }> }
    ).content[0];
    expect([first.type, first.attrs?.level, first.content?.[0]?.text]).toEqual(['heading', 2, 'Vega at a glance']);
    expect(json).toContain('"type":"bold"');
    expect(json).toContain('"type":"italic"');
    expect(json).toContain('"type":"bulletList"');
    expect(json).toContain('https://example.org/vega');
    expect(json).not.toMatch(/Mso|style|onclick|onerror|javascript:|script|iframe|evil\.example|mso-/i);
    expect(await page.evaluate(() => (window as unknown as { hacked?: boolean }).hacked)).toBeUndefined();
    await screenshot(page, 'pages-pasted');
    // The browser reports the pasted event handlers it refused under our Content-Security-Policy;
    // those are the only console messages allowed here, and none of the handlers ran (checked above).
    expect(
      errors.filter(
        (e) =>
          !/Executing inline event handler violates the following Content Security Policy.*The action has been blocked/.test(e),
      ),
    ).toEqual([]);
  });
});
