import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { appBaseUrl } from '../../server/config.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { addVersion, englishPage, publishVersion, type Desk } from '../support/page-versions.ts';

let desk: Desk;
let en: { id: string; slug: string };
let fr: { id: string; slug: string };
let lone: { id: string; slug: string };
const visitor = async () => supertest(await getTestApp());

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  desk = {
    writer: await signedInAgent('writer'),
    reviewer: await signedInAgent('reviewer'),
    editor: await signedInAgent('editor'),
  };
  const { page } = await englishPage(desk, 'The quasar next door');
  const french = (await addVersion(desk.writer.agent, page.id, 'fr-FR')).body.data;
  // A US version that stays a draft: never offered to the public.
  expect((await addVersion(desk.writer.agent, page.id, 'en-US')).status).toBe(201);
  await publishVersion(desk, page.id);
  await publishVersion(desk, french.id, 'Le quasar voisin');
  const single = await englishPage(desk, 'A page in one language');
  await publishVersion(desk, single.page.id);
  const list = (await (await visitor()).get('/api/public/pages')).body.data as Array<{ id: string; slug: string }>;
  const find = (id: string) => list.find((p) => p.id === id)!;
  en = find(page.id);
  fr = find(french.id);
  lone = find(single.page.id);
});

async function get(path: string, acceptLanguage?: string) {
  const req = (await visitor()).get(path);
  return acceptLanguage === undefined ? req : req.set('Accept-Language', acceptLanguage);
}

describe('one page in the reader’s language', () => {
  it('without ?lang or Accept-Language, the version the address names, with its language and alternates', async () => {
    const res = await get(`/api/public/pages/${en.slug}`);
    expect(res.status).toBe(200);
    expect(res.body.data.id).toBe(en.id);
    expect(res.headers['content-language']).toBe('en-GB');
    expect(res.headers.vary).toMatch(/Accept-Language/);
    const base = appBaseUrl().replace(/\/+$/, '');
    expect(res.body.data.alternates).toEqual([
      {
        hreflang: 'en-GB',
        title: 'The quasar next door',
        slug: en.slug,
        href: `${base}/api/public/pages/${en.slug}`,
        isDefault: true,
      },
      {
        hreflang: 'fr-FR',
        title: 'Le quasar voisin',
        slug: fr.slug,
        href: `${base}/api/public/pages/${fr.slug}`,
        isDefault: false,
      },
    ]);
    expect(res.headers.link).toBe(
      `<${base}/api/public/pages/${en.slug}>; rel="alternate"; hreflang="en-GB", <${base}/api/public/pages/${fr.slug}>; rel="alternate"; hreflang="fr-FR", <${base}/api/public/pages/${en.slug}>; rel="alternate"; hreflang="x-default"`,
    );
    expect((await get(`/api/public/pages/${fr.slug}`)).body.data.id).toBe(fr.id);
    expect((await get(`/api/public/pages/${fr.slug}`)).headers['content-language']).toBe('fr-FR');
  });

  it('?lang= picks the version: a locale or a bare language, any case; it beats Accept-Language', async () => {
    for (const lang of ['fr', 'fr-FR', 'FR-fr'])
      expect((await get(`/api/public/pages/${en.slug}?lang=${lang}`)).body.data.id, lang).toBe(fr.id);
    expect((await get(`/api/public/pages/${fr.slug}?lang=en`)).body.data.id).toBe(en.id);
    expect((await get(`/api/public/pages/${en.slug}?lang=en-GB`, 'fr')).body.data.id).toBe(en.id);
    // A language we write in but this page does not have in that locale: the same language, else the default version.
    expect((await get(`/api/public/pages/${fr.slug}?lang=en-US`)).body.data.id).toBe(en.id);
    const notThere = await get(`/api/public/pages/${lone.slug}?lang=fr`);
    expect(notThere.body.data.id).toBe(lone.id);
    expect(notThere.headers['content-language']).toBe('en-GB');
    expect(notThere.headers.link).toBeUndefined();
  });

  it('Accept-Language is negotiated by q-value, with the default version when nothing matches', async () => {
    const cases: Array<[string, string]> = [
      ['fr-CA,fr;q=0.9,en;q=0.8', fr.id],
      ['en;q=0.5, fr;q=0.8', fr.id],
      ['fr;q=0, en', en.id],
      ['fr;q=0, *', en.id],
      ['de-DE', en.id],
      ['de, *;q=0.1', en.id],
      ['en-US', en.id],
      ['fr-BE', fr.id],
      ['de-CH, fr-CH;q=0.7, en;q=0.3', fr.id],
    ];
    for (const [header, id] of cases) {
      const res = await get(`/api/public/pages/${fr.slug}`, header);
      expect(res.body.data.id, header).toBe(id);
      expect(res.headers['content-language'], header).toBe(id === fr.id ? 'fr-FR' : 'en-GB');
    }
  });

  it('each version has its own ETag; a revalidation in the same language is a 304', async () => {
    const enRes = await get(`/api/public/pages/${en.slug}`, 'en');
    const frRes = await get(`/api/public/pages/${en.slug}`, 'fr');
    expect(enRes.headers.etag).not.toBe(frRes.headers.etag);
    const again = (await visitor())
      .get(`/api/public/pages/${en.slug}`)
      .set('Accept-Language', 'fr')
      .set('If-None-Match', frRes.headers.etag!);
    expect((await again).status).toBe(304);
    const other = (await visitor())
      .get(`/api/public/pages/${en.slug}`)
      .set('Accept-Language', 'en')
      .set('If-None-Match', frRes.headers.etag!);
    expect((await other).status).toBe(200);
  });

  it('refuses a language we do not write in, in words', async () => {
    for (const lang of ['de', 'xx-YY', 'english', '']) {
      const res = await get(`/api/public/pages/${en.slug}?lang=${encodeURIComponent(lang)}`);
      if (lang === '') {
        expect(res.status).toBe(400);
        continue;
      }
      expect(res.status, lang).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.fields.lang).toBe('There is no such language here. Ask for one of: en-GB, en-US, fr-FR, en, fr');
    }
    expect((await get('/api/public/pages?lang=de')).status).toBe(400);
  });
});

describe('the list', () => {
  it('lists every published version without a language; one per page with one', async () => {
    const all = await get('/api/public/pages');
    expect(all.headers.vary).toMatch(/Accept-Language/);
    expect(all.body.data.map((p: { id: string }) => p.id).sort()).toEqual([en.id, fr.id, lone.id].sort());
    const french = await get('/api/public/pages', 'fr, en;q=0.5');
    expect(french.body.data.map((p: { id: string }) => p.id).sort()).toEqual([fr.id, lone.id].sort());
    const english = await get('/api/public/pages?lang=en');
    expect(english.body.data.map((p: { id: string }) => p.id).sort()).toEqual([en.id, lone.id].sort());
    expect(english.body.meta.total).toBe(2);
  });
});

describe('taking one version down', () => {
  it('leaves the others: alternates drop it, and readers who asked for it get the default version', async () => {
    expect((await desk.editor.agent.post(`/api/pages/${fr.id}/unpublish`)).status).toBe(200);
    const res = await get(`/api/public/pages/${en.slug}`, 'fr');
    expect(res.body.data.id).toBe(en.id);
    expect(res.headers['content-language']).toBe('en-GB');
    expect(res.body.data.alternates.map((a: { hreflang: string }) => a.hreflang)).toEqual(['en-GB']);
    expect(res.headers.link).toBeUndefined();
    expect((await get(`/api/public/pages/${fr.slug}`)).status).toBe(404);
    expect((await get(`/api/public/pages?lang=fr`)).body.data.map((p: { id: string }) => p.id).sort()).toEqual(
      [en.id, lone.id].sort(),
    );
  });
});
