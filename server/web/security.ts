/**
 * Request security: the optional access token, CSRF protection on unsafe methods, secure response
 * headers and request body limits. Documented in docs/web.md ("Security").
 *
 * - Access token (RUNWRIGHT_ACCESS_TOKEN): when set, every request needs it, as `Authorization:
 *   Bearer <token>` or as the session cookie set by the sign-in form (a random session id that
 *   expires after 12 hours and is deleted on sign-out: server/web/sessions.ts); only the sign-in form
 *   and the stylesheet are open. Browsers asking for a page are sent to /login; everything else gets 401.
 * - CSRF: a random per-browser token in an HttpOnly SameSite=Lax cookie must come back in the `_csrf`
 *   form field or the `x-csrf-token` header on POST/PUT/PATCH/DELETE (double submit); a request whose
 *   Origin names another host, or whose Sec-Fetch-Site is cross-site, is refused. The JSON API (/api/)
 *   is exempt from the token but accepts request bodies only as application/json, which a page on
 *   another site cannot send without a CORS preflight (never granted). `Origin: null` (sandboxed
 *   frames, data: and file: pages, cross-site redirects) is refused on unsafe methods.
 * - Caching: every answer that does not set its own Cache-Control (the static files do) is
 *   `no-store`, errors (401, 403, 413, 415, 429) and /health included.
 * - Body limits: 413 beyond `maxBodyBytes`, or `maxUploadBytes` on the file-import routes and /api/.
 */
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { getConnInfo } from '@hono/node-server/conninfo';
import type { Context, MiddlewareHandler } from 'hono';
import { getCookie, setCookie, deleteCookie } from 'hono/cookie';
import { bodyLimit } from 'hono/body-limit';
import { secureHeaders } from 'hono/secure-headers';
import { CSRF_FIELD, CSRF_HEADER } from '../../templates/view.js';
import type { AppEnv } from './env.js';
import type { SessionStore } from './sessions.js';

export const CSRF_COOKIE = 'rw_csrf';
export const ACCESS_COOKIE = 'rw_access';
const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const TOKEN_RE = /^[A-Za-z0-9_-]{43}$/;

/** Paths open without the access token. */
const OPEN_PATHS = new Set(['/login', '/static/style.css']);

function sameBytes(a: string, b: string): boolean {
  const ha = createHash('sha256').update(a).digest();
  const hb = createHash('sha256').update(b).digest();
  return timingSafeEqual(ha, hb);
}

export function isApiPath(path: string): boolean {
  return path === '/api' || path.startsWith('/api/');
}

function wantsHtml(c: Context): boolean {
  return c.req.method === 'GET' && (c.req.header('accept') ?? '').includes('text/html') && !isApiPath(c.req.path);
}

/** Whether this request carries the access token (bearer header) or a live session cookie. */
export function hasAccess(c: Context, token: string, sessions: SessionStore): boolean {
  const auth = c.req.header('authorization');
  if (auth !== undefined) {
    const m = /^Bearer\s+(.+)$/i.exec(auth.trim());
    if (m && sameBytes(m[1]!, token)) return true;
  }
  return sessions.valid(getCookie(c, ACCESS_COOKIE));
}

/** Requires the access token (or a live session) on every request when `token` is set. */
export function accessGuard(token: string | undefined, sessions: SessionStore): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    if (token === undefined) {
      c.set('signedIn', false);
      return next();
    }
    const access = hasAccess(c, token, sessions);
    if (access || OPEN_PATHS.has(c.req.path)) {
      c.set('signedIn', access);
      return next();
    }
    c.header('Vary', 'Authorization, Cookie', { append: true });
    if (c.req.header('hx-request') === 'true') {
      c.header('HX-Redirect', '/login');
      return c.text('Sign in with the access token first.', 401);
    }
    if (wantsHtml(c)) {
      const url = new URL(c.req.url);
      const back = url.pathname + url.search;
      return c.redirect(`/login?next=${encodeURIComponent(back)}`, 303);
    }
    c.header('WWW-Authenticate', 'Bearer realm="runwright"');
    return isApiPath(c.req.path)
      ? c.json({ error: 'unauthorized', message: 'this server requires an access token: send "Authorization: Bearer <token>"' }, 401)
      : c.text('This server requires an access token: send "Authorization: Bearer <token>" or sign in at /login.', 401);
  };
}

/** Starts a session after a successful sign-in (ending the one this browser had) and sets its cookie. */
export function setAccessCookie(c: Context, sessions: SessionStore): void {
  sessions.revoke(getCookie(c, ACCESS_COOKIE));
  setCookie(c, ACCESS_COOKIE, sessions.create(), {
    httpOnly: true, sameSite: 'Strict', path: '/', secure: new URL(c.req.url).protocol === 'https:', maxAge: Math.floor(sessions.ttlMs / 1000),
  });
}

/** Signing out: the session is deleted on the server and the cookie cleared. */
export function clearAccessCookie(c: Context, sessions: SessionStore): void {
  sessions.revoke(getCookie(c, ACCESS_COOKIE));
  deleteCookie(c, ACCESS_COOKIE, { path: '/' });
}

/**
 * The client's address, for the sign-in throttle: the TCP peer of the request. Requests without a
 * socket (app.request() in tests) share one bucket. Behind a reverse proxy every client is the proxy.
 */
export function clientAddress(c: Context): string {
  try {
    return getConnInfo(c).remote.address ?? 'unknown';
  } catch {
    return 'unknown';
  }
}

/** Constant-time check of a token typed into the sign-in form. */
export function tokenMatches(typed: string, token: string): boolean {
  return sameBytes(typed, token);
}

function originAllowed(c: Context): boolean {
  const host = c.req.header('host');
  const origin = c.req.header('origin');
  // `Origin: null` is what sandboxed frames, data: and file: pages and cross-site redirects send.
  if (origin === 'null') return false;
  if (origin !== undefined && host !== undefined) {
    try {
      if (new URL(origin).host !== host) return false;
    } catch {
      return false;
    }
  }
  return c.req.header('sec-fetch-site') !== 'cross-site';
}

function refuse(c: Context, reason: string): Response {
  if (isApiPath(c.req.path)) return c.json({ error: 'forbidden', message: reason }, 403);
  return c.html(
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Request refused · Runwright</title><link rel="stylesheet" href="/static/style.css"></head>` +
      `<body><main id="main"><h1>Request refused</h1><p>${reason}</p><p><a href="/">Back to the start page</a></p></main></body></html>`,
    403,
  );
}

/**
 * CSRF protection. Issues the token cookie when missing (exposed as `c.var.csrf`); on unsafe
 * methods checks the origin and, outside /api/, the token.
 */
export function csrfGuard(): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    const cookie = getCookie(c, CSRF_COOKIE);
    const valid = cookie !== undefined && TOKEN_RE.test(cookie);
    const token = valid ? cookie : randomBytes(32).toString('base64url');
    c.set('csrf', token);
    if (!valid) setCookie(c, CSRF_COOKIE, token, { httpOnly: true, sameSite: 'Lax', path: '/', secure: new URL(c.req.url).protocol === 'https:' });
    if (!UNSAFE.has(c.req.method)) return next();
    if (!originAllowed(c)) return refuse(c, 'This request came from another site and was refused.');
    if (isApiPath(c.req.path)) {
      // A cross-site page can send a body without a CORS preflight only as a form, as text/plain or
      // with no type at all: any non-empty body must therefore be declared application/json.
      const type = c.req.header('content-type') ?? '';
      if (!/^application\/json\b/i.test(type) && (await c.req.text()).length > 0) {
        return c.json({ error: 'unsupported-media-type', message: 'send request bodies as application/json' }, 415);
      }
      return next();
    }
    let sent = c.req.header(CSRF_HEADER);
    if (sent === undefined) {
      const type = c.req.header('content-type') ?? '';
      if (/^(application\/x-www-form-urlencoded|multipart\/form-data)\b/i.test(type)) {
        const body = await c.req.parseBody();
        const v = body[CSRF_FIELD];
        if (typeof v === 'string') sent = v;
      }
    }
    if (!valid || cookie === undefined || sent === undefined || !sameBytes(sent, cookie)) {
      return refuse(c, 'The form could not be checked (it may have expired, or it came from another site). Reload the page and try again.');
    }
    return next();
  };
}

/** `Cache-Control: no-store` on every answer that does not set its own (error answers included). */
export function noStoreByDefault(): MiddlewareHandler {
  return async (c, next) => {
    await next();
    if (!c.res.headers.has('cache-control')) c.res.headers.set('Cache-Control', 'no-store');
  };
}

/** Secure response headers, with a content security policy that allows only this server's own files. */
export function secureHeadersGuard(): MiddlewareHandler {
  return secureHeaders({
    contentSecurityPolicy: {
      defaultSrc: ["'self'"],
      scriptSrc: ["'self'"],
      styleSrc: ["'self'"],
      imgSrc: ["'self'", 'data:'],
      connectSrc: ["'self'"],
      formAction: ["'self'"],
      frameAncestors: ["'none'"],
      baseUri: ["'none'"],
      objectSrc: ["'none'"],
    },
    xFrameOptions: 'DENY',
    referrerPolicy: 'same-origin',
    strictTransportSecurity: false,
    permissionsPolicy: { camera: [], microphone: [], geolocation: [] },
  });
}

export interface BodyLimits {
  /** Largest request body on ordinary routes, bytes. */
  readonly maxBodyBytes: number;
  /** Largest body on file-import routes and the JSON API, bytes. */
  readonly maxUploadBytes: number;
}

export const DEFAULT_BODY_LIMITS: BodyLimits = { maxBodyBytes: 1024 * 1024, maxUploadBytes: 16 * 1024 * 1024 };

const UPLOAD_PATHS = [/^\/aircraft\/import$/, /^\/sites\/\d+\/climate\/import$/, /^\/studies\/\d+\/scenarios\/\d+\/fleet\/import$/, /^\/api\//];

export function bodyLimits(limits: BodyLimits): MiddlewareHandler {
  const tooLarge = (max: number) => (c: Context) =>
    isApiPath(c.req.path)
      ? c.json({ error: 'payload-too-large', message: `request body larger than ${max} bytes` }, 413)
      : c.text(`The request is too large: at most ${(max / 1024 / 1024).toFixed(1)} MiB is accepted here.`, 413);
  const small = bodyLimit({ maxSize: limits.maxBodyBytes, onError: tooLarge(limits.maxBodyBytes) });
  const large = bodyLimit({ maxSize: limits.maxUploadBytes, onError: tooLarge(limits.maxUploadBytes) });
  return async (c, next) => {
    if (!UNSAFE.has(c.req.method)) return next();
    return UPLOAD_PATHS.some((re) => re.test(c.req.path)) ? large(c, next) : small(c, next);
  };
}
