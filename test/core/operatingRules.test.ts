/**
 * Operating rule sets (issue 13, item 12): the landing factor of each set, the light-aircraft
 * planning factors, and the study and runway check using the chosen set.
 * Sources, per check: 14 CFR 121.195(b)–(d) and the 14 CFR 121.195 and 135.385 example (LD 1 500 m → 2 500 m
 * dry, 2 875 m wet); 14 CFR 135.385(f) (80 %) and (d) (115 %; on the 80 % length from memory); Part 91
 * (no factor); EU Air Operations CAT.POL.A.230 / .235 / .305 / .325 / .330 (from memory).
 */
import { siText } from '../../core/notices.js';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputDomainError, OPERATING_RULE_SETS, analyseLanding, analyseTakeoff, runStudy, type AircraftProfile, type OperatingRuleSet, type StudyInput } from '../../core/index.js';
import { LIGHT_LANDING_FACTOR_DEFAULT, LIGHT_TAKEOFF_FACTOR_DEFAULT } from '../../core/operatingRules.js';
import { landingRequirement } from '../../core/landing.js';
import { maxLandingMassForLda } from '../../core/runwayCheck.js';
import { expectClose } from '../helpers/close.js';

const demoDoc = () => JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8'));
const byId = (id: string): AircraftProfile => demoDoc().aircraft.find((a: AircraftProfile) => a.id === id);

const jet = (ruleSet: OperatingRuleSet, wet = false) =>
  landingRequirement({ distance_m: 1500, rule: 'transport', ruleSet, wet, engineType: 'turbofan' });
const turboprop = (ruleSet: OperatingRuleSet, wet = false) =>
  landingRequirement({ distance_m: 1500, rule: 'transport', ruleSet, wet, engineType: 'turboprop' });

describe('landing factor by rule set (LD 1 500 m, dry equivalent = distance)', () => {
  it('us-121: ÷ 0.60 dry, × 1.15 wet for turbojets (14 CFR 121.195(b), (d); 14 CFR 121.195 and 135.385 example 2 500 / 2 875 m)', () => {
    expectClose(jet('us-121').required_m, 2500, { rel: 1e-12 });
    expectClose(jet('us-121', true).required_m, 2875, { rel: 1e-12 });
    // 121.195(d) names turbojets: no wet increase for a turboprop.
    expectClose(turboprop('us-121', true).required_m, 2500, { rel: 1e-12 });
    expect(turboprop('us-121', true).wetIncreaseApplied).toBe(false);
  });
  it('us-121 is the default rule set', () => {
    expect(landingRequirement({ distance_m: 1500, rule: 'transport', wet: false, engineType: 'turbofan' }).ruleSet).toBe('us-121');
  });
  it('us-135-eod: ÷ 0.80, × 1.15 wet for turbojets (14 CFR 135.385(f), (d); 115 % on the 80 % length from memory)', () => {
    expectClose(jet('us-135-eod').required_m, 1875, { rel: 1e-12 });
    expectClose(jet('us-135-eod', true).required_m, 1875 * 1.15, { rel: 1e-12 });
    expectClose(turboprop('us-135-eod', true).required_m, 1875, { rel: 1e-12 });
  });
  it('us-91: unfactored, the distance on the surface (Part 91 sets no landing factor)', () => {
    const r = jet('us-91', true);
    expect(r.multiplier).toBe(1);
    expect(r.basis).toBe('surface-distance');
    expectClose(r.required_m, 1500, { rel: 1e-12 });
  });
  it('eu-cat: jets ÷ 0.60, turboprops ÷ 0.70, × 1.15 wet for all types (CAT.POL.A.230, .235, from memory)', () => {
    expectClose(jet('eu-cat').required_m, 2500, { rel: 1e-12 });
    expectClose(jet('eu-cat', true).required_m, 2875, { rel: 1e-12 });
    expectClose(turboprop('eu-cat').required_m, 1500 / 0.7, { rel: 1e-12 });
    expectClose(turboprop('eu-cat', true).required_m, (1500 / 0.7) * 1.15, { rel: 1e-12 });
    expect(Math.round(turboprop('eu-cat', true).required_m)).toBe(2464);
  });
  it('light aircraft: default ÷ 0.70 under every set; eu-cat adds 15 % wet on the dry distance (CAT.POL.A.325, .330, from memory)', () => {
    for (const set of OPERATING_RULE_SETS) {
      const r = landingRequirement({ distance_m: 500, rule: 'light', ruleSet: set, wet: false, engineType: 'piston' });
      expectClose(r.required_m, 500 / 0.7, { rel: 1e-12 });
    }
    const wet = landingRequirement({ distance_m: 600, dryDistance_m: 500, rule: 'light', ruleSet: 'eu-cat', wet: true, engineType: 'piston' });
    expectClose(wet.required_m, (500 / 0.7) * 1.15, { rel: 1e-12 });
    const wetUs = landingRequirement({ distance_m: 600, dryDistance_m: 500, rule: 'light', ruleSet: 'us-121', wet: true, engineType: 'piston' });
    expectClose(wetUs.required_m, 600 / 0.7, { rel: 1e-12 });
  });
  it('every requirement says where its factor comes from', () => {
    for (const set of OPERATING_RULE_SETS) {
      expect(jet(set).source).toMatch(set === 'eu-cat' ? /CAT\.POL/ : set === 'us-91' ? /Part 91/ : /14 CFR/);
    }
    expect(landingRequirement({ distance_m: 500, rule: 'light', wet: false, engineType: 'piston' }).source).toMatch(/from memory/);
  });
  it('the turboprop-alternate rule is a us-121 rule; an unknown set is refused with the allowed list', () => {
    expect(() => landingRequirement({ distance_m: 1500, rule: 'turboprop-alternate', ruleSet: 'eu-cat', wet: false, engineType: 'turboprop' }))
      .toThrow(/us-121/);
    expect(() => landingRequirement({ distance_m: 1500, rule: 'transport', ruleSet: 'us-999' as OperatingRuleSet, wet: false, engineType: 'turbofan' }))
      .toThrow(InputDomainError);
    expect(() => landingRequirement({ distance_m: 1500, rule: 'transport', ruleSet: 'us-999' as OperatingRuleSet, wet: false, engineType: 'turbofan' }))
      .toThrow(/us-121, us-135-eod, us-91, eu-cat/);
  });
});

describe('light-aircraft planning factors (takeoff × 1.25, landing ÷ 0.70; CAT.POL.A.305 / .325, from memory)', () => {
  const kestrel = byId('kestrel-ut1');
  const at = { mass_kg: kestrel.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry' as const };
  it('the defaults are not 1.0', () => {
    expect(LIGHT_TAKEOFF_FACTOR_DEFAULT).toBe(1.25);
    expectClose(LIGHT_LANDING_FACTOR_DEFAULT, 1.4286, { abs: 1e-4 });
  });
  it('a light profile without its own factor takes them; its own factor replaces both', () => {
    expect(kestrel.lightAircraftFactor).toBeUndefined();
    const t = analyseTakeoff({ aircraft: kestrel, ...at });
    if (!t.feasible) throw new Error(siText(t.message));
    expectClose(t.required_m, 1.25 * t.allEngines!.toScreen_m, { rel: 1e-12 });
    expect(t.trace.some((e) => e.label.includes('planning default') && e.value === 1.25)).toBe(true);
    const l = analyseLanding({ aircraft: kestrel, mass_kg: kestrel.mlw_kg, pressureAltitude_m: 0, slope: 0, headwind_mps: 0, surface: 'dry' });
    if (l.status !== 'ok') throw new Error(siText(l.reason));
    expectClose(l.required_m, l.distance_m / 0.7, { rel: 1e-12 });
    expect(l.assumptions.some((x) => x.includes('CAT.POL.A.325'))).toBe(true);
    const own = { ...kestrel, lightAircraftFactor: 1 };
    const t1 = analyseTakeoff({ aircraft: own, ...at });
    const l1 = analyseLanding({ aircraft: own, mass_kg: kestrel.mlw_kg, pressureAltitude_m: 0, slope: 0, headwind_mps: 0, surface: 'dry' });
    if (!t1.feasible || l1.status !== 'ok') throw new Error('infeasible');
    expectClose(t1.required_m, t1.allEngines!.toScreen_m, { rel: 1e-12 });
    expectClose(l1.required_m, l1.distance_m, { rel: 1e-12 });
  });
});

describe('the study and the runway check use the chosen rule set', () => {
  it('each set gives each transport row the landing requirement of its rule, named on the row', () => {
    const base = runStudy(demoDoc() as StudyInput);
    const landing = (set: OperatingRuleSet) => {
      const doc = demoDoc();
      doc.options.operatingRules = set;
      return runStudy(doc as StudyInput).scenarios[0]!.rows;
    };
    const rows91 = landing('us-91');
    const rowsEod = landing('us-135-eod');
    const rowsEu = landing('eu-cat');
    for (const row of base.scenarios[0]!.rows.filter((r) => r.status === 'ok' && r.landing)) {
      const id = row.aircraft;
      const us121 = row.landing!;
      const a91 = rows91.find((r) => r.aircraft === id)!.landing!;
      const eod = rowsEod.find((r) => r.aircraft === id)!.landing!;
      const eu = rowsEu.find((r) => r.aircraft === id)!.landing!;
      const a = byId(id);
      if (a.certification === 'normal') {
        for (const l of [us121, a91, eod]) expectClose(l.required_m, l.distance_m / 0.7, { rel: 1e-9 });
        continue;
      }
      expectClose(us121.required_m, us121.distance_m / 0.6, { rel: 1e-9 });
      expectClose(a91.required_m, a91.distance_m, { rel: 1e-9 });
      expectClose(eod.required_m, eod.distance_m / 0.8, { rel: 1e-9 });
      expectClose(eu.required_m, eu.distance_m / (a.engineType === 'turbofan' ? 0.6 : 0.7), { rel: 1e-9 });
      expect(us121.rule).toMatch(/Part 121/);
      expect(a91.rule).toMatch(/Part 91.*unfactored/);
      expect(eu.ruleSource).toMatch(/CAT\.POL\.A\.230/);
    }
  });

  it('the greatest landing mass an LDA allows follows the rule set (unfactored allows more)', () => {
    const tern = byId('tern-rj90');
    const args = { aircraft: tern, pressureAltitude_m: 0, surface: 'dry' as const, lda_m: 1400 };
    const a121 = maxLandingMassForLda(args);
    const a91 = maxLandingMassForLda({ ...args, ruleSet: 'us-91' });
    expect(a91.maxLandingMass_kg!).toBeGreaterThan(a121.maxLandingMass_kg ?? 0);
    expect(a91.requiredAtMax_m!).toBeLessThanOrEqual(1400);
  });
});

describe('a recorded override lets a corrected reference length beyond 35 % govern (item 14)', () => {
  it('with a reason the corrected length governs, and the row says so with the reason and the physics length', () => {
    // ICAO Doc 9157, Aerodrome Design Manual Part 1, percentage corrections, step 3: beyond 35 % a specific study is required; the override is a
    // recorded planning decision, never silent.
    const doc = demoDoc();
    doc.options.method = 'reference-icao';
    doc.site.elevation_m = 2200;
    const reason = 'Matches the operator\u2019s own planning chart for this aerodrome (test case).';
    const plain = runStudy(doc as StudyInput);
    doc.options.referenceOverrideReason = reason;
    const over = runStudy(doc as StudyInput);
    const overRows = over.scenarios.flatMap((s) => s.rows).filter((x) => x.status === 'ok' && x.takeoff?.reference_m !== undefined);
    expect(overRows.length).toBeGreaterThan(0);
    for (const row of overRows) {
      const before = plain.scenarios.flatMap((s) => s.rows).find((x) => x.aircraft === row.aircraft && x.status === 'ok')!;
      expect(before.warnings.map(siText).some((w) => w.includes('does not govern'))).toBe(true);
      expect(row.takeoff!.required_m).toBe(row.takeoff!.reference_m);
      expect(row.takeoff!.governing).toMatch(/override beyond the 35 % limit/);
      const w = row.warnings.map(siText).find((x) => x.startsWith('Takeoff: OVERRIDE RECORDED'))!;
      expect(w).toContain(reason);
      expect(w).toContain(`${Math.round(row.takeoff!.physics_m!).toLocaleString('en-US')} m`);
    }
  });
});
