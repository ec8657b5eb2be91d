/**
 * The results CSV carries the spread between methods beside the requirement (issue 13, items 12 and
 * 13): the physics takeoff, the corrected reference length, the indicative Torenbeek and Roskam
 * figures, the unfactored landing distance, the landing rule with its source (rule set and regulation)
 * and Roskam's indicative landing field length (transports only). Values are the study's own (derived
 * consistency); the demo aircraft are invented (examples/demo-study.json).
 */
import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { resultsCsv } from '../../server/studies/resultsCsv.js';
import { parseStudyDocument, studyOutput } from '../../server/studies/document.js';

function demo(options: Record<string, unknown> = {}) {
  const doc = JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8'));
  Object.assign(doc.options, options);
  const p = parseStudyDocument(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.problems));
  return studyOutput(p.input);
}

describe('results CSV: the methods beside the requirement', () => {
  it('each ok row has its physics takeoff, unfactored landing distance and landing rule; Roskam landing for transports only', () => {
    const out = demo();
    const rows = parse(resultsCsv(out, 'si'), { comment: '#', columns: true }) as Record<string, string>[];
    const results = out.scenarios.flatMap((s) => s.rows);
    expect(rows.length).toBe(results.length);
    for (const [i, r] of results.entries()) {
      const c = rows[i]!;
      expect(c.aircraft_id).toBe(r.aircraft);
      if (r.status !== 'ok') continue;
      expect(c.takeoff_physics_m).toBe(r.takeoff!.physics_m!.toFixed(0));
      expect(c.landing_distance_unfactored_m).toBe(r.landing!.distance_m.toFixed(0));
      expect(c.landing_rule).toBe(r.landing!.rule);
      expect(c.landing_rule_source).toMatch(/14 CFR 121\.195|light-aircraft factor/);
      if (r.landing!.roskam_m !== undefined) expect(c.landing_roskam_indicative_m).toBe(r.landing!.roskam_m.toFixed(0));
      else expect(c.landing_roskam_indicative_m).toBe('');
      for (const [k, v] of Object.entries(c)) if (/_m$/.test(k) && v !== '') expect(Number.isFinite(Number(v)), `${k}=${v}`).toBe(true);
    }
    expect(rows.some((c) => c.landing_roskam_indicative_m !== '')).toBe(true);
    expect(rows.some((c) => c.aircraft_id === 'kestrel-ut1' && c.landing_rule!.includes('light-aircraft factor × 1.43'))).toBe(true);
  });

  it('the chosen rule set is named in the CSV (eu-cat: CAT.POL.A)', () => {
    const rows = parse(resultsCsv(demo({ operatingRules: 'eu-cat' }), 'us'), { comment: '#', columns: true }) as Record<string, string>[];
    const tern = rows.find((c) => c.aircraft_id === 'tern-rj90' && c.status === 'ok')!;
    expect(tern.landing_rule).toMatch(/^EU commercial air transport/);
    expect(tern.landing_rule_source).toMatch(/CAT\.POL\.A\.230/);
    expect(Object.keys(tern)).toContain('landing_roskam_indicative_ft');
  });
});
