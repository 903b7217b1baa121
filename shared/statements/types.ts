import type { CalcModel, ResolvedModel } from '../schemas/calc.ts';
import type { H0Range } from '../schemas/settings.ts';
import type { Step } from '../engine/working.ts';
import type { SkyObjectKind } from '../catalogue/kinds.ts';
import type { LocalisedText } from './locales.ts';
import type { SentenceNames } from './names.ts';
import type { TimelineEntry } from './timeline.ts';

/** An organisation's default spectral index for one kind of object, used only as a stated assumption. */
export interface SpectralIndexDefault {
  /** α in f_ν ∝ ν^α. */
  value: number;
  /** Its 1σ spread, if the source gives one (it then widens the statement's interval). */
  sigma: number | null;
  /** Where the value comes from (paper, handbook), shown in the working. */
  source: string;
}

/** Defaults the organisation has chosen to stand in for missing measurements, each with its source. */
export interface StatementAssumptions {
  /** A spectral index per object kind, for the K-correction when the object has no measured one. */
  spectralIndex?: Partial<Record<SkyObjectKind, SpectralIndexDefault>>;
}

/** A preferred measurement as a statement uses it (values in the catalogue's canonical units). */
export interface StatementMeasurement {
  id: string;
  quantity: string;
  value: number;
  unit: string;
  band: string | null;
  sigma?: number | null;
  minus?: number | null;
  plus?: number | null;
  source: { id: string; citation: string };
}

/** The venue a statement is for: the place whose night it describes. */
export interface StatementVenue {
  id: string;
  name: string;
  /** Degrees, north positive. */
  latitude: number;
  /** Degrees, east positive. */
  longitude: number;
  elevationM: number;
  /** IANA time zone. */
  timeZone: string;
}

/** A venue's night as the sky computation gave it (the server passes the numbers in). */
export interface StatementNight {
  /** The evening's date "YYYY-MM-DD" at the venue. */
  localDate: string;
  /** The instant the distances are for, and how it was chosen (e.g. the end of nautical twilight). */
  observation: { utc: string; localTime: string | null; basis: string };
  /** Each planet's distance from the Earth's centre at that instant, light-time corrected. */
  planets: Array<{ id: string; distanceAu: number }>;
  /** The ephemeris, as the sky computation names it. */
  ephemeris: string;
  /** The version of the sky rules the night was computed by. */
  skyVersion: number;
}

/** Everything a template may read. */
export interface TemplateContext {
  object: {
    id: string;
    name: string;
    kind: string;
    designations?: string[];
    /** The name as a sentence uses it, per language (article, number); absent → the catalogue name. */
    sentenceNames?: SentenceNames | null;
  };
  measurements: StatementMeasurement[];
  model: CalcModel;
  /** The organisation's H0 range with its source (null or absent: the default range). */
  h0Range?: H0Range | null;
  /** The organisation's preferred band for magnitudes (e.g. V). */
  band: string;
  /** For statements tied to a venue: the venue and its night (absent or null otherwise). */
  venue?: StatementVenue | null;
  night?: StatementNight | null;
  /** The organisation's stated defaults for missing measurements (absent: none). */
  assumptions?: StatementAssumptions | null;
  /** Earth's timeline, edited by admins, for comparing a light-travel time (absent: none). */
  timeline?: readonly TimelineEntry[] | null;
}

/**
 * What a statement that follows tonight was computed for. Reviewers sign off the method; a new
 * night alone moves only `localDate`, `observationUtc` and the number.
 */
export interface NightBasis {
  venueId: string;
  localDate: string;
  observationUtc: string;
  /** Everything but the night: a change here goes through the normal "changed" review. */
  method: {
    planet: string;
    venue: { latitude: number; longitude: number; elevationM: number; timeZone: string };
    ephemeris: string;
    skyVersion: number;
    constants: { auM: number; cKmS: number };
    /** The sentence around the number, per locale (the number replaced by "…"). */
    wording: LocalisedText;
  };
}

/** An input a statement used, stored so a change can be detected and shown. */
export interface UsedInput {
  measurementId: string;
  quantity: string;
  band: string | null;
  value: number;
  unit: string;
  sigma?: number | null;
  minus?: number | null;
  plus?: number | null;
  sourceId: string;
  citation: string;
}

/** A rendered statement. */
export interface TemplateSuccess {
  ok: true;
  /** The headline number and its unit (what the words round). */
  value: number;
  unit: string;
  interval: { low: number; high: number } | null;
  significantFigures: number;
  texts: LocalisedText;
  /** The number as a phrase for inside a sentence, when the template has one (its phrase form shows it). */
  phrases?: LocalisedText;
  /** Small print: which cosmology, which band. Null when nothing needs saying. */
  footnotes: LocalisedText | null;
  working: Step[];
  warnings: string[];
  inputs: UsedInput[];
  model: ResolvedModel | null;
  /** Set by templates that follow tonight: the venue, night and method it was computed for. */
  night?: NightBasis;
}

/**
 * A NightBasis as a statement stores it, with the method last accepted (by a reviewer, or by the
 * first computation): a new night follows only while its method is that one.
 */
export interface StoredNight extends NightBasis {
  /** Null until a wording computed by some method has been accepted. */
  acceptedMethod: NightBasis['method'] | null;
}

/** A statement that cannot be rendered, and why, in words. */
export interface TemplateFailure {
  ok: false;
  code: 'missing_input' | 'calculation_failed' | 'not_applicable';
  reason: string;
  missing?: string[];
}

export type TemplateOutcome = TemplateSuccess | TemplateFailure;

/** A statement template: one sentence pattern, the data it needs, and how to compute it. */
export interface StatementTemplate {
  id: string;
  title: string;
  /** What it needs, in words, for the picker. */
  needs: string;
  /** The object kinds it is valid for; the picker offers it only for these, the server refuses the rest. */
  kinds: readonly SkyObjectKind[];
  /** Why the other kinds are refused, in words for a writer (follows "not for <kind>: "). */
  kindsReason: string;
  /** True when the template uses the organisation's cosmology (so a model change can move it). */
  usesCosmology: boolean;
  /** True when the statement is about one venue's sky: creating it needs a venue. */
  needsVenue?: boolean;
  /**
   * True when the number changes with the night: a recompute for a new night keeps the statement
   * current and its accepted wording follows, as long as the method (venue position, constants,
   * ephemeris, sentence) is the one last accepted.
   */
  followsTonight?: boolean;
  /** True when the statement reads the timeline: a timeline edit recomputes its statements. */
  usesTimeline?: boolean;
  /** For a phrase form: the id of the sentence template it shortens. */
  phraseOf?: string;
  /** For a sentence template with a phrase form: that form's id. */
  phraseId?: string;
  evaluate(ctx: TemplateContext): TemplateOutcome;
}
