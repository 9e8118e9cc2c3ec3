/**
 * Keyset paging for lists that grow without bound (a sac's care log, a project's ledger): a page
 * starts strictly after the last item of the one before, named by an opaque cursor, so a page costs
 * the same however far back it is and an item added meanwhile neither repeats nor shifts a page.
 */
export interface KeysetPage<T> {
  items: T[];
  /** Pass as `after` for the next page; null when this page is the last. */
  nextCursor: string | null;
}

export interface KeysetQuery {
  /** The `nextCursor` of the page before. */
  after?: string;
  /** Page size, 1 to `KEYSET_MAX_LIMIT`. */
  limit?: number;
}

export const KEYSET_DEFAULT_LIMIT = 100;
export const KEYSET_MAX_LIMIT = 200;
