/** Page layout: header, navigation, the caution banner and the pinned htmx script. */
import type { Child } from 'hono/jsx';
import { CAUTION_TEXT, CAUTION_TITLE } from '../core/caution.js';

export const HTMX_CONFIG = JSON.stringify({
  responseHandling: [
    { code: '204', swap: false },
    { code: '[23]..', swap: true },
    { code: '422', swap: true },
    { code: '[45]..', swap: false, error: true },
  ],
});

export function Caution() {
  return (
    <aside class="caution" role="note" aria-label={CAUTION_TITLE}>
      <strong>{CAUTION_TITLE}.</strong> {CAUTION_TEXT}
    </aside>
  );
}

export function Layout(props: { title: string; children?: Child }) {
  return (
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="htmx-config" content={HTMX_CONFIG} />
        <title>{props.title} · Runwright</title>
        <link rel="stylesheet" href="/static/style.css" />
        <script src="/static/htmx.min.js" defer></script>
      </head>
      <body>
        <header class="top">
          <a class="brand" href="/">Runwright</a>
          <nav aria-label="Main">
            <a href="/">Home</a>
          </nav>
        </header>
        <main>
          <Caution />
          {props.children}
        </main>
      </body>
    </html>
  );
}
