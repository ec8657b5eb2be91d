/**
 * Paging of long lists (the catalogue page, the JSON API): lists are read one bounded slice at a
 * time, so a catalogue of tens of thousands of rows never renders or serialises whole on the event
 * loop (docs/web.md, "Responsiveness").
 */

/** Rows per page of the catalogue page. */
export const LIST_PAGE_SIZE = 50;

/** Largest catalogue offered as a select in every fleet row; above it a row has a text field with suggestions. */
export const FLEET_SELECT_MAX = 200;

/** Suggestions a fleet row's aircraft field offers at a time (htmx refreshes them as the user types). */
export const FLEET_SUGGESTIONS = 100;

/** Rows per API list answer unless `limit` says otherwise, and the most `limit` may ask for. */
export const API_LIST_DEFAULT = 100;
export const API_LIST_MAX = 1000;

export interface PageChoice {
  /** The page shown, 1-based (clamped to the last page). */
  readonly page: number;
  /** Number of pages (at least 1, even for an empty list). */
  readonly pages: number;
  /** Rows skipped before this page. */
  readonly offset: number;
  /** Why the requested page was not shown as asked (a bad or out-of-range `page`), for a notice. */
  readonly problem?: string;
  /** True when the `page` value was not a page number at all (the answer is 400). */
  readonly invalid: boolean;
}

/** Number of pages of `total` rows. */
export function pageCount(total: number, size: number): number {
  return Math.max(1, Math.ceil(total / size));
}

/**
 * The page to show for a `page` query value: blank means 1; a whole number beyond the last page shows
 * the last page; anything else (text, 0, negative, fractions) shows page 1 with a message naming the
 * value and the allowed range.
 */
export function choosePage(raw: string | undefined, total: number, size: number = LIST_PAGE_SIZE): PageChoice {
  const pages = pageCount(total, size);
  const at = (page: number, extra: { problem?: string; invalid?: boolean } = {}): PageChoice => ({
    page, pages, offset: (page - 1) * size, invalid: extra.invalid ?? false, ...(extra.problem ? { problem: extra.problem } : {}),
  });
  if (raw === undefined || raw.trim() === '') return at(1);
  const range = pages === 1 ? 'the only page is 1' : `use a whole number from 1 to ${pages.toLocaleString('en-US')}`;
  if (!/^\d{1,12}$/.test(raw.trim()) || Number(raw) < 1) {
    return at(1, { problem: `page "${raw.slice(0, 40)}" is not a page number: ${range}. Showing page 1.`, invalid: true });
  }
  const n = Number(raw);
  if (n > pages) return at(pages, { problem: `page ${raw.trim()} is past the end: ${range}. Showing page ${pages.toLocaleString('en-US')}.` });
  return at(n);
}

export interface OffsetChoice {
  readonly limit: number;
  readonly offset: number;
}

/** API paging: `limit` 1..max (default `def`) and `offset` ≥ 0 (default 0); a bad value is a problem naming it. */
export function chooseOffset(
  q: { limit?: string | undefined; offset?: string | undefined }, def: number, max: number,
): { ok: true; value: OffsetChoice } | { ok: false; problems: string[] } {
  const problems: string[] = [];
  const whole = (raw: string | undefined, name: string, min: number, hi: number, fallback: number): number => {
    if (raw === undefined || raw === '') return fallback;
    if (!/^\d{1,15}$/.test(raw) || Number(raw) < min || Number(raw) > hi) {
      problems.push(`${name}: "${raw.slice(0, 40)}" is not allowed; use a whole number from ${min} to ${hi.toLocaleString('en-US')}`);
      return fallback;
    }
    return Number(raw);
  };
  const limit = whole(q.limit, 'limit', 1, max, def);
  const offset = whole(q.offset, 'offset', 0, Number.MAX_SAFE_INTEGER, 0);
  return problems.length > 0 ? { ok: false, problems } : { ok: true, value: { limit, offset } };
}

/** One page of an in-memory list of summaries (studies, sites) for a `page` query value. */
export function pageOfList<T>(all: readonly T[], raw: string | undefined, size: number = LIST_PAGE_SIZE): {
  rows: T[];
  paging: { page: number; pages: number; total: number; offset: number; problem?: string };
  status: 200 | 400;
} {
  const choice = choosePage(raw, all.length, size);
  return {
    rows: all.slice(choice.offset, choice.offset + size),
    paging: { page: choice.page, pages: choice.pages, total: all.length, offset: choice.offset, ...(choice.problem ? { problem: choice.problem } : {}) },
    status: choice.invalid ? 400 : 200,
  };
}
