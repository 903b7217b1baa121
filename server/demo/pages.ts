import type { JSONContent } from '@tiptap/core';
import { Page, SkyObject, User } from '../models/index.ts';
import { savePage, createPage, publishPage, signOffPage, signOffStatement, submitPage } from '../services/pages/index.ts';
import { findOrCreateStatement } from '../services/statements/index.ts';
import { logger } from '../logger.ts';
import { DEMO_ACCOUNTS } from './accounts.ts';

const t = (text: string): JSONContent => ({ type: 'text', text });
const s = (statementId: string): JSONContent => ({ type: 'statementRef', attrs: { statementId } });
const p = (...content: JSONContent[]): JSONContent => ({ type: 'paragraph', content });
const h = (text: string): JSONContent => ({ type: 'heading', attrs: { level: 2 }, content: [t(text)] });

const account = (role: string) => User.findOne({ where: { email: DEMO_ACCOUNTS.find((a) => a.role === role)!.email } });

async function statementFor(objectName: string, templateId: string, writer: User): Promise<string> {
  const object = await SkyObject.findOne({ where: { name: objectName } });
  if (!object) throw new Error(`demo object ${objectName} missing`);
  return (await findOrCreateStatement(object.id, templateId, writer)).statement.id;
}

async function draft(title: string, objectName: string, writer: User, doc: JSONContent) {
  const object = await SkyObject.findOne({ where: { name: objectName } });
  const page = await createPage({ title, objectId: object!.id, locale: 'en-GB' }, writer);
  return (await savePage(page.id, { version: page.version, title, doc }, writer)).page;
}

/** Creates one demo page unless a page of that title exists; a failure is logged, never fatal. */
async function once(title: string, make: () => Promise<void>): Promise<void> {
  if (await Page.findOne({ where: { title } })) return;
  try {
    await make();
  } catch (err) {
    // Demo pages are a convenience: a catalogue without the demo objects must not stop the app.
    logger.warn({ err, title }, 'demo page not created');
  }
}

/**
 * Four demo pages at Corrie Vale Planetarium (demo), all about demo catalogue objects: two
 * published (one placing light-travel times on Earth's timeline), one waiting for review (with a
 * hand-typed number for the reviewer), one draft about the Sun with its eye-safety notice.
 * Idempotent per page.
 */
export async function seedDemoPages(): Promise<void> {
  const [writer, reviewer, editor] = await Promise.all([account('writer'), account('reviewer'), account('editor')]);
  if (!writer || !reviewer || !editor) return;

  const andromedaTitle = 'How far away is the Andromeda Galaxy? (demo)';
  await once(andromedaTitle, async () => {
    const distance = await statementFor('Andromeda Galaxy', 'distance-today', writer);
    // Not the naked-eye comparison: that is for points of light, and a galaxy's light is spread out.
    const travel = await statementFor('Andromeda Galaxy', 'light-travel', writer);
    const andromeda = await draft(andromedaTitle, 'Andromeda Galaxy', writer, {
      type: 'doc',
      content: [
        p(
          t(
            'On a clear autumn night at Corrie Vale, look high in the east for a faint smudge of light: the Andromeda Galaxy, our nearest large neighbour.',
          ),
        ),
        h('A long way off'),
        p(s(distance), t(' '), s(travel), t(' It set out long before there were people to see it.')),
        h('Can I see it?'),
        p(
          t(
            'Yes, on a dark night: not as a star but as a faint, oval glow, because its light is spread over a patch of sky several times the width of the full Moon. Let your eyes adjust to the dark for twenty minutes first, away from the car park lights.',
          ),
        ),
      ],
    });
    await submitPage(andromeda.id, undefined, writer);
    for (const id of [distance, travel]) await signOffStatement(andromeda.id, id, reviewer);
    await signOffPage(andromeda.id, reviewer);
    await publishPage(andromeda.id, editor);
  });

  const quasarTitle = '3C 279, a quasar in Virgo (demo)';
  await once(quasarTitle, async () => {
    const luminosity = await statementFor('3C 279', 'luminosity-sun', writer);
    const travel = await statementFor('3C 279', 'light-travel', writer);
    const quasar = await draft(quasarTitle, '3C 279', writer, {
      type: 'doc',
      content: [
        p(t('3C 279 looks like a very faint star in a large telescope, but it is the blazing centre of a distant galaxy.')),
        p(s(luminosity), t(' '), s(travel)),
        p(
          t(
            'An old leaflet in our shop says it is about 5 billion light-years away; our reviewers check which distance measure that means.',
          ),
        ),
      ],
    });
    await submitPage(quasar.id, undefined, writer, [
      { text: '5 billion light-years', reason: 'Quoted from an old leaflet; please check which distance it means.' },
    ]);
  });

  const setOutTitle = 'When the light set out (demo)';
  await once(setOutTitle, async () => {
    // Each statement names an event of Earth's timeline only where the rule finds one that fits.
    const andromeda = await statementFor('Andromeda Galaxy', 'light-set-out-timeline', writer);
    const quasar = await statementFor('3C 279', 'light-set-out-timeline', writer);
    const sirius = await statementFor('Sirius', 'light-set-out-timeline', writer);
    const page = await draft(setOutTitle, 'Andromeda Galaxy', writer, {
      type: 'doc',
      content: [
        p(t('Every light in the night sky left its source long ago. Put the times beside the story of our own planet:')),
        p(s(quasar)),
        p(s(andromeda)),
        p(t('Closer to home, the times are human ones. '), s(sirius)),
      ],
    });
    await submitPage(page.id, undefined, writer);
    for (const id of [andromeda, quasar, sirius]) await signOffStatement(page.id, id, reviewer);
    await signOffPage(page.id, reviewer);
    await publishPage(page.id, editor);
  });

  const sunTitle = 'Watching the Sun safely (demo)';
  await once(sunTitle, async () => {
    await draft(sunTitle, 'Sun', writer, {
      type: 'doc',
      content: [
        p(t('Our solar telescope on the terrace shows sunspots on clear days, with a certified filter fitted by our staff.')),
        { type: 'eyeSafetyNotice' },
      ],
    });
  });
}
