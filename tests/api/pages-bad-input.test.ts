import { beforeAll, describe, expect, it } from 'vitest';
import { PageLimits } from '../../shared/validations.ts';
import { PageRevision } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { doc, pageWithBody, paragraph, quasarWithStatements, statement, text } from '../support/pages.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

async function setup() {
  const { agent, user } = await signedInAgent('writer');
  const { object, distanceId } = await quasarWithStatements(agent, user);
  const page = await pageWithBody(agent, object.id, doc(paragraph(text('It is '), statement(distanceId))));
  return { agent, user, object, page };
}

const revisions = (pageId: string) => PageRevision.count({ where: { pageId } });

describe('page documents sent straight to the API', () => {
  it('refuses HTML pasted in place of the editor document, and stores nothing', async () => {
    const { agent, page } = await setup();
    const before = await revisions(page.id);
    // HTML as a word processor puts it on the clipboard (recalled from memory of Word's output).
    const wordHtml =
      '<p class=MsoNormal style="margin:0cm"><span style="font-family:Calibri">Its light left <b>12 billion</b> years ago</span><o:p></o:p></p>';
    const res = await agent.put(`/api/pages/${page.id}`).send({ version: page.version, title: 'Pasted', doc: wordHtml });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('The page body must be editor JSON, not HTML or text. Paste into the editor instead.');
    expect(await revisions(page.id)).toBe(before);
  });

  it('keeps markup typed as text as text: escaped when rendered, never run', async () => {
    const { agent, page } = await setup();
    const res = await agent
      .put(`/api/pages/${page.id}`)
      .send({
        version: page.version,
        title: 'Markup as text',
        doc: doc(paragraph(text('<script>alert(1)</script><img src=x onerror=alert(2)>'))),
      });
    expect(res.status).toBe(200);
    const preview = await agent.get(`/api/pages/${page.id}/preview`);
    expect(preview.body.data.html).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;&lt;img src=x onerror=alert(2)&gt;</p>');
  });

  it.each([
    ['javascript:alert(1)'],
    ['JaVaScRiPt:alert(1)'],
    ['java\tscript:alert(1)'],
    [' javascript:alert(1)'],
    ['data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg=='],
    ['vbscript:msgbox(1)'],
    ['//evil.example/path'],
  ])('refuses a link to %j', async (href) => {
    const { agent, page } = await setup();
    const before = await revisions(page.id);
    const res = await agent
      .put(`/api/pages/${page.id}`)
      .send({ version: page.version, title: 'Link', doc: doc(paragraph(text('click', [{ type: 'link', attrs: { href } }]))) });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/“href” of link must be a web address \(http or https\) or a mailto: address/);
    expect(await revisions(page.id)).toBe(before);
  });

  it('accepts http, https and mailto links and renders them with rel=noopener', async () => {
    const { agent, page } = await setup();
    const body = doc(
      paragraph(
        text('site', [{ type: 'link', attrs: { href: 'https://example.org/sky' } }]),
        text(' and '),
        text('mail', [{ type: 'link', attrs: { href: 'mailto:desk@example.org' } }]),
      ),
    );
    expect((await agent.put(`/api/pages/${page.id}`).send({ version: page.version, title: 'Links', doc: body })).status).toBe(
      200,
    );
    const html = (await agent.get(`/api/pages/${page.id}/preview`)).body.data.html as string;
    expect(html).toContain('<a href="https://example.org/sky" rel="noopener noreferrer nofollow">site</a>');
    expect(html).toContain('<a href="mailto:desk@example.org" rel="noopener noreferrer nofollow">mail</a>');
  });

  it.each([
    ['an unknown node', doc({ type: 'script', content: [text('alert(1)')] }), /“script” is not something a page can contain/],
    [
      'an iframe node',
      doc({ type: 'iframe', attrs: { src: 'https://evil.example' } }),
      /“iframe” is not something a page can contain/,
    ],
    ['an unknown mark', doc(paragraph(text('x', [{ type: 'highlight' }]))), /the mark “highlight” is not allowed/],
    [
      'an event attribute',
      doc({ type: 'paragraph', attrs: { onclick: 'alert(1)' }, content: [text('x')] }),
      /has no attribute “onclick”/,
    ],
    [
      'a style attribute',
      doc({ type: 'paragraph', attrs: { style: 'color:red' }, content: [text('x')] }),
      /has no attribute “style”/,
    ],
    [
      'a heading of level 1',
      doc({ type: 'heading', attrs: { level: 1 }, content: [text('x')] }),
      /“level” of heading must be 2 or 3/,
    ],
    [
      'a statement with a made-up id',
      doc(paragraph({ type: 'statementRef', attrs: { statementId: 'x" onmouseover="alert(1)' } })),
      /“statementId” of statementRef must be a valid id/,
    ],
    [
      'a statement carrying its own text',
      doc(
        paragraph({
          type: 'statementRef',
          attrs: { statementId: '00000000-0000-4000-8000-000000000000' },
          content: [text('a trillion')],
        }),
      ),
      /structure is not valid/,
    ],
    ['text straight in the document', doc(text('loose')), /structure is not valid/],
    [
      'an extra property',
      doc({ type: 'paragraph', content: [text('x')], html: '<b>x</b>' } as never),
      /unexpected property “html”/,
    ],
    [
      'a link with a target',
      doc(paragraph(text('x', [{ type: 'link', attrs: { href: 'https://example.org', target: '_top' } }]))),
      /“target” of link must be empty/,
    ],
  ])('refuses %s with a clear message', async (_name, body, message) => {
    const { agent, page } = await setup();
    const res = await agent.put(`/api/pages/${page.id}`).send({ version: page.version, title: 'Crafted', doc: body });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.message).toMatch(message);
  });

  it('refuses a page over 5 MB with a clear message and keeps the last version', async () => {
    const { agent, page } = await setup();
    const before = await revisions(page.id);
    // 5.2 MB of text in 1,300 paragraphs: larger than the limit but under the transport's 6 MB cap.
    const big = doc(...Array.from({ length: 1300 }, (_, i) => paragraph(text(`${i} `.padEnd(4000, 'x')))));
    const res = await agent.put(`/api/pages/${page.id}`).send({ version: page.version, title: 'Huge', doc: big });
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({
      code: 'page_too_large',
      message: `This page is larger than ${PageLimits.docMaxBytes / 1024 / 1024} MB and cannot be saved. Split it into shorter pages, or remove pasted material you do not need.`,
    });
    expect(await revisions(page.id)).toBe(before);
    const still = await agent.get(`/api/pages/${page.id}`);
    expect(still.body.data.version).toBe(page.version);
  });

  it('refuses a body beyond the transport limit in the error shape', async () => {
    const { agent, page } = await setup();
    const res = await agent
      .put(`/api/pages/${page.id}`)
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ version: page.version, title: 'x', doc: 'y'.repeat(7 * 1024 * 1024) }));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
  });

  it('refuses a save without a version or with a made-up one', async () => {
    const { agent, page } = await setup();
    const missing = await agent.put(`/api/pages/${page.id}`).send({ title: 'x', doc: doc(paragraph(text('x'))) });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.version).toBe('Send the version you started editing from');
    const future = await agent
      .put(`/api/pages/${page.id}`)
      .send({ version: page.version + 5, title: 'x', doc: doc(paragraph(text('x'))) });
    expect(future.status).toBe(409);
  });
});

describe('two people in the same page', () => {
  it('the second save against the same version gets 409 with the first one’s text, and nothing is lost', async () => {
    const { agent: first, object, page } = await setup();
    const { agent: editor } = await signedInAgent('editor');
    const fromVersion = page.version;
    const a = await first
      .put(`/api/pages/${page.id}`)
      .send({ version: fromVersion, title: 'Version A', doc: doc(paragraph(text('Words from the writer.'))) });
    expect(a.status).toBe(200);
    const b = await editor
      .put(`/api/pages/${page.id}`)
      .send({ version: fromVersion, title: 'Version B', doc: doc(paragraph(text('Words from the editor.'))) });
    expect(b.status).toBe(409);
    expect(b.body.error.code).toBe('page_changed');
    expect(b.body.error.message).toMatch(/saved this page while you were editing/);
    expect(b.body.current).toMatchObject({
      version: a.body.data.version,
      title: 'Version A',
      doc: doc(paragraph(text('Words from the writer.'))),
    });
    // The editor merges and saves against the version the 409 named: both texts are kept in history.
    const merged = await editor
      .put(`/api/pages/${page.id}`)
      .send({
        version: b.body.current.version,
        title: 'Version A+B',
        doc: doc(paragraph(text('Words from the writer.')), paragraph(text('Words from the editor.'))),
      });
    expect(merged.status).toBe(200);
    const history = (await first.get(`/api/pages/${page.id}/revisions`)).body.data.map((r: { title: string }) => r.title);
    expect(history.slice(0, 2)).toEqual(['Version A+B', 'Version A']);
    expect(object.id).toBeTruthy();
  });

  it('two saves racing with the same version: exactly one wins', async () => {
    const { agent, page } = await setup();
    const results = await Promise.all(
      ['one', 'two', 'three'].map((w) =>
        agent.put(`/api/pages/${page.id}`).send({ version: page.version, title: `Race ${w}`, doc: doc(paragraph(text(w))) }),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409]);
    expect(await revisions(page.id)).toBe(3);
  });

  it('a save that changes nothing writes no revision and keeps the version', async () => {
    const { agent, page } = await setup();
    const current = (await agent.get(`/api/pages/${page.id}`)).body.data;
    const res = await agent
      .put(`/api/pages/${page.id}`)
      .send({ version: current.version, title: current.title, doc: current.doc });
    expect(res.status).toBe(200);
    expect(res.body.meta.saved).toBe(false);
    expect(res.body.data.version).toBe(current.version);
  });
});
