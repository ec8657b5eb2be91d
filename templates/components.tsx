/** Small shared pieces of page markup: forms that post to the main region, warnings, definition lists. */
import type { Child } from 'hono/jsx';
import { CsrfInput } from './layout.js';
import { IDS } from './ids.js';
import { useView } from './view.js';
import { say } from './format.js';
import type { Notice as CoreNotice } from '../core/index.js';

/** Hidden field naming the unit system the form's numbers were typed in. */
export const UNITS_FIELD = '_units';

/**
 * A form that works without JavaScript (real action and method) and, with htmx, posts to the same URL
 * and swaps the main region with the answer: the page with field errors (422) or, after the 303, the
 * page the save leads to (pushed to the history).
 */
export function PostForm(p: { action: string; children?: Child; id?: string; class?: string; multipart?: boolean; label?: string; scrollTo?: string }) {
  return (
    <form
      id={p.id}
      class={p.class}
      method="post"
      action={p.action}
      enctype={p.multipart ? 'multipart/form-data' : undefined}
      hx-post={p.action}
      hx-target={`#${IDS.main}`}
      hx-swap={`outerHTML show:${p.scrollTo ?? 'window'}:top`}
      hx-push-url="true"
      hx-encoding={p.multipart ? 'multipart/form-data' : undefined}
      aria-label={p.label}
      novalidate
    >
      <CsrfInput />
      <input type="hidden" name={UNITS_FIELD} value={useView().units} />
      {p.children}
    </form>
  );
}

/** A single-button post form (duplicate, compute, ...). */
export function ActionButton(p: { action: string; label: string; class?: string; fields?: Readonly<Record<string, string>> }) {
  return (
    <PostForm action={p.action} class="inline">
      {Object.entries(p.fields ?? {}).map(([k, v]) => <input type="hidden" name={k} value={v} />)}
      <button type="submit" class={p.class}>{p.label}</button>
    </PostForm>
  );
}

/** A list of warnings: plain text, or notices from core rendered in the page's units. */
export function Warnings(p: { items: readonly (string | CoreNotice)[]; title?: string }) {
  const { units } = useView();
  if (p.items.length === 0) return null;
  return (
    <div class="warnings" role="note">
      <h3>{p.title ?? 'Warnings'}</h3>
      <ul>{p.items.map((w) => <li>{say(w, units)}</li>)}</ul>
    </div>
  );
}

export function Notice(p: { children?: Child; kind?: 'ok' | 'info' | 'error' }) {
  return <p class={`notice notice-${p.kind ?? 'info'}`} role={p.kind === 'error' ? 'alert' : 'status'}>{p.children}</p>;
}

/** A two-column table of labelled values. */
export function Facts(p: { rows: readonly (readonly [string, Child])[]; caption?: string; class?: string }) {
  return (
    <table class={`facts${p.class ? ` ${p.class}` : ''}`}>
      {p.caption ? <caption>{p.caption}</caption> : null}
      <tbody>
        {p.rows.map(([k, v]) => (
          <tr><th scope="row">{k}</th><td>{v}</td></tr>
        ))}
      </tbody>
    </table>
  );
}

/** Problems of a rejected import, each with its line and column. */
export function ImportProblems(p: { what: string; problems: readonly string[] }) {
  if (p.problems.length === 0) return null;
  return (
    <div class="error-summary" role="alert">
      <h3>{p.what} was rejected; nothing was imported</h3>
      <ul>{p.problems.map((x) => <li>{x}</li>)}</ul>
    </div>
  );
}
