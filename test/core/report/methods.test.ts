/**
 * The appendix method summary (core/report/methods.ts) against the method write-ups in docs/methods/:
 * each entry names the doc it condenses and phrases that must be found there, so that a change of a
 * formula in the docs shows up here. References: every cited key exists and every listed reference
 * is cited.
 */
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { METHOD_ENTRIES, METHOD_REFERENCES, referencesFor } from '../../../core/report/methods.js';

const docs = resolve(import.meta.dirname, '..', '..', '..', 'docs', 'methods');

describe('method summary of the appendix', () => {
  it('condenses the docs: every anchor phrase is in the doc the entry names', () => {
    for (const e of METHOD_ENTRIES) {
      const text = readFileSync(join(docs, e.doc), 'utf8');
      for (const a of e.docAnchors) expect(text, `${e.id}: "${a}" in docs/methods/${e.doc}`).toContain(a);
    }
  });

  it('cites only listed references, and lists only cited ones', () => {
    const ids = new Set(METHOD_REFERENCES.map((r) => r.id));
    expect(ids.size).toBe(METHOD_REFERENCES.length);
    for (const e of METHOD_ENTRIES) {
      expect(e.sources.length, e.id).toBeGreaterThan(0);
      for (const s of e.sources) expect(ids.has(s), `${e.id} cites ${s}`).toBe(true);
    }
    expect(referencesFor(METHOD_ENTRIES).map((r) => r.id).sort()).toEqual([...ids].sort());
  });

  it('gives each entry a title, a summary and at least one formula, with unique ids', () => {
    expect(new Set(METHOD_ENTRIES.map((e) => e.id)).size).toBe(METHOD_ENTRIES.length);
    for (const e of METHOD_ENTRIES) {
      expect(e.title.length).toBeGreaterThan(3);
      expect(e.summary.length).toBeGreaterThan(40);
      expect(e.formulas.length).toBeGreaterThan(0);
    }
  });

  it('states the factors the study applies with the values the docs give (14 CFR 121.195, 25.113; ICAO 7 % / 1 % / 10 %)', () => {
    const all = METHOD_ENTRIES.flatMap((e) => e.formulas).join('\n');
    for (const f of ['LD/0.60', '× 1.15', 'LD/0.70', '1.15 × all-engines distance to 35 ft', '0.07·E/300', '0.01·(T_ref − T_std(E))', '0.10·G', '2 s × V1']) {
      expect(all).toContain(f);
    }
  });
});
