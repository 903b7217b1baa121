/** Where a visitor or a reviewer can read a source. */
export interface SourceLinkFields {
  doi: string | null;
  bibcode: string | null;
  url: string | null;
}

/** A link for a source: DOI first, then the ADS record for a bibcode, then its URL; null when none is known. */
export function sourceHref(source: SourceLinkFields): string | null {
  if (source.doi) return `https://doi.org/${source.doi}`;
  if (source.bibcode) return `https://ui.adsabs.harvard.edu/abs/${encodeURIComponent(source.bibcode)}`;
  return source.url;
}
