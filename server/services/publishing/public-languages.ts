/** One published version of a page, as negotiation needs it. */
export interface VersionChoice {
  id: string;
  locale: string;
}

const languageOf = (tag: string) => tag.toLowerCase().split('-')[0]!;

/** The version in exactly this locale, else the first in the same language (the default first). */
function match(versions: VersionChoice[], range: string): VersionChoice | undefined {
  const wanted = range.toLowerCase();
  return (
    versions.find((v) => v.locale.toLowerCase() === wanted) ?? versions.find((v) => languageOf(v.locale) === languageOf(wanted))
  );
}

/**
 * Which language version a reader gets. `?lang=` first (a locale, or a bare language such as `fr`);
 * then the reader's `Accept-Language` ranges, best q-value first (ranked by the caller with
 * negotiator, so `q=0` ranges are already gone): each range takes the version in exactly that
 * locale, else one in the same language (`fr-CA` reads the `fr-FR` version; `*` the default). With
 * neither, the version the address names. When nothing the reader asked for is there, the page's
 * default version.
 * @param versions the published versions, the default first
 * @param named the version the address names
 * @param lang the `?lang=` value, already checked against the registry
 * @param ranked the Accept-Language ranges in order of preference, or null when the header is absent
 */
export function chooseVersion(
  versions: VersionChoice[],
  named: VersionChoice,
  lang: string | undefined,
  ranked: string[] | null,
): VersionChoice {
  const fallback = versions[0] ?? named;
  if (lang) return match(versions, lang) ?? fallback;
  if (!ranked) return named;
  for (const range of ranked) {
    if (range === '*') return fallback;
    const found = match(versions, range);
    if (found) return found;
  }
  return fallback;
}
