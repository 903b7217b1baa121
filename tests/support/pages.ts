import type { JSONContent } from '@tiptap/core';
import type { Agent } from 'supertest';
import { Media, MediaRendition, type User } from '../../server/models/index.ts';
import { buildObjectWithMeasurements } from './sky-fixtures.ts';

/** A quasar with a redshift and a V magnitude, and two statements on it made through the API. */
export async function quasarWithStatements(agent: Agent, creator: User) {
  const built = await buildObjectWithMeasurements(
    'Page quasar',
    'quasar',
    [
      { quantity: 'redshift', value: 0.158, sigma: 0.0003, unit: '' },
      { quantity: 'apparent_magnitude', value: 12.9, sigma: 0.1, band: 'V', unit: 'mag' },
    ],
    creator,
  );
  const distance = await agent.post('/api/statements').send({ objectId: built.object.id, templateId: 'distance-today' });
  const nakedEye = await agent.post('/api/statements').send({ objectId: built.object.id, templateId: 'naked-eye' });
  if (distance.status >= 300 || nakedEye.status >= 300)
    throw new Error(`statements not created: ${JSON.stringify(distance.body)} ${JSON.stringify(nakedEye.body)}`);
  return {
    ...built,
    distanceId: distance.body.data.id as string,
    nakedEyeId: nakedEye.body.data.id as string,
    distanceText: distance.body.data.texts['en-GB'] as string,
  };
}

export const text = (t: string, marks?: JSONContent['marks']): JSONContent =>
  marks ? { type: 'text', text: t, marks } : { type: 'text', text: t };
export const statement = (statementId: string): JSONContent => ({ type: 'statementRef', attrs: { statementId } });
export const paragraph = (...content: JSONContent[]): JSONContent => ({ type: 'paragraph', content });
export const doc = (...content: JSONContent[]): JSONContent => ({ type: 'doc', content });

/** Creates a page and saves a first body; returns the page as the API answered the save. */
export async function pageWithBody(agent: Agent, objectId: string, body: JSONContent, title = 'A page for checks') {
  const created = await agent.post('/api/pages').send({ title, objectId, locale: 'en-GB' });
  if (created.status !== 201) throw new Error(`page not created: ${JSON.stringify(created.body)}`);
  const saved = await agent
    .put(`/api/pages/${created.body.data.id}`)
    .send({ version: created.body.data.version, title, doc: body });
  if (saved.status !== 200) throw new Error(`page not saved: ${JSON.stringify(saved.body)}`);
  return saved.body.data as { id: string; version: number; status: string };
}

/** A library image with renditions; `complete` false leaves out the credit and licence. */
export async function buildMedia(uploader: User, complete = true) {
  const sha = Math.random().toString(16).slice(2).padEnd(12, '0');
  const media = await Media.create({
    sha256: sha.repeat(6).slice(0, 64),
    originalKey: `originals/${sha}.jpg`,
    fileName: 'test-nebula.jpg',
    format: 'jpeg',
    bytes: 1000,
    width: 800,
    height: 600,
    altText: 'A glowing cloud of gas (test image)',
    credit: complete ? 'Test credit line' : '',
    licenceId: complete ? 'cc-by-4.0' : null,
    sourceUrl: complete ? 'https://example.org/test-image' : '',
    renditionsStatus: 'ready',
    uploadedById: uploader.id,
  });
  await MediaRendition.create({
    mediaId: media.id,
    name: 'page',
    format: 'jpeg',
    width: 800,
    height: 600,
    bytes: 900,
    storageKey: `renditions/${'a'.repeat(63)}${sha.slice(0, 1)}.jpg`,
  });
  return media;
}
