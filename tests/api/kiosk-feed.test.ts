import supertest from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { appBaseUrl } from '../../server/config.ts';
import { KioskScreen, Page } from '../../server/models/index.ts';
import { publicPageUrl } from '../../server/services/publishing/index.ts';
import { kioskFeedStats } from '../../server/services/publishing/feed-cache.ts';
import { getTestApp } from '../support/app.ts';
import {
  buildKioskMedia,
  freshPublishingDesk,
  getFeed,
  makeVenue,
  pairedScreen,
  publishedPage,
  type PublishingDesk,
} from '../support/publishing.ts';

let crew: PublishingDesk['crew'];
let venue: PublishingDesk['venue'];
let channelWithScreen: PublishingDesk['channelWithScreen'];

beforeAll(async () => {
  ({ crew, venue, channelWithScreen } = await freshPublishingDesk('Feed Test Dome'));
});

const addSlide = async (channelId: string, body: Record<string, unknown>) => {
  const res = await crew.editor.agent.post(`/api/channels/${channelId}/slides`).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.data.slides.at(-1).id as string;
};

describe('the kiosk feed', () => {
  it('a screen without a channel, and a channel without slides, get a valid empty JSON Feed (the holding screen)', async () => {
    const lone = await pairedScreen(crew.admin.agent, venue.id, 'Lone screen');
    const res = await getFeed(lone.token);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/feed+json; charset=utf-8');
    const feed = JSON.parse(res.text);
    // JSON Feed 1.1: version URL, title and items are required (jsonfeed.org/version/1.1).
    expect(feed.version).toBe('https://jsonfeed.org/version/1.1');
    expect(feed.title).toBe('Feed Test Dome');
    expect(feed.items).toEqual([]);
    expect(feed._starproof).toMatchObject({ holding: true, channel: null, venue: { id: venue.id, time_zone: 'Europe/London' } });

    const empty = await channelWithScreen('Empty channel', 'Empty screen');
    const emptyFeed = JSON.parse((await getFeed(empty.token)).text);
    expect(emptyFeed.items).toEqual([]);
    expect(emptyFeed._starproof).toMatchObject({ holding: true, channel: { id: empty.channelId, name: 'Empty channel' } });
    expect(emptyFeed.title).toBe('Empty channel · Feed Test Dome');
  });

  it('carries page, image and sky slides in order with timing, layout, statements with "as of", credit and licence', async () => {
    const image = await buildKioskMedia(crew.editor.user);
    const page = await publishedPage(crew, 'A quasar for the foyer', image.id);
    const { channelId, token } = await channelWithScreen('Foyer', 'Foyer screen');
    const pageSlide = await addSlide(channelId, {
      kind: 'page',
      pageId: page.pageId,
      statementIds: [page.statementIds[0]],
      durationS: 20,
    });
    const imageSlide = await addSlide(channelId, {
      kind: 'image',
      mediaId: image.id,
      caption: 'Gas & dust <in> the Swan',
      durationS: 3,
    });
    const skySlide = await addSlide(channelId, { kind: 'sky_tonight', durationS: 600 });

    const res = await getFeed(token);
    expect(res.status).toBe(200);
    const feed = JSON.parse(res.text);
    expect(feed.items.map((i: { id: string }) => i.id)).toEqual([pageSlide, imageSlide, skySlide]);
    const [p, i, s] = feed.items;
    expect(p.title).toBe('A quasar for the foyer');
    expect(p.content_html).toContain('<p>A bright quasar you can find with a small telescope.</p>');
    // Absolute addresses (PUBLIC_URL), for images and for the page's public address (issue 17).
    expect(p.image).toMatch(new RegExp(`^${appBaseUrl()}/media/files/[0-9a-f]{64}\\.jpg$`));
    expect(p._starproof.slide.image.uhd).toMatch(new RegExp(`^${appBaseUrl()}/media/files/[0-9a-f]{64}\\.jpg$`));
    expect(p.url).toBe(publicPageUrl('a-quasar-for-the-foyer'));
    expect(Date.parse(p.date_published)).not.toBeNaN();
    expect(p._starproof.slide).toMatchObject({
      kind: 'page',
      duration_s: 20,
      layout: 'image-text',
      credit: 'Corrie Vale Observatory (demo)',
      licence: 'CC BY 4.0',
      licence_url: 'https://creativecommons.org/licenses/by/4.0/',
    });
    expect(p._starproof.slide.statements).toHaveLength(1);
    expect(p._starproof.slide.statements[0]).toMatchObject({ id: page.statementIds[0], text: page.distanceText });
    expect(Date.parse(p._starproof.slide.statements[0].as_of)).not.toBeNaN();
    // The distance's small print travels with it, for the player to show where space allows.
    expect(p._starproof.slide.statements[0].note).toMatch(/^Worked out with the Planck 2018 .* cosmology\.$/);
    expect(p._starproof.slide.image).toMatchObject({ focal: { x: 0.4, y: 0.6 } });
    expect(p._starproof.slide.image.hd).not.toBe(p._starproof.slide.image.uhd);
    // Durations are clamped to 5–120 s rather than refused.
    expect(i._starproof.slide).toMatchObject({
      kind: 'image',
      layout: 'image',
      duration_s: 5,
      text: 'Gas & dust <in> the Swan',
      credit: 'Corrie Vale Observatory (demo)',
    });
    expect(i.content_html).toContain('Gas &amp; dust &lt;in&gt; the Swan');
    expect(s._starproof.slide).toMatchObject({ kind: 'sky_tonight', layout: 'sky-table', duration_s: 120 });
    expect(s._starproof.sky.planets).toHaveLength(7);
    expect(s._starproof.sky.venue_name).toBe('Feed Test Dome');
    expect(s.content_html).toMatch(/^<p>Sunset .*<table>/);
    expect(feed._starproof.valid_until).not.toBeNull();
  });

  it('leaves a phrase form off the slide’s list of statements: alone it would read as a fragment', async () => {
    const page = await publishedPage(crew, 'A phrase in a sentence', undefined, undefined, { phrase: true });
    const { channelId, token } = await channelWithScreen('Phrase loop', 'Phrase screen');
    await addSlide(channelId, { kind: 'page', pageId: page.pageId, statementIds: [page.statementIds[0], page.phraseId] });
    const feed = await getFeed(token);
    expect(feed.status).toBe(200);
    const listed = feed.body.items[0]._starproof.slide.statements.map((s: { id: string }) => s.id);
    expect(listed).toEqual([page.statementIds[0]]);
  });

  it('answers If-None-Match with 304 from memory, with a strong ETag and no-cache', async () => {
    const { channelId, token } = await channelWithScreen('Revalidation', 'Revalidation screen');
    await addSlide(channelId, { kind: 'sky_tonight' });
    const first = await getFeed(token);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^"[A-Za-z0-9_-]{43}"$/); // strong: no W/ prefix
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const builds = kioskFeedStats().builds;
    for (const header of [etag, `W/${etag}`, `"other", ${etag}`, '*']) {
      const again = await getFeed(token, header);
      expect(again.status).toBe(304);
      expect(again.text).toBe('');
      expect(again.headers.etag).toBe(etag);
    }
    expect(kioskFeedStats().builds).toBe(builds);
    expect((await getFeed(token, '"stale"')).status).toBe(200);
  });

  it('drops a slide at once when its page is unpublished, and brings it back when published again', async () => {
    const page = await publishedPage(crew, 'Here today');
    const { channelId, token } = await channelWithScreen('Unpublish', 'Unpublish screen');
    await addSlide(channelId, { kind: 'page', pageId: page.pageId, statementIds: page.statementIds });
    await addSlide(channelId, { kind: 'sky_tonight' });
    const before = await getFeed(token);
    expect(JSON.parse(before.text).items.map((i: { title: string }) => i.title)).toEqual(['Here today', 'The sky tonight']);
    expect((await crew.editor.agent.post(`/api/pages/${page.pageId}/unpublish`)).status).toBe(200);
    const after = await getFeed(token, before.headers.etag);
    expect(after.status).toBe(200);
    expect(JSON.parse(after.text).items.map((i: { title: string }) => i.title)).toEqual(['The sky tonight']);
    const detail = await crew.editor.agent.get(`/api/channels/${channelId}`);
    expect(detail.body.data.slides[0]).toMatchObject({ state: 'page_unpublished' });
    expect((await crew.editor.agent.post(`/api/pages/${page.pageId}/publish`)).status).toBe(200);
    expect(JSON.parse((await getFeed(token)).text).items).toHaveLength(2);
  });

  it('notices a change made on another server instance (no event here) through the fingerprint', async () => {
    const page = await publishedPage(crew, 'Elsewhere');
    const { channelId, token } = await channelWithScreen('Other instance', 'Other instance screen');
    await addSlide(channelId, { kind: 'page', pageId: page.pageId });
    expect(JSON.parse((await getFeed(token)).text).items).toHaveLength(1);
    // Another instance unpublishes: the row changes, but this process hears no event.
    await Page.update({ publishedSnapshot: null, publishedRevisionId: null, status: 'approved' }, { where: { id: page.pageId } });
    await new Promise((r) => setTimeout(r, 1100));
    expect(JSON.parse((await getFeed(token)).text).items).toHaveLength(0);
  });

  it('leaves out slides outside their window by the server clock, and adds one when its window opens', async () => {
    const { channelId, token } = await channelWithScreen('Windows', 'Windows screen');
    const now = Date.now();
    const iso = (ms: number) => new Date(ms).toISOString();
    await addSlide(channelId, { kind: 'sky_tonight', startsAt: iso(now - 3_600_000), endsAt: iso(now - 60_000) });
    const soon = await addSlide(channelId, { kind: 'sky_tonight', startsAt: iso(now + 2_500) });
    const open = await addSlide(channelId, { kind: 'sky_tonight', startsAt: iso(now - 60_000), endsAt: iso(now + 3_600_000) });
    // A kiosk whose own clock is a day off changes nothing: the server decides by its clock.
    const first = await supertest(await getTestApp())
      .get('/api/kiosk/feed')
      .set('Authorization', `Bearer ${token}`)
      .set('Date', new Date(now + 86_400_000).toUTCString());
    const feed = JSON.parse(first.text);
    expect(feed.items.map((i: { id: string }) => i.id)).toEqual([open]);
    expect(Math.abs(Date.parse(feed._starproof.server_time) - Date.now())).toBeLessThan(5_000);
    expect(Date.parse(feed._starproof.valid_until)).toBeLessThanOrEqual(now + 2_500);
    await new Promise((r) => setTimeout(r, Math.max(0, now + 2_700 - Date.now())));
    const later = await getFeed(token, first.headers.etag);
    expect(later.status).toBe(200);
    expect(JSON.parse(later.text).items.map((i: { id: string }) => i.id)).toEqual([soon, open]);
  });

  it('refuses an unknown, malformed or revoked token with 401, and a kiosk cannot read a channel’s staff preview', async () => {
    const { channelId, token, screenId } = await channelWithScreen('Revocation', 'Revocation screen');
    expect((await getFeed(token)).status).toBe(200);
    const unknown = await getFeed('spk_thisTokenWasNeverIssuedToAnyScreen');
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.code).toBe('kiosk_token_invalid');
    expect((await supertest(await getTestApp()).get('/api/kiosk/feed')).status).toBe(401);
    expect(
      (
        await supertest(await getTestApp())
          .get('/api/kiosk/feed')
          .set('Authorization', 'Basic abc')
      ).status,
    ).toBe(401);
    expect(
      (
        await supertest(await getTestApp())
          .get(`/api/channels/${channelId}/preview-feed`)
          .set('Authorization', `Bearer ${token}`)
      ).status,
    ).toBe(401);
    expect((await crew.admin.agent.post(`/api/venues/${venue.id}/screens/${screenId}/revoke`)).status).toBe(200);
    const revoked = await getFeed(token);
    expect(revoked.status).toBe(401);
    expect(revoked.body.error.code).toBe('kiosk_token_invalid');
  });

  it('keeps each venue’s channels to its own screens', async () => {
    const other = await makeVenue(crew.admin.agent, 'Other Town Science Centre');
    const theirs = await crew.editor.agent.post('/api/channels').send({ venueId: other.id, name: 'Their channel' });
    await crew.editor.agent.post(`/api/channels/${theirs.body.data.id}/slides`).send({ kind: 'sky_tonight' });
    const ours = await pairedScreen(crew.admin.agent, venue.id, 'Our screen');
    const refused = await crew.editor.agent
      .put(`/api/channels/${theirs.body.data.id}/screens`)
      .send({ screenIds: [ours.screenId] });
    expect(refused.status).toBe(400);
    expect(refused.body.error.code).toBe('screen_other_venue');
    const feed = JSON.parse((await getFeed(ours.token)).text);
    expect(feed.items).toEqual([]);
    expect(feed._starproof.venue.id).toBe(venue.id);
  });
  it('sends the same security headers as the rest of the API on its 200 and 401 answers; its 304 carries only the validators and cache rule', async () => {
    const { channelId, token } = await channelWithScreen('Headers', 'Headers screen');
    await addSlide(channelId, { kind: 'sky_tonight' });
    const health = await supertest(await getTestApp()).get('/api/health');
    const security = (headers: Record<string, unknown>) =>
      Object.fromEntries(
        Object.entries(headers).filter(
          ([name]) =>
            !/^(etag|cache-control|content-type|content-length|vary|date|connection|keep-alive|www-authenticate|set-cookie)$/.test(
              name,
            ),
        ),
      );
    const expected = security(health.headers);
    expect(expected['content-security-policy']).toContain("default-src 'self'");
    const full = await getFeed(token);
    const again = await getFeed(token, full.headers.etag);
    const refused = await getFeed('spk_thisTokenWasNeverIssuedToAnyScreen');
    expect([full.status, again.status, refused.status]).toEqual([200, 304, 401]);
    for (const res of [full, refused]) expect(security(res.headers)).toEqual(expected);
    // The player (or a cache) keeps the 200's other headers, the security headers among them (RFC 9111, 4.3.4).
    expect(security(again.headers)).toEqual({});
    expect(again.headers.etag).toBe(full.headers.etag);
    expect(again.headers['cache-control']).toBe('private, no-cache');
    expect(again.headers.vary).toBe('Authorization');
    // Answered ahead of Express for the exact path; the app answers any other form of it the same way.
    const withQuery = await supertest(await getTestApp())
      .get('/api/kiosk/feed?from=test')
      .set('Authorization', `Bearer ${token}`)
      .set('If-None-Match', full.headers.etag as string);
    expect(withQuery.status).toBe(304);
    expect(security(withQuery.headers)).toEqual({});
    expect(withQuery.headers.etag).toBe(full.headers.etag);
    expect(refused.headers['www-authenticate']).toBe('Bearer realm="kiosk", error="invalid_token"');
  });

  it('checks a token once for all the requests that bring it at the same moment', async () => {
    const { token } = await channelWithScreen('Crowd', 'Crowd screen');
    const lookups = vi.spyOn(KioskScreen, 'findOne');
    try {
      const answers = await Promise.all(Array.from({ length: 8 }, () => getFeed(token)));
      expect(answers.map((a) => a.status)).toEqual(Array(8).fill(200));
      expect(lookups).toHaveBeenCalledTimes(1);
    } finally {
      lookups.mockRestore();
    }
  });
});
