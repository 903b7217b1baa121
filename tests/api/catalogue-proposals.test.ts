import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, CatalogueProposal, SkyObject, Source } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildSkyObject, buildSource } from '../support/catalogue.ts';

let sourceId: string;

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  sourceId = (await buildSource({ citation: 'Proposal test survey (invented, 2023)' })).id;
});

const objectBody = (name: string, extra: Record<string, unknown> = {}) => ({
  name,
  kind: 'galaxy',
  ra: '12 29 06.7',
  dec: '+02 03 09',
  sourceId,
  ...extra,
});

describe('writers propose objects and sources', () => {
  it('a proposed object waits for a reviewer, who accepts it into the catalogue, with audit events', async () => {
    const writer = await signedInAgent('writer');
    const { agent: reviewer } = await signedInAgent('reviewer');
    // Writers cannot add directly: the answer says so, and proposing is the way.
    expect((await writer.agent.post('/api/catalogue/objects').send(objectBody('Corrie Vale Test Galaxy'))).status).toBe(403);
    const proposed = await writer.agent.post('/api/catalogue/proposals/objects').send(objectBody('Corrie Vale Test Galaxy'));
    expect(proposed.status).toBe(201);
    expect(proposed.body.data).toMatchObject({
      kind: 'object',
      status: 'proposed',
      title: 'Corrie Vale Test Galaxy',
      source: { id: sourceId },
      can: { review: false },
    });
    expect(await SkyObject.count({ where: { name: 'Corrie Vale Test Galaxy' } })).toBe(0);

    const waiting = await reviewer.get('/api/catalogue/proposals');
    const row = waiting.body.data.find((p: { id: string }) => p.id === proposed.body.data.id);
    expect(row.can.review).toBe(true);

    const accepted = await reviewer.post(`/api/catalogue/proposals/${row.id}/review`).send({ decision: 'accept' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.data).toMatchObject({ status: 'accepted', reviewedBy: expect.any(String) });
    const object = await SkyObject.findByPk(accepted.body.data.recordId);
    expect(object).toMatchObject({ name: 'Corrie Vale Test Galaxy', kind: 'galaxy', constellation: 'Vir' });
    const actions = (await AuditEvent.findAll({ where: { subjectId: row.id } })).map((e) => e.action).sort();
    expect(actions).toEqual(['catalogue.object_proposed', 'catalogue.proposal_accepted']);

    const twice = await reviewer.post(`/api/catalogue/proposals/${row.id}/review`).send({ decision: 'decline', reason: 'late' });
    expect(twice.status).toBe(409);
  });

  it('a proposed source is declined with a reason the writer can read, and nothing is added', async () => {
    const writer = await signedInAgent('editor');
    const { agent: reviewer } = await signedInAgent('reviewer');
    const before = await Source.count();
    const proposed = await writer.agent
      .post('/api/catalogue/proposals/sources')
      .send({ citation: 'Invented, A. (2022), Demo Journal 1, 2', doi: '10.5555/demo.2022.1' });
    expect(proposed.status).toBe(201);
    const noReason = await reviewer
      .post(`/api/catalogue/proposals/${proposed.body.data.id}/review`)
      .send({ decision: 'decline' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toMatch(/Reason: say why/);
    const declined = await reviewer
      .post(`/api/catalogue/proposals/${proposed.body.data.id}/review`)
      .send({ decision: 'decline', reason: 'This DOI points at a different paper.' });
    expect(declined.body.data).toMatchObject({
      status: 'declined',
      reviewReason: 'This DOI points at a different paper.',
      recordId: null,
    });
    expect(await Source.count()).toBe(before);
    const all = await writer.agent.get('/api/catalogue/proposals?status=all');
    expect(all.body.data.find((p: { id: string }) => p.id === proposed.body.data.id).reviewReason).toMatch(/different paper/);
  });
});

describe('proposals: hostile cases', () => {
  it('refuses an object proposal without a source, naming the field', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await agent.post('/api/catalogue/proposals/objects').send(objectBody('Sourceless Galaxy', { sourceId: '' }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sourceId).toMatch(/^Source: choose the source/);
    expect(await CatalogueProposal.count({ where: { title: 'Sourceless Galaxy' } })).toBe(0);
  });

  it('refuses a source proposal that says nowhere where to find the source', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await agent.post('/api/catalogue/proposals/sources').send({ citation: 'Somebody (2020), somewhere' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.url).toMatch(/bibcode, a DOI or a URL/);
  });

  it('refuses a writer’s measurement proposal without a source, naming the field', async () => {
    const { agent } = await signedInAgent('writer');
    const object = await buildSkyObject();
    const res = await agent
      .post(`/api/catalogue/objects/${object.id}/measurements`)
      .send({ quantity: 'redshift', value: '0.02' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sourceId).toMatch(/^Source: a proposed measurement needs the source/);
    const withSource = await agent
      .post(`/api/catalogue/objects/${object.id}/measurements`)
      .send({ quantity: 'redshift', value: '0.02', sourceId });
    expect(withSource.body.data.status).toBe('proposed');
  });

  it('a writer cannot accept their own proposal, and a reviewer cannot review their own', async () => {
    const writer = await signedInAgent('writer');
    const proposed = await writer.agent.post('/api/catalogue/proposals/objects').send(objectBody('Self Accepted Galaxy'));
    const own = await writer.agent.post(`/api/catalogue/proposals/${proposed.body.data.id}/review`).send({ decision: 'accept' });
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/reviewer or an admin/);
    expect(await SkyObject.count({ where: { name: 'Self Accepted Galaxy' } })).toBe(0);
    // A reviewer adds directly, so cannot propose at all; the matrix holds that. An admin's own
    // proposals do not exist either: the rule still refuses a record made by the viewer.
    const proposal = await CatalogueProposal.findByPk(proposed.body.data.id);
    const reviewer = await signedInAgent('reviewer');
    proposal!.createdById = reviewer.user.id;
    await proposal!.save();
    const self = await reviewer.agent.post(`/api/catalogue/proposals/${proposal!.id}/review`).send({ decision: 'accept' });
    expect(self.status).toBe(403);
    expect(self.body.error.message).toMatch(/You made this proposal/);
  });

  it('refuses a duplicate name: one already in the catalogue, and one already waiting', async () => {
    const { agent } = await signedInAgent('writer');
    const other = await signedInAgent('editor');
    await buildSkyObject({ name: 'Existing Test Nebula' });
    const taken = await agent.post('/api/catalogue/proposals/objects').send(objectBody('existing test nebula'));
    expect(taken.status).toBe(409);
    expect(taken.body.error.code).toBe('name_taken');
    expect((await agent.post('/api/catalogue/proposals/objects').send(objectBody('Twice Proposed Galaxy'))).status).toBe(201);
    const again = await other.agent.post('/api/catalogue/proposals/objects').send(objectBody('TWICE proposed galaxy'));
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: 'proposal_exists' });
    expect(again.body.error.message).toMatch(/waiting for a reviewer/);
    const sourceTaken = await agent
      .post('/api/catalogue/proposals/sources')
      .send({ citation: 'Proposal test survey (invented, 2023)', url: 'https://example.test/survey' });
    expect(sourceTaken.status).toBe(409);
    expect(sourceTaken.body.error.code).toBe('source_exists');
  });

  it('refuses to accept an object whose name was taken after it was proposed, and changes nothing', async () => {
    const { agent } = await signedInAgent('writer');
    const { agent: reviewer } = await signedInAgent('reviewer');
    const proposed = await agent.post('/api/catalogue/proposals/objects').send(objectBody('Late Clash Galaxy'));
    await buildSkyObject({ name: 'Late Clash Galaxy' });
    const res = await reviewer.post(`/api/catalogue/proposals/${proposed.body.data.id}/review`).send({ decision: 'accept' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('name_taken');
    expect((await CatalogueProposal.findByPk(proposed.body.data.id))!.status).toBe('proposed');
  });
});
