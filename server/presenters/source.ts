import type { SourceDto, SourceRefDto } from '@shared/schemas/source.ts';
import type { Source, User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The API contract for a source. */
export function presentSource(source: Source, viewer: User, measurementCount: number): SourceDto {
  return {
    id: source.id,
    citation: source.citation,
    bibcode: source.bibcode,
    doi: source.doi,
    url: source.url,
    catalogueName: source.catalogueName,
    retrievedOn: source.retrievedOn,
    notes: source.notes,
    measurementCount,
    createdAt: source.createdAt.toISOString(),
    can: { update: can(viewer, 'catalogue', 'editSource') },
  };
}

/** The short form shown beside a measurement. */
export function presentSourceRef(source: Source): SourceRefDto {
  return { id: source.id, citation: source.citation, bibcode: source.bibcode, doi: source.doi, url: source.url };
}
