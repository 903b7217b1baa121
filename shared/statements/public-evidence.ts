/**
 * "How we know": a statement's working retold for visitors. The staff working names every value,
 * formula and source with symbols and ids; this keeps every source and says the rest in plain words,
 * with no ids, symbols or internal codes.
 */
import type { Step } from '../engine/working.ts';
import type { ResolvedModel } from '../schemas/calc.ts';
import { findQuantity } from '../catalogue/quantities.ts';
import type { UsedInput } from './types.ts';

/** A source as visitors see it: its citation and, where one is known, a link to read it. */
export interface EvidenceSource {
  name: string;
  url: string | null;
}

/** One measurement a statement rests on, in words. */
export interface EvidenceMeasurement {
  /** "Redshift", "Apparent magnitude (V band)". */
  what: string;
  /** "0.158 ± 0.001", "3.4 mag". */
  value: string;
  source: EvidenceSource;
}

/** A statement's working retold for the public. */
export interface PublicEvidence {
  /** The language the words below are written in (BCP 47). */
  lang: string;
  measurements: EvidenceMeasurement[];
  /** The cosmology in words, or null when none was used. */
  model: string | null;
  /** The formula in words. */
  method: string;
  /** Every other source the working names (constants, model parameters, conventions), each with what it gave. */
  references: Array<{ source: string; usedFor: string[] }>;
  /** When the figure was last checked (accepted by a reviewer, or computed for tonight), ISO 8601. */
  checkedAt: string;
}

/** What a statement's stored working and inputs give to retell it. */
export interface EvidenceInput {
  templateId: string;
  inputs: UsedInput[];
  /** Where each input's source can be read, by source id. */
  sourceLinks: ReadonlyMap<string, string | null>;
  working: Step[];
  model: ResolvedModel | null;
  checkedAt: string;
}

/** Working "sources" that name no source: they point inside the working itself or at the person who typed a value. */
const NOT_SOURCES = new Set([
  '',
  'previous step',
  'previous steps',
  'this step',
  'uncertainty step',
  'request',
  'H0_range in the request',
  'the catalogue',
  'the model’s choice',
]);

/**
 * A working source as the public reads it: the measurement id the staff working carries (so a
 * reviewer can open the row) is taken out; the citation stays.
 */
export function publicSourceName(source: string): string {
  return source.replace(/\s*\(measurement [^)]*\)/gi, '').trim();
}

/** Every source a working names (steps' inputs and constants), as the public reads them, in order, once each. */
export function workingSources(working: Step[]): string[] {
  const seen = new Set<string>();
  for (const step of working)
    for (const v of [...step.inputs, ...step.constants]) {
      const name = publicSourceName(v.source);
      if (!NOT_SOURCES.has(name)) seen.add(name);
    }
  return [...seen];
}

const number = (value: number, locale: string) => new Intl.NumberFormat(locale, { maximumSignificantDigits: 6 }).format(value);

function measuredValue(input: UsedInput, locale: string): string {
  const unit = input.unit ? ` ${input.unit}` : '';
  const v = number(input.value, locale);
  if (input.minus != null && input.plus != null)
    return `${v} (−${number(input.minus, locale)}, +${number(input.plus, locale)})${unit}`;
  if (input.sigma != null) return `${v} ± ${number(input.sigma, locale)}${unit}`;
  return `${v}${unit}`;
}

/** Names that carry a number at full machine precision ("z ± 0.00136794…") read with three figures. */
const shortNumbers = (text: string) => text.replace(/\d+\.\d{5,}/g, (n) => String(Number(Number(n).toPrecision(3))));

const percent = (fraction: number) => `${Math.round(fraction * 100)} %`;

/** The cosmology in words for visitors: what the universe is assumed to be made of and how fast it grows. */
export function modelInWords(model: ResolvedModel, locale = 'en-GB'): string {
  const h0 = `${number(model.H0, locale)} km/s per megaparsec`;
  if (model.kind === 'hubble_law')
    return `The simple Hubble law: an object’s distance is its speed away from us divided by the Hubble constant, taken as ${h0}. It holds only for nearby objects.`;
  const parts = [
    `A ${model.flat ? 'flat ' : ''}expanding universe following the Friedmann equations (${model.label})`,
    `expanding today at ${h0} (the Hubble constant)`,
  ];
  if (model.Om0 !== undefined && model.Ode0 !== undefined)
    parts.push(`${percent(model.Om0)} of its content matter (ordinary and dark) and ${percent(model.Ode0)} dark energy`);
  const range = model.H0_range
    ? ` Astronomers’ methods disagree on the Hubble constant today, so the figure was worked out across ${number(model.H0_range.low, locale)} to ${number(model.H0_range.high, locale)} km/s per megaparsec and rounded so that it holds across that range.`
    : '';
  return `${parts.join(', ')}.${range}`;
}

const has = (inputs: UsedInput[], quantity: string) => inputs.some((i) => i.quantity === quantity);

function distanceWords(inputs: UsedInput[]): string {
  if (has(inputs, 'redshift'))
    return 'The redshift says how much the universe has stretched while the light was on its way; following the model’s expansion back over that stretch gives the distance.';
  if (has(inputs, 'parallax'))
    return 'The parallax is the small shift in the object’s position as the Earth goes round the Sun; one divided by the parallax gives the distance (a shift of one arcsecond means 3.26 light-years).';
  return 'The measured distance is used as it stands.';
}

/** The formula of each template in words (English); templates not listed fall back to the working's step titles. */
const METHOD: Record<string, (inputs: UsedInput[]) => string> = {
  'distance-today': (inputs) => `${distanceWords(inputs)} It is then given in light-years.`,
  'light-travel': (inputs) =>
    has(inputs, 'redshift')
      ? 'The redshift says how much the universe has stretched while the light travelled. Adding up, along the way, how fast the universe was growing gives how long the light has been travelling; the age of the universe then is its age today less that time.'
      : `${distanceWords(inputs)} Light crosses one light-year in one year, so the travel time in years is the distance in light-years.`,
  'luminosity-sun': (inputs) =>
    `How bright the object looks in one band of light, corrected for dust along the way where that has been measured, and its distance give how much light it really gives out in that band. That is compared with the Sun’s output in the same band. ${distanceWords(inputs)}`,
  'brightness-at-10pc': (inputs) =>
    `How bright the object looks, corrected for dust along the way where that has been measured, and its distance give how bright it would look from a standard 10 parsecs (32.6 light-years); that is compared with how bright the Sun looks from the Earth. ${distanceWords(inputs)}`,
  'naked-eye': () =>
    'How bright the object looks (its apparent magnitude) is compared with the faintest stars the unaided eye can see on a dark night, about magnitude 6. Each step of one magnitude is about 2.5 times fainter.',
  'scale-model': (inputs) =>
    `${distanceWords(inputs)} The distance is then shrunk by the same factor that shrinks the Sun to a bead 1 cm across.`,
  'distance-today-phrase': (inputs) => METHOD['distance-today']!(inputs),
  'light-travel-phrase': (inputs) => METHOD['light-travel']!(inputs),
  'light-set-out-timeline': (inputs) =>
    `${METHOD['light-travel']!(inputs)} That time is set beside Earth’s history from our timeline of dated events, each with its published source; an event is named only when its date, with its uncertainty, fits the light’s travel time.`,
  'planet-light-tonight': () =>
    'The planet’s distance from the Earth tonight is worked out from the planets’ orbits (Meeus’s methods with the VSOP87 theory), for the time given in the note; that distance divided by the speed of light is the time its light takes to reach us.',
};

/**
 * A statement's working retold for visitors: the measurements with their sources (and links),
 * the model in words, the formula in words, every other source the working names, and when it was
 * last checked. Every source of the staff working appears, without its measurement id.
 * @param input the statement's stored inputs, working, model and check date
 * @param locale the page's locale (number formats); the words are English for now (`lang` says so)
 */
export function publicEvidence(input: EvidenceInput, locale = 'en-GB'): PublicEvidence {
  const measurements = input.inputs.map((i) => {
    const quantity = findQuantity(i.quantity);
    const label = quantity?.label ?? i.quantity.replace(/_/g, ' ');
    return {
      what: i.band ? `${label} (${i.band} band)` : label,
      value: measuredValue(i, locale),
      source: { name: i.citation, url: input.sourceLinks.get(i.sourceId) ?? null },
    };
  });
  const citations = new Set(input.inputs.map((i) => i.citation));
  const usedFor = new Map<string, Set<string>>();
  for (const step of input.working)
    for (const v of [...step.inputs, ...step.constants]) {
      const name = publicSourceName(v.source);
      if (NOT_SOURCES.has(name) || citations.has(name)) continue;
      if (!usedFor.has(name)) usedFor.set(name, new Set());
      usedFor.get(name)!.add(shortNumbers(v.name));
    }
  const method =
    METHOD[input.templateId]?.(input.inputs) ??
    `Worked out in these steps: ${input.working.map((s) => s.title.toLowerCase()).join('; ')}.`;
  return {
    lang: 'en',
    measurements,
    model: input.model ? modelInWords(input.model, locale) : null,
    method,
    references: [...usedFor].map(([source, names]) => ({ source, usedFor: [...names] })),
    checkedAt: input.checkedAt,
  };
}
