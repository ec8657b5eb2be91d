/**
 * docs/methods/demo-fleet.md: every invented demo type's figures at sea level ISA and at the demo site
 * lie inside the range of its class (class ranges common practice, from memory; the landing ratio
 * derived from the density ratio at 1,346 m), and the page shows the figures the engine gives now.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { demoFigures, tableRows } from '../../scripts/demo-class-table.js';

const page = readFileSync(new URL('../../docs/methods/demo-fleet.md', import.meta.url), 'utf8');
const figures = demoFigures();

describe('the demo fleet against the ranges of its classes (issue 13, demo fleet)', () => {
  it('covers all eight types at sea level and at the site', () => {
    expect(new Set(figures.map((f) => f.id)).size).toBe(8);
    for (const id of new Set(figures.map((f) => f.id))) {
      expect(figures.filter((f) => f.id === id).map((f) => f.key)).toEqual(expect.arrayContaining(['takeoff-sl', 'landing-sl', 'takeoff-site-ratio', 'landing-site-ratio']));
    }
  });
  for (const f of figures) {
    it(`${f.id}: ${f.figure} ${f.value.toFixed(2)} within ${f.range[0]}–${f.range[1]}`, () => {
      expect(Number.isFinite(f.value)).toBe(true);
      expect(f.value).toBeGreaterThanOrEqual(f.range[0]);
      expect(f.value).toBeLessThanOrEqual(f.range[1]);
    });
  }
  it('the page carries the current table (regenerate with node --import tsx scripts/demo-class-table.ts)', () => {
    for (const row of tableRows(figures)) expect(page).toContain(row);
  });
});
