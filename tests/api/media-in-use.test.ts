import { beforeAll, describe, expect, it } from 'vitest';
import { Media } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { doc, pageWithBody, paragraph, quasarWithStatements, text } from '../support/pages.ts';
import { buildKioskMedia, publishedPage, publishingCrew } from '../support/publishing.ts';

// Issue 15, points 4 and 5: images in published use, and what the usage list may show.

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

describe('an image live on a published page (point 4)', () => {
  it('a writer may not change its credit, alt text or licence; an editor may; unchanged values and unused images are fine', async () => {
    const crew = await publishingCrew();
    const live = await buildKioskMedia(crew.writer.user);
    await publishedPage(crew, 'Live image page (demo)', live.id);
    for (const change of [{ credit: 'Someone else' }, { altText: 'A different description' }, { licenceId: null }]) {
      const res = await crew.writer.agent.patch(`/api/media/${live.id}`).send(change);
      expect(res.status, JSON.stringify(change)).toBe(403);
      expect(res.body.error.code).toBe('image_in_published_use');
    }
    const unchanged = (await Media.findByPk(live.id))!;
    expect(unchanged.credit).toBe(live.credit);
    expect(unchanged.licenceId).toBe(live.licenceId);
    // Sending the same values back (a form saved as it was) changes nothing the public sees.
    expect((await crew.writer.agent.patch(`/api/media/${live.id}`).send({ credit: live.credit })).status).toBe(200);
    expect((await crew.editor.agent.patch(`/api/media/${live.id}`).send({ credit: 'Corrected credit (demo)' })).status).toBe(200);
    const unused = await buildKioskMedia(crew.writer.user);
    expect((await crew.writer.agent.patch(`/api/media/${unused.id}`).send({ credit: 'Mine to change' })).status).toBe(200);
  }, 60_000);
});

describe('usage as the viewer may see it (point 5)', () => {
  it('another writer’s private draft is counted, not named, in the usage list and in the 409 on delete', async () => {
    const owner = await signedInAgent('writer');
    const other = await signedInAgent('writer');
    const editor = await signedInAgent('editor');
    const media = await buildKioskMedia(other.user);
    const q = await quasarWithStatements(owner.agent, owner.user);
    await pageWithBody(
      owner.agent,
      q.object.id,
      doc(paragraph(text('Secret plans.')), { type: 'mediaImage', attrs: { mediaId: media.id, caption: null } }),
      'Secret draft title (demo)',
    );
    const seenByOther = await other.agent.get(`/api/media/${media.id}`);
    expect(seenByOther.body.data.usage).toEqual([]);
    expect(seenByOther.body.data.hiddenUsageCount).toBe(1);
    const refused = await other.agent.delete(`/api/media/${media.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).not.toContain('Secret draft');
    expect(refused.body.error.message).toContain('a private draft');
    // The writer and the desk see the title.
    for (const who of [owner, editor]) {
      const seen = await who.agent.get(`/api/media/${media.id}`);
      expect(seen.body.data.usage.map((u: { title: string }) => u.title)).toEqual(['Secret draft title (demo)']);
      expect(seen.body.data.hiddenUsageCount).toBe(0);
    }
  }, 60_000);
});
