import { MeasurementInputSchema } from '@shared/schemas/measurement.ts';
import { SkyObjectInputSchema } from '@shared/schemas/sky-object.ts';
import { SkyObject, Source, User } from '../models/index.ts';
import { createMeasurement, setPreferred, createSkyObject } from '../services/catalogue/index.ts';
import { getSettings } from '../services/settings/index.ts';
import { DEMO_ACCOUNTS } from './accounts.ts';
import { DEMO_OBJECTS } from './catalogue-objects.ts';

/** The one source every demo value hangs from, so nothing demo passes for checked data. */
export const DEMO_SOURCE_CITATION = 'Demo values — not for publication';

/**
 * A couple of dozen well-known objects with approximate values, entered by the demo reviewer and
 * attached to the demo source. The first value of each quantity and band is marked preferred.
 * Idempotent: does nothing once the demo source exists.
 */
export async function seedCatalogueDemo(): Promise<void> {
  if (await Source.findOne({ where: { citation: DEMO_SOURCE_CITATION } })) return;
  const reviewer = await User.findOne({ where: { email: DEMO_ACCOUNTS.find((a) => a.role === 'reviewer')!.email } });
  const writer = await User.findOne({ where: { email: DEMO_ACCOUNTS.find((a) => a.role === 'writer')!.email } });
  if (!reviewer || !writer) return;
  const source = await Source.create({
    citation: DEMO_SOURCE_CITATION,
    bibcode: null,
    doi: null,
    url: null,
    catalogueName: 'Corrie Vale Planetarium (demo)',
    retrievedOn: null,
    notes:
      'Rounded values typed in for the demonstration. Replace them with measurements from published sources before anything is published.',
    createdById: reviewer.id,
  });

  // The demo organisation names a default spectral index for quasars, so its quasar statements show
  // how an assumption reads in the working (an organisation without one is asked for the measurement).
  const settings = await getSettings();
  if (Object.keys(settings.spectralIndexDefaults ?? {}).length === 0) {
    settings.spectralIndexDefaults = {
      quasar: {
        value: -0.44,
        sigma: null,
        source:
          'Vanden Berk et al. (2001), AJ 122, 549: continuum of the composite quasar spectrum, α_ν = −0.44 (demo setting; value recalled from memory)',
      },
    };
    await settings.save();
  }
  for (const demo of DEMO_OBJECTS) {
    const existing = await SkyObject.findOne({ where: { name: demo.name } });
    if (existing) continue;
    const object = await createSkyObject(
      SkyObjectInputSchema.parse({ ...demo, notes: `${demo.notes ?? ''} Demo object.`.trim() }),
      reviewer,
    );
    const preferredKeys = new Set<string>();
    for (const entry of demo.measurements) {
      const values = MeasurementInputSchema.parse({ ...entry, sourceId: source.id });
      const proposal = entry.proposed === true;
      const m = await createMeasurement(object, values, proposal ? writer : reviewer, proposal);
      const key = `${values.quantity}|${values.band ?? ''}`;
      if (!proposal && !preferredKeys.has(key)) {
        preferredKeys.add(key);
        await setPreferred(m.id, { preferred: true }, reviewer);
      }
    }
  }
}

/**
 * Gives the demo objects their names as sentences use them where a catalogue seeded before they
 * existed has none. Never overwrites a sentence name someone has entered.
 */
export async function fillDemoSentenceNames(): Promise<void> {
  if (!(await Source.findOne({ where: { citation: DEMO_SOURCE_CITATION } }))) return;
  for (const demo of DEMO_OBJECTS) {
    if (!demo.sentenceNames) continue;
    const object = await SkyObject.findOne({ where: { name: demo.name } });
    if (object && Object.keys(object.sentenceNames ?? {}).length === 0) {
      object.sentenceNames = demo.sentenceNames;
      await object.save();
    }
  }
}
