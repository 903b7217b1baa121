/**
 * Earth's timeline through the API: admins edit it, others only read it; bad entries are refused
 * with a message per field (and by the database's own checks); an edit recomputes the statements
 * that compare with the timeline.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/demo/seed.ts';
import { TIMELINE_STARTER } from '../../server/migrations/data/timeline-starter.ts';
import { AuditEvent, Page, Statement, TimelineEntry } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildObjectWithMeasurements } from '../support/sky-fixtures.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const stoneTools = {
  label: 'Oldest Oldowan stone tools (test copy)',
  yearsAgo: 2.55e6,
  uncertaintyYears: 0.05e6,
  relation: 'around',
  phrases: {
    'en-GB': 'around the time early relatives of ours were making some of the oldest stone tools yet found',
    'en-US': 'around the time early relatives of ours were making some of the oldest stone tools yet found',
    'fr-FR': 'à l’époque où de lointains parents de notre espèce taillaient certains des plus anciens outils de pierre connus',
  },
  sourceCitation: 'Stone tools from Gona, Ethiopia, dated to 2.6–2.5 million years ago: Nature 385, 333–336 (1997)',
  sourceUrl: '',
  note: 'Recalled from memory.',
};

describe('who may edit the timeline', () => {
  it('every member of staff reads it; only admins add, change or remove entries', async () => {
    const admin = await signedInAgent('admin');
    const created = await admin.agent.post('/api/timeline').send({ ...stoneTools, label: 'Access check entry' });
    expect(created.status).toBe(201);
    expect(created.body.data.sourceUrl).toBeNull();
    expect(created.body.data.can).toEqual({ update: true, delete: true });
    const id = created.body.data.id as string;
    for (const role of ['writer', 'reviewer', 'editor'] as const) {
      const { agent } = await signedInAgent(role);
      const list = await agent.get('/api/timeline');
      expect(list.status).toBe(200);
      expect(list.body.data.find((e: { id: string }) => e.id === id).can).toEqual({ update: false, delete: false });
      expect((await agent.post('/api/timeline').send({ ...stoneTools, label: `By a ${role}` })).status).toBe(403);
      expect((await agent.patch(`/api/timeline/${id}`).send({ note: 'changed' })).status).toBe(403);
      expect((await agent.delete(`/api/timeline/${id}`)).status).toBe(403);
    }
    expect((await TimelineEntry.findByPk(id))?.note).toBe('Recalled from memory.');
    expect((await admin.agent.delete(`/api/timeline/${id}`)).status).toBe(204);
    expect(await AuditEvent.count({ where: { action: ['timeline.created', 'timeline.deleted'], subjectId: id } })).toBe(2);
    expect((await admin.agent.patch(`/api/timeline/${id}`).send({ note: 'gone' })).status).toBe(404);
  });
});

describe('bad entries are refused, saying which field and why', () => {
  it('the schema names each field', async () => {
    const { agent } = await signedInAgent('admin');
    const cases: Array<[Record<string, unknown>, string, RegExp]> = [
      [{ yearsAgo: -5 }, 'yearsAgo', /more than 0/],
      [{ yearsAgo: 'soon' }, 'yearsAgo', /as a number/],
      [{ uncertaintyYears: 0 }, 'uncertaintyYears', /more than 0/],
      [{ uncertaintyYears: 3e6 }, 'uncertaintyYears', /smaller than the date/],
      [{ sourceCitation: '' }, 'sourceCitation', /published source/],
      [{ relation: 'after' }, 'relation', /around the time/],
      [{ phrases: { ...stoneTools.phrases, 'fr-FR': 'Une phrase.' } }, 'phrases.fr-FR', /full stop/],
      [{ sourceUrl: 'javascript:alert(1)' }, 'sourceUrl', /https:\/\//],
    ];
    for (const [change, field, message] of cases) {
      const res = await agent.post('/api/timeline').send({ ...stoneTools, label: `Bad ${field}`, ...change });
      expect(res.status, JSON.stringify(change)).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.fields[field], JSON.stringify(res.body.error.fields)).toMatch(message);
    }
    expect(await TimelineEntry.count({ where: { label: cases.map(([, f]) => `Bad ${f}`) } })).toBe(0);
  });

  it('a change that makes the uncertainty as large as the date is refused, and the database holds the limits too', async () => {
    const { agent } = await signedInAgent('admin');
    const created = await agent.post('/api/timeline').send({ ...stoneTools, label: 'Limits entry' });
    const res = await agent.patch(`/api/timeline/${created.body.data.id}`).send({ yearsAgo: 1e4 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/smaller than the date/);
    await expect(
      TimelineEntry.create({ ...stoneTools, label: 'Direct', uncertaintyYears: 0, relation: 'around' }),
    ).rejects.toThrow(/timeline_entries_uncertainty_check/);
    const dup = await agent.post('/api/timeline').send({ ...stoneTools, label: 'Limits entry' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('timeline_label_taken');
  });
});

describe('a timeline edit recomputes the statements that compare with it', () => {
  it('a galaxy 2.5 million light-years away gains, then loses, its comparison as the timeline changes', async () => {
    const writer = await signedInAgent('writer');
    const admin = await signedInAgent('admin');
    await TimelineEntry.destroy({ where: {} });
    // 765 ± 28 kpc: 2.50 million light-years (invented test values).
    const { object } = await buildObjectWithMeasurements(
      'Timeline test galaxy',
      'galaxy',
      [{ quantity: 'distance', value: 765e3, sigma: 28e3, unit: 'pc' }],
      writer.user,
    );
    const created = await writer.agent
      .post('/api/statements')
      .send({ objectId: object.id, templateId: 'light-set-out-timeline' });
    expect(created.status).toBe(201);
    const id = created.body.data.id as string;
    expect(created.body.data.texts['en-GB']).toMatch(
      /^The light we see tonight from Timeline test galaxy \d+ set out about 2\.5 million years ago\.$/,
    );

    const entry = await admin.agent.post('/api/timeline').send(stoneTools);
    expect(entry.status).toBe(201);
    await expect
      .poll(async () => (await Statement.findByPk(id))?.texts?.['en-GB'], { timeout: 15_000 })
      .toMatch(
        /2\.5 million years ago, around the time early relatives of ours were making some of the oldest stone tools yet found\.$/,
      );
    const after = await Statement.findByPk(id);
    // The accepted wording was the one without the comparison: a reviewer sees the new one.
    expect(after?.status).toBe('changed');

    const moved = await admin.agent.patch(`/api/timeline/${entry.body.data.id}`).send({ yearsAgo: 3.3e6 });
    expect(moved.status).toBe(200);
    await expect
      .poll(async () => (await Statement.findByPk(id))?.texts?.['en-GB'], { timeout: 15_000 })
      .toMatch(/set out about 2\.5 million years ago\.$/);

    // The working names the timeline's source and the measurement by object and quantity, never by id.
    const shown = await writer.agent.get(`/api/statements/${id}`);
    const working = JSON.stringify(shown.body.data.working);
    expect(working).toContain('Placing it on Earth’s timeline');
    expect(working).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/);
    expect(working).toMatch(/Timeline test galaxy \d+: distance/);
  });
});

describe('the demo uses the starter timeline on a published page', () => {
  it('Andromeda beside the oldest stone tools, 3C 279 before the Sun formed, Sirius with no comparison', async () => {
    await TimelineEntry.destroy({ where: {} });
    await TimelineEntry.bulkCreate(TIMELINE_STARTER.map((e) => ({ ...e, phrases: { ...e.phrases } })));
    await seedDemo();
    const page = await Page.findOne({ where: { title: 'When the light set out (demo)' } });
    expect(page?.status).toBe('published');
    const texts = Object.values(page!.publishedSnapshot!.statementTexts).map((t) => String(t));
    expect(texts).toContainEqual(
      expect.stringMatching(
        /^The light we see tonight from the Andromeda Galaxy set out about 2\.5 million years ago, around the time early relatives of ours were making some of the oldest stone tools yet found\.$/,
      ),
    );
    expect(texts).toContainEqual(
      expect.stringMatching(
        /^The light we see tonight from 3C 279 set out about [\d.]+ billion years ago, before the Sun and Earth had formed\.$/,
      ),
    );
    expect(texts).toContainEqual(
      expect.stringMatching(/^The light we see tonight from Sirius set out about [\d.]+ years ago\.$/),
    );
  }, 120_000);
});
