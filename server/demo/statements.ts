import { templatesForKind } from '@shared/statements/index.ts';
import { SkyObject, Statement, User, Venue } from '../models/index.ts';
import { findOrCreateStatement } from '../services/statements/index.ts';
import { DEMO_ACCOUNTS, DEMO_VENUE } from './accounts.ts';

/** Demo objects that get checked statements, so the Statements screen has something to show. */
const DEMO_STATEMENT_OBJECTS = [
  '3C 279',
  'TON 618',
  'Andromeda Galaxy',
  'Vega',
  'Sirius',
  'Orion Nebula',
  'Pleiades',
  'Messier 87',
];
/** Demo planets whose light-travel time tonight is worked out for the demo venue. */
const DEMO_TONIGHT_PLANETS = ['Jupiter', 'Saturn'];

/**
 * Works out every template valid for the kind of each of a handful of demo objects, and tonight's light-travel
 * time of two planets for the demo venue. Idempotent: statements that exist are left alone;
 * templates an object lacks the data for are skipped.
 */
export async function seedDemoStatements(): Promise<void> {
  const writer = await User.findOne({ where: { email: DEMO_ACCOUNTS.find((a) => a.role === 'writer')!.email } });
  if (!writer) return;
  for (const name of DEMO_STATEMENT_OBJECTS) {
    const object = await SkyObject.findOne({ where: { name } });
    if (!object || (await Statement.count({ where: { skyObjectId: object.id } })) > 0) continue;
    // Phrase forms belong inside a writer's sentence, and the timeline statements to their demo page.
    for (const template of templatesForKind(object.kind).filter((t) => !t.needsVenue && !t.phraseOf && !t.usesTimeline)) {
      await findOrCreateStatement(object.id, template.id, writer).catch(() => undefined);
    }
  }
  const venue = await Venue.findOne({ where: { name: DEMO_VENUE.name } });
  if (!venue) return;
  for (const name of DEMO_TONIGHT_PLANETS) {
    const object = await SkyObject.findOne({ where: { name } });
    if (object) await findOrCreateStatement(object.id, 'planet-light-tonight', writer, venue.id).catch(() => undefined);
  }
}
