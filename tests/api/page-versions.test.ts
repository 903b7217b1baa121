import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Measurement, Page, PageVersionGroup, Statement } from '../../server/models/index.ts';
import { setPreferred } from '../../server/services/catalogue/preferred-write.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { addVersion, englishPage as englishPageOf, publishVersion, type Desk } from '../support/page-versions.ts';

type Signed = Awaited<ReturnType<typeof signedInAgent>>;
let writer: Signed;
let reviewer: Signed;
let editor: Signed;

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  writer = await signedInAgent('writer');
  reviewer = await signedInAgent('reviewer');
  editor = await signedInAgent('editor');
});

const desk = (): Desk => ({ writer, reviewer, editor });
const englishPage = (title = 'The quasar next door') => englishPageOf(desk(), title);
const publish = (pageId: string) => publishVersion(desk(), pageId);

describe('adding a version in another language', () => {
  it('copies the structure and statements; each statement reads in the new locale, with the same numbers', async () => {
    const { q, page } = await englishPage();
    const res = await addVersion(writer.agent, page.id, 'fr-FR');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const fr = res.body.data;
    expect(fr.locale).toBe('fr-FR');
    expect(fr.status).toBe('draft');
    expect(fr.title).toBe('The quasar next door');
    expect(fr.doc).toEqual((await writer.agent.get(`/api/pages/${page.id}`)).body.data.doc);

    const stored = await Statement.findByPk(q.distanceId);
    const distance = fr.statements.find((s: { id: string }) => s.id === q.distanceId);
    expect(distance.text).toBe(stored!.texts!['fr-FR']);
    expect(distance.text).not.toBe(stored!.texts!['en-GB']);
    // Same figure, French words and number format: "2,2 milliards" against "2.2 billion".
    const figure = (t: string) => t.match(/\d+(?:[.,]\d+)?/)![0];
    expect(figure(distance.text)).toBe(figure(stored!.texts!['en-GB']).replace('.', ','));
    expect(distance.text).toMatch(/années-lumière/);

    // Both versions list each other, the original as the default.
    for (const id of [page.id, fr.id]) {
      const list = (await writer.agent.get(`/api/pages/${id}/versions`)).body.data;
      expect(list.versions.map((v: { locale: string }) => v.locale)).toEqual(['en-GB', 'fr-FR']);
      expect(list.versions.find((v: { current: boolean }) => v.current).id).toBe(id);
      expect(list.versions.find((v: { isDefault: boolean }) => v.isDefault).id).toBe(page.id);
      expect(list.missing.map((m: { locale: string }) => m.locale)).toEqual(['en-US']);
      expect(list.missing[0].addLabel).toBe('Add an English (US) version');
    }
    const audit = await AuditEvent.findOne({ where: { subjectId: fr.id, action: 'page.version_created' } });
    expect(audit?.data).toMatchObject({ from: page.id, locale: 'fr-FR' });
  });

  it('refuses a second version in the same language with 409 and says which page holds it', async () => {
    const { page } = await englishPage('Twice in French');
    expect((await addVersion(writer.agent, page.id, 'fr-FR')).status).toBe(201);
    const again = await addVersion(writer.agent, page.id, 'fr-FR');
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('version_exists');
    expect(again.body.error.message).toBe(
      'This page already has a Français version (“Twice in French”). Open that version to change it; a page has one version per language.',
    );
    // Asked of the page's own language, too.
    const same = await addVersion(writer.agent, page.id, 'en-GB');
    expect(same.status).toBe(409);
    expect(same.body.error.message).toMatch(/already has a English \(UK\) version/);
    expect(await Page.count({ where: { title: 'Twice in French' } })).toBe(2);
  });

  it('two requests at once for the same language: one version is made, the other gets 409', async () => {
    const { page } = await englishPage('Raced in US English');
    const answers = await Promise.all([addVersion(writer.agent, page.id, 'en-US'), addVersion(editor.agent, page.id, 'en-US')]);
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
    expect(await Page.count({ where: { title: 'Raced in US English', locale: 'en-US' } })).toBe(1);
  });

  it('refuses a language we do not write in, naming the ones we do', async () => {
    const { page } = await englishPage('Unknown language');
    for (const locale of ['de-DE', 'fr', 'xx', '']) {
      const res = await addVersion(writer.agent, page.id, locale);
      expect(res.status, locale).toBe(400);
      expect(res.body.error.fields.locale).toBe(
        'Choose a language we write in: en-GB (English (UK)), en-US (English (US)), fr-FR (Français)',
      );
    }
    expect((await writer.agent.post(`/api/pages/${page.id}/versions`).send({})).status).toBe(400);
    expect(await Page.count({ where: { title: 'Unknown language' } })).toBe(1);
  });

  it('refuses a version whose statements fail in that locale, naming them, and writes nothing', async () => {
    const { q, page } = await englishPage('No French wording');
    const s = (await Statement.findByPk(q.nakedEyeId))!;
    const { 'fr-FR': _dropped, ...rest } = s.texts!;
    await Statement.update({ texts: rest as typeof s.texts }, { where: { id: s.id } });
    const res = await addVersion(writer.agent, page.id, 'fr-FR');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('statements_fail_in_locale');
    expect(res.body.error.message).toBe(
      `This page cannot have a Français version yet: “Brightness compared with the faintest stars the unaided eye sees” for ${q.object.name} (no Français wording yet). Recompute or remove that statement on this page first.`,
    );
    // A broken statement fails in every locale.
    await Statement.update({ status: 'broken', statusReason: 'No preferred redshift.' }, { where: { id: q.distanceId } });
    const both = await addVersion(writer.agent, page.id, 'en-US');
    expect(both.status).toBe(422);
    expect(both.body.error.message).toContain(`“Distance today in light-years” for ${q.object.name} (No preferred redshift.)`);
    expect(await Page.count({ where: { title: 'No French wording' } })).toBe(1);
    expect((await Page.findByPk(page.id))!.versionGroupId).toBeNull();
  });

  it('a reviewer cannot make versions (they write no pages); a writer cannot copy a colleague’s private draft', async () => {
    const { page } = await englishPage('Private English draft');
    expect((await addVersion(reviewer.agent, page.id, 'fr-FR')).status).toBe(403);
    const other = await signedInAgent('writer');
    expect((await addVersion(other.agent, page.id, 'fr-FR')).status).toBe(403);
    expect((await other.agent.get(`/api/pages/${page.id}/versions`)).status).toBe(403);
  });
});

describe('a colleague’s version', () => {
  it('another writer’s unsubmitted version is listed without its title, and cannot be opened', async () => {
    const { page } = await englishPage('Published, then translated by a colleague');
    await publish(page.id);
    const colleague = await signedInAgent('writer');
    const fr = await addVersion(colleague.agent, page.id, 'fr-FR');
    expect(fr.status).toBe(201);
    const list = (await writer.agent.get(`/api/pages/${page.id}/versions`)).body.data;
    expect(list.versions[1]).toMatchObject({ locale: 'fr-FR', title: '', readable: false, status: 'draft' });
    expect((await writer.agent.get(`/api/pages/${fr.body.data.id}`)).status).toBe(403);
    expect((await colleague.agent.get(`/api/pages/${page.id}/versions`)).body.data.versions[1].title).toBe(
      'Published, then translated by a colleague',
    );
  });
});

describe('each version has its own review and publication', () => {
  it('signing off and publishing one version leaves the other as it was', async () => {
    const { page } = await englishPage('Signed per language');
    const fr = (await addVersion(writer.agent, page.id, 'fr-FR')).body.data;
    await publish(page.id);
    expect((await Page.findByPk(page.id))!.status).toBe('published');
    expect((await Page.findByPk(fr.id))!.status).toBe('draft');

    // A sign-off on the English version does not count for the French one.
    const frSubmitted = await writer.agent.post(`/api/pages/${fr.id}/submit`).send({ version: fr.version });
    expect(frSubmitted.status).toBe(200);
    const early = await reviewer.agent.post(`/api/pages/${fr.id}/signoffs/page`);
    expect(early.status).toBe(422);
    expect(early.body.error.message).toMatch(/2 statements have not been signed off/);

    await reviewer.agent.post(`/api/pages/${fr.id}/send-back`).send({ comment: 'Traduisez le premier paragraphe.' });
    expect((await Page.findByPk(fr.id))!.status).toBe('draft');
    expect((await Page.findByPk(page.id))!.status).toBe('published');

    await publish(fr.id);
    const list = (await editor.agent.get(`/api/pages/${page.id}/versions`)).body.data;
    expect(list.versions.map((v: { status: string; live: boolean }) => [v.status, v.live])).toEqual([
      ['published', true],
      ['published', true],
    ]);
  });
});

describe('a change of data', () => {
  it('sends every published version to re-check, each in its own words', async () => {
    const { q, page } = await englishPage('Rechecked in both languages');
    const fr = (await addVersion(writer.agent, page.id, 'fr-FR')).body.data;
    await publish(page.id);
    await publish(fr.id);

    const better = await Measurement.create({
      skyObjectId: q.object.id,
      quantity: 'redshift',
      band: null,
      value: 0.3,
      uncertainty: 0.001,
      uncertaintyMinus: null,
      uncertaintyPlus: null,
      enteredValue: 0.3,
      enteredUnit: '',
      sourceId: q.source.id,
      status: 'accepted',
      createdById: reviewer.user.id,
    });
    await setPreferred(better.id, { preferred: true, replaces: q.measurements[0].id }, reviewer.user);
    for (const id of [page.id, fr.id])
      await expect.poll(async () => (await Page.findByPk(id))!.status, { timeout: 15_000 }).toBe('needs_recheck');
    for (const id of [page.id, fr.id]) expect((await Page.findByPk(id))!.recheckStatementIds).toEqual([q.distanceId]);

    const frSeen = (await reviewer.agent.get(`/api/pages/${fr.id}`)).body.data;
    const distance = frSeen.statements.find((s: { id: string }) => s.id === q.distanceId);
    expect(distance.signedText).toMatch(/années-lumière/);
    expect(distance.text).toMatch(/années-lumière/);
    expect(distance.text).not.toBe(distance.signedText);
    const audit = await AuditEvent.findOne({ where: { subjectId: fr.id, action: 'page.needs_recheck' } });
    expect(JSON.stringify(audit?.data)).toMatch(/années-lumière/);
  });
});

describe('removing one version', () => {
  it('leaves the others, still linked; removing the default lets the oldest remaining stand in', async () => {
    const { page } = await englishPage('Three languages, then two');
    const fr = (await addVersion(writer.agent, page.id, 'fr-FR')).body.data;
    const us = (await addVersion(writer.agent, page.id, 'en-US')).body.data;
    await Page.destroy({ where: { id: fr.id } });
    let list = (await writer.agent.get(`/api/pages/${page.id}/versions`)).body.data;
    expect(list.versions.map((v: { locale: string }) => v.locale)).toEqual(['en-GB', 'en-US']);
    expect(list.missing.map((m: { locale: string }) => m.locale)).toEqual(['fr-FR']);

    await Page.destroy({ where: { id: page.id } });
    list = (await writer.agent.get(`/api/pages/${us.id}/versions`)).body.data;
    expect(list.versions.map((v: { locale: string; isDefault: boolean }) => [v.locale, v.isDefault])).toEqual([['en-US', true]]);
    expect((await PageVersionGroup.findByPk(list.groupId))!.defaultPageId).toBeNull();
    // The French version can be made again, from what is left.
    expect((await addVersion(writer.agent, us.id, 'fr-FR')).status).toBe(201);
  });
});
