/**
 * Words that make a page about looking at the Sun. Pages that use them must carry the eye-safety
 * notice: eclipses, solar observing, filters, sunspots, transits across the Sun.
 */
const SOLAR_TOPICS = [
  /\beclipses?\b/i,
  /\bsolar\s+(observ\w*|view\w*|filters?|telescopes?|projection|glasses|eclipses?)\b/i,
  /\b(observ\w*|look\w*|view\w*|watch\w*|gaz\w*)\s+(directly\s+)?(at\s+)?the\s+sun\b/i,
  /\bsunspots?\b/i,
  /\btransits?\s+(of|across)\s+the\s+sun\b/i,
  /\bpartial\s+phase\b/i,
  /\béclipses?\b/i,
  /\bobserv\w*\s+(du\s+)?soleil\b/i,
];

/** Why a page needs the eye-safety notice, or null when it does not. */
export function eyeSafetyReason(objectKind: string | null | undefined, plainText: string): string | null {
  if (objectKind === 'sun') return 'This page is about the Sun';
  const hit = SOLAR_TOPICS.map((re) => re.exec(plainText)).find(Boolean);
  return hit ? `This page mentions “${hit[0]}”` : null;
}
