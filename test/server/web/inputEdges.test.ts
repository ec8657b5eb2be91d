/**
 * Web input edges (issue 12, findings 5 and 7): a return path (`back`, `next`) holding CR, LF or NUL
 * is refused with 400 and a clear message (it used to reach a Location header: 500); duplicating an
 * aircraft whose id has the full 64 characters gives a copy id the id rule accepts.
 */
import { describe, expect, it } from 'vitest';
import { createAircraft, getAircraft } from '../../../db/repos/aircraft.js';
import { copyIdFor } from '../../../server/aircraft/routes.js';
import { ident } from '../../../server/common/schema.js';
import { browser, makeApp } from './helpers.js';

const BAD: readonly [string, string][] = [['CR', '/studies\r\nSet-Cookie: x=1'], ['LF', '/aircraft\nx'], ['NUL', '/sites\u0000']];

describe('return paths with CR, LF or NUL', () => {
  it('POST /preferences/units refuses them with 400, naming the character; nothing is set', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    for (const [what, back] of BAD) {
      const r = await c.post('/preferences/units', { units: 'us', back });
      expect(r.status, what).toBe(400);
      expect(r.text).toMatch(/The &quot;back&quot; value holds a (carriage return \(CR\)|line feed \(LF\)|NUL character) at character \d+/);
      expect(r.headers.get('location')).toBeNull();
      expect(r.headers.getSetCookie().some((x) => x.startsWith('rw_units='))).toBe(false);
    }
  });

  it('GET and POST /login refuse them with 400 (with and without an access token)', async () => {
    for (const token of [undefined, 'a-long-enough-access-token-for-tests']) {
      const { app } = makeApp(token ? { accessToken: token } : {});
      const c = await browser(app);
      for (const [what, next] of BAD) {
        const g = await c.get(`/login?next=${encodeURIComponent(next)}`);
        expect(g.status, `GET ${what}`).toBe(400);
        expect(g.text).toContain('the &quot;next&quot; value holds'.replace('the', 'The'));
        const p = await c.post('/login', { token: token ?? '', next });
        expect(p.status, `POST ${what}`).toBe(400);
      }
      // A plain path still works.
      expect((await c.get('/login?next=%2Fstudies')).status).toBe(200);
    }
  });
});

describe('duplicating an aircraft with a 64-character id', () => {
  it('the copy id keeps the id rule: cut before the suffix, unique', async () => {
    const { app, db } = makeApp();
    const src = getAircraft(db, 'kestrel-ut1')!;
    // Character 8 is "-": a copy id cut from the end used to start with "-", which the rule refuses.
    const longId = `k123456-${'x'.repeat(56)}`;
    expect(longId).toHaveLength(64);
    createAircraft(db, { ...src, id: longId });
    const c = await browser(app);
    const ids: string[] = [];
    for (let i = 0; i < 3; i++) {
      const r = await c.post(`/aircraft/${encodeURIComponent(longId)}/duplicate`, {});
      expect(r.status).toBe(303);
      const id = decodeURIComponent(/^\/aircraft\/(.+)\/edit$/.exec(r.headers.get('location')!)![1]!);
      expect(ident.safeParse(id).success, id).toBe(true);
      expect(id.length).toBeLessThanOrEqual(64);
      expect(getAircraft(db, id)).toBeDefined();
      ids.push(id);
    }
    expect(new Set(ids).size).toBe(3);
    expect(ids[0]).toBe(`${longId.slice(0, 59)}-copy`);
    expect(ids[1]).toBe(`${longId.slice(0, 57)}-copy-2`);
  });

  it('copyIdFor leaves short ids whole', () => {
    expect(copyIdFor('kestrel-ut1', 1)).toBe('kestrel-ut1-copy');
    expect(copyIdFor('kestrel-ut1', 12)).toBe('kestrel-ut1-copy-12');
  });
});
