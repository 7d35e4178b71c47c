/** Where a page sits in its list, as every list route answers it beside its rows. */
export interface PageOf {
  total: number;
  page: number;
  pageSize: number;
}

/** The rows a page shows, 1-based (0–0 when the list is empty), and how many pages the list has. */
export function pageRange({ total, page, pageSize }: PageOf, shown: number): { first: number; last: number; pages: number } {
  const first = shown === 0 ? 0 : (page - 1) * pageSize + 1;
  return { first, last: shown === 0 ? 0 : first + shown - 1, pages: Math.max(1, Math.ceil(total / pageSize)) };
}

/** A page's search parameters with one value each: a repeated parameter counts by its first value. */
export function firstValues(params: Record<string, string | string[] | undefined>): Record<string, string | undefined> {
  return Object.fromEntries(Object.entries(params).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
}

/** The address of another page of a list, keeping its filters; page 1 is left out of the address. */
export function pageHref(path: string, filters: Record<string, string | number | undefined>, page: number): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters))
    if (value !== undefined && value !== '' && key !== 'page' && key !== 'pageSize') params.set(key, String(value));
  if (page > 1) params.set('page', String(page));
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

/** "101–200 of 10000 bins", or what an empty list says. */
export function rangeText(at: PageOf, shown: number, noun: [one: string, many: string], empty: string): string {
  if (shown === 0) return empty;
  const { first, last } = pageRange(at, shown);
  return `${first}–${last} of ${at.total} ${at.total === 1 ? noun[0] : noun[1]}`;
}
