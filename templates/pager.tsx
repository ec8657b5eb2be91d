/**
 * Page links of a long list: plain links (they work without JavaScript) that htmx turns into swaps of
 * the list's own region, pushed to the history. Shows first, previous, a window around the current
 * page, next and last.
 */
import { IDS } from './ids.js';

export interface PagerProps {
  /** Page shown, 1-based. */
  readonly page: number;
  readonly pages: number;
  /** URL of page n (with the list's other query parameters). */
  readonly href: (page: number) => string;
  /** Id of the region the links swap (htmx). */
  readonly target: string;
  /** Accessible name of the navigation, e.g. "Catalogue pages". */
  readonly label: string;
}

/** A page of a simple list (studies, sites): where it is, for the caption and the links. */
export interface ListPaging {
  readonly page: number;
  readonly pages: number;
  /** Rows in the whole list. */
  readonly total: number;
  /** Rows before this page. */
  readonly offset: number;
  /** Why the requested page was not shown as asked. */
  readonly problem?: string;
}

/** "12 studies" or "1,234 studies; 51–100 shown". */
export function listCaption(l: ListPaging, shown: number, one: string, many: string): string {
  const what = `${l.total.toLocaleString('en-US')} ${l.total === 1 ? one : many}`;
  return l.pages > 1 ? `${what}; ${(l.offset + 1).toLocaleString('en-US')}–${(l.offset + shown).toLocaleString('en-US')} shown` : what;
}

/** Page links of a list that is the whole main region (htmx swaps the region). */
export function ListPager(p: { paging: ListPaging; path: string; label: string }) {
  return <Pager page={p.paging.page} pages={p.paging.pages} href={(n) => (n > 1 ? `${p.path}?page=${n}` : p.path)} target={IDS.main} label={p.label} />;
}

/** Pages shown on each side of the current one. */
const WINDOW = 2;

export function Pager(p: PagerProps) {
  if (p.pages <= 1) return null;
  const link = (n: number, text: string, rel?: string, label?: string) => (
    <a href={p.href(n)} hx-get={p.href(n)} hx-target={`#${p.target}`} hx-swap="outerHTML" hx-push-url="true" rel={rel} aria-label={label}>{text}</a>
  );
  const shown: number[] = [];
  for (let n = Math.max(1, p.page - WINDOW); n <= Math.min(p.pages, p.page + WINDOW); n++) shown.push(n);
  return (
    <nav class="pager" aria-label={p.label}>
      {p.page > 1 ? link(1, '« First', undefined, 'First page') : <span class="muted">« First</span>}
      {p.page > 1 ? link(p.page - 1, '‹ Previous', 'prev', 'Previous page') : <span class="muted">‹ Previous</span>}
      {shown[0]! > 1 ? <span class="muted">…</span> : null}
      {shown.map((n) => (n === p.page ? <strong aria-current="page">{n.toLocaleString('en-US')}</strong> : link(n, n.toLocaleString('en-US'), undefined, `Page ${n}`)))}
      {shown[shown.length - 1]! < p.pages ? <span class="muted">…</span> : null}
      {p.page < p.pages ? link(p.page + 1, 'Next ›', 'next', 'Next page') : <span class="muted">Next ›</span>}
      {p.page < p.pages ? link(p.pages, 'Last »', undefined, `Last page (${p.pages.toLocaleString('en-US')})`) : <span class="muted">Last »</span>}
      <span class="muted">Page {p.page.toLocaleString('en-US')} of {p.pages.toLocaleString('en-US')}</span>
    </nav>
  );
}
