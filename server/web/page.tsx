/**
 * Page rendering: one URL gives the whole page, or only its main region for an htmx request
 * (HX-Request without HX-Boosted); `Vary: HX-Request` says so to caches. Pages are never cached
 * (they carry the CSRF token). Validation failures answer 422 without changing the browser history.
 */
import type { Context } from 'hono';
import { raw } from 'hono/html';
import type { Child } from 'hono/jsx';
import type { UnitSystem } from '../../core/index.js';
import { Layout, MainRegion } from '../../templates/layout.js';
import { ViewContext, type View } from '../../templates/view.js';
import type { AppEnv } from './env.js';

export function isHtmx(c: Context): boolean {
  return c.req.header('hx-request') === 'true' && c.req.header('hx-boosted') !== 'true';
}

/** The view context of this request; `units` overrides the user's choice (a study's own units). */
export function viewOf(c: Context<AppEnv>, units?: UnitSystem): View {
  const q = c.req.query('units');
  const fromQuery = q === 'si' || q === 'us' ? q : undefined;
  return {
    csrf: c.var.csrf,
    userUnits: c.var.userUnits,
    units: fromQuery ?? units ?? c.var.userUnits,
    path: c.req.path,
    signedIn: c.var.signedIn,
  };
}

export interface PageOptions {
  readonly title: string;
  readonly status?: 200 | 400 | 401 | 404 | 409 | 413 | 422 | 429 | 500 | 501 | 503;
  /** Unit system of the page (a study's); default the user's. */
  readonly units?: UnitSystem;
}

function headers(c: Context, status: number): void {
  c.header('Vary', 'HX-Request', { append: true });
  c.header('Cache-Control', 'no-store');
  if (status === 422 && isHtmx(c)) c.header('HX-Push-Url', 'false');
}

/** Renders a page (or its main region for htmx). `body` is a function so it renders inside the view context. */
export function page(c: Context<AppEnv>, opts: PageOptions, body: () => Child): Response {
  const status = opts.status ?? 200;
  headers(c, status);
  const view = viewOf(c, opts.units);
  const html = isHtmx(c) ? (
    <ViewContext.Provider value={view}>
      <MainRegion title={opts.title} withTitle>{body()}</MainRegion>
    </ViewContext.Provider>
  ) : (
    <>
      {raw('<!doctype html>')}
      <ViewContext.Provider value={view}>
        <Layout title={opts.title}>{body()}</Layout>
      </ViewContext.Provider>
    </>
  );
  return c.html(html.toString(), status);
}

const SLOT = '\u0000runwright-cached-content\u0000';

/**
 * Renders a page whose main content is already rendered and encoded (UTF-8 bytes shared between
 * requests, with no per-user data inside): the layout around it is rendered for this request and the
 * bytes are joined without re-encoding the content.
 */
export function pageWithContent(c: Context<AppEnv>, opts: PageOptions, content: Uint8Array): Response {
  const status = opts.status ?? 200;
  headers(c, status);
  const view = viewOf(c, opts.units);
  const shell = (isHtmx(c) ? (
    <ViewContext.Provider value={view}>
      <MainRegion title={opts.title} withTitle>{raw(SLOT)}</MainRegion>
    </ViewContext.Provider>
  ) : (
    <>
      {raw('<!doctype html>')}
      <ViewContext.Provider value={view}>
        <Layout title={opts.title}>{raw(SLOT)}</Layout>
      </ViewContext.Provider>
    </>
  )).toString();
  const at = shell.indexOf(SLOT);
  const body = Buffer.concat([Buffer.from(shell.slice(0, at), 'utf8'), content, Buffer.from(shell.slice(at + SLOT.length), 'utf8')]);
  c.header('Content-Type', 'text/html; charset=UTF-8');
  return c.body(body, status);
}

/** Renders a fragment (a panel) in the view context, for htmx requests that target that panel. */
export function fragment(c: Context<AppEnv>, opts: { status?: 200 | 400 | 422; units?: UnitSystem }, body: () => Child): Response {
  const status = opts.status ?? 200;
  headers(c, status);
  const html = <ViewContext.Provider value={viewOf(c, opts.units)}>{body()}</ViewContext.Provider>;
  return c.html(html.toString(), status);
}

/** 303 See Other to a GET (after a save or delete). */
export function seeOther(c: Context, location: string): Response {
  c.header('Vary', 'HX-Request', { append: true });
  return c.redirect(location, 303);
}

/** Control characters, format characters (zero-width, bidi) and whitespace of any kind. */
const UNSAFE_CHAR = /[\p{Cc}\p{Cf}\p{Z}\s]/u;
const BACK_BASE = 'http://host.invalid';
const MAX_BACK_LENGTH = 2048;

/** The character rules for a local path: starts with one `/`, no `\`, no control or space character. */
function localPathShape(p: string): boolean {
  return p.startsWith('/') && p[1] !== '/' && !p.includes('\\') && !UNSAFE_CHAR.test(p);
}

/**
 * A same-site path to go back to (`back`, `next`), or `fallback`. Browsers follow the WHATWG URL
 * parser, which drops tabs and newlines anywhere, trims control characters and spaces and reads `\` as
 * `/`, so `/\t/evil.example` would be `//evil.example`, another site. Accepted: a path that starts with
 * exactly one `/`, holds no backslash, control, format or space character, is not protocol-relative or
 * backslash-relative once percent-decoded (`/%2F%2Fevil`, `/%09/evil`), and that resolves against a
 * placeholder origin to the same origin and to exactly itself (no dot segments, no characters the
 * parser would rewrite). Anything else, or a path longer than 2,048 characters, gives the fallback.
 */
export function safeBack(path: string | undefined, fallback: string): string {
  if (path === undefined || path.length > MAX_BACK_LENGTH || !localPathShape(path)) return fallback;
  const cut = path.search(/[?#]/);
  const pathname = cut < 0 ? path : path.slice(0, cut);
  let decoded: string;
  try {
    decoded = decodeURIComponent(pathname);
  } catch {
    return fallback;
  }
  if (!localPathShape(decoded)) return fallback;
  let resolved: URL;
  try {
    resolved = new URL(path, BACK_BASE);
  } catch {
    return fallback;
  }
  const again = resolved.pathname + resolved.search + resolved.hash;
  if (resolved.origin !== BACK_BASE || again !== path) return fallback;
  return again;
}
