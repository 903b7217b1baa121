import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Page, PageRevision } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { doc, pageWithBody, paragraph, quasarWithStatements, text } from '../support/pages.ts';
import { getFeed, makeVenue, pairedScreen, publishedPage, publishingCrew } from '../support/publishing.ts';

type Crew = Awaited<ReturnType<typeof publishingCrew>>;
let crew: Crew;

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  crew = await publishingCrew();
});

const visitor = async () => supertest(await getTestApp());
const auditOf = (pageId: string) =>
  AuditEvent.findAll({ where: { subjectType: 'page', subjectId: pageId }, order: [['createdAt', 'ASC']] });

async function draftOf(agent: Crew['writer'], title: string) {
  const q = await quasarWithStatements(agent.agent, agent.user);
  return pageWithBody(agent.agent, q.object.id, doc(paragraph(text('A quasar seen from far away.'))), title);
}

describe('archiving pages', () => {
  it('takes a live page off every public output and the desk list, keeps it restorable, and restoring does not republish', async () => {
    const page = await publishedPage(crew, 'Archive me');
    const venue = await makeVenue(crew.admin.agent, 'Archive Dome');
    const channel = await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name: 'Archive channel' });
    const screen = await pairedScreen(crew.admin.agent, venue.id, 'Archive screen');
    await crew.editor.agent.put(`/api/channels/${channel.body.data.id}/screens`).send({ screenIds: [screen.screenId] });
    const slide = await crew.editor.agent
      .post(`/api/channels/${channel.body.data.id}/slides`)
      .send({ kind: 'page', pageId: page.pageId, statementIds: page.statementIds });
    expect(slide.status).toBe(201);
    expect(JSON.parse((await getFeed(screen.token)).text).items).toHaveLength(1);
    expect((await (await visitor()).get(`/api/public/pages/${page.pageId}`)).status).toBe(200);

    const archived = await crew.editor.agent
      .post(`/api/pages/${page.pageId}/archive`)
      .send({ reason: 'Replaced by a newer page' });
    expect(archived.status, JSON.stringify(archived.body)).toBe(200);
    expect(archived.body.data).toMatchObject({ live: false, status: 'approved', can: { restore: true, archive: false } });
    expect(archived.body.data.archivedAt).toEqual(expect.any(String));

    // Gone from every public output: one page by id, the list, the Atom feed, the kiosk feed.
    const v = await visitor();
    expect((await v.get(`/api/public/pages/${page.pageId}`)).status).toBe(404);
    expect(JSON.stringify((await v.get('/api/public/pages')).body)).not.toContain(page.pageId);
    expect((await v.get('/api/public/pages.atom')).text).not.toContain(page.pageId);
    expect(JSON.parse((await getFeed(screen.token)).text).items).toHaveLength(0);
    // The slide pointing at it stays, and says why it is not shown.
    const detail = await crew.editor.agent.get(`/api/channels/${channel.body.data.id}`);
    expect(detail.body.data.slides[0]).toMatchObject({ state: 'page_archived' });
    // A new slide for an archived page is refused (it is not published).
    const again = await crew.editor.agent
      .post(`/api/channels/${channel.body.data.id}/slides`)
      .send({ kind: 'page', pageId: page.pageId, statementIds: [] });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('page_not_published');

    // Hidden from the desk's list unless asked for.
    const ids = (res: supertest.Response) => res.body.data.map((p: { id: string }) => p.id);
    expect(ids(await crew.editor.agent.get('/api/pages?pageSize=100'))).not.toContain(page.pageId);
    expect(ids(await crew.editor.agent.get('/api/pages?archived=include&pageSize=100'))).toContain(page.pageId);
    expect(ids(await crew.editor.agent.get('/api/pages?archived=only'))).toEqual([page.pageId]);
    expect((await crew.editor.agent.get('/api/pages?archived=maybe')).status).toBe(400);
    // Still readable by id (the desk can open it to restore it).
    expect((await crew.editor.agent.get(`/api/pages/${page.pageId}`)).status).toBe(200);

    // Every other step is refused while it is archived.
    const publish = await crew.editor.agent.post(`/api/pages/${page.pageId}/publish`);
    expect(publish.status).toBe(409);
    expect(publish.body.error.code).toBe('page_archived');
    expect(publish.body.error.message).toMatch(/archived\. Restore it first/);

    const restored = await crew.editor.agent.post(`/api/pages/${page.pageId}/restore`).send({ reason: 'Still needed' });
    expect(restored.status).toBe(200);
    expect(restored.body.data).toMatchObject({ archivedAt: null, live: false, status: 'approved', can: { publish: true } });
    expect((await (await visitor()).get(`/api/public/pages/${page.pageId}`)).status).toBe(404);
    // Going live again is an editor's publish, as always.
    expect((await crew.editor.agent.post(`/api/pages/${page.pageId}/publish`)).status).toBe(200);
    expect((await (await visitor()).get(`/api/public/pages/${page.pageId}`)).status).toBe(200);

    const actions = (await auditOf(page.pageId)).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['page.archived', 'page.restored']));
    const archiveEvent = (await auditOf(page.pageId)).find((e) => e.action === 'page.archived')!;
    expect(archiveEvent.actorId).toBe(crew.editor.user.id);
    expect(archiveEvent.data).toMatchObject({ reason: 'Replaced by a newer page', wasLive: true, from: 'published' });
  });

  it('refuses to archive twice or restore a page that is not archived, and needs a reason', async () => {
    const draft = await draftOf(crew.writer, 'Twice archived');
    const noReason = await crew.writer.agent.post(`/api/pages/${draft.id}/archive`).send({ reason: '  ' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toMatch(/Give a reason/);
    expect((await crew.writer.agent.post(`/api/pages/${draft.id}/restore`).send({ reason: 'x' })).body.error.code).toBe(
      'page_not_archived',
    );
    expect((await crew.writer.agent.post(`/api/pages/${draft.id}/archive`).send({ reason: 'Not needed' })).status).toBe(200);
    const twice = await crew.writer.agent.post(`/api/pages/${draft.id}/archive`).send({ reason: 'Not needed' });
    expect(twice.status).toBe(409);
    expect(twice.body.error).toMatchObject({ code: 'page_archived', message: 'This page is archived already.' });
    // Saving an archived page is refused, and nothing is written.
    const revisions = await PageRevision.count({ where: { pageId: draft.id } });
    const save = await crew.writer.agent
      .put(`/api/pages/${draft.id}`)
      .send({ version: draft.version, title: 'Edited', doc: doc(paragraph(text('Changed'))) });
    expect(save.status).toBe(409);
    expect(await PageRevision.count({ where: { pageId: draft.id } })).toBe(revisions);
  });

  it('lets a writer archive their own page only while it is not live; another writer cannot', async () => {
    const live = await publishedPage(crew, 'Live writer page');
    const own = await crew.writer.agent.post(`/api/pages/${live.pageId}/archive`).send({ reason: 'Mine' });
    expect(own.status).toBe(403);
    const draft = await draftOf(crew.writer, 'Someone else’s');
    const other = await signedInAgent('writer');
    expect((await other.agent.post(`/api/pages/${draft.id}/archive`).send({ reason: 'Not mine' })).status).toBe(403);
    expect((await crew.reviewer.agent.post(`/api/pages/${live.pageId}/archive`).send({ reason: 'Nope' })).status).toBe(403);
    // What an editor archived, the writer cannot undo; what the writer archived, they can.
    expect((await crew.editor.agent.post(`/api/pages/${live.pageId}/archive`).send({ reason: 'Out of date' })).status).toBe(200);
    const undo = await crew.writer.agent.post(`/api/pages/${live.pageId}/restore`).send({ reason: 'I still want it' });
    expect(undo.status).toBe(403);
    expect((await crew.writer.agent.get(`/api/pages/${live.pageId}`)).body.data.can).toMatchObject({ restore: false });
    expect((await crew.writer.agent.post(`/api/pages/${draft.id}/archive`).send({ reason: 'Parked' })).status).toBe(200);
    expect((await crew.writer.agent.post(`/api/pages/${draft.id}/restore`).send({ reason: 'Back' })).status).toBe(200);
  });
});

describe('deleting pages', () => {
  it('deletes a never-published draft for its writer, with an audit event keeping the title and reason', async () => {
    const draft = await draftOf(crew.writer, 'Started by mistake');
    const res = await crew.writer.agent.delete(`/api/pages/${draft.id}?reason=Duplicate`);
    expect(res.status, JSON.stringify(res.body)).toBe(204);
    expect(await Page.findByPk(draft.id)).toBeNull();
    expect(await PageRevision.count({ where: { pageId: draft.id } })).toBe(0);
    expect((await crew.writer.agent.get(`/api/pages/${draft.id}`)).status).toBe(404);
    const [event] = (await auditOf(draft.id)).filter((e) => e.action === 'page.deleted');
    expect(event).toBeDefined();
    expect(event!.actorId).toBe(crew.writer.user.id);
    expect(event!.data).toMatchObject({ reason: 'Duplicate', title: 'Started by mistake', status: 'draft' });
  });

  it('lets an editor delete any never-published page, archived ones too; a reason is required', async () => {
    const draft = await draftOf(crew.writer, 'Editor tidies up');
    expect((await crew.writer.agent.post(`/api/pages/${draft.id}/submit`).send({ version: draft.version })).status).toBe(200);
    // Submitted: the writer withdraws it first; the editor may delete it as it is.
    expect((await crew.writer.agent.delete(`/api/pages/${draft.id}?reason=Gone`)).status).toBe(403);
    const blank = await crew.editor.agent.delete(`/api/pages/${draft.id}?reason=`);
    expect(blank.status).toBe(400);
    expect(blank.body.error.fields.reason).toMatch(/Give a reason/);
    expect((await crew.editor.agent.post(`/api/pages/${draft.id}/archive`).send({ reason: 'Parked' })).status).toBe(200);
    expect((await crew.editor.agent.delete(`/api/pages/${draft.id}?reason=Not+needed`)).status).toBe(204);
  });

  it('refuses to delete a page that was ever published, even after it was unpublished or archived, with a clear message', async () => {
    const page = await publishedPage(crew, 'Seen by visitors');
    const live = await crew.editor.agent.delete(`/api/pages/${page.pageId}?reason=Tidy`);
    expect(live.status).toBe(409);
    expect(live.body.error.code).toBe('page_was_published');
    expect(live.body.error.message).toMatch(/has been published, so it cannot be deleted.*Archive it instead/);
    expect((await crew.editor.agent.post(`/api/pages/${page.pageId}/unpublish`)).status).toBe(200);
    const unpublished = await crew.admin.agent.delete(`/api/pages/${page.pageId}?reason=Tidy`);
    expect(unpublished.status).toBe(409);
    const detail = await crew.editor.agent.get(`/api/pages/${page.pageId}`);
    expect(detail.body.data.can).toMatchObject({ delete: false, archive: true });
    expect(await Page.findByPk(page.pageId)).not.toBeNull();
  });

  it('forbids a writer deleting another writer’s draft (403) and a reviewer deleting anything', async () => {
    const draft = await draftOf(crew.writer, 'Not yours to delete');
    const other = await signedInAgent('writer');
    const res = await other.agent.delete(`/api/pages/${draft.id}?reason=Mine+now`);
    expect(res.status).toBe(403);
    expect((await crew.reviewer.agent.delete(`/api/pages/${draft.id}?reason=Nope`)).status).toBe(403);
    expect(await Page.findByPk(draft.id)).not.toBeNull();
  });
});
