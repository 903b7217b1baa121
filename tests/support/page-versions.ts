import { expect } from 'vitest';
import type { signedInAgent } from './app.ts';
import { doc, pageWithBody, paragraph, quasarWithStatements, statement, text } from './pages.ts';

type Signed = Awaited<ReturnType<typeof signedInAgent>>;

/** The three people a page needs on its way to publication. */
export interface Desk {
  writer: Signed;
  reviewer: Signed;
  editor: Signed;
}

/** An English (UK) page with two statements about a fresh quasar. */
export async function englishPage(desk: Desk, title: string) {
  const q = await quasarWithStatements(desk.writer.agent, desk.writer.user);
  const body = doc(paragraph(text('Astronomers say '), statement(q.distanceId)), paragraph(statement(q.nakedEyeId)));
  const page = await pageWithBody(desk.writer.agent, q.object.id, body, title);
  return { q, page };
}

/** Asks for a version of a page in another locale. */
export function addVersion(agent: Signed['agent'], pageId: string, locale: string) {
  return agent.post(`/api/pages/${pageId}/versions`).send({ locale });
}

/** Submits, signs off every statement and the page, and publishes one version (optionally under a new title). */
export async function publishVersion(desk: Desk, pageId: string, title?: string) {
  let seen = (await desk.writer.agent.get(`/api/pages/${pageId}`)).body.data;
  if (title) {
    const saved = await desk.writer.agent.put(`/api/pages/${pageId}`).send({ version: seen.version, title, doc: seen.doc });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    seen = saved.body.data;
  }
  const submitted = await desk.writer.agent.post(`/api/pages/${pageId}/submit`).send({ version: seen.version });
  expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
  for (const s of seen.statements as Array<{ id: string }>)
    expect((await desk.reviewer.agent.post(`/api/pages/${pageId}/signoffs/statements`).send({ statementId: s.id })).status).toBe(
      200,
    );
  const approved = await desk.reviewer.agent.post(`/api/pages/${pageId}/signoffs/page`);
  expect(approved.status, JSON.stringify(approved.body)).toBe(200);
  const published = await desk.editor.agent.post(`/api/pages/${pageId}/publish`);
  expect(published.status, JSON.stringify(published.body)).toBe(200);
}
