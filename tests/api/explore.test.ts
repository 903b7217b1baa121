// fast-xml-parser 3 (installed with s3rver, a dev dependency): a validating XML parser for Node.
import xml from 'fast-xml-parser';
import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { workingSources } from '../../shared/statements/public-evidence.ts';
import { measurementName } from '../../shared/statements/working-names.ts';
import { appBaseUrl } from '../../server/config.ts';
import { getTestApp, resetDatabase } from '../support/app.ts';
import { paragraph, text } from '../support/pages.ts';
import { buildKioskMedia, publishedPage, publishingCrew } from '../support/publishing.ts';

type Crew = Awaited<ReturnType<typeof publishingCrew>>;
let crew: Crew;
let plain: Awaited<ReturnType<typeof publishedPage>>;
let hostile: Awaited<ReturnType<typeof publishedPage>>;
let solar: Awaited<ReturnType<typeof publishedPage>>;
const HOSTILE_TITLE = 'Rings <script>alert("t")</script> & <img src=x onerror=alert(1)>';
const HOSTILE_CAPTION = '<b onmouseover="alert(2)">caption</b> & "quotes"';
const HOSTILE_CREDIT = 'Ama & Co <script>alert(3)</script>';
const PLAIN_SLUG = 'the-quasar-for-visitors';
const HOSTILE_SLUG = 'rings-script-alert-t-script-img-src-x-onerror-alert-1';
const visitor = async () => supertest(await getTestApp());
const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i;

/** The "How we know" disclosures of a public page's HTML. */
const disclosures = (body: string) => [...body.matchAll(/<details class="how"[\s\S]*?<\/details>/g)].map((m) => m[0]);

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  crew = await publishingCrew();
  const image = await buildKioskMedia(crew.editor.user, { credit: HOSTILE_CREDIT });
  plain = await publishedPage(crew, 'The quasar for visitors');
  hostile = await publishedPage(crew, HOSTILE_TITLE, image.id, 'Tags like <b> & ampersands stay text.', {
    caption: HOSTILE_CAPTION,
  });
  solar = await publishedPage(crew, 'Watching a partial eclipse of the Sun', undefined, 'Use a certified filter.', {
    blocks: [{ type: 'eyeSafetyNotice' }, paragraph(text('Never look at the partial phase without one.'))],
  });
});

describe('the public pages (/explore)', () => {
  it('serves a published page as HTML with its language, cache validators, Open Graph and the Atom link', async () => {
    const res = await (await visitor()).get(`/explore/${PLAIN_SLUG}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(res.headers['content-language']).toBe('en-GB');
    expect(res.headers['cache-control']).toBe('public, max-age=60, must-revalidate');
    expect(res.headers.etag).toMatch(/^"[A-Za-z0-9_-]{43}"$/);
    expect(res.text).toMatch(/^<!doctype html>\n<html lang="en-GB">/);
    expect(res.text).toContain(`<link rel="canonical" href="${appBaseUrl()}/explore/${PLAIN_SLUG}">`);
    expect(res.text).toContain('<meta property="og:type" content="article">');
    expect(res.text).toContain('<meta property="og:title" content="The quasar for visitors">');
    expect(res.text).toContain(
      `<link rel="alternate" type="application/atom+xml" title="Starproof: newly published pages" href="${appBaseUrl()}/api/public/pages.atom">`,
    );
    // Landmarks: one main, a banner and a footer; one h1; no script at all.
    expect(res.text.match(/<main /g)).toHaveLength(1);
    expect(res.text.match(/<h1>/g)).toHaveLength(1);
    expect(res.text).not.toMatch(/<script/i);
    const again = await (await visitor()).get(`/explore/${PLAIN_SLUG}`).set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
    // HEAD answers the same headers without a body.
    const head = await (await visitor()).head(`/explore/${PLAIN_SLUG}`);
    expect(head.status).toBe(200);
    expect(head.headers.etag).toBe(res.headers.etag);
  });

  it('puts a "How we know" under each checked statement: sources named, no ids, no symbols of the staff view', async () => {
    const res = await (await visitor()).get(`/explore/${PLAIN_SLUG}`);
    const found = disclosures(res.text);
    expect(found).toHaveLength(2);
    for (const [i, id] of plain.statementIds.entries()) {
      const staff = await crew.reviewer.agent.get(`/api/statements/${id}`);
      const working = staff.body.data.working;
      expect(working.length).toBeGreaterThan(0);
      const body = found[i]
        .replace(/&amp;/g, '&')
        .replace(/&#39;/g, "'")
        .replace(/&quot;/g, '"');
      // Every source the staff working names appears, without the staff view's name of the
      // measurement ("(Page quasar: redshift)"): visitors read what was measured in its own list.
      const named = (staff.body.data.inputs as Array<{ quantity: string; band: string | null }>).map(
        (input) => ` (${measurementName(staff.body.data.object.name, input)})`,
      );
      for (const source of workingSources(working)) expect(body).toContain(named.reduce((s, n) => s.replace(n, ''), source));
      for (const input of staff.body.data.inputs) expect(body).toContain(input.citation);
      expect(found[i]).not.toMatch(UUID);
      expect(found[i]).toContain('<dt>How it is worked out</dt>');
      expect(found[i]).toContain('<dt>Last checked</dt>');
    }
    // The distance from a redshift names the cosmology in words.
    expect(found[0]).toContain('<dt>The model of the universe</dt>');
    expect(found[0]).toMatch(/expanding universe following the Friedmann equations/);
  });

  it('escapes hostile titles, captions and credits everywhere they appear', async () => {
    const res = await (await visitor()).get(`/explore/${HOSTILE_SLUG}`);
    expect(res.status).toBe(200);
    expect(res.text).not.toMatch(/<script|<img src=x/i);
    // No tag carries an event attribute (quoted attribute values, where the escaped text lives, set aside).
    expect(res.text.replace(/"[^"]*"/g, '""')).not.toMatch(/<[a-z][^>]*\son\w+=/i);
    expect(res.text).toContain('<title>Rings &lt;script&gt;alert(&quot;t&quot;)&lt;/script&gt; &amp; &lt;img src=x');
    expect(res.text).toContain('<h1>Rings &lt;script&gt;');
    expect(res.text).toContain('content="Rings &lt;script&gt;alert(&quot;t&quot;)');
    expect(res.text).toContain('&lt;b onmouseover=&quot;alert(2)&quot;&gt;caption&lt;/b&gt; &amp; &quot;quotes&quot;');
    expect(res.text).toContain('Ama &amp; Co &lt;script&gt;alert(3)&lt;/script&gt;');
    // The picture's credit and licence, with the licence linked; its address absolute.
    expect(res.text).toMatch(/<h2 id="credits-h">Picture credits<\/h2>/);
    expect(res.text).toContain('<a href="https://creativecommons.org/licenses/by/4.0/" rel="noopener noreferrer">CC BY 4.0</a>');
    expect(res.text).toMatch(new RegExp(`<img src="${appBaseUrl()}/media/files/[0-9a-f]{64}\\.jpg"`));
    const index = await (await visitor()).get('/explore');
    expect(index.text).not.toMatch(/<script|<img src=x/i);
    expect(index.text).toContain('Rings &lt;script&gt;');
  });

  it('heads a page about looking at the Sun with the eye-safety notice, once', async () => {
    const res = await (await visitor()).get('/explore/watching-a-partial-eclipse-of-the-sun');
    expect(res.status).toBe(200);
    expect(res.text).toMatch(/<aside class="eye-safety" aria-label="Eye safety"><p><strong>Eye safety\.<\/strong> /);
    expect(res.text).not.toContain('eye-safety-notice');
    const ordinary = await (await visitor()).get(`/explore/${PLAIN_SLUG}`);
    expect(ordinary.text).not.toContain('class="eye-safety"');
    const api = await (await visitor()).get(`/api/public/pages/${solar.pageId}`);
    expect(api.body.data.eyeSafetyNotice).toMatch(/Sun/);
    // New words for the notice reach the public page at once.
    const words = 'Never look at the Sun without a certified solar filter; ask our staff (words for a test).';
    expect((await crew.admin.agent.patch('/api/settings').send({ eyeSafetyNotice: words })).status).toBe(200);
    expect((await (await visitor()).get('/explore/watching-a-partial-eclipse-of-the-sun')).text).toContain(words);
  });

  it('says in words when there is no such page, and serves the index, the sitemap and the stylesheet', async () => {
    const missing = await (await visitor()).get('/explore/no-such-page');
    expect(missing.status).toBe(404);
    expect(missing.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(missing.text).toContain('<h1>We could not find that page</h1>');
    expect(missing.text).toContain('<a href="/explore">See every published page</a>');
    expect((await (await visitor()).get('/explore/a/b/c')).status).toBe(404);

    const index = await (await visitor()).get('/explore');
    expect(index.status).toBe(200);
    expect(index.headers['content-language']).toBe('en');
    expect(index.text).toContain(`<a href="/explore/${PLAIN_SLUG}">The quasar for visitors</a>`);
    expect((await (await visitor()).get('/explore').set('If-None-Match', index.headers.etag)).status).toBe(304);

    const sitemap = await (await visitor()).get('/sitemap.xml');
    expect(sitemap.status).toBe(200);
    expect(sitemap.headers['content-type']).toBe('application/xml; charset=utf-8');
    expect(xml.validate(sitemap.text)).toBe(true);
    const urls = [...sitemap.text.matchAll(/<loc>([^<]+)<\/loc>/g)].map((m) => m[1]);
    expect(urls).toContain(`${appBaseUrl()}/explore`);
    expect(urls).toContain(`${appBaseUrl()}/explore/${PLAIN_SLUG}`);
    expect(urls).toContain(`${appBaseUrl()}/explore/${HOSTILE_SLUG}`);

    const cssLink = /<link rel="stylesheet" href="([^"]+)">/.exec(index.text)![1];
    const css = await (await visitor()).get(cssLink);
    expect(css.status).toBe(200);
    expect(css.headers['content-type']).toBe('text/css; charset=utf-8');
    expect(css.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(css.text).toContain('@media print');
  });

  it('gives absolute addresses for pages and images in the public API and the Atom feed', async () => {
    const res = await (await visitor()).get(`/api/public/pages/${hostile.pageId}`);
    const page = res.body.data;
    expect(page.url).toBe(`${appBaseUrl()}/explore/${HOSTILE_SLUG}`);
    expect(page.images[0].url).toMatch(new RegExp(`^${appBaseUrl()}/media/files/[0-9a-f]{64}\\.jpg$`));
    expect(page.html).not.toMatch(/src="\//);
    expect(page.statements[0].howWeKnow).toMatchObject({ lang: 'en', method: expect.any(String) });
    // The desk's view of the live version links to the same address.
    const staff = await crew.editor.agent.get(`/api/pages/${hostile.pageId}/published`);
    expect(staff.body.data.publicUrl).toBe(page.url);
    const atom = await (await visitor()).get('/api/public/pages.atom');
    expect(atom.text).toContain(`<link rel="alternate" type="text/html" href="${appBaseUrl()}/explore/${PLAIN_SLUG}"/>`);
  });

  it('serves a page as an HTML fragment any website may read, and answers its preflight', async () => {
    const res = await (await visitor()).get(`/embed/pages/${PLAIN_SLUG}`).set('Origin', 'https://museum.example');
    expect(res.status).toBe(200);
    expect(res.headers['access-control-allow-origin']).toBe('*');
    expect(res.headers['cross-origin-resource-policy']).toBe('cross-origin');
    expect(res.headers['content-language']).toBe('en-GB');
    expect(res.text).toMatch(/^<article class="starproof-embed" lang="en-GB">/);
    expect(res.text).not.toMatch(/<html|<head|<script|<style/i);
    expect(disclosures(res.text)).toHaveLength(2);
    expect(res.text).toContain(`<a href="${appBaseUrl()}/explore/${PLAIN_SLUG}">`);
    expect((await (await visitor()).get(`/embed/pages/${PLAIN_SLUG}`).set('If-None-Match', res.headers.etag)).status).toBe(304);
    const preflight = await (await visitor())
      .options(`/embed/pages/${PLAIN_SLUG}`)
      .set('Origin', 'https://museum.example')
      .set('Access-Control-Request-Method', 'GET');
    expect(preflight.status).toBe(204);
    const missing = await (await visitor()).get('/embed/pages/no-such-page');
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('not_found');
  });

  it('drops an unpublished page from its address, the index, the sitemap and the fragments at once', async () => {
    expect((await crew.editor.agent.post(`/api/pages/${plain.pageId}/unpublish`)).status).toBe(200);
    expect((await (await visitor()).get(`/explore/${PLAIN_SLUG}`)).status).toBe(404);
    expect((await (await visitor()).get(`/embed/pages/${PLAIN_SLUG}`)).status).toBe(404);
    expect((await (await visitor()).get('/explore')).text).not.toContain(PLAIN_SLUG);
    expect((await (await visitor()).get('/sitemap.xml')).text).not.toContain(PLAIN_SLUG);
  });
});
