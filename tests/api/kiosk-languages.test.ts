import { beforeAll, describe, expect, it } from 'vitest';
import type { KioskFeed } from '@shared/schemas/kiosk-feed.ts';
import { DEMO_FRENCH_TITLE } from '../../server/demo/pages.ts';
import { seedDemo } from '../../server/demo/seed.ts';
import { AuditEvent, Channel, Page, Statement } from '../../server/models/index.ts';
import { getTestApp, resetDatabase } from '../support/app.ts';
import { addVersion, publishVersion } from '../support/page-versions.ts';
import { getFeed, makeVenue, pairedScreen, publishedPage, publishingCrew } from '../support/publishing.ts';

let crew: Awaited<ReturnType<typeof publishingCrew>>;

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  crew = await publishingCrew();
});

const titles = (feed: KioskFeed) => feed.items.map((i) => [i.language ?? null, i.title]);

describe('a channel that lists its languages', () => {
  it('plays one round per language: each page in its version in that language, image and sky slides in every round', async () => {
    const venue = await makeVenue(crew.admin.agent, 'Two-language venue (test)');
    const page = await publishedPage(crew, 'The quasar in two languages');
    const fr = (await addVersion(crew.writer.agent, page.pageId, 'fr-FR')).body.data;
    await publishVersion(crew, fr.id, 'Le quasar en deux langues');
    const alone = await publishedPage(crew, 'Only in English');
    const channel = (await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name: 'Bilingual loop' })).body.data;
    for (const [pageId, statementIds] of [
      [page.pageId, page.statementIds],
      [alone.pageId, alone.statementIds],
    ] as const)
      expect(
        (await crew.editor.agent.post(`/api/channels/${channel.id}/slides`).send({ kind: 'page', pageId, statementIds })).status,
      ).toBe(201);
    await crew.editor.agent.post(`/api/channels/${channel.id}/slides`).send({ kind: 'sky_tonight' });
    const screen = await pairedScreen(crew.admin.agent, venue.id, 'Bilingual screen');
    await crew.editor.agent.put(`/api/channels/${channel.id}/screens`).send({ screenIds: [screen.screenId] });

    // No languages listed: as before, each page as chosen, ids are the slides'.
    let feed: KioskFeed = (await getFeed(screen.token)).body;
    expect(feed._starproof.languages).toEqual([]);
    expect(feed.items.map((i) => i.title)).toEqual(['The quasar in two languages', 'Only in English', 'The sky tonight']);

    const set = await crew.editor.agent
      .patch(`/api/channels/${channel.id}`)
      .send({ name: 'Bilingual loop', languages: ['en-GB', 'fr-FR'] });
    expect(set.status, JSON.stringify(set.body)).toBe(200);
    expect(set.body.data.languages).toEqual(['en-GB', 'fr-FR']);
    expect(await AuditEvent.count({ where: { subjectId: channel.id, action: 'channel.languages_set' } })).toBe(1);
    expect(await AuditEvent.count({ where: { subjectId: channel.id, action: 'channel.renamed' } })).toBe(0);

    feed = (await getFeed(screen.token)).body;
    expect(feed._starproof.languages).toEqual(['en-GB', 'fr-FR']);
    expect(titles(feed)).toEqual([
      ['en-GB', 'The quasar in two languages'],
      ['en-GB', 'Only in English'],
      ['en', 'The sky tonight'],
      ['fr-FR', 'Le quasar en deux langues'],
      // No French version: the page as chosen, so the round keeps its slide.
      ['en-GB', 'Only in English'],
      ['en', 'The sky tonight'],
    ]);
    expect(new Set(feed.items.map((i) => i.id)).size).toBe(6);
    const french = feed.items[3]!._starproof.slide;
    const distance = (await Statement.findByPk(page.statementIds[0]))!;
    expect(french.statements.map((s) => s.text)).toContain(distance.texts!['fr-FR']);
    expect(feed.items[0]!._starproof.slide.statements.map((s) => s.text)).toContain(distance.texts!['en-GB']);

    // A screen with a language of its own plays only that one.
    const one = await crew.admin.agent.patch(`/api/venues/${venue.id}/screens/${screen.screenId}`).send({ language: 'fr-FR' });
    expect(one.status, JSON.stringify(one.body)).toBe(200);
    expect(one.body.data.language).toBe('fr-FR');
    await expect
      .poll(async () => ((await getFeed(screen.token)).body as KioskFeed)._starproof.languages, { timeout: 5000 })
      .toEqual(['fr-FR']);
    feed = (await getFeed(screen.token)).body;
    expect(titles(feed)).toEqual([
      ['fr-FR', 'Le quasar en deux langues'],
      ['en-GB', 'Only in English'],
      ['en', 'The sky tonight'],
    ]);

    // Unpublishing the French version: that round shows the page as chosen, at once.
    expect((await crew.editor.agent.post(`/api/pages/${fr.id}/unpublish`)).status).toBe(200);
    feed = (await getFeed(screen.token)).body;
    expect(feed.items[0]!.title).toBe('The quasar in two languages');

    // Back to following the channel.
    expect(
      (await crew.admin.agent.patch(`/api/venues/${venue.id}/screens/${screen.screenId}`).send({ language: null })).body.data
        .language,
    ).toBeNull();
  });

  it('refuses languages we do not write in, a language listed twice, and a screen language outside the registry', async () => {
    const venue = await makeVenue(crew.admin.agent, 'Refusing venue (test)');
    const channel = (await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name: 'Refusals' })).body.data;
    const unknown = await crew.editor.agent
      .patch(`/api/channels/${channel.id}`)
      .send({ name: 'Refusals', languages: ['en-GB', 'de-DE'] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields['languages.1']).toMatch(/^Choose a language we write in: en-GB \(English \(UK\)\)/);
    const twice = await crew.editor.agent
      .patch(`/api/channels/${channel.id}`)
      .send({ name: 'Refusals', languages: ['fr-FR', 'fr-FR'] });
    expect(twice.status).toBe(400);
    expect(twice.body.error.message).toMatch(/A language is listed twice/);
    expect((await Channel.findByPk(channel.id))!.languages).toEqual([]);

    const added = await crew.admin.agent.post(`/api/venues/${venue.id}/screens`).send({ name: 'Refusing screen' });
    const screenId = added.body.data.screen.id;
    const bad = await crew.admin.agent.patch(`/api/venues/${venue.id}/screens/${screenId}`).send({ language: 'klingon' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.language).toMatch(/^Choose a language we write in/);
    expect(
      (await crew.editor.agent.patch(`/api/venues/${venue.id}/screens/${screenId}`).send({ language: 'fr-FR' })).status,
    ).toBe(403);
  });
});

describe('demo data', () => {
  it('has the Andromeda page in English and French, each published, and a channel that plays both', async () => {
    await seedDemo();
    await seedDemo();
    const french = await Page.findAll({ where: { title: DEMO_FRENCH_TITLE } });
    expect(french).toHaveLength(1);
    expect(french[0]!.locale).toBe('fr-FR');
    expect(french[0]!.status).toBe('published');
    const english = (await Page.findAll({ where: { versionGroupId: french[0]!.versionGroupId } })).find(
      (p) => p.locale === 'en-GB',
    )!;
    expect(english.status).toBe('published');
    const texts = Object.values(french[0]!.publishedSnapshot!.statementTexts);
    expect(texts).toHaveLength(2);
    for (const t of texts) expect(t).toMatch(/galaxie d’Andromède|années/);
    expect(french[0]!.publishedSnapshot!.html).toContain('C’était bien avant l’apparition de notre espèce.');
    const channel = await Channel.findOne({ where: { name: 'Foyer loop in English and French (demo)' } });
    expect(channel!.languages).toEqual(['en-GB', 'fr-FR']);
  });
});
