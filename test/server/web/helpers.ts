/**
 * Route-test helpers: an app over an in-memory database seeded with the invented demo, and a small
 * client that keeps cookies like a browser and sends the CSRF token with every form.
 */
import { readFileSync } from 'node:fs';
import type { Hono } from 'hono';
import type Database from 'better-sqlite3';
import { openDatabase, seedDemoIfEmpty, type Db } from '../../../db/index.js';
import { createApp, type AppDeps } from '../../../server/app.js';
import { inlineJobs } from '../../../server/jobs/index.js';
import { parseAll } from '../../../server/common/schema.js';
import { studyFileSchema, studyInputOf } from '../../../server/studies/schema.js';
import type { AppEnv } from '../../../server/web/env.js';

export const DEMO_TEXT = readFileSync(new URL('../../../examples/demo-study.json', import.meta.url), 'utf8');

export function demoInput() {
  const r = parseAll(studyFileSchema, JSON.parse(DEMO_TEXT));
  if (!r.ok) throw new Error(`demo study invalid: ${JSON.stringify(r.problems)}`);
  return studyInputOf(r.value);
}

/** A fixed clock: saved results get this time. */
export const FIXED_TIME = new Date('2026-03-01T09:30:00.000Z');

export interface TestApp {
  readonly app: Hono<AppEnv>;
  readonly db: Db;
  readonly sqlite: Database.Database;
  readonly studyId: number;
  readonly siteId: number;
}

export function makeApp(opts: { seed?: boolean } & Partial<Omit<AppDeps, 'db'>> = {}): TestApp {
  const { db, sqlite } = openDatabase(':memory:');
  let studyId = 0;
  let siteId = 0;
  if (opts.seed !== false) {
    const s = seedDemoIfEmpty(db, demoInput());
    if (!s.seeded) throw new Error('expected to seed');
    studyId = s.studyId;
    siteId = s.siteId;
  }
  const app = createApp({ db, clock: () => FIXED_TIME, jobs: opts.jobs ?? inlineJobs(), ...(opts.accessToken ? { accessToken: opts.accessToken } : {}), ...(opts.limits ? { limits: opts.limits } : {}) });
  return { app, db, sqlite, studyId, siteId };
}

export interface Res {
  readonly status: number;
  readonly headers: Headers;
  readonly text: string;
}

/** A browser-like client: cookies kept, CSRF token read from the first page and sent with forms. */
export class Client {
  private readonly cookies = new Map<string, string>();
  constructor(private readonly app: Hono<AppEnv>, private readonly extraHeaders: Record<string, string> = {}) {}

  get csrf(): string {
    const t = this.cookies.get('rw_csrf');
    if (!t) throw new Error('no CSRF cookie yet: GET a page first');
    return t;
  }

  private cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  private keep(res: Response): void {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const i = pair!.indexOf('=');
      const k = pair!.slice(0, i);
      const v = pair!.slice(i + 1);
      if (/Max-Age=0/i.test(c) || v === '') this.cookies.delete(k);
      else this.cookies.set(k, v);
    }
  }

  async request(path: string, init: RequestInit & { htmx?: boolean } = {}): Promise<Res> {
    const headers = new Headers(init.headers);
    for (const [k, v] of Object.entries(this.extraHeaders)) headers.set(k, v);
    if (this.cookies.size > 0) headers.set('cookie', this.cookieHeader());
    if (init.htmx) headers.set('hx-request', 'true');
    if (!headers.has('host')) headers.set('host', 'localhost');
    const res = await this.app.request(`http://localhost${path}`, { ...init, headers });
    this.keep(res);
    return { status: res.status, headers: res.headers, text: await res.text() };
  }

  get(path: string, opts: { htmx?: boolean; headers?: Record<string, string> } = {}): Promise<Res> {
    return this.request(path, { method: 'GET', headers: { accept: 'text/html', ...(opts.headers ?? {}) }, ...(opts.htmx ? { htmx: true } : {}) });
  }

  /** Posts a urlencoded form with the CSRF token (unless `csrf: false`). */
  post(path: string, fields: Record<string, string>, opts: { htmx?: boolean; csrf?: boolean; headers?: Record<string, string> } = {}): Promise<Res> {
    const body = new URLSearchParams(fields);
    if (opts.csrf !== false) body.set('_csrf', this.csrf);
    return this.request(path, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded', ...(opts.headers ?? {}) },
      body: body.toString(),
      ...(opts.htmx ? { htmx: true } : {}),
    });
  }

  /** Posts a multipart form with one file. */
  upload(path: string, fields: Record<string, string>, file: { name: string; text: string; type?: string }): Promise<Res> {
    const fd = new FormData();
    fd.set('_csrf', this.csrf);
    for (const [k, v] of Object.entries(fields)) fd.set(k, v);
    fd.set('file', new File([file.text], file.name, { type: file.type ?? 'text/csv' }));
    return this.request(path, { method: 'POST', body: fd });
  }

  /** JSON request (the API). */
  json(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Res> {
    return this.request(path, {
      method,
      headers: { ...(body === undefined ? {} : { 'content-type': 'application/json' }), ...headers },
      ...(body === undefined ? {} : { body: typeof body === 'string' ? body : JSON.stringify(body) }),
    });
  }
}

/** A client that has fetched the start page (so it holds a CSRF cookie). */
export async function browser(app: Hono<AppEnv>): Promise<Client> {
  const c = new Client(app);
  await c.get('/');
  return c;
}

/** Value attribute of the input named `name` in HTML. */
export function inputValue(html: string, name: string): string | undefined {
  const m = new RegExp(`<input[^>]*name="${name.replace(/[.]/g, '\\.')}"[^>]*value="([^"]*)"`).exec(html)
    ?? new RegExp(`<input[^>]*value="([^"]*)"[^>]*name="${name.replace(/[.]/g, '\\.')}"`).exec(html);
  return m?.[1];
}

/** The field values of the aircraft edit form of `id`, as a browser would submit them unchanged. */
export function formFields(html: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of html.matchAll(/<input([^>]*)>/g)) {
    const attrs = m[1]!;
    const name = /name="([^"]*)"/.exec(attrs)?.[1];
    const type = /type="([^"]*)"/.exec(attrs)?.[1];
    if (!name || type === 'file' || type === 'checkbox' || name === '_csrf') continue;
    out[name] = decode(/value="([^"]*)"/.exec(attrs)?.[1] ?? '');
  }
  for (const m of html.matchAll(/<select[^>]*name="([^"]*)"[^>]*>([\s\S]*?)<\/select>/g)) {
    const sel = /<option value="([^"]*)" selected/.exec(m[2]!) ?? /<option value="([^"]*)"/.exec(m[2]!);
    out[m[1]!] = decode(sel?.[1] ?? '');
  }
  for (const m of html.matchAll(/<textarea[^>]*name="([^"]*)"[^>]*>([\s\S]*?)<\/textarea>/g)) out[m[1]!] = decode(m[2]!);
  return out;
}

function decode(s: string): string {
  return s.replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&');
}
