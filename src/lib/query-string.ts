/**
 * URL search parameters from a plain object of filters: keys whose value is undefined, null or '' are
 * left out (an empty filter means "not filtered"), everything else is written with String().
 * @param params the filters, e.g. `{ q: 'm31', page: 2 }`
 */
export function searchParams(params: object): URLSearchParams {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') search.set(key, String(value));
  }
  return search;
}

/**
 * The same as a query string for an API path.
 * @param params the filters, e.g. `{ q: 'm31', page: 2 }`
 * @returns `?q=m31&page=2`, or '' when nothing is set
 */
export function queryString(params: object): string {
  const text = searchParams(params).toString();
  return text ? `?${text}` : '';
}
