/**
 * App factory: builds the Hono app over injected dependencies (no module-level state).
 *
 * Order of the middleware: secure headers → access token (when configured) → body limits → CSRF and
 * the unit preference → routes. One error handler turns the errors the repositories and the core raise
 * into pages (or JSON under /api/). Routes: docs/web.md.
 */
import { Hono } from 'hono';
import { getCookie, setCookie } from 'hono/cookie';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { CAUTION_TEXT, ConvergenceError, InputDomainError, type UnitSystem } from '../core/index.js';
import { AircraftInUseError, DuplicateIdError, NotFoundError, SiteInUseError } from '../db/errors.js';
import type { BulkWriter } from '../db/bulk.js';
import type { Db } from '../db/types.js';
import { HomePage, LoginPage } from '../templates/home.js';
import { ProblemPage } from '../templates/errors.js';
import { formValues } from './common/formFields.js';
import { ImportError, formatProblem } from './io/errors.js';
import { JobTimeoutError, JobUnavailableError, inlineJobs, type JobRunner } from './jobs/index.js';
import { aircraftRoutes } from './aircraft/index.js';
import { apiRoutes } from './api.js';
import { reportRoutes } from './studies/index.js';
import { siteRoutes } from './sites/index.js';
import { StudyService } from './studies/index.js';
import { studyRoutes } from './studies/index.js';
import type { AppEnv } from './web/env.js';
import type { LoopMonitor } from './web/loop.js';
import { page, safeBack, seeOther } from './web/page.js';
import { refuseBadReturnPath } from './web/returnPath.js';
import {
  DEFAULT_BODY_LIMITS, accessGuard, bodyLimits, clearAccessCookie, clientAddress, csrfGuard, isApiPath, noStoreByDefault,
  secureHeadersGuard, setAccessCookie, tokenMatches, type BodyLimits,
} from './web/security.js';
import { SessionStore, SignInThrottle } from './web/sessions.js';

export interface AppDeps {
  /** The database the repositories use (owned by the caller). */
  readonly db: Db;
  /** Clock for saved-result times. */
  readonly clock: () => Date;
  /** When set, every request needs this token (header or sign-in cookie). */
  readonly accessToken?: string;
  /** Request body limits (default 1 MiB; 16 MiB on file imports and the API). */
  readonly limits?: Partial<BodyLimits>;
  /**
   * Where long computations run (studies, station files). The server passes a worker-thread pool so
   * that they never block other requests; the default runs them inline (tests).
   */
  readonly jobs?: JobRunner;
  /**
   * The server's bulk connection (db/bulk.ts): catalogue imports commit on it with the event loop
   * free, and every request that may write passes its write gate. Without it (tests) imports commit
   * in one synchronous transaction on `db`.
   */
  readonly bulk?: BulkWriter;
  /** The server's event-loop delay monitor, read by `GET /health/loop` (docs/web.md, "Responsiveness"). */
  readonly loop?: LoopMonitor;
}

const require = createRequire(import.meta.url);
const HTMX = readFileSync(require.resolve('htmx.org/dist/htmx.min.js'), 'utf8');
const CSS = readFileSync(fileURLToPath(new URL('../static/style.css', import.meta.url)), 'utf8');

export const UNITS_COOKIE = 'rw_units';

export function createApp(deps: AppDeps): Hono<AppEnv> {
  const app = new Hono<AppEnv>();
  const jobs = deps.jobs ?? inlineJobs();
  const token = deps.accessToken !== undefined && deps.accessToken !== '' ? deps.accessToken : undefined;

  // Sign-in sessions and the sign-in throttle live with this app (in memory; a restart signs everyone out).
  const sessions = new SessionStore(deps.clock);
  const throttle = new SignInThrottle(deps.clock);

  app.use('*', noStoreByDefault());
  app.use('*', secureHeadersGuard());
  app.use('*', accessGuard(token, sessions));
  app.use('*', bodyLimits({ ...DEFAULT_BODY_LIMITS, ...deps.limits }));
  app.use('*', csrfGuard());
  // A request that may write waits (asynchronously) while a bulk import's transaction is open.
  const gate = deps.bulk?.gate;
  if (gate) app.use('*', (c, next) => (c.req.method === 'GET' || c.req.method === 'HEAD' || c.req.method === 'OPTIONS' ? next() : gate.shared(next)));
  app.use('*', async (c, next) => {
    const u = getCookie(c, UNITS_COOKIE);
    c.set('userUnits', u === 'us' ? 'us' : 'si');
    await next();
  });

  app.get('/static/htmx.min.js', (c) =>
    c.body(HTMX, 200, { 'content-type': 'text/javascript; charset=utf-8', 'cache-control': 'public, max-age=86400' }),
  );
  app.get('/static/style.css', (c) => c.body(CSS, 200, { 'content-type': 'text/css; charset=utf-8', 'cache-control': 'public, max-age=3600' }));
  app.get('/health', (c) => c.json({ ok: true, caution: CAUTION_TEXT }));
  // Longest event-loop block since the last reset (`?reset=1` reads and starts a new window).
  app.get('/health/loop', (c) => (deps.loop ? c.json(deps.loop.read(c.req.query('reset') === '1')) : c.json({ error: 'not-found', message: 'this app has no loop monitor' }, 404)));

  app.get('/', (c) => page(c, { title: 'Home' }, () => <HomePage />));

  app.post('/preferences/units', async (c) => {
    const v = formValues(await c.req.parseBody());
    const refused = refuseBadReturnPath(c, 'back', v.back);
    if (refused) return refused;
    const units: UnitSystem = v.units === 'us' ? 'us' : 'si';
    setCookie(c, UNITS_COOKIE, units, { path: '/', sameSite: 'Lax', httpOnly: true, maxAge: 60 * 60 * 24 * 365 });
    return seeOther(c, safeBack(v.back, '/'));
  });

  app.get('/login', (c) => refuseBadReturnPath(c, 'next', c.req.query('next'))
    ?? page(c, { title: 'Sign in' }, () => <LoginPage next={safeBack(c.req.query('next'), '/')} enabled={token !== undefined} />));
  app.post('/login', async (c) => {
    const v = formValues(await c.req.parseBody());
    const refused = refuseBadReturnPath(c, 'next', v.next);
    if (refused) return refused;
    const next = safeBack(v.next, '/');
    if (token === undefined) return seeOther(c, next);
    const client = clientAddress(c);
    const wait = throttle.retryAfterSeconds(client);
    if (wait > 0) {
      c.header('Retry-After', String(wait));
      const minutes = Math.ceil(wait / 60);
      return page(c, { title: 'Sign in', status: 429 }, () => (
        <LoginPage next={next} enabled error={`Too many wrong access tokens from this address: ${throttle.maxFailures} within ${throttle.windowMs / 60_000} minutes. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`} />
      ));
    }
    if (!tokenMatches(v.token ?? '', token)) {
      throttle.fail(client);
      return page(c, { title: 'Sign in', status: 401 }, () => <LoginPage next={next} enabled error="That is not the access token of this server." />);
    }
    throttle.succeed(client);
    setAccessCookie(c, sessions);
    return seeOther(c, next);
  });
  app.post('/logout', (c) => {
    clearAccessCookie(c, sessions);
    return seeOther(c, '/login');
  });

  const service = new StudyService(deps.db, jobs, deps.clock);
  app.route('/aircraft', aircraftRoutes({ db: deps.db, jobs, ...(deps.bulk ? { bulk: deps.bulk } : {}) }));
  app.route('/sites', siteRoutes({ db: deps.db, jobs }));
  app.route('/studies', reportRoutes({ db: deps.db, clock: deps.clock, jobs, service }));
  app.route('/studies', studyRoutes({ db: deps.db, jobs, clock: deps.clock, service }));
  app.route('/api', apiRoutes({ db: deps.db, jobs, clock: deps.clock, service }));

  app.notFound((c) =>
    isApiPath(c.req.path)
      ? c.json({ error: 'not-found', message: `no route ${c.req.method} ${c.req.path}` }, 404)
      : page(c, { title: 'Not found', status: 404 }, () => <ProblemPage title="Not found" message={`There is no page at ${c.req.path}.`} />),
  );

  app.onError((err, c) => {
    const api = isApiPath(c.req.path);
    let status: 404 | 409 | 422 | 500 | 503 = 500;
    let message = 'Something went wrong on the server; nothing was changed. The error has been logged.';
    let problems: string[] | undefined;
    if (err instanceof NotFoundError) { status = 404; message = err.message; }
    else if (err instanceof AircraftInUseError || err instanceof SiteInUseError || err instanceof DuplicateIdError) { status = 409; message = err.message; }
    else if (err instanceof InputDomainError) { status = 422; message = err.message; }
    else if (err instanceof ImportError) { status = 422; message = err.message; problems = err.problems.map(formatProblem); }
    else if (err instanceof JobTimeoutError || err instanceof JobUnavailableError) { status = 503; message = err.message; }
    // A solver that did not meet its tolerance: the input could not be computed, a 422 with the solver's words.
    else if (err instanceof ConvergenceError) { status = 422; message = `A calculation did not converge: ${err.message}. Nothing was changed; check the inputs named on the page, or report the case.`; }
    if (status === 500) console.error(err);
    if (api) return c.json({ error: status === 500 ? 'internal' : status === 503 ? 'unavailable' : 'rejected', message, ...(problems ? { problems } : {}) }, status);
    return page(c, { title: status === 404 ? 'Not found' : 'Problem', status }, () => (
      <ProblemPage title={status === 404 ? 'Not found' : status === 500 ? 'Server error' : status === 503 ? 'Try again later' : 'Not done'} message={message} />
    ));
  });

  return app;
}
