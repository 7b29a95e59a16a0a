/** `/api/studios/:slug/…` with every part escaped. */
export function studioApi(slug: string, ...parts: string[]): string {
  return ['/api/studios', slug, ...parts]
    .map((p, i) => (i === 0 ? p : encodeURIComponent(p)))
    .join('/');
}

/** Lists that grow come in pages: `?limit&offset`. */
export type PageAt = { limit: number; offset: number };
export const firstPage: PageAt = { limit: 25, offset: 0 };
/** Pickers in a form want everything at once; the server caps a page at 100. */
export const pickerPage: PageAt = { limit: 100, offset: 0 };

export const withPage = (path: string, page: PageAt) =>
  `${path}?limit=${page.limit}&offset=${page.offset}`;
