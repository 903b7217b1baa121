// fast-xml-parser 3 (installed with s3rver, a dev dependency): a validating XML parser for Node.
import xml from 'fast-xml-parser';
import supertest from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { appBaseUrl } from '../../server/config.ts';
import { getTestApp, resetDatabase } from '../support/app.ts';
import { buildKioskMedia, publishedPage, publishingCrew } from '../support/publishing.ts';

/** The fields of a listed public page this file reads. */
type PublicPageBody = {
  id: string;
  title: string;
  slug: string;
  summary: string;
  html: string;
  statements: Array<{ id: string; text: string; asOf: string; note: string | null }>;
  images: Array<Record<string, unknown>>;
  object: { name: string };
};

// A low limit for this file only, so the 429 is reached quickly (read when the router loads).
vi.hoisted(() => {
  process.env.STARPROOF_PUBLIC_LIMIT = '60';
});

type Crew = Awaited<ReturnType<typeof publishingCrew>>;
let crew: Crew;
let hostile: Awaited<ReturnType<typeof publishedPage>>;
let plain: Awaited<ReturnType<typeof publishedPage>>;
const HOSTILE_TITLE = 'Rings & <script>alert("x")</script> “quotes”';
const visitor = async () => supertest(await getTestApp());

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  crew = await publishingCrew();
  const image = await buildKioskMedia(crew.editor.user, { credit: 'Ama & Co <Imaging>' });
  plain = await publishedPage(crew, 'The quasar in plain words');
  hostile = await publishedPage(crew, HOSTILE_TITLE, image.id, 'Tags like <b> & ampersands stay text.');
});

describe('the public API', () => {
  it('lists published pages with sanitized HTML, statements with "as of", and image credits and licences; no sign-in', async () => {
    const res = await (await visitor()).get('/api/public/pages');
    expect(res.status).toBe(200);
    expect(res.headers['access-control-allow-origin']).toBe('*');
    expect(res.headers['cache-control']).toBe('public, max-age=60, must-revalidate');
    const pages = res.body.data as PublicPageBody[];
    expect(res.body.meta.total).toBe(2);
    const page = pages.find((p) => p.id === hostile.pageId)!;
    expect(page.title).toBe(HOSTILE_TITLE);
    expect(page.slug).toBe('rings-script-alert-x-script-quotes');
    expect(page.summary).toBe('Tags like <b> & ampersands stay text.');
    expect(page.html).toContain('Tags like &lt;b&gt; &amp; ampersands stay text.');
    expect(page.html).not.toMatch(/<script|\son\w+=/i);
    expect(page.statements).toHaveLength(2);
    expect(page.statements[0]).toMatchObject({ id: expect.any(String), text: expect.any(String) });
    expect(Date.parse(page.statements[0].asOf)).not.toBeNaN();
    // The small print reaches the public: the distance names its cosmology, the naked-eye one has none.
    const [distance, nakedEye] = hostile.statementIds.map((id) => page.statements.find((s) => s.id === id)!);
    expect(distance.note).toMatch(/^Worked out with the Planck 2018 .* cosmology\.$/);
    expect(nakedEye.note).toBeNull();
    expect(page.html).toMatch(/<sup class="statement-note-ref">1<\/sup>/);
    expect(page.html).toMatch(/<ol class="statement-notes" aria-label="Notes"><li value="1">Worked out with the Planck 2018 /);
    expect(page.images[0]).toMatchObject({
      credit: 'Ama & Co <Imaging>',
      licence: 'CC BY 4.0',
      licenceUrl: 'https://creativecommons.org/licenses/by/4.0/',
    });
    expect(page.object.name).toBe(hostile.objectName);
  });

  it('finds one page by slug or id, 404 otherwise, and revalidates with a strong ETag', async () => {
    const bySlug = await (await visitor()).get('/api/public/pages/the-quasar-in-plain-words');
    expect(bySlug.status).toBe(200);
    expect(bySlug.body.data.id).toBe(plain.pageId);
    const byId = await (await visitor()).get(`/api/public/pages/${plain.pageId}`);
    expect(byId.body.data.slug).toBe('the-quasar-in-plain-words');
    const etag = byId.headers.etag;
    expect(etag).toMatch(/^"[A-Za-z0-9_-]{43}"$/);
    expect((await (await visitor()).get(`/api/public/pages/${plain.pageId}`).set('If-None-Match', etag)).status).toBe(304);
    const missing = await (await visitor()).get('/api/public/pages/no-such-page');
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('not_found');
    expect(missing.headers['access-control-allow-origin']).toBe('*');
  });

  it('serves a well-formed Atom 1.0 feed with every text escaped', async () => {
    // A fixed Host: links in Atom are absolute, built from it (supertest's port changes per request).
    const res = await (await visitor()).get('/api/public/pages.atom').set('Host', 'starproof.example');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/atom+xml; charset=utf-8');
    expect(xml.validate(res.text)).toBe(true);
    expect(res.text).not.toContain('<script>');
    const doc = xml.parse(res.text, {
      ignoreAttributes: false,
      attributeNamePrefix: '@_',
      textNodeName: '#text',
      parseNodeValue: false,
    });
    // RFC 4287: feed needs id, title, updated, author (or per-entry authors); entries need id, title, updated.
    expect(doc.feed['@_xmlns']).toBe('http://www.w3.org/2005/Atom');
    // The configured base, never the Host header (issue 15, point 13).
    expect(doc.feed.id).toBe(`${appBaseUrl()}/api/public/pages.atom`);
    expect(doc.feed.author.name).toBeTruthy();
    const entries = Array.isArray(doc.feed.entry) ? doc.feed.entry : [doc.feed.entry];
    expect(entries).toHaveLength(2);
    const entry = entries.find((e: { id: string }) => e.id === `urn:uuid:${hostile.pageId}`);
    // The parser leaves entities as written: the title arrives escaped, exactly once.
    expect(entry.title['#text']).toBe('Rings &amp; &lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; “quotes”');
    expect(Date.parse(entry.updated)).not.toBeNaN();
    expect(entry.content['@_type']).toBe('html');
    expect(res.text).toContain('&lt;p&gt;Tags like &amp;lt;b&amp;gt; &amp;amp; ampersands stay text.&lt;/p&gt;');
    expect(
      (
        await (
          await visitor()
        )
          .get('/api/public/pages.atom')
          .set('Host', 'starproof.example')
          .set('If-None-Match', res.headers.etag)
      ).status,
    ).toBe(304);
  });

  it('drops an unpublished page from the list and the feed at once', async () => {
    expect((await crew.editor.agent.post(`/api/pages/${plain.pageId}/unpublish`)).status).toBe(200);
    const list = await (await visitor()).get('/api/public/pages');
    expect(list.body.data.map((p: { id: string }) => p.id)).toEqual([hostile.pageId]);
    expect((await (await visitor()).get(`/api/public/pages/${plain.pageId}`)).status).toBe(404);
    expect((await (await visitor()).get('/api/public/pages.atom')).text).not.toContain(plain.pageId);
  });

  it('is read-only with open CORS for GET, answers preflights, and is rate limited with standard headers', async () => {
    const preflight = await (await visitor())
      .options('/api/public/pages')
      .set('Origin', 'https://corrie-vale.example')
      .set('Access-Control-Request-Method', 'GET');
    expect(preflight.status).toBe(204);
    expect(preflight.headers['access-control-allow-methods']).toBe('GET, HEAD, OPTIONS');
    const post = await (await visitor()).post('/api/public/pages').send({});
    expect(post.status).toBe(405);
    // Staff routes stay closed to other sites: no CORS header outside /api/public.
    expect(
      (await (await visitor()).get('/api/channels').set('Origin', 'https://corrie-vale.example')).headers[
        'access-control-allow-origin'
      ],
    ).toBeUndefined();
    const res = await (await visitor()).get('/api/public/pages');
    // IETF draft-ietf-httpapi-ratelimit-headers (draft 8), as express-rate-limit writes it.
    expect(res.headers['ratelimit-policy']).toMatch(/q=60; w=60/);
    expect(res.headers.ratelimit).toMatch(/r=\d+; t=\d+/);
    let last = res;
    for (let i = 0; i < 70 && last.status !== 429; i += 1) last = await (await visitor()).get('/api/public/pages');
    expect(last.status).toBe(429);
    expect(last.body.error.code).toBe('too_many_requests');
    expect(last.headers['access-control-allow-origin']).toBe('*');
  });
});
