/**
 * Sign-in sessions and the sign-in throttle, both kept in memory by the app that createApp builds
 * (no module-level state). Documented in docs/web.md ("Security").
 *
 * - A session is a random 256-bit id in the `rw_access` cookie. The server keeps only its SHA-256
 *   digest and its expiry: a session lasts SESSION_TTL_MS (12 hours) from sign-in, whatever the
 *   activity, and signing out deletes it, so the cookie is refused from then on. Sessions live in
 *   the server process: a restart signs everyone out (they sign in again with the token).
 * - The throttle counts wrong access tokens per client address: after SIGN_IN_MAX_FAILURES (5) within
 *   SIGN_IN_WINDOW_MS (10 minutes) further attempts from that address are refused (429, with the
 *   seconds to wait) until the oldest of those failures is 10 minutes old. A right token clears the
 *   count. Times come from the app's injected clock.
 */
import { createHash, randomBytes } from 'node:crypto';

export const SESSION_TTL_MS = 12 * 60 * 60 * 1000;
export const SIGN_IN_MAX_FAILURES = 5;
export const SIGN_IN_WINDOW_MS = 10 * 60 * 1000;
/** Upper bounds on what is kept in memory (oldest entries go first). */
const MAX_SESSIONS = 10_000;
const MAX_CLIENTS = 10_000;

const SESSION_ID_RE = /^[A-Za-z0-9_-]{43}$/;
const digest = (id: string): string => createHash('sha256').update(id).digest('base64url');

export class SessionStore {
  /** SHA-256 of the session id → expiry (ms since the epoch), in order of creation. */
  private readonly sessions = new Map<string, number>();

  constructor(private readonly clock: () => Date, readonly ttlMs: number = SESSION_TTL_MS) {}

  /** Starts a session; returns the id to put in the cookie. */
  create(): string {
    const now = this.clock().getTime();
    for (const [k, exp] of this.sessions) if (exp <= now) this.sessions.delete(k);
    while (this.sessions.size >= MAX_SESSIONS) this.sessions.delete(this.sessions.keys().next().value!);
    const id = randomBytes(32).toString('base64url');
    this.sessions.set(digest(id), now + this.ttlMs);
    return id;
  }

  /** Whether `id` names a live session (an expired one is deleted). */
  valid(id: string | undefined): boolean {
    if (id === undefined || !SESSION_ID_RE.test(id)) return false;
    const key = digest(id);
    const exp = this.sessions.get(key);
    if (exp === undefined) return false;
    if (this.clock().getTime() >= exp) {
      this.sessions.delete(key);
      return false;
    }
    return true;
  }

  /** Ends the session `id` (signing out). */
  revoke(id: string | undefined): void {
    if (id !== undefined && SESSION_ID_RE.test(id)) this.sessions.delete(digest(id));
  }

  get size(): number {
    return this.sessions.size;
  }
}

export class SignInThrottle {
  /** Client address → times of its recent wrong tokens (ms), oldest first. */
  private readonly failures = new Map<string, number[]>();

  constructor(
    private readonly clock: () => Date,
    readonly maxFailures: number = SIGN_IN_MAX_FAILURES,
    readonly windowMs: number = SIGN_IN_WINDOW_MS,
  ) {}

  private recent(client: string, now: number): number[] {
    const list = (this.failures.get(client) ?? []).filter((t) => t > now - this.windowMs);
    if (list.length === 0) this.failures.delete(client);
    else this.failures.set(client, list);
    return list;
  }

  /** Seconds this client must wait before it may try again, or 0 when it may try now. */
  retryAfterSeconds(client: string): number {
    const now = this.clock().getTime();
    const list = this.recent(client, now);
    if (list.length < this.maxFailures) return 0;
    return Math.max(1, Math.ceil((list[list.length - this.maxFailures]! + this.windowMs - now) / 1000));
  }

  /** Counts a wrong token from this client. */
  fail(client: string): void {
    const now = this.clock().getTime();
    const list = this.recent(client, now);
    list.push(now);
    this.failures.delete(client);
    this.failures.set(client, list);
    while (this.failures.size > MAX_CLIENTS) this.failures.delete(this.failures.keys().next().value!);
  }

  /** A right token: the client's count starts again. */
  succeed(client: string): void {
    this.failures.delete(client);
  }
}
