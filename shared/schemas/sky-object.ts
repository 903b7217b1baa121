import { z } from 'zod';
import { parseDeclination, parseRightAscension } from '../catalogue/coordinates.ts';
import { MOVING_KINDS, SKY_OBJECT_KINDS } from '../catalogue/kinds.ts';
import { QUANTITY_IDS } from '../catalogue/quantities.ts';
import { CatalogueLimits } from '../validations.ts';
import { SentenceNamesSchema, type SentenceNames } from '../statements/names.ts';

export const SkyObjectKindSchema = z.enum(SKY_OBJECT_KINDS, { message: `Kind must be one of ${SKY_OBJECT_KINDS.join(', ')}` });

/** Designations arrive as a list (API) or as text with one per line or comma (form). */
function splitDesignations(value: unknown): unknown {
  if (value === undefined || value === null) return [];
  if (typeof value !== 'string') return value;
  return value
    .split(/[\n,;]/)
    .map((d) => d.trim())
    .filter(Boolean);
}

const coordinate = z.union([z.string(), z.number()]).nullish();

/**
 * An object as entered. Right ascension and declination are read from degrees or sexagesimal
 * text; solar-system bodies (planet, moon, sun) have no fixed position and every other kind needs one.
 */
export const SkyObjectInputSchema = z
  .object({
    name: z
      .string({ message: 'Enter a name' })
      .trim()
      .min(1, 'Enter a name')
      .max(CatalogueLimits.objectNameMax, `Names are at most ${CatalogueLimits.objectNameMax} characters`),
    designations: z.preprocess(
      splitDesignations,
      z
        .array(
          z
            .string()
            .trim()
            .min(1)
            .max(CatalogueLimits.designationMax, `Each designation is at most ${CatalogueLimits.designationMax} characters`),
        )
        .max(CatalogueLimits.designationsMax, `At most ${CatalogueLimits.designationsMax} designations`),
    ),
    kind: SkyObjectKindSchema,
    ra: coordinate,
    dec: coordinate,
    notes: z
      .string()
      .trim()
      .max(CatalogueLimits.notesMax, `Notes are at most ${CatalogueLimits.notesMax} characters`)
      .default(''),
    /** The name as sentences use it, per language; left out → none (the name as listed). */
    sentenceNames: SentenceNamesSchema.optional(),
  })
  .transform((input, ctx) => {
    const blank = (v: unknown) => v === undefined || v === null || (typeof v === 'string' && v.trim() === '');
    const designations = [...new Set(input.designations)].filter((d) => d.toLowerCase() !== input.name.toLowerCase());
    // Left out → kept as stored (an edit from a form or import that does not carry them changes nothing).
    const base = {
      name: input.name,
      designations,
      kind: input.kind,
      notes: input.notes,
      ...(input.sentenceNames ? { sentenceNames: input.sentenceNames } : {}),
    };
    if (MOVING_KINDS.includes(input.kind)) {
      if (!blank(input.ra) || !blank(input.dec)) {
        ctx.addIssue({
          code: 'custom',
          path: ['ra'],
          message: 'Planets, moons and the Sun move across the sky: leave the position empty.',
        });
        return z.NEVER;
      }
      return { ...base, raDeg: null, decDeg: null };
    }
    const ra = blank(input.ra)
      ? ({ ok: false, message: 'Enter a right ascension (J2000).' } as const)
      : parseRightAscension(input.ra!);
    const dec = blank(input.dec)
      ? ({ ok: false, message: 'Enter a declination (J2000).' } as const)
      : parseDeclination(input.dec!);
    if (!ra.ok) ctx.addIssue({ code: 'custom', path: ['ra'], message: ra.message });
    if (!dec.ok) ctx.addIssue({ code: 'custom', path: ['dec'], message: dec.message });
    if (!ra.ok || !dec.ok) return z.NEVER;
    return { ...base, raDeg: ra.deg, decDeg: dec.deg };
  });
export type SkyObjectInput = z.input<typeof SkyObjectInputSchema>;
export type SkyObjectValues = z.output<typeof SkyObjectInputSchema>;

/** What the object form holds before parsing (all text). */
export interface SkyObjectFormValues {
  name: string;
  designations: string;
  kind: (typeof SKY_OBJECT_KINDS)[number];
  ra: string;
  dec: string;
  notes: string;
  /** Sentence names: English and French text with their "plural" boxes. */
  sentenceEn: string;
  sentenceEnPlural: boolean;
  sentenceFr: string;
  sentenceFrPlural: boolean;
}

export const SKY_OBJECT_SORTS = ['name', 'kind', 'constellation', 'ra', 'dec', 'updated'] as const;
export const MISSING_FILTERS = ['any_preferred', 'position', 'source', ...QUANTITY_IDS] as const;

/** The catalogue table's query: filters, sort and a page. */
export const SkyObjectListQuerySchema = z.object({
  q: z.string().trim().max(120).optional(),
  kind: SkyObjectKindSchema.optional(),
  missing: z.enum(MISSING_FILTERS, { message: `Missing must be one of ${MISSING_FILTERS.join(', ')}` }).optional(),
  sort: z.enum(SKY_OBJECT_SORTS, { message: `Sort by one of ${SKY_OBJECT_SORTS.join(', ')}` }).default('name'),
  dir: z.enum(['asc', 'desc'], { message: 'Direction is asc or desc' }).default('asc'),
  page: z.coerce
    .number({ message: 'Page must be a number' })
    .int('Page must be a whole number')
    .min(1, 'Pages start at 1')
    .default(1),
  pageSize: z.coerce
    .number({ message: 'Page size must be a number' })
    .int()
    .min(1)
    .max(CatalogueLimits.pageSizeMax, `At most ${CatalogueLimits.pageSizeMax} rows a page`)
    .default(50),
  /** Keyset cursor from the previous page's `nextAfter` (name and kind sorts): deep pages without OFFSET. */
  after: z
    .string()
    .max(600, 'after: not a page cursor')
    .regex(/^[A-Za-z0-9_-]+$/, 'after: not a page cursor')
    .optional(),
});
export type SkyObjectListQuery = z.output<typeof SkyObjectListQuerySchema>;

/** One row of the catalogue table. */
export interface SkyObjectRowDto {
  id: string;
  name: string;
  designations: string[];
  kind: (typeof SKY_OBJECT_KINDS)[number];
  raDeg: number | null;
  decDeg: number | null;
  constellation: string | null;
  measurementCount: number;
  preferredCount: number;
  proposedCount: number;
  updatedAt: string;
}

/** A page of the catalogue table. */
export interface SkyObjectPageDto {
  rows: SkyObjectRowDto[];
  /** Exact when `totalExact`; otherwise the planner's estimate ("about N"), never below the exact-count cap. */
  total: number;
  totalExact: boolean;
  page: number;
  pageSize: number;
  /** Pass as `after` (with page + 1) to fetch the next page by keyset; null when the sort has no keyset or this is the last page. */
  nextAfter: string | null;
}

/** An object with what the viewer may do to it. */
export interface SkyObjectDto extends Omit<SkyObjectRowDto, 'measurementCount' | 'preferredCount' | 'proposedCount'> {
  notes: string;
  /** The name as sentences use it, per language ({} → the name as listed). */
  sentenceNames: SentenceNames;
  createdAt: string;
  can: { update: boolean; addMeasurement: boolean; proposeMeasurement: boolean; delete: boolean };
}
