/** App factory: builds the Hono app over injected dependencies (no module-level state). */
import { Hono } from 'hono';
import { raw } from 'hono/html';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { Layout } from '../templates/layout.js';
import { CAUTION_TEXT } from '../core/caution.js';

export interface AppDeps {
  readonly clock: () => Date;
}

const require = createRequire(import.meta.url);
const HTMX = readFileSync(require.resolve('htmx.org/dist/htmx.min.js'), 'utf8');
const CSS = readFileSync(fileURLToPath(new URL('../static/style.css', import.meta.url)), 'utf8');

export function createApp(_deps: AppDeps): Hono {
  const app = new Hono();
  app.get('/static/htmx.min.js', (c) =>
    c.body(HTMX, 200, { 'content-type': 'text/javascript; charset=utf-8', 'cache-control': 'public, max-age=86400' }),
  );
  app.get('/static/style.css', (c) => c.body(CSS, 200, { 'content-type': 'text/css; charset=utf-8' }));
  app.get('/health', (c) => c.json({ ok: true, caution: CAUTION_TEXT }));
  app.get('/', (c) =>
    c.html(
      <>
        {raw('<!doctype html>')}
        <Layout title="Home">
          <h1>Runwright</h1>
          <p>Runway length requirements for airport planning studies.</p>
        </Layout>
      </>,
    ),
  );
  return app;
}
