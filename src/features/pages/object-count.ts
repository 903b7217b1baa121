/** Counts with thousands separators, as the rest of the desk writes them. */
const COUNT = new Intl.NumberFormat('en-GB');

/** What the object picker says about its list: how many are shown of how many match (or exist). */
export function objectCountText(shown: number, total: number, totalExact: boolean, q: string): string {
  const n = (x: number) => `${totalExact ? '' : 'about '}${COUNT.format(x)}`;
  const typed = q.trim();
  if (!typed) {
    if (total === 0) return 'The catalogue has no objects yet.';
    return shown < total
      ? `${shown} of ${n(total)} objects shown — type to search`
      : `All ${n(total)} object${total === 1 ? '' : 's'} shown`;
  }
  if (total === 0) return `No object matches “${typed}”.`;
  return shown < total
    ? `${shown} of ${n(total)} matching objects shown — keep typing to narrow the list`
    : `${n(total)} object${total === 1 ? ' matches' : 's match'} “${typed}”`;
}
