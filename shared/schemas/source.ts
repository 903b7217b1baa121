import { z } from 'zod';
import { CatalogueLimits } from '../validations.ts';

const optionalText = (max: number, label: string) =>
  z
    .string()
    .trim()
    .max(max, `${label} is at most ${max} characters`)
    .nullish()
    .transform((v) => (v ? v : null));

/** A source as entered: a citation, and any of bibcode, DOI, URL, catalogue name and retrieval date. */
export const SourceInputSchema = z.object({
  citation: z
    .string({ message: 'Enter the citation' })
    .trim()
    .min(3, 'Enter the citation (authors, year, journal or title)')
    .max(CatalogueLimits.citationMax, `Citations are at most ${CatalogueLimits.citationMax} characters`),
  bibcode: z
    .string()
    .trim()
    .nullish()
    .transform((v) => (v ? v : null))
    .refine(
      (v) => v === null || /^\d{4}[A-Za-z0-9&.]{14}[A-Z.]$/.test(v),
      'A bibcode has 19 characters, e.g. 2018ApJS..236...47W',
    ),
  doi: optionalText(CatalogueLimits.doiMax, 'A DOI')
    .transform((v) => (v ? v.replace(/^https?:\/\/(dx\.)?doi\.org\//i, '').replace(/^doi:\s*/i, '') : null))
    .refine(
      (v) => v === null || /^10\.\d{4,9}\/\S+$/.test(v),
      'A DOI starts with 10. and a slash, e.g. 10.1051/0004-6361/201833910',
    ),
  url: optionalText(CatalogueLimits.urlMax, 'A URL').refine(
    (v) => v === null || /^https?:\/\/[^\s]+$/i.test(v),
    'A URL starts with http:// or https://',
  ),
  catalogueName: optionalText(CatalogueLimits.catalogueNameMax, 'A catalogue name'),
  retrievedOn: z
    .string()
    .trim()
    .nullish()
    .transform((v) => (v ? v : null))
    .refine((v) => v === null || (/^\d{4}-\d{2}-\d{2}$/.test(v) && !Number.isNaN(Date.parse(v))), 'Write the date as YYYY-MM-DD'),
  notes: z.string().trim().max(CatalogueLimits.notesMax).default(''),
});
export type SourceInput = z.input<typeof SourceInputSchema>;
export type SourceValues = z.output<typeof SourceInputSchema>;

/** A source as the API shows it. */
export interface SourceDto {
  id: string;
  citation: string;
  bibcode: string | null;
  doi: string | null;
  url: string | null;
  catalogueName: string | null;
  retrievedOn: string | null;
  notes: string;
  measurementCount: number;
  createdAt: string;
  can: { update: boolean };
}

/** The short form of a source shown beside a measurement. */
export interface SourceRefDto {
  id: string;
  citation: string;
  bibcode: string | null;
  doi: string | null;
  url: string | null;
}
