import { describe, expect, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser } from '../support/e2e-api.ts';

const WAIT = { timeout: 20_000 };

describe('a workflow without dead ends', () => {
  it('open hand-typed numbers need a reason to submit; the writer withdraws; a send-back shows its reason in the editor; a reviewer is told the editor is read-only', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const writer = await demoSession(baseUrl, 'writer');
    const reviewer = await demoSession(baseUrl, 'reviewer');
    const objects = await writer.call<{ data: { rows: Array<{ id: string; name: string }> } }>(
      'GET',
      '/api/catalogue/objects?q=3C%20279',
    );
    const objectId = objects.body.data.rows[0]!.id;
    const created = ok(
      await writer.call<{ data: { id: string; version: number } }>('POST', '/api/pages', {
        title: 'Workflow check (demo)',
        objectId,
        locale: 'en-GB',
      }),
      'create page',
    ).body.data;
    const doc = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'A leaflet says it is about 5 billion light-years away.' }] },
      ],
    };
    ok(
      await writer.call('PUT', `/api/pages/${created.id}`, { version: created.version, title: 'Workflow check (demo)', doc }),
      'save page',
    );

    await openSessionInBrowser(context, baseUrl, writer);
    await page.goto(`${baseUrl}/pages/${created.id}`);
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const reasons = page.getByRole('form', { name: 'Reasons for hand-typed numbers' });
    await expect.poll(() => reasons.isVisible(), WAIT).toBe(true);
    // An empty reason is refused in the form, and the page stays a draft.
    await reasons.getByRole('button', { name: 'Submit with these reasons' }).click();
    await expect.poll(() => reasons.getByText(/Give a reason of at least/).count()).toBe(1);
    await reasons.getByLabel('Why “5 billion light-years” stays as typed').fill('Quoted from the leaflet, to be checked.');
    await reasons.getByRole('button', { name: 'Submit with these reasons' }).click();
    await expect.poll(() => page.getByText('Submitted for review').count(), WAIT).toBe(1);
    const comments = await reviewer.call<{ data: Array<{ body: string }> }>('GET', `/api/pages/${created.id}/comments`);
    expect(comments.body.data.map((c) => c.body).join('\n')).toContain('Quoted from the leaflet, to be checked.');

    await page.getByRole('button', { name: 'Withdraw from review' }).click();
    await expect.poll(() => page.getByText('Withdrawn from review').count(), WAIT).toBe(1);
    expect(await page.getByRole('button', { name: 'Submit for review' }).isVisible()).toBe(true);

    // Submitted again, then sent back: the writer sees the reviewer's reason in the editor.
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await reasons.getByLabel('Why “5 billion light-years” stays as typed').fill('Quoted from the leaflet, to be checked.');
    await reasons.getByRole('button', { name: 'Submit with these reasons' }).click();
    await expect.poll(() => page.getByText('Submitted for review').count(), WAIT).toBe(1);

    // The reviewer opening the editor is told it is read-only and where to sign off.
    await context.clearCookies();
    await openSessionInBrowser(context, baseUrl, reviewer);
    await page.goto(`${baseUrl}/pages/${created.id}`);
    await expect.poll(() => page.getByText('Read-only').count(), WAIT).toBe(1);
    await page.getByRole('link', { name: 'Sign off in the review view' }).click();
    await page.waitForURL(/\/review$/);
    ok(
      await reviewer.call('POST', `/api/pages/${created.id}/send-back`, {
        comment: 'Say which distance the leaflet means, or make it a statement.',
      }),
      'send back',
    );

    await context.clearCookies();
    await openSessionInBrowser(context, baseUrl, writer);
    await page.goto(`${baseUrl}/pages/${created.id}`);
    await expect.poll(() => page.getByText(/^Sent back by /).count(), WAIT).toBe(1);
    expect(await page.getByText('Say which distance the leaflet means, or make it a statement.').count()).toBe(1);
    await screenshot(page, 'workflow-sent-back');
  });

  it('an editor publishes an approved page from the editor', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const editor = await demoSession(baseUrl, 'editor');
    const pages = await editor.call<{ data: Array<{ id: string; status: string }> }>('GET', '/api/pages');
    const approved = pages.body.data.find((p) => p.status === 'approved');
    const target =
      approved ??
      // The demo's published page: unpublish it, then it is approved and waiting to go live again.
      (await (async () => {
        const live = pages.body.data.find((p) => p.status === 'published')!;
        ok(await editor.call('POST', `/api/pages/${live.id}/unpublish`), 'unpublish');
        return live;
      })());
    await openSessionInBrowser(context, baseUrl, editor);
    await page.goto(`${baseUrl}/pages/${target.id}`);
    const publish = page.getByRole('button', { name: /^Publish revision/ });
    await expect.poll(() => publish.count(), WAIT).toBe(1);
    await publish.click();
    await expect
      .poll(
        async () => (await editor.call<{ data: { status: string } }>('GET', `/api/pages/${target.id}`)).body.data.status,
        WAIT,
      )
      .toBe('published');
  });
});
