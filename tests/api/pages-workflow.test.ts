import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Measurement, OutboxMessage, Page, PageRevision } from '../../server/models/index.ts';
import { setPreferred } from '../../server/services/catalogue/preferred-write.ts';
import { findMediaUsage } from '../../server/services/media/media-usage.ts';
import { renderPublishedPage } from '../../server/services/pages/page-render.ts';
import { sendDailyDigests } from '../../server/services/pages/page-digest.ts';
import { publishDuePages } from '../../server/services/pages/page-publish.ts';
import { buildUser, getTestApp, resetDatabase, signedInAgent, waitForMail } from '../support/app.ts';
import { buildMedia, doc, pageWithBody, paragraph, quasarWithStatements, statement, text } from '../support/pages.ts';
import { buildObjectWithMeasurements } from '../support/sky-fixtures.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

/** A writer's page with two statements and one hand-typed number, submitted; a reviewer and an editor ready. */
async function submittedPage() {
  const writer = await signedInAgent('writer');
  const reviewer = await signedInAgent('reviewer');
  const editor = await signedInAgent('editor');
  const q = await quasarWithStatements(writer.agent, writer.user);
  const body = doc(
    { type: 'heading', attrs: { level: 2 }, content: [text('How far away')] },
    paragraph(text('Astronomers say '), statement(q.distanceId), text(' It is about 3 times brighter than its neighbours.')),
    paragraph(statement(q.nakedEyeId)),
  );
  const page = await pageWithBody(writer.agent, q.object.id, body, 'The quasar next door');
  const submitted = await writer.agent.post(`/api/pages/${page.id}/submit`).send({
    version: page.version,
    flagNotes: [{ text: '3 times brighter', reason: 'A loose comparison with its neighbours.' }],
  });
  expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
  expect(submitted.body.data.status).toBe('in_review');
  return { writer, reviewer, editor, q, page: submitted.body.data };
}

async function signOffEverything(reviewer: Awaited<ReturnType<typeof signedInAgent>>, pageId: string, statementIds: string[]) {
  for (const id of statementIds)
    expect((await reviewer.agent.post(`/api/pages/${pageId}/signoffs/statements`).send({ statementId: id })).status).toBe(200);
  const res = await reviewer.agent.post(`/api/pages/${pageId}/signoffs/page`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res;
}

describe('from draft to published', () => {
  it('submit mails the reviewers; approval waits for every statement and every flagged number', async () => {
    const { reviewer, editor, writer, q, page } = await submittedPage();
    const mail = await waitForMail(reviewer.user.email);
    expect(mail.subject).toBe('For review: The quasar next door');
    expect(page.flags.map((f: { text: string }) => f.text)).toEqual(['3 times brighter']);

    const early = await reviewer.agent.post(`/api/pages/${page.id}/signoffs/page`);
    expect(early.status).toBe(422);
    expect(early.body.error.message).toMatch(/One hand-typed number is not resolved \(“3 times brighter”\)/);
    expect(early.body.error.message).toMatch(/2 statements have not been signed off/);

    expect(
      (await writer.agent.post(`/api/pages/${page.id}/signoffs/statements`).send({ statementId: q.distanceId })).status,
    ).toBe(403);
    expect(
      (
        await writer.agent
          .post(`/api/pages/${page.id}/flags`)
          .send({ text: '3 times brighter', reason: 'A comparison with nearby objects in the picture.' })
      ).status,
    ).toBe(403);
    const short = await reviewer.agent.post(`/api/pages/${page.id}/flags`).send({ text: '3 times brighter', reason: 'fine' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.reason).toMatch(/at least 10 characters/);
    const notThere = await reviewer.agent
      .post(`/api/pages/${page.id}/flags`)
      .send({ text: '12 billion years', reason: 'Not on this page at all, really.' });
    expect(notThere.status).toBe(409);
    const resolved = await reviewer.agent
      .post(`/api/pages/${page.id}/flags`)
      .send({ text: '3  Times brighter', reason: 'A loose comparison in the picture caption, not a measurement.' });
    expect(resolved.status).toBe(200);
    expect(resolved.body.data.flags[0].resolution.reason).toMatch(/loose comparison/);

    expect((await editor.agent.post(`/api/pages/${page.id}/publish`)).status).toBe(409);
    const approved = await signOffEverything(reviewer, page.id, [q.distanceId, q.nakedEyeId]);
    expect(approved.body.data.status).toBe('approved');
    expect(approved.body.data.statements.every((s: { signedOff: boolean }) => s.signedOff)).toBe(true);

    expect((await writer.agent.post(`/api/pages/${page.id}/publish`)).status).toBe(403);
    expect((await reviewer.agent.post(`/api/pages/${page.id}/publish`)).status).toBe(403);
    const published = await editor.agent.post(`/api/pages/${page.id}/publish`);
    expect(published.status).toBe(200);
    expect(published.body.data.status).toBe('published');

    const live = await renderPublishedPage(page.id);
    expect(live!.html).toContain(`<span class="statement" data-statement-id="${q.distanceId}">${q.distanceText}</span>`);
    expect(live!.html).toContain('<h2>How far away</h2>');
    expect(live!.html).not.toMatch(/<script|\son\w+=|javascript:/i);

    const actions = (await AuditEvent.findAll({ where: { subjectId: page.id }, order: [['createdAt', 'ASC']] })).map(
      (e) => e.action,
    );
    expect(actions).toEqual([
      'page.created',
      'page.submitted',
      'page.number_resolved',
      'page.statement_signed_off',
      'page.statement_signed_off',
      'page.approved',
      'page.published',
    ]);
  });

  it('submitting with an open hand-typed number needs a reason for it, shown to the reviewer; the writer can withdraw', async () => {
    const writer = await signedInAgent('writer');
    const reviewer = await signedInAgent('reviewer');
    const q = await quasarWithStatements(writer.agent, writer.user);
    const body = doc(paragraph(statement(q.distanceId), text(' It is about 3 times brighter than its neighbours.')));
    const page = await pageWithBody(writer.agent, q.object.id, body, 'Flags need a reason');
    const bare = await writer.agent.post(`/api/pages/${page.id}/submit`).send({ version: page.version });
    expect(bare.status).toBe(422);
    expect(bare.body.error.code).toBe('flags_need_reasons');
    expect(bare.body.error.message).toContain('“3 times brighter”');
    const blank = await writer.agent
      .post(`/api/pages/${page.id}/submit`)
      .send({ version: page.version, flagNotes: [{ text: '3 times brighter', reason: ' ' }] });
    expect(blank.status).toBe(400);
    expect((await Page.findByPk(page.id))!.status).toBe('draft');

    const ok = await writer.agent.post(`/api/pages/${page.id}/submit`).send({
      version: page.version,
      flagNotes: [{ text: '3  times brighter', reason: 'A loose comparison, not a measurement.' }],
    });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    const comments = (await reviewer.agent.get(`/api/pages/${page.id}/comments`)).body.data;
    expect(JSON.stringify(comments)).toContain('“3 times brighter” left as typed: A loose comparison, not a measurement.');

    // Signed statements survive the withdrawal; once the page is signed off it cannot be withdrawn.
    expect(
      (await reviewer.agent.post(`/api/pages/${page.id}/signoffs/statements`).send({ statementId: q.distanceId })).status,
    ).toBe(200);
    const other = await signedInAgent('writer');
    expect((await other.agent.post(`/api/pages/${page.id}/withdraw`)).status).toBe(403);
    const withdrawn = await writer.agent.post(`/api/pages/${page.id}/withdraw`);
    expect(withdrawn.status).toBe(200);
    expect(withdrawn.body.data.status).toBe('draft');
    expect((await writer.agent.post(`/api/pages/${page.id}/withdraw`)).status).toBe(409);
    const edited = await writer.agent.put(`/api/pages/${page.id}`).send({
      version: withdrawn.body.data.version,
      title: 'Flags need a reason',
      doc: doc(paragraph(statement(q.distanceId), text(' A new sentence.'))),
    });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect((await writer.agent.post(`/api/pages/${page.id}/submit`).send({ version: edited.body.data.version })).status).toBe(
      200,
    );
    const seen = (await reviewer.agent.get(`/api/pages/${page.id}`)).body.data;
    expect(seen.statements.find((s: { id: string }) => s.id === q.distanceId).signedOff).toBe(true);
    expect((await reviewer.agent.post(`/api/pages/${page.id}/signoffs/page`)).status).toBe(200);
    const late = await writer.agent.post(`/api/pages/${page.id}/withdraw`);
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/signed off already/);
    const actions = (await AuditEvent.findAll({ where: { subjectId: page.id } })).map((e) => e.action);
    expect(actions).toContain('page.withdrawn');
  });

  it('a page about the Sun, or one that mentions an eclipse, needs the eye-safety notice to be submitted', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object: sun } = await buildObjectWithMeasurements(
      'Our Sun',
      'sun',
      [{ quantity: 'radius', value: 1, unit: 'R_sun' }],
      user,
    );
    const sunPage = await pageWithBody(agent, sun.id, doc(paragraph(text('The Sun is our star.'))), 'The Sun');
    const refused = await agent.post(`/api/pages/${sunPage.id}/submit`).send({});
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toBe(
      'This page cannot be submitted yet: This page is about the Sun: add the eye-safety notice block (toolbar, “Eye-safety notice”) before submitting.',
    );

    const { object: moon } = await buildObjectWithMeasurements(
      'Test moon',
      'moon',
      [{ quantity: 'radius', value: 1737.4, unit: 'km' }],
      user,
    );
    const moonPage = await pageWithBody(
      agent,
      moon.id,
      doc(paragraph(text('Watch the total eclipse from the car park.'))),
      'Moon',
    );
    const eclipse = await agent.post(`/api/pages/${moonPage.id}/submit`).send({});
    expect(eclipse.status).toBe(422);
    expect(eclipse.body.error.message).toMatch(/mentions “eclipse”/);
    const withNotice = await agent.put(`/api/pages/${moonPage.id}`).send({
      version: moonPage.version,
      title: 'Moon',
      doc: doc(paragraph(text('Watch the total eclipse from the car park.')), { type: 'eyeSafetyNotice' }),
    });
    expect((await agent.post(`/api/pages/${moonPage.id}/submit`).send({ version: withNotice.body.data.version })).status).toBe(
      200,
    );
    const html = (await agent.get(`/api/pages/${moonPage.id}/preview`)).body.data.html as string;
    expect(html).toMatch(
      /<aside class="eye-safety-notice" role="note"><strong>Eye safety<\/strong> <span>Never look at the Sun directly/,
    );
  });

  it('approval is refused while an image lacks its credit and licence; the library lists the page', async () => {
    const { agent, user } = await signedInAgent('writer');
    const reviewer = await signedInAgent('reviewer');
    const q = await quasarWithStatements(agent, user);
    const bare = await buildMedia(user, false);
    const page = await pageWithBody(
      agent,
      q.object.id,
      doc(paragraph(text('A quasar shines.')), { type: 'mediaImage', attrs: { mediaId: bare.id, caption: 'The field' } }),
    );
    expect((await findMediaUsage(bare.id, user)).usage).toContainEqual({ kind: 'page', id: page.id, title: 'A page for checks' });
    await agent.post(`/api/pages/${page.id}/submit`).send({});
    const refused = await reviewer.agent.post(`/api/pages/${page.id}/signoffs/page`);
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toMatch(
      /An image is not ready for publishing: it lacks credit line, licence, source web address/,
    );
    await bare.update({ credit: 'Test credit line', licenceId: 'cc-by-4.0', sourceUrl: 'https://example.org/image' });
    const ok = await reviewer.agent.post(`/api/pages/${page.id}/signoffs/page`);
    expect(ok.status).toBe(200);
    const snapshot = (await Page.findByPk(page.id))!.approvedSnapshot!;
    expect(snapshot.html).toMatch(
      /<figure data-media-id="[^"]+"><img src="\/media\/files\/[0-9a-f]{64}\.jpg" alt="A glowing cloud of gas \(test image\)" width="800" height="600" loading="lazy"><figcaption><span class="caption">The field<\/span> <small class="credit">Test credit line · CC BY 4.0<\/small><\/figcaption><\/figure>/,
    );
  });
});

describe('who may do what', () => {
  it('another writer cannot read, list or change an unsubmitted draft; they can once it is submitted', async () => {
    const owner = await signedInAgent('writer');
    const other = await signedInAgent('writer');
    const reviewer = await signedInAgent('reviewer');
    const q = await quasarWithStatements(owner.agent, owner.user);
    const page = await pageWithBody(owner.agent, q.object.id, doc(paragraph(text('A private draft.'))), 'Private draft');
    expect((await other.agent.get(`/api/pages/${page.id}`)).status).toBe(403);
    expect((await other.agent.get(`/api/pages/${page.id}/revisions`)).status).toBe(403);
    expect((await other.agent.get(`/api/pages/${page.id}/preview`)).status).toBe(403);
    expect(
      (
        await other.agent
          .put(`/api/pages/${page.id}`)
          .send({ version: page.version, title: 'Mine now', doc: doc(paragraph(text('x'))) })
      ).status,
    ).toBe(403);
    expect((await reviewer.agent.get(`/api/pages/${page.id}`)).status).toBe(403);
    const listed = (await other.agent.get('/api/pages?pageSize=200')).body.data.map((p: { id: string }) => p.id);
    expect(listed).not.toContain(page.id);
    expect((await other.agent.get('/api/pages/not-an-id')).status).toBe(404);

    await owner.agent.post(`/api/pages/${page.id}/submit`).send({});
    expect((await other.agent.get(`/api/pages/${page.id}`)).status).toBe(200);
    expect(
      (
        await other.agent
          .put(`/api/pages/${page.id}`)
          .send({ version: page.version, title: 'Mine now', doc: doc(paragraph(text('x'))) })
      ).status,
    ).toBe(403);
    // While it is with the reviewers, even its writer cannot change it.
    const locked = await owner.agent
      .put(`/api/pages/${page.id}`)
      .send({ version: page.version, title: 'Edit', doc: doc(paragraph(text('y'))) });
    expect(locked.status).toBe(409);
    expect(locked.body.error.code).toBe('page_in_review');
  });

  it('a reviewer sends a page back with a comment; the writer is mailed and may edit again', async () => {
    const owner = await signedInAgent('writer');
    const reviewer = await signedInAgent('reviewer');
    const q = await quasarWithStatements(owner.agent, owner.user);
    const page = await pageWithBody(owner.agent, q.object.id, doc(paragraph(text('Short.'))), 'Send me back');
    await owner.agent.post(`/api/pages/${page.id}/submit`).send({});
    expect((await owner.agent.post(`/api/pages/${page.id}/send-back`).send({ comment: 'x' })).status).toBe(403);
    expect((await reviewer.agent.post(`/api/pages/${page.id}/send-back`).send({ comment: '' })).status).toBe(400);
    const back = await reviewer.agent
      .post(`/api/pages/${page.id}/send-back`)
      .send({ comment: 'Please add a statement about its distance.' });
    expect(back.body.data.status).toBe('draft');
    expect((await waitForMail(owner.user.email)).textBody).toMatch(/Please add a statement about its distance/);
    const comments = (await owner.agent.get(`/api/pages/${page.id}/comments`)).body.data;
    expect(comments[0]).toMatchObject({ body: 'Please add a statement about its distance.', revisionNumber: 2 });
    expect(
      (
        await owner.agent
          .put(`/api/pages/${page.id}`)
          .send({ version: page.version, title: 'Send me back', doc: doc(paragraph(text('Longer now.'))) })
      ).status,
    ).toBe(200);
  });

  it('anonymous visitors get 401', async () => {
    const { default: supertest } = await import('supertest');
    expect((await supertest(await getTestApp()).get('/api/pages')).status).toBe(401);
  });
});

describe('when a statement’s data changes after publication', () => {
  it('the page needs a re-check, its writer and reviewer are mailed, and the public still sees the approved text', async () => {
    const { reviewer, editor, writer, q, page } = await submittedPage();
    await reviewer.agent
      .post(`/api/pages/${page.id}/flags`)
      .send({ text: '3 times brighter', reason: 'A loose comparison, not a measurement.' });
    await signOffEverything(reviewer, page.id, [q.distanceId, q.nakedEyeId]);
    await editor.agent.post(`/api/pages/${page.id}/publish`);
    const before = await renderPublishedPage(page.id);

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
    await OutboxMessage.destroy({ where: {} });
    await setPreferred(better.id, { preferred: true, replaces: q.measurements[0].id }, reviewer.user);
    await expect.poll(async () => (await Page.findByPk(page.id))!.status, { timeout: 15_000 }).toBe('needs_recheck');

    const seen = (await editor.agent.get(`/api/pages/${page.id}`)).body.data;
    const distance = seen.statements.find((s: { id: string }) => s.id === q.distanceId);
    expect(distance.signedText).toBe(q.distanceText);
    expect(distance.text).not.toBe(q.distanceText);
    expect(distance.signedOff).toBe(false);
    // The naked-eye statement does not use the redshift: still signed off.
    expect(seen.statements.find((s: { id: string }) => s.id === q.nakedEyeId).signedOff).toBe(true);
    expect((await Page.findByPk(page.id))!.recheckStatementIds).toEqual([q.distanceId]);

    const writerMail = await waitForMail(writer.user.email);
    expect(writerMail.subject).toBe('Needs re-check: The quasar next door');
    expect(writerMail.textBody).toContain(`Signed off: ${q.distanceText}`);
    expect(writerMail.textBody).toContain('The published version stays live');
    await waitForMail(reviewer.user.email);

    const after = await renderPublishedPage(page.id);
    expect(after).toEqual(before);
    expect(after!.html).toContain(q.distanceText);

    // The reviewer signs off the new wording (accepting it), then the page; the editor publishes it.
    await signOffEverything(reviewer, page.id, [q.distanceId]);
    expect((await renderPublishedPage(page.id))!.html).toContain(q.distanceText);
    await editor.agent.post(`/api/pages/${page.id}/publish`);
    const republished = await renderPublishedPage(page.id);
    expect(republished!.html).toContain(distance.text);
    expect(republished!.html).not.toContain(q.distanceText);
    const actions = (await AuditEvent.findAll({ where: { subjectId: page.id }, order: [['createdAt', 'ASC']] })).map(
      (e) => e.action,
    );
    expect(actions.slice(-4)).toEqual(['page.needs_recheck', 'page.statement_signed_off', 'page.approved', 'page.published']);
  });

  it('a page returns to published when every statement reads again as signed (cosmology A → B → A)', async () => {
    const { reviewer, editor, q, page } = await submittedPage();
    const admin = await signedInAgent('admin');
    await reviewer.agent.post(`/api/pages/${page.id}/flags`).send({ text: '3 times brighter', reason: 'A loose comparison.' });
    await signOffEverything(reviewer, page.id, [q.distanceId, q.nakedEyeId]);
    expect((await editor.agent.post(`/api/pages/${page.id}/publish`)).status).toBe(200);
    const switchTo = async (model: object) => {
      const settings = (await admin.agent.get('/api/settings')).body.data;
      const res = await admin.agent.put('/api/settings/cosmology').send({ model, expectedVersion: settings.version });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
    };
    // A model far enough from Planck 2018 (H0 = 50) that the wording moves even at two figures.
    await switchTo({ H0: 50, Om0: 0.3 });
    await expect.poll(async () => (await Page.findByPk(page.id))!.status, { timeout: 15_000 }).toBe('needs_recheck');
    await switchTo({ preset: 'planck18' });
    await expect.poll(async () => (await Page.findByPk(page.id))!.status, { timeout: 15_000 }).toBe('published');
    const back = (await editor.agent.get(`/api/pages/${page.id}`)).body.data;
    expect(back.statements.every((s: { signedOff: boolean }) => s.signedOff)).toBe(true);
    expect((await Page.findByPk(page.id))!.recheckStatementIds).toEqual([]);
    const actions = (await AuditEvent.findAll({ where: { subjectId: page.id }, order: [['createdAt', 'ASC']] })).map(
      (e) => e.action,
    );
    expect(actions.slice(-2)).toEqual(['page.needs_recheck', 'page.recheck_cleared']);
  });

  it('a draft or in-review page is not sent to re-check; an unrelated page is untouched', async () => {
    const { reviewer, q, page } = await submittedPage();
    const better = await Measurement.create({
      skyObjectId: q.object.id,
      quantity: 'redshift',
      band: null,
      value: 0.25,
      uncertainty: 0.001,
      uncertaintyMinus: null,
      uncertaintyPlus: null,
      enteredValue: 0.25,
      enteredUnit: '',
      sourceId: q.source.id,
      status: 'accepted',
      createdById: reviewer.user.id,
    });
    await setPreferred(better.id, { preferred: true, replaces: q.measurements[0].id }, reviewer.user);
    await new Promise((r) => setTimeout(r, 1500));
    expect((await Page.findByPk(page.id))!.status).toBe('in_review');
  });
});

describe('revisions, scheduling and the digest', () => {
  it('lists revisions, diffs any two readably and restores an old one as a new revision', async () => {
    const { agent, user } = await signedInAgent('writer');
    const q = await quasarWithStatements(agent, user);
    const page = await pageWithBody(agent, q.object.id, doc(paragraph(text('The first words.'))), 'Diff me');
    const second = await agent.put(`/api/pages/${page.id}`).send({
      version: page.version,
      title: 'Diff me again',
      doc: doc(paragraph(text('The second words.')), paragraph(statement(q.distanceId))),
    });
    const list = (await agent.get(`/api/pages/${page.id}/revisions`)).body.data;
    expect(list.map((r: { number: number }) => r.number)).toEqual([3, 2, 1]);
    expect(list[0].marks).toEqual(['current']);
    const diff = (await agent.get(`/api/pages/${page.id}/revisions/diff?from=2&to=3`)).body.data;
    expect(diff.blocks).toEqual([
      { value: 'The ' },
      { value: 'first', removed: true },
      { value: 'second', added: true },
      { value: ' words.' },
      { value: '\n' },
      { value: '⟦Distance today in light-years⟧\n', added: true },
    ]);
    expect(
      diff.title
        .filter((p: { added?: boolean }) => p.added)
        .map((p: { value: string }) => p.value)
        .join(''),
    ).toBe(' again');
    expect((await agent.get(`/api/pages/${page.id}/revisions/diff?from=2&to=99`)).status).toBe(404);
    expect((await agent.get(`/api/pages/${page.id}/revisions/diff?from=x&to=2`)).status).toBe(400);

    const stale = await agent.post(`/api/pages/${page.id}/revisions/2/restore`).send({ version: page.version });
    expect(stale.status).toBe(409);
    // The server's version travels inside the error shape, nothing beside it.
    expect(stale.body.error).toMatchObject({
      code: 'page_changed',
      current: { version: second.body.data.version, revisionNumber: 3 },
    });
    expect(Object.keys(stale.body)).toEqual(['error']);
    const restored = await agent.post(`/api/pages/${page.id}/revisions/2/restore`).send({ version: second.body.data.version });
    expect(restored.status).toBe(200);
    expect(restored.body.data.revision.number).toBe(4);
    expect(restored.body.data.title).toBe('Diff me');
    expect((await PageRevision.findOne({ where: { pageId: page.id, number: 4 } }))!.restoredFrom).toBe(2);
  });

  it('an editor schedules an approved page, and it goes live when due', async () => {
    const { reviewer, editor, q, page } = await submittedPage();
    await reviewer.agent
      .post(`/api/pages/${page.id}/flags`)
      .send({ text: '3 times brighter', reason: 'A loose comparison, not a measurement.' });
    await signOffEverything(reviewer, page.id, [q.distanceId, q.nakedEyeId]);
    expect((await editor.agent.put(`/api/pages/${page.id}/schedule`).send({ at: '2000-01-01T00:00:00Z' })).status).toBe(409);
    expect((await editor.agent.put(`/api/pages/${page.id}/schedule`).send({ at: 'tomorrow' })).status).toBe(400);
    const at = new Date(Date.now() + 3600_000).toISOString();
    const scheduled = await editor.agent.put(`/api/pages/${page.id}/schedule`).send({ at });
    expect(scheduled.body.data.scheduledPublishAt).toBe(at);
    expect(await publishDuePages(new Date())).not.toContain(page.id);
    expect(await publishDuePages(new Date(Date.now() + 2 * 3600_000))).toContain(page.id);
    expect((await Page.findByPk(page.id))!.status).toBe('published');
    const off = await editor.agent.post(`/api/pages/${page.id}/unpublish`);
    expect(off.body.data.status).toBe('approved');
    expect(await renderPublishedPage(page.id)).toBeNull();
  });

  it('sends the daily digest only to people who asked for it and have something waiting', async () => {
    await submittedPage();
    const wants = await signedInAgent('reviewer');
    const quiet = await buildUser({ role: 'reviewer' });
    expect((await wants.agent.put('/api/pages/digest').send({ enabled: 'yes' })).status).toBe(400);
    expect((await wants.agent.put('/api/pages/digest').send({ enabled: true })).status).toBe(200);
    expect((await wants.agent.get('/api/pages/dashboard')).body.data.digest).toBe(true);
    await OutboxMessage.destroy({ where: {} });
    expect(await sendDailyDigests()).toBeGreaterThanOrEqual(1);
    const mail = await waitForMail(wants.user.email);
    expect(mail.textBody).toMatch(/Waiting for review \(\d+\)/);
    expect(await OutboxMessage.count({ where: { toAddresses: quiet.email } })).toBe(0);
  });
});
