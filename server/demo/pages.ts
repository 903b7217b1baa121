import type { JSONContent } from '@tiptap/core';
import { Page, PageRevision, SkyObject, User } from '../models/index.ts';
import {
  savePage,
  createPage,
  createPageVersion,
  publishPage,
  signOffPage,
  signOffStatement,
  submitPage,
} from '../services/pages/index.ts';
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

/** The French version of the Andromeda page, written for French-speaking visitors (demo). */
export const DEMO_FRENCH_TITLE = 'À quelle distance se trouve la galaxie d’Andromède\u202f? (démo)';

/**
 * The published Andromeda page's French version: the same statements (which read in French by
 * themselves), the text around them translated, signed off and published on its own.
 */
async function frenchAndromeda(englishTitle: string, writer: User, reviewer: User, editor: User): Promise<void> {
  const english = await Page.findOne({ where: { title: englishTitle, locale: 'en-GB' } });
  if (!english) return;
  const version = await createPageVersion(english, 'fr-FR', writer);
  const revision = (await PageRevision.findByPk(version.currentRevisionId!))!;
  const [distance, travel] = revision.statementIds;
  const french = await savePage(
    version.id,
    {
      version: version.version,
      title: DEMO_FRENCH_TITLE,
      doc: {
        type: 'doc',
        content: [
          p(
            t(
              'Par une nuit claire d’automne à Corrie Vale, cherchez haut vers l’est une faible tache de lumière\u00a0: la galaxie d’Andromède, la grande galaxie la plus proche de la nôtre.',
            ),
          ),
          h('Très loin d’ici'),
          p(s(distance!), t(' '), s(travel!), t(' C’était bien avant l’apparition de notre espèce.')),
          h('Peut-on la voir\u202f?'),
          p(
            t(
              'Oui, par une nuit bien noire\u00a0: non pas comme une étoile, mais comme une faible lueur ovale, car sa lumière s’étale sur une partie du ciel plusieurs fois plus large que la pleine Lune. Laissez d’abord vos yeux s’habituer à l’obscurité pendant vingt minutes, loin des lumières du parking.',
            ),
          ),
        ],
      },
    },
    writer,
  );
  await submitPage(french.page.id, undefined, writer);
  for (const id of [distance!, travel!]) await signOffStatement(french.page.id, id, reviewer);
  await signOffPage(french.page.id, reviewer);
  await publishPage(french.page.id, editor);
}

/**
 * Six demo pages at Corrie Vale Planetarium (demo), all about demo catalogue objects: four
 * published (Andromeda, with a published French version; 3C 48, worked out from its redshift;
 * sunspots, with the eye-safety notice; light-travel times placed on Earth's timeline), one waiting
 * for review (with a hand-typed number for the reviewer), one draft about the Sun with its
 * eye-safety notice. Idempotent per page.
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
  await once(DEMO_FRENCH_TITLE, () => frenchAndromeda(andromedaTitle, writer, reviewer, editor));

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

  // Published for the public site: a statement worked out from a redshift (so "How we know" names
  // the cosmology), and a page about the Sun that carries the eye-safety notice.
  const oldLightTitle = '3C 48: light that set out billions of years ago (demo)';
  await once(oldLightTitle, async () => {
    const travel = await statementFor('3C 48', 'light-travel', writer);
    const page = await draft(oldLightTitle, '3C 48', writer, {
      type: 'doc',
      content: [
        p(
          t(
            '3C 48 was one of the first quasars found: a point of light that turned out to be the bright centre of a galaxy far beyond our own.',
          ),
        ),
        p(s(travel), t(' Its redshift tells us how much the universe has stretched while that light was on its way.')),
      ],
    });
    await submitPage(page.id, undefined, writer);
    await signOffStatement(page.id, travel, reviewer);
    await signOffPage(page.id, reviewer);
    await publishPage(page.id, editor);
  });

  const sunSpotsTitle = 'Sunspots from the terrace (demo)';
  await once(sunSpotsTitle, async () => {
    const page = await draft(sunSpotsTitle, 'Sun', writer, {
      type: 'doc',
      content: [
        { type: 'eyeSafetyNotice' },
        p(
          t(
            'On clear days our staff show sunspots on the terrace with a solar telescope whose certified filter they fit and check before every session. Sunspots are cooler patches on the Sun’s surface that come and go over days and weeks.',
          ),
        ),
      ],
    });
    await submitPage(page.id, undefined, writer);
    await signOffPage(page.id, reviewer);
    await publishPage(page.id, editor);
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
