/** A date on the timeline in words for staff: "2.55 million years ago", "4,567.3 million years ago". */
export function yearsAgoInWords(years: number): string {
  const n = (v: number) => new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 6 }).format(v);
  if (years >= 1e9) return `${n(years / 1e9)} billion years`;
  if (years >= 1e6) return `${n(years / 1e6)} million years`;
  if (years >= 1e4) return `${n(years / 1e3)} thousand years`;
  return `${n(years)} years`;
}
