/**
 * Page layout: header with navigation and the units switch, the caution banner, the busy indicator and
 * the pinned htmx script. One URL gives the whole page (Layout) or, for an htmx request, only the main
 * region (MainRegion), which carries its own <title> so that htmx updates the document title.
 */
import type { Child } from 'hono/jsx';
import { CAUTION_TEXT, CAUTION_TITLE } from '../core/index.js';
import { IDS } from './ids.js';
import { CSRF_FIELD, CSRF_HEADER, useView } from './view.js';
import { UNIT_SYSTEM_LABELS } from './format.js';

/**
 * htmx 2 configuration: swap 422 (validation) responses like 2xx ones; never swap other errors; no
 * inline indicator styles and no settling of `style` attributes (the stylesheet has the styles, and
 * the content security policy forbids inline styles); no eval.
 */
export const HTMX_CONFIG = JSON.stringify({
  responseHandling: [
    { code: '204', swap: false },
    { code: '[23]..', swap: true },
    { code: '422', swap: true },
    { code: '[45]..', swap: false, error: true },
  ],
  includeIndicatorStyles: false,
  attributesToSettle: ['class', 'width', 'height'],
  allowEval: false,
  allowScriptTags: false,
  historyCacheSize: 0,
  refreshOnHistoryMiss: true,
});

export function Caution() {
  return (
    <aside class="caution" role="note" aria-label={CAUTION_TITLE}>
      <strong>{CAUTION_TITLE}.</strong> {CAUTION_TEXT}
    </aside>
  );
}

/** Hidden CSRF field for a form (value from the view context). */
export function CsrfInput() {
  return <input type="hidden" name={CSRF_FIELD} value={useView().csrf} />;
}

const NAV: readonly { href: string; label: string }[] = [
  { href: '/aircraft', label: 'Aircraft' },
  { href: '/sites', label: 'Sites' },
  { href: '/studies', label: 'Studies' },
];

function UnitsSwitch() {
  const v = useView();
  return (
    <form class="units-switch" method="post" action="/preferences/units">
      <CsrfInput />
      <input type="hidden" name="back" value={v.path} />
      <label for="units-switch">Units</label>
      <select id="units-switch" name="units">
        {(['si', 'us'] as const).map((u) => (
          <option value={u} selected={v.userUnits === u}>{UNIT_SYSTEM_LABELS[u]}</option>
        ))}
      </select>
      <button type="submit">Set</button>
    </form>
  );
}

/** The main region: what an htmx navigation or form swaps. The caution is part of it on every page. */
export function MainRegion(props: { title: string; children?: Child; withTitle?: boolean }) {
  return (
    <>
      {props.withTitle ? <title>{`${props.title} · Runwright`}</title> : null}
      <main id={IDS.main} tabindex={-1}>
        <Caution />
        {props.children}
      </main>
    </>
  );
}

export function Layout(props: { title: string; children?: Child }) {
  const v = useView();
  const current = NAV.find((n) => v.path === n.href || v.path.startsWith(`${n.href}/`))?.href;
  return (
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="htmx-config" content={HTMX_CONFIG} />
        <title>{`${props.title} · Runwright`}</title>
        <link rel="stylesheet" href="/static/style.css" />
        <script src="/static/htmx.min.js" defer></script>
      </head>
      <body hx-headers={JSON.stringify({ [CSRF_HEADER]: v.csrf })} hx-indicator={`#${IDS.busy}`}>
        <a class="skip" href={`#${IDS.main}`}>Skip to content</a>
        <header class="top">
          <a class="brand" href="/">Runwright</a>
          <nav aria-label="Main">
            {NAV.map((n) => (
              <a href={n.href} aria-current={current === n.href ? 'page' : undefined}>{n.label}</a>
            ))}
          </nav>
          <UnitsSwitch />
          {v.signedIn ? (
            <form method="post" action="/logout" class="signout">
              <CsrfInput />
              <button type="submit">Sign out</button>
            </form>
          ) : null}
        </header>
        <div id={IDS.busy} class="busy htmx-indicator" role="status" aria-live="polite">
          <span class="spinner" aria-hidden="true"></span> Working…
        </div>
        <MainRegion title={props.title}>{props.children}</MainRegion>
        <footer class="foot">
          <p>Runwright: preliminary runway length requirements for airport planning studies.</p>
        </footer>
      </body>
    </html>
  );
}
