/** The fuzz harness's own checks can fail: a leak is found, an echo is allowed, a write is seen. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { applyJsonEdits, assertClean, csvGrid, dbSnapshot, echoesOf, fuzzApp, nonFinitePath, type FuzzApp } from './harness.js';

let h: FuzzApp;
beforeAll(async () => { h = await fuzzApp(); });
afterAll(() => h?.close());

describe('fuzz harness', () => {
  it('finds NaN, Infinity, undefined and [object Object] that the input did not bring', () => {
    for (const leak of ['length NaN m', 'is Infinity °C', 'undefined is not allowed', 'name [object Object]']) {
      expect(() => assertClean(`<p>${leak}</p>`, [], 'test')).toThrow();
    }
    expect(() => assertClean('<p>NaNo Infinityish undefinedness</p>', [], 'test')).not.toThrow();
  });

  it('allows a value the request carried, raw or escaped, but not a different leak beside it', () => {
    const echoed = echoesOf(['  NaN ', 'a "undefined" b']);
    expect(() => assertClean('"NaN" is not a number', echoed, 'test')).not.toThrow();
    expect(() => assertClean('&quot;undefined&quot;', echoed, 'test')).not.toThrow();
    expect(() => assertClean('"NaN" is not a number; Infinity is too large', echoed, 'test')).toThrow();
  });

  it('sees a write in any table and nothing when nothing is written', () => {
    const a = dbSnapshot(h.sqlite);
    expect(dbSnapshot(h.sqlite)).toEqual(a);
    h.sqlite.prepare(`UPDATE aircraft SET name = name || ' x' WHERE rowid = (SELECT min(rowid) FROM aircraft)`).run();
    const b = dbSnapshot(h.sqlite);
    expect(b.aircraft).not.toBe(a.aircraft);
    expect({ ...b, aircraft: a.aircraft }).toEqual(a);
  });

  it('mutates JSON by raw tokens (1e999 parses to Infinity) and walks numbers', () => {
    const { text, described } = applyJsonEdits({ a: { b: 1 } }, [{ i: 1, token: '1e999' }]);
    expect(text).toBe('{"a":{"b":1e999}}');
    expect(described).toBe('$.a.b = 1e999');
    expect(nonFinitePath(JSON.parse(text))).toBe('$.a.b = Infinity');
    expect(applyJsonEdits({ a: 'x' }, [{ i: 0, token: '"$&"' }]).text).toBe('{"a":"$&"}');
  });

  it('reads CSV as the exports write it', () => {
    expect(csvGrid('a,"b,c"\r\n"d""e",f\n')).toEqual([['a', 'b,c'], ['d"e', 'f']]);
  });
});
