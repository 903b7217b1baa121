import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot } from '../support/browser.ts';
import { demoSession, ok, openSessionInBrowser, type E2eSession } from '../support/e2e-api.ts';
import { FORMULA_PAYLOADS, XSS_PAYLOADS } from '../support/xss-payloads.ts';

const WAIT = { timeout: 20_000 };
const tag = Date.now().toString(36);
type Data<T> = { data: T };

/** Objects, sources, measurement notes, an image's details, a page and a channel, all carrying payloads. */
async function plantPayloads(admin: E2eSession, writer: E2eSession, reviewer: E2eSession, editor: E2eSession) {
  const objectIds: string[] = [];
  for (const [i, p] of XSS_PAYLOADS.entries()) {
    const res = ok(
      await admin.call('POST', '/api/catalogue/objects', {
        name: `${p} ${tag}-${i}`.slice(0, 120),
        kind: 'galaxy',
        ra: '10 00 00',
        dec: '+10 00 00',
        notes: p,
      }),
      `object ${i}`,
    );
    objectIds.push((res.body as Data<{ id: string }>).data.id);
  }
  for (const [i, p] of FORMULA_PAYLOADS.entries())
    ok(
      await admin.call('POST', '/api/catalogue/objects', {
        name: `${p}${tag}${i}`,
        kind: 'galaxy',
        ra: '11 00 00',
        dec: '+11 00 00',
        notes: p,
      }),
      `formula object ${i}`,
    );
  const sourceIds: string[] = [];
  for (const [i, p] of [...XSS_PAYLOADS, ...FORMULA_PAYLOADS].entries()) {
    const res = ok(
      await admin.call('POST', '/api/catalogue/sources', { citation: `${p} (hostile test ${tag}-${i})` }),
      `source ${i}`,
    );
    sourceIds.push((res.body as Data<{ id: string }>).data.id);
  }
  const target = objectIds[0];
  for (const [i, p] of [...XSS_PAYLOADS.slice(0, 8), ...FORMULA_PAYLOADS].entries()) {
    ok(
      await admin.call('POST', `/api/catalogue/objects/${target}/measurements`, {
        quantity: 'redshift',
        value: String(0.01 + i / 1000),
        sourceId: sourceIds[i],
        note: p,
      }),
      `measurement ${i}`,
    );
  }

  // An image whose credit, alt text and captions are payloads.
  const png = await sharp({ create: { width: 640, height: 400, channels: 3, background: '#1b2340' } })
    .png()
    .toBuffer();
  const media = ok(await writer.upload(png, `${XSS_PAYLOADS[5]}.png`), 'upload').body.data;
  ok(
    await writer.call('PATCH', `/api/media/${media.id}`, {
      altText: XSS_PAYLOADS[0],
      credit: XSS_PAYLOADS[23],
      licenceId: 'cc-by-4.0',
      sourceUrl: 'https://example.org/hostile-test',
    }),
    'media details',
  );
  await expect
    .poll(
      async () =>
        ((await writer.call('GET', `/api/media/${media.id}`)).body as Data<{ renditionsStatus: string }>).data.renditionsStatus,
      { timeout: 60_000 },
    )
    .toBe('ready');

  // A page with a payload title, every payload as text, the image with a payload caption; published.
  const paragraphs = XSS_PAYLOADS.map((p) => ({ type: 'paragraph', content: [{ type: 'text', text: p }] }));
  const docBody = {
    type: 'doc',
    content: [{ type: 'mediaImage', attrs: { mediaId: media.id, caption: XSS_PAYLOADS[18] } }, ...paragraphs],
  };
  const created = ok(
    await writer.call('POST', '/api/pages', { title: XSS_PAYLOADS[3], objectId: target, locale: 'en-GB' }),
    'page',
  ).body as Data<{ id: string; version: number }>;
  const pageId = created.data.id;
  const saved = ok(
    await writer.call('PUT', `/api/pages/${pageId}`, { version: created.data.version, title: XSS_PAYLOADS[3], doc: docBody }),
    'save',
  ).body as Data<{ version: number }>;
  ok(await writer.call('POST', `/api/pages/${pageId}/submit`, { version: saved.data.version }), 'submit');
  const detail = (await reviewer.call('GET', `/api/pages/${pageId}`)).body as Data<{
    flags: Array<{ text: string; resolution: unknown }>;
  }>;
  for (const text of new Set(detail.data.flags.filter((f) => !f.resolution).map((f) => f.text))) {
    ok(
      await reviewer.call('POST', `/api/pages/${pageId}/flags`, {
        text,
        reason: 'Part of a test string, not a measured quantity.',
      }),
      `flag ${text}`,
    );
  }
  ok(await reviewer.call('POST', `/api/pages/${pageId}/signoffs/page`), 'sign off');
  ok(await editor.call('POST', `/api/pages/${pageId}/publish`), 'publish');

  // A channel with a payload name and an image slide with a payload caption.
  const venues = (await admin.call('GET', '/api/venues')).body as Data<Array<{ id: string }>>;
  const channel = ok(
    await admin.call('POST', '/api/channels', { venueId: venues.data[0].id, name: `${XSS_PAYLOADS[24]} ${tag}`.slice(0, 80) }),
    'channel',
  ).body as Data<{ id: string }>;
  ok(
    await admin.call('POST', `/api/channels/${channel.data.id}/slides`, {
      kind: 'image',
      mediaId: media.id,
      caption: XSS_PAYLOADS[13],
    }),
    'image slide',
  );
  ok(await admin.call('POST', `/api/channels/${channel.data.id}/slides`, { kind: 'page', pageId }), 'page slide');
  return { objectId: target, pageId, channelId: channel.data.id, mediaId: media.id };
}

/**
 * After a screen has settled: no dialog opened, no payload set the global, and nothing a payload
 * could run from made it into the DOM as markup (event attributes, javascript: URLs, foreign
 * script, frames). The DOM check matters because our CSP would block inline handlers anyway.
 */
async function assertInert(page: Page, dialogs: string[], screen: string) {
  await page.waitForTimeout(600);
  expect(dialogs, `${screen}: a dialog opened`).toEqual([]);
  expect(
    await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned),
    `${screen}: a payload ran`,
  ).toBeUndefined();
  const found = await page.evaluate(() => {
    const bad: string[] = [];
    for (const el of Array.from(document.querySelectorAll('*'))) {
      for (const attr of Array.from(el.attributes)) {
        if (/^on/i.test(attr.name)) bad.push(`${el.tagName} ${attr.name}`);
        if (
          /^\s*(javascript|data:text\/javascript)/i.test(attr.value.replace(/[\s\u0000-\u001f]/g, '')) &&
          /href|src|action|data/i.test(attr.name)
        )
          bad.push(`${el.tagName} ${attr.name}=${attr.value}`);
      }
    }
    for (const s of Array.from(document.scripts))
      if (!s.src || new URL(s.src).origin !== location.origin) bad.push(`script ${s.src || s.textContent?.slice(0, 40)}`);
    // The channel screen frames our own kiosk preview; any other frame came from a payload.
    const ownFrame = (el: Element) =>
      el instanceof HTMLIFrameElement &&
      new URL(el.src, location.href).origin === location.origin &&
      new URL(el.src, location.href).pathname === '/kiosk';
    for (const el of Array.from(document.querySelectorAll('iframe, object, embed, base, meta[http-equiv="refresh"], template')))
      if (!ownFrame(el)) bad.push(`${el.tagName} ${el.outerHTML.slice(0, 80)}`);
    return bad;
  });
  expect(found, `${screen}: live markup from a payload`).toEqual([]);
}

describe('hostile content', () => {
  it('payloads in every field that reaches a screen are shown as text and never run', async () => {
    const { context, page, baseUrl } = await openBrowser();
    const [admin, writer, reviewer, editor] = await Promise.all(
      (['admin', 'writer', 'reviewer', 'editor'] as const).map((r) => demoSession(baseUrl, r)),
    );
    const planted = await plantPayloads(admin, writer, reviewer, editor);
    const dialogs: string[] = [];
    page.on('dialog', (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    await openSessionInBrowser(context, baseUrl, admin);

    const screens: Array<[string, string, string]> = [
      ['catalogue', `/catalogue?q=${tag}`, 'window.__pwned=1'],
      ['object', `/catalogue/${planted.objectId}`, 'window.__pwned=1'],
      ['sources', '/sources', 'hostile test'],
      ['media library', '/media', 'Media'],
      ['page editor', `/pages/${planted.pageId}`, 'onerror="window.__pwned=1"'],
      ['page review', `/pages/${planted.pageId}/review`, 'onerror="window.__pwned=1"'],
      ['channel', `/publishing/channels/${planted.channelId}`, 'window.__pwned=1'],
      ['kiosk preview', `/kiosk?preview=${planted.channelId}`, XSS_PAYLOADS[13]],
    ];
    for (const [name, url, visible] of screens) {
      await page.goto(`${baseUrl}${url}`);
      if (visible)
        await expect
          // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
          .poll(() => page.locator('body').innerText(), { ...WAIT, message: `${name} shows the payload as text` })
          .toContain(visible);
      await assertInert(page, dialogs, name);
      await screenshot(page, `hostile-${name.replace(/ /g, '-')}`);
    }
    // The image panel shows the credit and alt text.
    await page.goto(`${baseUrl}/media`);
    await page.getByRole('list', { name: 'Images' }).getByRole('button').first().click();
    const details = page.getByRole('form', { name: 'Image details' });
    await expect.poll(() => details.getByLabel('Credit line').inputValue(), WAIT).toBe(XSS_PAYLOADS[23]);
    expect(await details.getByLabel('Alt text').inputValue()).toBe(XSS_PAYLOADS[0]);
    await assertInert(page, dialogs, 'image details');

    // The public API's HTML, rendered as a site embedding it would, on a page with no CSP at all.
    const live = (await (await fetch(`${baseUrl}/api/public/pages/${planted.pageId}`)).json()) as Data<{
      title: string;
      html: string;
    }>;
    expect(live.data.title).toBe(XSS_PAYLOADS[3]);
    await page.goto('about:blank');
    await page.setContent(`<!doctype html><title>embed</title><h1 id="t"></h1><main>${live.data.html}</main>`);
    await page.evaluate((t) => (document.getElementById('t')!.textContent = t), live.data.title);
    await page.waitForTimeout(600);
    expect(dialogs).toEqual([]);
    expect(await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned)).toBeUndefined();
    expect(live.data.html).not.toMatch(/<(script|svg|math|iframe|object|embed|img[^>]*onerror|[a-z]+[^>]*\son[a-z]+=)/i);
    // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
    expect(await page.locator('main').innerText()).toContain('<script>window.__pwned=1</script>');

    // The same page on the public site (our CSP), and its fragment embedded on a page with no CSP at all.
    const { slug } = live.data as unknown as { slug: string };
    await page.goto(`${baseUrl}/explore/${slug}`);
    // biome-ignore lint/performance/useDomNodeTextContent: a Playwright locator, not a DOM node: innerText is the text a reader sees
    await expect.poll(() => page.getByRole('heading', { level: 1 }).innerText(), WAIT).toBe(XSS_PAYLOADS[3]);
    await assertInert(page, dialogs, 'public page');
    const fragment = await (await fetch(`${baseUrl}/embed/pages/${slug}`)).text();
    await page.goto('about:blank');
    await page.setContent(`<!doctype html><title>embed</title><main>${fragment}</main>`);
    await assertInert(page, dialogs, 'embedded fragment');
  });

  it('CSV exports escape cells that a spreadsheet would read as a formula', async () => {
    const baseUrl = inject('baseUrl');
    const admin = await demoSession(baseUrl, 'admin');
    for (const file of ['objects.csv', 'measurements.csv']) {
      const res = await fetch(`${baseUrl}/api/catalogue/exports/${file}`, { headers: { Cookie: admin.cookie } });
      expect(res.status).toBe(200);
      const rows = parse(await res.text(), { relax_column_count: true }) as string[][];
      const dangerous = rows.flat().filter((c) => /^[=+\-@\t\r\u2212]/.test(c) && !/^-?\d+(\.\d+)?(e-?\d+)?$/i.test(c));
      expect(dangerous, `${file}: cells a spreadsheet would run`).toEqual([]);
      const escaped = rows.flat().filter((c) => /^'[=+\-@\u2212]/.test(c));
      expect(escaped.length, `${file}: the planted formulas are there, escaped`).toBeGreaterThanOrEqual(4);
    }
  });

  it('HTML pages (the staff app and the kiosk player) carry the Content-Security-Policy and security headers', async () => {
    const baseUrl = inject('baseUrl');
    for (const url of ['/', '/sign-in', '/kiosk', '/explore']) {
      const res = await fetch(`${baseUrl}${url}`);
      expect(res.status, url).toBe(200);
      expect(res.headers.get('content-type'), url).toMatch(/text\/html/);
      const csp = res.headers.get('content-security-policy') ?? '';
      // The kiosk player may be framed by the staff app's own channel preview, and by nothing else.
      const frames = url === '/kiosk' ? "frame-ancestors 'self'" : "frame-ancestors 'none'";
      for (const part of ["default-src 'self'", "script-src 'self'", "object-src 'none'", "base-uri 'self'", frames])
        expect(csp, url).toContain(part);
      expect(csp, url).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
      expect(res.headers.get('x-content-type-options'), url).toBe('nosniff');
      expect(res.headers.get('referrer-policy'), url).toBe('no-referrer');
      expect(res.headers.get('x-powered-by'), url).toBeNull();
      // No inline script in the HTML itself, or the policy above could not hold.
      expect(await res.text(), url).not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/i);
    }
  });
});
