import { siText, type Notice } from '../../core/notices.js';
/**
 * Existing-runway check (core/runwayCheck.ts): field-length components, greatest takeoff and landing
 * masses for declared distances, route penalties, and the assembled check.
 *
 * Sources: the field-length equations are Horonjeff et al., *Planning and Design of Airports*, 5th
 * ed., eqs 2-4 … 2-14 (14 CFR 25.113). The book's own Example 2-1 is not reproduced here
 * (its numbers were not available); the cases below are hand-worked with invented round numbers, the
 * arithmetic shown beside each — "hand-worked". The 25.113 identity TOR = midpoint distance is derived
 * from the equations ("derived"). Inverse-consistency and monotonicity checks are properties of the
 * method ("derived"); temperature and elevation directions are common practice. Aircraft and site are
 * the invented ones of examples/demo-study.json.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { InputDomainError } from '../../core/errors.js';
import { payloadForRange, rangeForPayload, type ReservePolicy } from '../../core/route/index.js';
import {
  assessExistingRunway, declaredNeeds, existingRunwayCheckOf, exceededDistances, fieldLengthComponents, maxLandingMassForLda,
  maxTakeoffMassForRunway, routePenalty, MAX_CLEARWAY_M, TAKEOFF_MASS_TOL_KG, type DeclaredTakeoffDistances,
  type MaxTakeoffMassInput,
} from '../../core/runwayCheck.js';
import { analyseLanding } from '../../core/landing.js';
import { analyseTakeoff } from '../../core/takeoff/index.js';
import { expectClose } from '../helpers/close.js';
import { byId, fleet, numbers } from './takeoff/fixtures.js';

/** A runway-check note list as SI text. */
const notesText = (ns?: readonly Notice[]): string => (ns ?? []).map(siText).join(' ');

const TERN = byId('tern-rj90');
const CURLEW = byId('curlew-rt70');
const ALBATROSS = byId('albatross-nb180');
const C45: ReservePolicy = { kind: 'cruise-45min' };

/** Demo site: 1346 m, 35 °C; runway 12 falls 7.6 m over 2600 m (profile 1346.0 → 1338.4 m): slope −7.6/2600 (derived). */
const SITE = { pressureAltitude_m: 1346, temperature_c: 35, headwind_mps: 0, surface: 'dry' as const };
const SLOPE_12 = -7.6 / 2600;
const RWY_12 = { designator: '12', tora_m: 2600, toda_m: 2750, asda_m: 2600, lda_m: 2600 };
/** Runway 22 of the demo: 1400/1460/1400/1320, rising 2.1 m over 1400 m the other way → slope −2.1/1400. */
const RWY_22 = { designator: '22', tora_m: 1400, toda_m: 1460, asda_m: 1400, lda_m: 1320 };
const SLOPE_22 = -2.1 / 1400;

function allFinite(v: unknown): void {
  for (const [path, x] of numbers(v)) expect(Number.isFinite(x), `${path} = ${x}`).toBe(true);
}

describe('fieldLengthComponents — Horonjeff eqs 2-4 … 2-14 (hand-worked cases, invented round numbers)', () => {
  it('case A: accelerate-stop governs, stopway, no clearway', () => {
    // D35_AEO 2000, LOD_AEO 1600, D35_OEI 2400, LOD_OEI 1900, DAS 2500, SD 1200 (all m).
    // TOD1 = 1.15·2000 = 2300; CL1max = ½(2300 − 1.15·1600) = ½(2300 − 1840) = 230; TOR1 = 2300 − 230 = 2070
    // TOD2 = 2400; CL2max = ½(2400 − 1900) = 250; TOR2 = 2400 − 250 = 2150
    // LD = 1200/0.6 = 2000
    // FL = max(2300, 2400, 2500, 2000) = 2500 (DAS); FS = max(2070, 2150, 2000) = 2150
    // SW = 2500 − 2150 = 350; CL = min(2500 − 2500, 230, 250) = 0; FS + SW + CL = 2500 = FL
    const c = fieldLengthComponents({
      allEnginesToScreen_m: 2000, allEnginesLiftoff_m: 1600, engineOut: { toScreen_m: 2400, liftoff_m: 1900 },
      accelerateStop_m: 2500, landingDistance_m: 1200,
    });
    const abs = { abs: 1e-9 };
    expectClose(c.tod1_m, 2300, abs, 'TOD1');
    expectClose(c.cl1max_m, 230, abs, 'CL1max');
    expectClose(c.tor1_m, 2070, abs, 'TOR1');
    expectClose(c.tod2_m!, 2400, abs, 'TOD2');
    expectClose(c.cl2max_m!, 250, abs, 'CL2max');
    expectClose(c.tor2_m!, 2150, abs, 'TOR2');
    expectClose(c.ld_m!, 2000, abs, 'LD');
    expectClose(c.fieldLength_m, 2500, abs, 'FL');
    expect(c.governing).toBe('DAS');
    expectClose(c.fullStrength_m, 2150, abs, 'FS');
    expectClose(c.stopway_m, 350, abs, 'SW');
    expectClose(c.clearway_m, 0, abs, 'CL');
    expectClose(c.takeoffRun_m, 2150, abs, 'TOR need');
    expectClose(c.takeoffDistance_m, 2400, abs, 'TOD need');
    expectClose(c.unallocated_m, 0, abs, 'unallocated');
    expect(c.warnings).toEqual([]);
  });

  it('case B: engine-out distance governs, stopway and clearway', () => {
    // As case A with DAS 2200: FL = max(2300, 2400, 2200, 2000) = 2400 (TOD2); FS = 2150
    // SW = 2200 − 2150 = 50; CL = min(2400 − 2200, 230, 250) = 200; FS + SW + CL = 2400 = FL
    const c = fieldLengthComponents({
      allEnginesToScreen_m: 2000, allEnginesLiftoff_m: 1600, engineOut: { toScreen_m: 2400, liftoff_m: 1900 },
      accelerateStop_m: 2200, landingDistance_m: 1200,
    });
    expectClose(c.fieldLength_m, 2400, { abs: 1e-9 }, 'FL');
    expect(c.governing).toBe('TOD2');
    expectClose(c.stopway_m, 50, { abs: 1e-9 }, 'SW');
    expectClose(c.clearway_m, 200, { abs: 1e-9 }, 'CL');
    expectClose(c.unallocated_m, 0, { abs: 1e-9 }, 'unallocated');
  });

  it('case C: landing governs, stopway floored at zero', () => {
    // As case A with SD 1800: LD = 1800/0.6 = 3000; FL = 3000 (LD); FS = max(2070, 2150, 3000) = 3000
    // SW = max(0, 2500 − 3000) = 0; CL = min(3000 − 2500, 230, 250) = 230
    const c = fieldLengthComponents({
      allEnginesToScreen_m: 2000, allEnginesLiftoff_m: 1600, engineOut: { toScreen_m: 2400, liftoff_m: 1900 },
      accelerateStop_m: 2500, landingDistance_m: 1800,
    });
    expectClose(c.fieldLength_m, 3000, { abs: 1e-9 }, 'FL');
    expect(c.governing).toBe('LD');
    expectClose(c.fullStrength_m, 3000, { abs: 1e-9 }, 'FS');
    expectClose(c.stopway_m, 0, { abs: 1e-9 }, 'SW');
    expectClose(c.clearway_m, 230, { abs: 1e-9 }, 'CL');
  });

  it('case D: clearway capped at 1000 ft', () => {
    // D35_AEO 4000, LOD_AEO 2800, D35_OEI 4800, LOD_OEI 3800, DAS 3000, no landing.
    // TOD1 = 4600; CL1max = ½(4600 − 3220) = 690; TOR1 = 3910; TOD2 = 4800; CL2max = ½(4800 − 3800) = 500; TOR2 = 4300
    // FL = 4800 (TOD2); FS = 4300; SW = max(0, 3000 − 4300) = 0; CL = min(1800, 690, 500) = 500 → cap 304.8
    // unallocated = 4800 − (4300 + 0 + 304.8) = 195.2
    const c = fieldLengthComponents({
      allEnginesToScreen_m: 4000, allEnginesLiftoff_m: 2800, engineOut: { toScreen_m: 4800, liftoff_m: 3800 },
      accelerateStop_m: 3000,
    });
    expectClose(c.tor1_m, 3910, { abs: 1e-9 }, 'TOR1');
    expectClose(c.clearway_m, 304.8, { abs: 1e-9 }, 'CL capped (1000 ft exact: 304.8 m)');
    expect(MAX_CLEARWAY_M).toBe(304.8);
    expectClose(c.unallocated_m, 195.2, { abs: 1e-9 }, 'unallocated');
    expect(c.warnings.length).toBe(2);
    expect(c.ld_m).toBeUndefined();
  });

  it('case E: all engines only (no engine-out, no accelerate-stop)', () => {
    // D35_AEO 1000, LOD_AEO 700: TOD1 = 1150; CL1max = ½(1150 − 805) = 172.5; TOR1 = 977.5
    // FL = 1150; FS = 977.5; SW = 0; CL = min(CL1max) = 172.5; FS + CL = 1150
    const c = fieldLengthComponents({ allEnginesToScreen_m: 1000, allEnginesLiftoff_m: 700 });
    expectClose(c.fieldLength_m, 1150, { abs: 1e-9 }, 'FL');
    expectClose(c.fullStrength_m, 977.5, { abs: 1e-9 }, 'FS');
    expectClose(c.clearway_m, 172.5, { abs: 1e-9 }, 'CL');
    expect(c.tod2_m).toBeUndefined();
  });

  it('bad input throws InputDomainError naming the field', () => {
    expect(() => fieldLengthComponents({ allEnginesToScreen_m: 1000, allEnginesLiftoff_m: 1200 })).toThrow(/allEnginesLiftoff_m/);
    expect(() => fieldLengthComponents({ allEnginesToScreen_m: Number.NaN, allEnginesLiftoff_m: 700 })).toThrow(InputDomainError);
    expect(() => fieldLengthComponents({ allEnginesToScreen_m: 1000, allEnginesLiftoff_m: 700, accelerateStop_m: -5 })).toThrow(/accelerateStop_m/);
  });
});

describe('declared needs agree with the takeoff engine\'s 25.113 pieces (derived: TOR1 = 1.15·(D35 + LOD)/2, TOR2 = (D35 + LOD)/2 engine out)', () => {
  for (const a of fleet.filter((x) => x.certification !== 'normal')) {
    it(a.id, () => {
      const r = analyseTakeoff({ aircraft: a, mass_kg: 0.95 * a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry' });
      if (!r.feasible) throw new Error(siText(r.message));
      const n = declaredNeeds(r);
      expect(n.basis).toBe('field-components');
      expectClose(n.takeoffRun_m, r.declared.takeoffRun_m, { rel: 1e-12 }, 'TOR');
      expectClose(n.takeoffDistance_m, r.declared.takeoffDistance_m, { rel: 1e-12 }, 'TOD');
      if (r.engineOut) expectClose(n.accelerateStop_m!, r.engineOut.accelerateStop_m, { rel: 1e-12 }, 'ASD');
    });
  }
});

type Case = { label: string } & MaxTakeoffMassInput;
const CASES: Case[] = [
  { label: 'tern-rj90, demo site, runway 12', aircraft: TERN, ...SITE, slope: SLOPE_12, direction: RWY_12 },
  { label: 'tern-rj90, demo site, runway 22', aircraft: TERN, ...SITE, slope: SLOPE_22, direction: RWY_22 },
  { label: 'albatross-nb180, demo site, runway 12', aircraft: ALBATROSS, ...SITE, slope: SLOPE_12, direction: RWY_12 },
  { label: 'curlew-rt70, demo site, runway 22', aircraft: CURLEW, ...SITE, slope: SLOPE_22, direction: RWY_22 },
  { label: 'swift-bj8, demo site, runway 22', aircraft: byId('swift-bj8'), ...SITE, slope: SLOPE_22, direction: RWY_22 },
  { label: 'plover-ct19, demo site, runway 22', aircraft: byId('plover-ct19'), ...SITE, slope: SLOPE_22, direction: RWY_22 },
  { label: 'albatross-nb180, sea level 25 °C, 1800 m', aircraft: ALBATROSS, pressureAltitude_m: 0, temperature_c: 25, headwind_mps: 0, surface: 'dry', slope: 0, direction: { tora_m: 1800, toda_m: 1800, asda_m: 1800 } },
  { label: 'pipit-lt2 (normal category), demo site, runway 22', aircraft: byId('pipit-lt2'), ...SITE, slope: SLOPE_22, direction: { tora_m: 650, toda_m: 670, asda_m: 650 } },
];

function needsAt(c: MaxTakeoffMassInput, mass_kg: number) {
  const r = analyseTakeoff({
    aircraft: c.aircraft, mass_kg, pressureAltitude_m: c.pressureAltitude_m, temperature_c: c.temperature_c, slope: c.slope,
    headwind_mps: c.headwind_mps, surface: c.surface,
  });
  return { r, needs: r.feasible ? declaredNeeds(r) : undefined };
}

describe('maxTakeoffMassForRunway — inverse consistency (derived)', () => {
  for (const c of CASES) {
    it(c.label, () => {
      const m = maxTakeoffMassForRunway(c);
      allFinite(m);
      expect(m.status).toBe('ok');
      const max = m.maxTakeoffMass_kg!;
      const at = needsAt(c, max);
      expect(at.needs, 'feasible at the greatest mass').toBeDefined();
      const d: DeclaredTakeoffDistances = c.direction;
      expect(at.needs!.takeoffRun_m).toBeLessThanOrEqual(d.tora_m + 0.5);
      expect(at.needs!.takeoffDistance_m).toBeLessThanOrEqual(d.toda_m + 0.5);
      if (at.needs!.accelerateStop_m !== undefined) expect(at.needs!.accelerateStop_m).toBeLessThanOrEqual(d.asda_m + 0.5);
      if (m.limitedBy === 'MTOW') {
        expect(max).toBe(c.aircraft.mtow_kg);
      } else if (m.limitedBy === 'climb') {
        expect(max).toBe(m.climbLimitMass_kg);
        expect(at.r.climb.gradient).toBeGreaterThanOrEqual(at.r.climb.minimum - 1e-6);
        expect(needsAt(c, max + TAKEOFF_MASS_TOL_KG).r.climb.limited).toBe(true);
      } else {
        expect(['TORA', 'TODA', 'ASDA']).toContain(m.limitedBy);
        const heavier = needsAt(c, max + TAKEOFF_MASS_TOL_KG);
        if (heavier.needs) {
          const over = exceededDistances(heavier.needs, d);
          expect(over.length, '10 kg heavier exceeds a declared distance').toBeGreaterThan(0);
          expect(over).toContain(m.limitedBy);
        } else {
          expect(heavier.r.feasible).toBe(false);
        }
        expect(m.refusedMass_kg! - max).toBeLessThanOrEqual(TAKEOFF_MASS_TOL_KG);
      }
    });
  }
});

describe('maxTakeoffMassForRunway — binding limits', () => {
  it('MTOW binds on a long runway at sea level, ISA', () => {
    const m = maxTakeoffMassForRunway({ aircraft: TERN, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry', direction: { tora_m: 3000, toda_m: 3000, asda_m: 3000 } });
    expect(m.limitedBy).toBe('MTOW');
    expect(m.maxTakeoffMass_kg).toBe(TERN.mtow_kg);
  });

  it('climb binds: curlew-rt70 at the demo site on runway 12 (V2 gradient below 2.4 % at MTOW, 14 CFR 25.121(b) from memory)', () => {
    const top = analyseTakeoff({ aircraft: CURLEW, mass_kg: CURLEW.mtow_kg, ...SITE, slope: SLOPE_12 });
    expect(top.climb.limited).toBe(true);
    const m = maxTakeoffMassForRunway({ aircraft: CURLEW, ...SITE, slope: SLOPE_12, direction: RWY_12 });
    expect(m.limitedBy).toBe('climb');
    expect(m.maxTakeoffMass_kg).toBe(top.climb.maxMass_kg);
  });

  it('no mass fits a very short runway → none-feasible, a result with a message', () => {
    const m = maxTakeoffMassForRunway({ aircraft: TERN, ...SITE, slope: 0, direction: { tora_m: 400, toda_m: 400, asda_m: 400 } });
    expect(m.status).toBe('none-feasible');
    expect(m.limitedBy).toBe('none-feasible');
    expect(m.maxTakeoffMass_kg).toBeUndefined();
    expect(siText(m.message).length).toBeGreaterThan(0);
    allFinite(m);
  });

  it('climb fails even at OEW → none-feasible by climb', () => {
    const weak: AircraftProfile = { ...TERN, id: 'tern-weak', staticThrust_N: TERN.staticThrust_N! * 0.55 };
    const m = maxTakeoffMassForRunway({ aircraft: weak, ...SITE, slope: 0, direction: RWY_12 });
    expect(m.status).toBe('none-feasible');
    expect(m.limitedBy).toBe('climb');
  });

  it('bad input throws InputDomainError naming the field', () => {
    expect(() => maxTakeoffMassForRunway({ aircraft: TERN, ...SITE, slope: 0, direction: { tora_m: 0, toda_m: 2000, asda_m: 2000 } })).toThrow(/direction\.tora_m/);
    expect(() => maxTakeoffMassForRunway({ aircraft: TERN, ...SITE, slope: 0, direction: RWY_12, minMass_kg: 1000 })).toThrow(/minMass_kg/);
  });
});

describe('maxTakeoffMassForRunway — monotone in temperature and elevation (common practice; fast-check, ≤ 30 runs)', () => {
  const base = { aircraft: TERN, headwind_mps: 0, surface: 'dry' as const, slope: SLOPE_12, direction: RWY_12 };
  const mass = (pa: number, t: number): number => {
    const m = maxTakeoffMassForRunway({ ...base, pressureAltitude_m: pa, temperature_c: t });
    return m.maxTakeoffMass_kg ?? 0;
  };
  it('hotter never allows more (within the 10 kg tolerance)', () => {
    fc.assert(fc.property(
      fc.double({ min: 0, max: 2000, noNaN: true }), fc.double({ min: 0, max: 45, noNaN: true }), fc.double({ min: 0, max: 45, noNaN: true }),
      (pa, t1, t2) => {
        const [lo, hi] = t1 <= t2 ? [t1, t2] : [t2, t1];
        expect(mass(pa, hi)).toBeLessThanOrEqual(mass(pa, lo) + TAKEOFF_MASS_TOL_KG);
      },
    ), { numRuns: 25, seed: 4201 });
  });
  it('higher never allows more (within the 10 kg tolerance)', () => {
    fc.assert(fc.property(
      fc.double({ min: 0, max: 40, noNaN: true }), fc.double({ min: 0, max: 2500, noNaN: true }), fc.double({ min: 0, max: 2500, noNaN: true }),
      (t, h1, h2) => {
        const [lo, hi] = h1 <= h2 ? [h1, h2] : [h2, h1];
        expect(mass(hi, t)).toBeLessThanOrEqual(mass(lo, t) + TAKEOFF_MASS_TOL_KG);
      },
    ), { numRuns: 25, seed: 4202 });
  });
});

describe('maxLandingMassForLda — inverse consistency (derived)', () => {
  it('tern-rj90, LDA 1500 m at the demo site: required ≤ LDA at the mass, > LDA 10 kg heavier', () => {
    const m = maxLandingMassForLda({ aircraft: TERN, pressureAltitude_m: 1346, surface: 'dry', lda_m: 1500 });
    expect(m.limitedBy).toBe('LDA');
    const max = m.maxLandingMass_kg!;
    const at = analyseLanding({ aircraft: TERN, mass_kg: max, pressureAltitude_m: 1346, slope: 0, headwind_mps: 0, surface: 'dry' });
    const over = analyseLanding({ aircraft: TERN, mass_kg: max + 10, pressureAltitude_m: 1346, slope: 0, headwind_mps: 0, surface: 'dry' });
    if (at.status !== 'ok' || over.status !== 'ok') throw new Error('landing infeasible');
    expect(at.required_m).toBeLessThanOrEqual(1500 + 0.5);
    expect(over.required_m).toBeGreaterThan(1500);
    allFinite(m);
  });
  it('a long LDA allows MLW; a very short one allows nothing', () => {
    expect(maxLandingMassForLda({ aircraft: TERN, pressureAltitude_m: 1346, surface: 'dry', lda_m: 2600 }).limitedBy).toBe('MLW');
    const none = maxLandingMassForLda({ aircraft: TERN, pressureAltitude_m: 1346, surface: 'dry', lda_m: 300 });
    expect(none.status).toBe('none-feasible');
    expect(none.maxLandingMass_kg).toBeUndefined();
  });
  it('a wet runway allows less than a dry one (121.195(d) ×1.15 for turbojets, 14 CFR 121.195 and 135.385)', () => {
    const dry = maxLandingMassForLda({ aircraft: TERN, pressureAltitude_m: 1346, surface: 'dry', lda_m: 1900 }).maxLandingMass_kg!;
    const wet = maxLandingMassForLda({ aircraft: TERN, pressureAltitude_m: 1346, surface: 'wet', lda_m: 1900 }).maxLandingMass_kg!;
    expect(wet).toBeLessThan(dry);
  });
});

describe('routePenalty (route payloadForRange / rangeForPayload; derived)', () => {
  it('penalty = payload at MTOW − payload at the limited mass; passengers = penalty / passenger mass', () => {
    const stage = 1_200_000;
    const P = 0.8 * CURLEW.maxPayload_kg;
    const limit = 20_000;
    const p = routePenalty({ aircraft: CURLEW, takeoffMass_kg: limit, stageLength_m: stage, payload_kg: P, reserves: C45, passengerMass_kg: 95 });
    const atMtow = Math.min(P, payloadForRange({ aircraft: CURLEW, takeoffMass_kg: CURLEW.mtow_kg, stageLength_m: stage, reserves: C45 }).payload_kg);
    const atLimit = payloadForRange({ aircraft: CURLEW, takeoffMass_kg: limit, stageLength_m: stage, reserves: C45 }).payload_kg;
    expectClose(p.payloadPenalty_kg, atMtow - atLimit, { abs: 1e-9 }, 'payload penalty');
    expectClose(p.passengersPenalty!, (atMtow - atLimit) / 95, { abs: 1e-9 }, 'passengers');
    const range = rangeForPayload({ aircraft: CURLEW, takeoffMass_kg: limit, payload_kg: P, reserves: C45 }).range_m;
    expectClose(p.rangeAtMass_m, range, { abs: 1e-9 }, 'range');
    expectClose(p.rangePenalty_m, Math.max(0, stage - range), { abs: 1e-9 }, 'range penalty');
    expect(p.payloadPenalty_kg).toBeGreaterThan(0);
  });

  it('a stage beyond reach at the limited mass is reported as such', () => {
    // Ferry reach (zero payload) at the limited mass, then a stage 20 % beyond it.
    const limit = 30_000;
    const reach = rangeForPayload({ aircraft: TERN, takeoffMass_kg: limit, payload_kg: 0, reserves: C45 }).range_m;
    const p = routePenalty({ aircraft: TERN, takeoffMass_kg: limit, stageLength_m: 1.2 * reach, payload_kg: 2000, reserves: C45 });
    expect(p.status).toBe('beyond-reach');
    expect(p.payloadAtMass_kg).toBe(0);
    expect(notesText(p.note)).toMatch(/beyond reach/);
    allFinite(p);
  });

  it('a stage beyond reach even at MTOW is reported, with no penalty counted against the runway', () => {
    const reach = rangeForPayload({ aircraft: TERN, takeoffMass_kg: TERN.mtow_kg, payload_kg: 0, reserves: C45 }).range_m;
    const p = routePenalty({ aircraft: TERN, takeoffMass_kg: 36_000, stageLength_m: 1.1 * reach, payload_kg: 2000, reserves: C45 });
    expect(p.status).toBe('beyond-reach');
    expect(p.payloadPenalty_kg).toBe(0);
    expect(notesText(p.note)).toMatch(/even at MTOW/);
  });
});

describe('assessExistingRunway — the demo site (examples/demo-study.json; derived consistency)', () => {
  const route = { stageLength_m: 1_200_000, reserves: C45, passengerMass_kg: 95 };

  it('tern-rj90 on runway 12: fits at its design mass; the greatest mass is TODA-limited below MTOW', () => {
    const P = 0.8 * TERN.maxPayload_kg;
    const tow = 34_000;
    const r = assessExistingRunway({
      aircraft: TERN, runway: '12/30', direction: { ...RWY_12, slope: SLOPE_12 }, ...SITE, takeoffMass_kg: tow, payload_kg: P, ...route,
    });
    allFinite(r);
    expect(r.takeoffOk).toBe(true);
    expect(r.landingOk).toBe(true);
    expect(r.takeoffDistanceNeeded_m!).toBeLessThanOrEqual(r.toda_m);
    expect(r.maxTakeoffMass_kg!).toBeGreaterThan(tow);
    // Since the takeoff model revision the jet's greatest mass here is below MTOW (the declared
    // distance binds before the engine-out climb limit of about 35.6 t at 35 °C): the check fits at
    // 34 t but names the limit and the payload it costs against a departure at MTOW.
    expect(r.limitedBy).toBe('TODA');
    expect(r.maxTakeoffMass_kg!).toBeLessThan(TERN.mtow_kg);
    expect(r.payloadPenalty_kg!).toBeGreaterThan(0);
    expect(r.maxLandingMass_kg).toBe(TERN.mlw_kg);
    const plain = existingRunwayCheckOf(r);
    expect(Object.keys(plain)).not.toContain('takeoffMass');
    expect(plain.maxTakeoffMass_kg).toBe(r.maxTakeoffMass_kg);
    expect(plain.limitedBy).toBe(r.limitedBy);
  });

  it('curlew-rt70 on runway 12 above its climb-limited mass: not ok, limited by climb, payload and range penalties', () => {
    // Full payload: its climb-limited mass at the site is close to MTOW (97 %), so only a full cabin loses payload.
    const P = CURLEW.maxPayload_kg;
    const r = assessExistingRunway({
      aircraft: CURLEW, runway: '12/30', direction: RWY_12, slope: SLOPE_12, ...SITE, takeoffMass_kg: 22_600, payload_kg: P, ...route,
    });
    allFinite(r);
    expect(r.takeoffOk).toBe(false);
    expect(r.limitedBy).toBe('climb');
    expect(r.payloadPenalty_kg!).toBeGreaterThan(0);
    expectClose(r.passengersPenalty!, r.payloadPenalty_kg! / 95, { rel: 1e-12 }, 'passengers');
    expect(r.rangePenalty_km!).toBeGreaterThan(0);
    expect(notesText(r.note)).toMatch(/climb/);
  });

  it('albatross-nb180 on runway 22 (1400 m): no mass fits (even at OEW the accelerate-stop exceeds ASDA), said in the note; no NaN', () => {
    const r = assessExistingRunway({
      aircraft: ALBATROSS, runway: '04/22', direction: RWY_22, slope: SLOPE_22, ...SITE, takeoffMass_kg: ALBATROSS.mtow_kg,
      payload_kg: 0.8 * ALBATROSS.maxPayload_kg, ...route,
    });
    allFinite(r);
    expect(r.takeoffOk).toBe(false);
    expect(r.maxTakeoffMass_kg).toBeUndefined();
    expect(notesText(r.note)).toMatch(/No mass from [\d,]+ kg to [\d,]+ kg fits the declared distances/);
    const m = maxTakeoffMassForRunway({ aircraft: ALBATROSS, ...SITE, slope: SLOPE_22, direction: RWY_22 });
    expect(m.status).toBe('none-feasible');
    expect(siText(m.message)).toMatch(/exceeds ASDA/);
  });

  it('bad input: slope missing, partial route, zero TORA', () => {
    const base = { aircraft: TERN, runway: '12/30', ...SITE, takeoffMass_kg: 34_000 };
    expect(() => assessExistingRunway({ ...base, direction: RWY_12 })).toThrow(/direction\.slope/);
    expect(() => assessExistingRunway({ ...base, direction: RWY_12, slope: 0, stageLength_m: 1_000_000 })).toThrow(/stageLength_m/);
    expect(() => assessExistingRunway({ ...base, direction: { ...RWY_12, tora_m: 0 }, slope: 0 })).toThrow(InputDomainError);
  });
});
