/**
 * Design weight from the route (core/route): Breguet forms, reserve policies, design takeoff mass,
 * payload-range corners and the inverse helpers.
 *
 * Check values: Aeronautical Engineer’s Data Book ch. 9 prop example and §11 case 32 (both derived, [D]); the design
 * masses and corner stage lengths were derived by an independent forward evaluation of §9.3 in Python
 * (reserve legs integrated backwards from W_ZF by RK4, fixed-point iteration for the contingency,
 * bisection for the corners — no closed-form inverses), quoted below with the inputs; the aircraft are
 * the invented types of examples/demo-study.json.
 *
 * Method route-breguet-2 (issue 13 item 15) moved every design mass: trip fuel now carries a
 * climb/descent allowance (δ × TOW; default turbofan 1.0 %, turboprop 0.6 %, piston 0.4 %, from memory /
 * common practice) and 'cruise-45min' carries a 200 NM alternate by default (14 CFR 121.639 / 91.167
 * carry one; the distance is from memory / common practice). The pinned values below are the forward
 * evaluation of that model.
 */
import { siText } from '../../core/notices.js';
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { InputDomainError } from '../../core/errors.js';
import {
  ALTERNATE_DEFAULT_M, CLIMB_DESCENT_FRACTION_DEFAULTS, ROUTE_METHOD_VERSION,
  breguetCpFromBsfc, breguetCtFromTsfcPerHour, breguetJetEndurance, breguetJetEnduranceWeightRatio,
  breguetJetRange, breguetJetWeightRatio, breguetPropEndurance, breguetPropEnduranceWeightRatio,
  breguetPropRange, breguetPropWeightRatio, designTakeoffMass, payloadForRange, payloadRangeDiagram,
  rangeForPayload, resolveReserves, INTERNATIONAL_ALTERNATE_DEFAULT_M, type ReservePolicy, type RouteResult,
} from '../../core/route/index.js';
import { expectClose } from '../helpers/close.js';

const FLEET = JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8')).aircraft as AircraftProfile[];
const byId = (id: string): AircraftProfile => {
  const a = FLEET.find((x) => x.id === id);
  if (!a) throw new Error(`demo aircraft ${id} missing`);
  return a;
};
const TERN = byId('tern-rj90');
const CURLEW = byId('curlew-rt70');
const SWIFT = byId('swift-bj8');
const C45: ReservePolicy = { kind: 'cruise-45min' };
const INTL: ReservePolicy = { kind: 'international' };
/** A demo type with a holding fuel flow of its own (3 % of MTOW per hour: invented, in the field's 20–20 000 kg/h). */
const withHoldFlow = (a: AircraftProfile, ff = 0.03 * a.mtow_kg): AircraftProfile => ({ ...a, id: `${a.id}-ff`, cruise: { ...a.cruise!, holdFuelFlow_kgph: ff } });

function expectDomainError(fn: () => unknown, field: string): void {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(InputDomainError);
    expect((e as InputDomainError).field).toBe(field);
    return;
  }
  expect.fail(`expected InputDomainError on ${field}`);
}

/** fast-check: the inverse helpers agree with designTakeoffMass for random takeoff masses and stages. */
function expectInverseConsistency(a: AircraftProfile, reserves: ReservePolicy): void {
  fc.assert(
    fc.property(fc.double({ min: 0.85, max: 1, noNaN: true }), fc.double({ min: 1000, max: 8_000_000, noNaN: true }), (towFrac, s) => {
      const tow = towFrac * a.mtow_kg;
      const p = payloadForRange({ aircraft: a, takeoffMass_kg: tow, stageLength_m: s, reserves });
      if (p.status === 'cannot-fly') {
        const r = designTakeoffMass({ aircraft: a, stageLength_m: s, payload_kg: 0, reserves });
        return r.status !== 'ok' || r.designTakeoffMass_kg > tow;
      }
      const P = Math.min(p.payload_kg, a.maxPayload_kg);
      const r = designTakeoffMass({ aircraft: a, stageLength_m: s, payload_kg: P, reserves });
      const g = rangeForPayload({ aircraft: a, takeoffMass_kg: tow, payload_kg: P, reserves });
      return r.status === 'ok' && r.designTakeoffMass_kg <= tow + 1e-6 && g.status === 'ok' && g.range_m >= s * (1 - 1e-9);
    }),
    { numRuns: 150 },
  );
}

/** Every number anywhere in a result is finite. */
function allFinite(x: unknown, path = 'result'): string[] {
  if (typeof x === 'number') return Number.isFinite(x) ? [] : [path];
  if (Array.isArray(x)) return x.flatMap((v, i) => allFinite(v, `${path}[${i}]`));
  if (x && typeof x === 'object') return Object.entries(x).flatMap(([k, v]) => allFinite(v, `${path}.${k}`));
  return [];
}

describe('Breguet forms — Aeronautical Engineer’s Data Book ch. 9, §11 case 32 (derived)', () => {
  const ct = breguetCtFromTsfcPerHour(0.6);

  it('case 32: 2000 km, V 230 m/s, L/D 16, TSFC 0.6/h → ln(Wi/Wf) = 0.09058 (§11 case 32, derived)', () => {
    expectClose(ct, 1.6667e-4, { rel: 1e-4 }, 'c_T (§9.1: 0.6 h⁻¹ = 1.6667e-4 s⁻¹)');
    const r = breguetJetWeightRatio({ speed_mps: 230, liftToDrag: 16, ct_perS: ct, range_m: 2_000_000 });
    expectClose(Math.log(r), 0.09058, { abs: 5e-6 }, 'ln(Wi/Wf)');
    expectClose(breguetJetRange({ speed_mps: 230, liftToDrag: 16, ct_perS: ct, weightRatio: r }), 2_000_000, { rel: 1e-12 }, 'inverse');
  });

  it('propeller: BSFC 0.25 kg/kWh, η 0.8, L/D 15, Wf/Wi 0.9 → c_P 6.81e-7 1/m, R 1857 km (§9.1 prop example, derived)', () => {
    const cp = breguetCpFromBsfc(0.25);
    expectClose(cp, 6.81e-7, { rel: 1e-3 }, 'c_P');
    const R = breguetPropRange({ propEfficiency: 0.8, liftToDrag: 15, cp_perM: cp, weightRatio: 1 / 0.9 });
    expectClose(R, 1_857_000, { abs: 500 }, 'range');
    expectClose(breguetPropWeightRatio({ propEfficiency: 0.8, liftToDrag: 15, cp_perM: cp, range_m: R }), 1 / 0.9, { rel: 1e-12 }, 'inverse');
  });

  it('jet endurance: L/D 17, 0.6/h, 30 min → ln(Wi/Wf) = 0.0176471 (§9.1 endurance form, derived)', () => {
    const r = breguetJetEnduranceWeightRatio({ liftToDrag: 17, ct_perS: ct, endurance_s: 1800 });
    expectClose(Math.log(r), 1800 * (0.6 / 3600) / 17, { rel: 1e-12 }, 'ln ratio');
    expectClose(Math.log(r), 0.0176471, { abs: 1e-7 }, 'ln ratio (value)');
    expectClose(breguetJetEndurance({ liftToDrag: 17, ct_perS: ct, weightRatio: r }), 1800, { rel: 1e-12 }, 'inverse');
  });

  it('propeller endurance at constant speed is the propeller range divided by that speed (derived from §9.1)', () => {
    const cp = breguetCpFromBsfc(0.25);
    const E = breguetPropEndurance({ propEfficiency: 0.8, liftToDrag: 15, cp_perM: cp, speed_mps: 100, weightRatio: 1 / 0.9 });
    expectClose(E, 1_856_525.63 / 100, { rel: 1e-8 }, 'endurance s');
    const r = breguetPropEnduranceWeightRatio({ propEfficiency: 0.8, liftToDrag: 15, cp_perM: cp, speed_mps: 100, endurance_s: E });
    expectClose(r, 1 / 0.9, { rel: 1e-12 }, 'inverse');
  });

  it('rejects a weight ratio below 1 and a zero L/D', () => {
    expectDomainError(() => breguetJetRange({ speed_mps: 230, liftToDrag: 16, ct_perS: ct, weightRatio: 0.9 }), 'weightRatio');
    expectDomainError(() => breguetJetRange({ speed_mps: 230, liftToDrag: 0, ct_perS: ct, weightRatio: 1.1 }), 'liftToDrag');
  });
});

describe('design takeoff mass — §9.3 closed form vs an independent forward evaluation (derived)', () => {
  // Python forward evaluation: W_ZF → reserves as if flown → contingency by fixed-point → ×e^{κ·s}.
  const cases: [string, AircraftProfile, ReservePolicy, { TO: number; trip: number; cont: number; res: number; arr: number }][] = [
    // route-breguet-1 (cruise only, cruise-45min without alternate) gave tern C45 TO 34009.3831, INTL
    // 34340.0055; curlew C45 21395.4658, INTL 21791.5109.
    ['tern-rj90, 1200 km, 7600 kg, cruise-45min', TERN, C45, { TO: 34985.8317, trip: 2282.2231, cont: 114.1112, res: 1489.4974, arr: 32703.6086 }],
    ['tern-rj90, 1200 km, 7600 kg, international', TERN, INTL, { TO: 34686.8742, trip: 2262.7212, cont: 185.6054, res: 1138.5476, arr: 32424.153 }],
    ['curlew-rt70, 1200 km, 5760 kg, cruise-45min', CURLEW, C45, { TO: 22048.9606, trip: 1754.8142, cont: 87.7407, res: 946.4057, arr: 20294.1464 }],
    ['curlew-rt70, 1200 km, 5760 kg, international', CURLEW, INTL, { TO: 21923.0492, trip: 1744.7933, cont: 154.6055, res: 763.6504, arr: 20178.2559 }],
  ];
  for (const [label, a, reserves, x] of cases) {
    it(label, () => {
      const r = designTakeoffMass({ aircraft: a, stageLength_m: 1_200_000, payload_kg: 0.8 * a.maxPayload_kg, reserves });
      expect(r.status).toBe('ok');
      const l = r.loading;
      expectClose(l.takeoffMass_kg, x.TO, { abs: 1e-3 }, 'takeoff mass');
      expectClose(l.tripFuel_kg, x.trip, { abs: 1e-3 }, 'trip fuel');
      expectClose(l.contingencyFuel_kg, x.cont, { abs: 1e-3 }, 'contingency');
      expectClose(l.reserveFuel_kg, x.res, { abs: 1e-3 }, 'reserves');
      expectClose(l.arrivalMass_kg, x.arr, { abs: 1e-3 }, 'arrival');
      expectClose(l.rampMass_kg, x.TO + a.cruise!.taxiFuel_kg, { abs: 1e-3 }, 'ramp mass = TOW + taxi');
      expectClose(l.takeoffMass_kg, l.zeroFuelMass_kg + l.tripFuel_kg + l.contingencyFuel_kg + l.reserveFuel_kg, { abs: 1e-6 }, 'mass balance');
      expectClose(l.arrivalMass_kg, l.takeoffMass_kg - l.tripFuel_kg, { abs: 1e-6 }, 'arrival = TOW − trip (§9.3)');
      expectClose(l.reserveFuel_kg, l.alternateFuel_kg + l.finalReserveFuel_kg, { abs: 1e-6 }, 'reserve split');
      expect(r.designTakeoffMass_kg).toBe(l.takeoffMass_kg);
      expect(r.trace.length).toBeGreaterThan(5);
    });
  }

  it('contingency is 5 % of trip fuel for cruise-45min (aircraft contingencyFraction)', () => {
    const r = designTakeoffMass({ aircraft: TERN, stageLength_m: 1_200_000, payload_kg: 7600, reserves: C45 });
    expectClose(r.loading.contingencyFuel_kg, 0.05 * r.loading.tripFuel_kg, { rel: 1e-12 }, 'contingency');
  });
});

describe('payload-range corners — §9.4 (derived)', () => {
  for (const a of FLEET) {
    it(`${a.id}: corners consistent with each other and with designTakeoffMass`, () => {
      const d = payloadRangeDiagram({ aircraft: a, reserves: C45 });
      const { A, B, C, D } = d.corners;
      expect(d.status).toBe('ok');
      expect(A.stageLength_m).toBe(0);
      if (A.payload_kg < a.maxPayload_kg - 1e-6) {
        // Degenerate: the reserves (200 NM alternate + 45 min) do not fit on top of the maximum payload
        // (heron-st1: MLW 3700 kg < MZFW 3600 kg + reserves), so B collapses onto A, with a warning.
        expect(A.limitedBy).not.toBe('max-payload');
        expect(d.warnings.map(siText).join(' ')).toMatch(/cannot be carried even at zero range/);
        expect(B.coincidesWith).toBe('A');
        expectClose(B.payload_kg, A.payload_kg, { abs: 1e-6 }, 'B payload = A payload');
      } else {
        expectClose(A.payload_kg, a.maxPayload_kg, { abs: 1e-6 }, 'A payload');
        expectClose(B.payload_kg, a.maxPayload_kg, { abs: 1e-6 }, 'B payload');
        expect(B.stageLength_m).toBeGreaterThan(0);
      }
      expect(C.stageLength_m).toBeGreaterThanOrEqual(B.stageLength_m);
      expect(D.stageLength_m).toBeGreaterThanOrEqual(C.stageLength_m);
      expectClose(D.payload_kg, 0, { abs: 1e-6 }, 'D payload');
      for (const k of [B, C, D]) {
        if (k.activeLimits.includes('mtow')) {
          expectClose(a.oew_kg + k.payload_kg + k.takeoffFuel_kg, a.mtow_kg, { abs: 1e-6 }, `${k.label}: OEW + payload + fuel = MTOW`);
        }
        if (k.activeLimits.includes('max-fuel')) expectClose(k.rampFuel_kg, a.maxFuel_kg, { abs: 1e-6 }, `${k.label}: full tanks`);
        expect(k.takeoffMass_kg).toBeLessThanOrEqual(a.mtow_kg + 1e-6);
        expect(k.arrivalMass_kg).toBeLessThanOrEqual(a.mlw_kg + 1e-6);
        // designTakeoffMass at the corner stage with the corner payload reproduces the corner masses
        // (a corner collapsed onto A sits at stage 0, below the API's 1 km minimum).
        if (k.stageLength_m < 1000) continue;
        const r = designTakeoffMass({ aircraft: a, stageLength_m: k.stageLength_m, payload_kg: Math.min(a.maxPayload_kg, Math.max(0, k.payload_kg)), reserves: C45 });
        expect(r.status, `${k.label}: ${r.reason ?? ''}`).toBe('ok');
        expectClose(r.designTakeoffMass_kg, k.takeoffMass_kg, { abs: 1e-5 }, `${k.label}: TOW`);
        expectClose(r.loading.rampFuel_kg, k.rampFuel_kg, { abs: 1e-5 }, `${k.label}: fuel`);
      }
      if (C.coincidesWith !== 'D') {
        expect(C.activeLimits).toEqual(expect.arrayContaining(['mtow', 'max-fuel']));
        expect(D.stageLength_m).toBeGreaterThan(C.stageLength_m);
      }
      // Curve: sorted, payload non-increasing, each point flies under designTakeoffMass.
      expect(d.points.length).toBeGreaterThanOrEqual(40);
      for (let i = 1; i < d.points.length; i++) {
        const p = d.points[i]!, q = d.points[i - 1]!;
        expect(p.stageLength_m).toBeGreaterThan(q.stageLength_m);
        expect(p.payload_kg).toBeLessThanOrEqual(q.payload_kg + 1e-6);
      }
      for (const p of d.points.filter((_, i) => i % 7 === 3)) {
        const r = designTakeoffMass({ aircraft: a, stageLength_m: p.stageLength_m, payload_kg: Math.max(0, p.payload_kg), reserves: C45 });
        expect(r.status).toBe('ok');
        expectClose(r.designTakeoffMass_kg, p.takeoffMass_kg, { abs: 1e-5 }, 'curve point TOW');
      }
    });
  }

  it('tern-rj90 and curlew-rt70 corner stage lengths match a bisection on the forward model (derived)', () => {
    // route-breguet-1 gave tern B/C/D 3237.9/5016.3/6336.4 km and curlew 1073.9/3250.1/4241.5 km; the
    // climb/descent allowance and the default 200 NM alternate shorten every corner.
    const t = payloadRangeDiagram({ aircraft: TERN, reserves: C45 }).corners;
    expectClose(t.B.stageLength_m, 2_677_788.697, { rel: 1e-9 }, 'tern B');
    expectClose(t.C.stageLength_m, 4_458_069.693, { rel: 1e-9 }, 'tern C');
    expectClose(t.C.payload_kg, 6650, { abs: 1e-6 }, 'tern C payload = MTOW − (maxFuel − taxi) − OEW');
    expectClose(t.D.stageLength_m, 5_779_630.843, { rel: 1e-9 }, 'tern D');
    expectClose(t.D.takeoffMass_kg, 33_350, { abs: 1e-6 }, 'tern D TOW = OEW + maxFuel − taxi');
    const c = payloadRangeDiagram({ aircraft: CURLEW, reserves: C45 }).corners;
    expectClose(c.B.stageLength_m, 628_247.469, { rel: 1e-9 }, 'curlew B');
    expectClose(c.C.stageLength_m, 2_807_339.869, { rel: 1e-9 }, 'curlew C');
    expectClose(c.D.stageLength_m, 3_800_080.434, { rel: 1e-9 }, 'curlew D');
  });

  it('swift-bj8: full tanks do not fit under MTOW even empty, so C coincides with D, MTOW-limited', () => {
    const d = payloadRangeDiagram({ aircraft: SWIFT, reserves: C45 });
    expect(d.corners.C.coincidesWith).toBe('D');
    expect(d.corners.D.activeLimits).toContain('mtow');
    expectClose(d.corners.D.takeoffMass_kg, SWIFT.mtow_kg, { abs: 1e-6 }, 'D at MTOW');
    expect(d.corners.D.rampFuel_kg).toBeLessThan(SWIFT.maxFuel_kg);
  });

  it('sample count is honoured and validated', () => {
    const d = payloadRangeDiagram({ aircraft: TERN, reserves: C45, samples: 5 });
    expect(d.points.length).toBeGreaterThanOrEqual(5);
    expect(d.points.length).toBeLessThanOrEqual(8);
    expectDomainError(() => payloadRangeDiagram({ aircraft: TERN, reserves: C45, samples: 1 }), 'samples');
  });
});

describe('limits and statuses — §9.3 caps (MTOW, fuel capacity, MLW)', () => {
  it('beyond the ferry reach: out-of-range with a reason, zero payload to the farthest reach, finite numbers', () => {
    const r = designTakeoffMass({ aircraft: TERN, stageLength_m: 7_000_000, payload_kg: 5000, reserves: C45 });
    const D = payloadRangeDiagram({ aircraft: TERN, reserves: C45 }).corners.D;
    expect(r.status).toBe('out-of-range');
    expect(r.reason).toMatch(/cannot be flown even with zero payload/);
    expect(r.loading.payload_kg).toBe(0);
    expectClose(r.reachZeroPayload_m, D.stageLength_m, { rel: 1e-12 }, 'reach = ferry range');
    expectClose(r.designTakeoffMass_kg, D.takeoffMass_kg, { abs: 1e-6 }, 'design TOW = ferry TOW');
    expect(r.payloadOffload_kg).toBe(5000);
    expect(allFinite(r)).toEqual([]);
  });

  it('a stage the contingency rule cannot close is out of range with finite numbers', () => {
    // kestrel-ut1, 20 000 km: κ·s = 2.12, e^{κs} − 1 = 7.3; with 20 % of trip fuel as contingency
    // 1 − 0.2·7.3 < 0, so no takeoff mass carries the requested loading (derived).
    const reserves: ReservePolicy = { kind: 'custom', alternateDistance_m: 0, holdMinutes: 30, contingencyFraction: 0.2 };
    const r = designTakeoffMass({ aircraft: byId('kestrel-ut1'), stageLength_m: 20_000_000, payload_kg: 100, reserves });
    expect(r.status).toBe('out-of-range');
    expect(r.uncappedTakeoffMass_kg).toBeUndefined();
    expect(allFinite(r)).toEqual([]);
  });

  it('between B and C with full payload: payload-limited at MTOW, the offload named', () => {
    const r = designTakeoffMass({ aircraft: TERN, stageLength_m: 4_000_000, payload_kg: 9500, reserves: C45 });
    expect(r.status).toBe('payload-limited');
    expect(r.limitedBy).toBe('mtow');
    expect(r.violated).toContain('mtow');
    expectClose(r.designTakeoffMass_kg, TERN.mtow_kg, { abs: 1e-6 }, 'TOW = MTOW');
    expect(r.uncappedTakeoffMass_kg!).toBeGreaterThan(TERN.mtow_kg);
    const p = payloadForRange({ aircraft: TERN, takeoffMass_kg: TERN.mtow_kg, stageLength_m: 4_000_000, reserves: C45 });
    expectClose(r.loading.payload_kg, p.payload_kg, { abs: 1e-6 }, 'payload = payloadForRange at MTOW');
    expectClose(r.payloadOffload_kg, 9500 - p.payload_kg, { abs: 1e-6 }, 'offload');
    expect(r.reason).toMatch(/left behind/);
  });

  it('between C and D: fuel-limited, tanks full', () => {
    const r = designTakeoffMass({ aircraft: TERN, stageLength_m: 5_500_000, payload_kg: 6000, reserves: C45 });
    expect(r.status).toBe('fuel-limited');
    expect(r.limitedBy).toBe('max-fuel');
    expectClose(r.loading.rampFuel_kg, TERN.maxFuel_kg, { abs: 1e-6 }, 'ramp fuel = capacity');
    expect(r.designTakeoffMass_kg).toBeLessThan(TERN.mtow_kg);
  });

  it('arrival above MLW: payload-limited by MLW, landing at MLW', () => {
    const low = { ...TERN, id: 'tern-low-mlw', mlw_kg: 32_000 };
    const r = designTakeoffMass({ aircraft: low, stageLength_m: 1_200_000, payload_kg: 7600, reserves: C45 });
    expect(r.status).toBe('payload-limited');
    expect(r.limitedBy).toBe('mlw');
    expect(r.violated).toEqual(['mlw']);
    expectClose(r.uncappedArrivalMass_kg!, 32703.6086, { abs: 1e-3 }, 'requested arrival (as the §9.3 case above)');
    expectClose(r.loading.arrivalMass_kg, 32_000, { abs: 1e-6 }, 'arrival = MLW');
    expect(r.reason).toMatch(/exceeds MLW/);
  });
});

describe('inverse helpers — closed form, round trips with designTakeoffMass (derived)', () => {
  it('payloadForRange: greatest payload at a takeoff mass; designTakeoffMass with it reaches that mass', () => {
    const p = payloadForRange({ aircraft: TERN, takeoffMass_kg: 38_000, stageLength_m: 2_500_000, reserves: C45 });
    expect(p.status).toBe('ok');
    expect(p.limitedBy).toBe('mtow');
    const r = designTakeoffMass({ aircraft: TERN, stageLength_m: 2_500_000, payload_kg: p.payload_kg, reserves: C45 });
    expectClose(r.designTakeoffMass_kg, 38_000, { abs: 1e-6 }, 'TOW');
  });

  it('payloadForRange: structural maximum on short stages; cannot-fly when even zero payload does not fit', () => {
    expect(payloadForRange({ aircraft: TERN, takeoffMass_kg: TERN.mtow_kg, stageLength_m: 500_000, reserves: C45 }))
      .toMatchObject({ status: 'ok', payload_kg: 9500, limitedBy: 'max-payload' });
    const no = payloadForRange({ aircraft: TERN, takeoffMass_kg: 26_000, stageLength_m: 6_000_000, reserves: C45 });
    expect(no.status).toBe('cannot-fly');
    expect(no.payload_kg).toBe(0);
    expect(no.reason).toBeTruthy();
  });

  it('rangeForPayload: greatest stage; designTakeoffMass at that stage takes off at the given mass', () => {
    const g = rangeForPayload({ aircraft: TERN, takeoffMass_kg: 38_000, payload_kg: 8000, reserves: C45 });
    expect(g.status).toBe('ok');
    expect(g.limitedBy).toBe('mtow');
    const r = designTakeoffMass({ aircraft: TERN, stageLength_m: g.range_m, payload_kg: 8000, reserves: C45 });
    expectClose(r.designTakeoffMass_kg, 38_000, { abs: 1e-5 }, 'TOW');
    expect(rangeForPayload({ aircraft: TERN, takeoffMass_kg: 30_000, payload_kg: 9500, reserves: C45 }).status).toBe('cannot-fly');
  });

  it('property: payloadForRange and rangeForPayload are consistent with designTakeoffMass', () => {
    expectInverseConsistency(TERN, C45);
  });
});

describe('monotonicity and finiteness (fast-check, modest runs)', () => {
  const aircraftArb = fc.constantFrom(...FLEET, ...FLEET.map((a) => withHoldFlow(a)));
  const policyArb = fc.constantFrom<ReservePolicy>(C45, INTL, { kind: 'custom', alternateDistance_m: 100_000, holdMinutes: 30, reserveFlight: 'cruise' });

  it('takeoff mass grows with stage length (uncapped; design TOW when both ok)', () => {
    fc.assert(
      fc.property(aircraftArb, policyArb, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1000, max: 6_000_000, noNaN: true }), fc.double({ min: 1, max: 2_000_000, noNaN: true }),
        (a, pol, frac, s1, ds) => {
          const P = frac * a.maxPayload_kg;
          const r1 = designTakeoffMass({ aircraft: a, stageLength_m: s1, payload_kg: P, reserves: pol });
          const r2 = designTakeoffMass({ aircraft: a, stageLength_m: s1 + ds, payload_kg: P, reserves: pol });
          if (r1.uncappedTakeoffMass_kg !== undefined && r2.uncappedTakeoffMass_kg !== undefined) {
            expect(r2.uncappedTakeoffMass_kg).toBeGreaterThan(r1.uncappedTakeoffMass_kg);
          }
          if (r1.status === 'ok' && r2.status === 'ok') expect(r2.designTakeoffMass_kg).toBeGreaterThan(r1.designTakeoffMass_kg);
          expect(r2.reachWithPayload_m).toBe(r1.reachWithPayload_m);
        }),
      { numRuns: 150 },
    );
  });

  it('takeoff mass grows with payload', () => {
    fc.assert(
      fc.property(aircraftArb, policyArb, fc.double({ min: 0, max: 0.99, noNaN: true }), fc.double({ min: 0.001, max: 1, noNaN: true }), fc.double({ min: 1000, max: 5_000_000, noNaN: true }),
        (a, pol, f1, df, s) => {
          const P1 = f1 * a.maxPayload_kg;
          const P2 = Math.min(a.maxPayload_kg, P1 + df * a.maxPayload_kg);
          const r1 = designTakeoffMass({ aircraft: a, stageLength_m: s, payload_kg: P1, reserves: pol });
          const r2 = designTakeoffMass({ aircraft: a, stageLength_m: s, payload_kg: P2, reserves: pol });
          if (r1.uncappedTakeoffMass_kg !== undefined && r2.uncappedTakeoffMass_kg !== undefined) {
            expect(r2.uncappedTakeoffMass_kg).toBeGreaterThan(r1.uncappedTakeoffMass_kg);
          }
          if (r1.status === 'ok' && r2.status === 'ok') expect(r2.designTakeoffMass_kg).toBeGreaterThan(r1.designTakeoffMass_kg);
          expect(r2.reachWithPayload_m).toBeLessThanOrEqual(r1.reachWithPayload_m);
        }),
      { numRuns: 150 },
    );
  });

  it('no NaN or Infinity anywhere, over the whole input domain', () => {
    fc.assert(
      fc.property(aircraftArb, policyArb, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1000, max: 20_000_000, noNaN: true }), (a, pol, frac, s) => {
        const r: RouteResult = designTakeoffMass({ aircraft: a, stageLength_m: s, payload_kg: frac * a.maxPayload_kg, reserves: pol });
        expect(allFinite(r)).toEqual([]);
        expect(['ok', 'payload-limited', 'fuel-limited', 'out-of-range']).toContain(r.status);
        if (r.status !== 'ok') expect(r.reason).toBeTruthy();
        expect(r.designTakeoffMass_kg).toBeLessThanOrEqual(a.mtow_kg + 1e-6);
        const p = payloadForRange({ aircraft: a, takeoffMass_kg: a.mtow_kg * (0.6 + 0.4 * frac), stageLength_m: s, reserves: pol });
        expect(allFinite(p)).toEqual([]);
      }),
      { numRuns: 200 },
    );
    for (const a of FLEET) for (const reserves of [C45, INTL]) expect(allFinite(payloadRangeDiagram({ aircraft: a, reserves }))).toEqual([]);
  });
});

describe('reserve policies — §9.2 (14 CFR 121.639 / 91.167, 121.645(b)); ordering derived', () => {
  const run = (reserves: ReservePolicy, a = TERN) => designTakeoffMass({ aircraft: a, stageLength_m: 1_200_000, payload_kg: 0.8 * a.maxPayload_kg, reserves });

  it('ordering for tern-rj90 and curlew-rt70 at 1200 km: none < cruise-45min without alternate < international, cruise-45min < with its default alternate', () => {
    for (const a of [TERN, CURLEW]) {
      const none = run({ kind: 'custom', alternateDistance_m: 0, holdMinutes: 0, contingencyFraction: 0 }, a);
      const c45NoAlt = run({ kind: 'cruise-45min', alternateDistance_m: 0 }, a);
      const c45 = run(C45, a);
      const intl = run(INTL, a);
      expect(none.loading.reserveFuel_kg).toBe(0);
      expect(none.loading.contingencyFuel_kg).toBe(0);
      expect(c45NoAlt.designTakeoffMass_kg).toBeGreaterThan(none.designTakeoffMass_kg);
      expect(intl.designTakeoffMass_kg).toBeGreaterThan(c45NoAlt.designTakeoffMass_kg);
      expect(c45.designTakeoffMass_kg).toBeGreaterThan(c45NoAlt.designTakeoffMass_kg);
    }
  });

  it('more holding, a farther alternate or more contingency never lowers the takeoff mass', () => {
    const base = { kind: 'custom', alternateDistance_m: 200_000, holdMinutes: 30, contingencyFraction: 0.05 } as const;
    const b = run(base).designTakeoffMass_kg;
    expect(run({ ...base, holdMinutes: 45 }).designTakeoffMass_kg).toBeGreaterThan(b);
    expect(run({ ...base, alternateDistance_m: 400_000 }).designTakeoffMass_kg).toBeGreaterThan(b);
    expect(run({ ...base, contingencyFraction: 0.1 }).designTakeoffMass_kg).toBeGreaterThan(b);
  });

  it('custom at cruise for 45 min with the aircraft contingency equals cruise-45min', () => {
    const c = run({ kind: 'custom', alternateDistance_m: ALTERNATE_DEFAULT_M, holdMinutes: 45, reserveFlight: 'cruise' });
    expectClose(c.designTakeoffMass_kg, run(C45).designTakeoffMass_kg, { rel: 1e-14 }, 'same TOW');
  });

  it('international defaults: 200 NM alternate (common practice), 30 min hold, 10 % trip time', () => {
    const r = run(INTL);
    expect(r.reserves.alternateDistance_m).toBe(INTERNATIONAL_ALTERNATE_DEFAULT_M);
    expectClose(INTERNATIONAL_ALTERNATE_DEFAULT_M, 370_400, { abs: 1e-9 }, '200 NM');
    expect(r.reserves.reserveTime_s).toBe(1800);
    expect(r.reserves.contingency).toEqual({ basis: 'trip-time', fraction: 0.1 });
    // 10 % of trip time at cruise, flown as if before the reserves (derived): cont = R·(e^{0.1·κ·s} − 1),
    // κ·s = ln(TOW/arrival) − ℓ, ℓ = −ln(1 − δ) (the climb/descent allowance adds fuel, not time).
    const l = r.loading;
    const R = l.zeroFuelMass_kg + l.reserveFuel_kg;
    const ks = Math.log(l.takeoffMass_kg / l.arrivalMass_kg) + Math.log(1 - CLIMB_DESCENT_FRACTION_DEFAULTS.turbofan);
    expectClose(l.contingencyFuel_kg, R * (Math.exp(0.1 * ks) - 1), { rel: 1e-10 }, 'contingency');
  });

  it('propeller holding carries its assumption as a warning, unless the profile gives a holding fuel flow', () => {
    expect(run(INTL, CURLEW).warnings.map(siText).join(' ')).toMatch(/cruise true airspeed/);
    expect(run(INTL, withHoldFlow(CURLEW, 400)).warnings.map(siText).join(' ')).not.toMatch(/cruise true airspeed/);
    expect(run(C45, TERN).warnings).toEqual([]);
  });
});

describe('route fuel beyond cruise (issue 13 item 15): climb/descent, taxi and block fuel, holding fuel flow, default alternate', () => {
  // Check values: the independent Python forward evaluation named in the file header. The issue's
  // "1,384 kg for a 900 km regional-jet stage" is the route-breguet-1 trip fuel (cruise only, no
  // alternate); its class burns about 2,300–2,700 kg block (issue 13, from memory).
  const tern900 = (reserves: ReservePolicy = C45, a = TERN) => designTakeoffMass({ aircraft: a, stageLength_m: 900_000, payload_kg: 7000, reserves });

  it('tern-rj90, 900 km, 7000 kg, cruise-45min: trip 1747.95 kg (was 1384.49), block 1897.95 kg, TOW 33 796.11 kg (was 32 853.13)', () => {
    const r = tern900();
    expect(r.method).toBe(ROUTE_METHOD_VERSION);
    expect(ROUTE_METHOD_VERSION).toBe('route-breguet-2');
    const l = r.loading;
    expectClose(l.tripFuel_kg, 1747.9484, { abs: 1e-3 }, 'trip fuel (forward evaluation)');
    expectClose(l.blockFuel_kg, 1897.9484, { abs: 1e-3 }, 'block fuel = taxi + trip');
    expectClose(l.climbDescentFuel_kg, 337.9611, { abs: 1e-3 }, 'climb/descent allowance');
    expectClose(l.alternateFuel_kg, 561.3486, { abs: 1e-3 }, '200 NM alternate (default)');
    expectClose(l.finalReserveFuel_kg, 899.4125, { abs: 1e-3 }, '45 min at normal cruise');
    expectClose(l.contingencyFuel_kg, 87.3974, { abs: 1e-3 }, 'contingency 5 % of trip fuel (incl. climb/descent)');
    expectClose(r.designTakeoffMass_kg, 33796.107, { abs: 1e-3 }, 'design TOW');
    expectClose(l.rampMass_kg, 33946.107, { abs: 1e-3 }, 'ramp mass');
    // Identities: δ of the TOW; trip = cruise + climb/descent; taxi outside the brake-release mass.
    expectClose(l.climbDescentFuel_kg, 0.01 * l.takeoffMass_kg, { rel: 1e-12 }, 'δ = 1 % (turbofan default)');
    expectClose(l.tripFuel_kg, l.cruiseFuel_kg + l.climbDescentFuel_kg, { abs: 1e-9 }, 'trip split');
    expectClose(l.rampMass_kg, l.takeoffMass_kg + TERN.cruise!.taxiFuel_kg, { abs: 1e-9 }, 'ramp = TOW + taxi');
    expectClose(l.takeoffMass_kg, l.zeroFuelMass_kg + l.tripFuel_kg + l.contingencyFuel_kg + l.reserveFuel_kg, { abs: 1e-9 }, 'TOW excludes taxi');
    expectClose(l.rampFuel_kg, l.takeoffFuel_kg + l.taxiFuel_kg, { abs: 1e-9 }, 'ramp fuel');
    expect(l.blockFuel_kg).toBeGreaterThan(l.tripFuel_kg);
    const trace = new Map(r.trace.map((t) => [t.key, t]));
    expect(trace.get('climbDescentFraction')!.label).toMatch(/default.*common practice/);
    expect(trace.get('alternateDistance_m')!.label).toMatch(/default 200 NM/);
    expect(trace.get('blockFuel_kg')!.value).toBe(l.blockFuel_kg);
  });

  it('with no allowance and no alternate the model reduces to route-breguet-1 (trip 1384.49 kg, TOW 32 853.13 kg)', () => {
    const bare = { ...TERN, cruise: { ...TERN.cruise!, climbDescentFraction: 0 } };
    const r = tern900({ kind: 'cruise-45min', alternateDistance_m: 0 }, bare);
    expectClose(r.loading.tripFuel_kg, 1384.4908, { abs: 1e-3 }, 'trip');
    expectClose(r.designTakeoffMass_kg, 32853.1279, { abs: 1e-3 }, 'TOW');
    expect(r.loading.climbDescentFuel_kg).toBe(0);
    expect(r.loading.alternateFuel_kg).toBe(0);
    expect(r.reserves.alternateDefaulted).toBe(false);
    expect(r.trace.find((t) => t.key === 'climbDescentFraction')!.label).toMatch(/profile/);
  });

  it('default allowance by engine type (turbofan 1.0 %, turboprop 0.6 %, piston 0.4 %, from memory / common practice); the profile value wins', () => {
    expect(CLIMB_DESCENT_FRACTION_DEFAULTS).toEqual({ turbofan: 0.01, turboprop: 0.006, piston: 0.004 });
    for (const a of FLEET) {
      const r = designTakeoffMass({ aircraft: a, stageLength_m: 100_000, payload_kg: 0, reserves: C45 });
      expectClose(r.loading.climbDescentFuel_kg, CLIMB_DESCENT_FRACTION_DEFAULTS[a.engineType] * r.loading.takeoffMass_kg, { rel: 1e-12 }, a.id);
    }
    const own = { ...CURLEW, cruise: { ...CURLEW.cruise!, climbDescentFraction: 0.02 } };
    const r = designTakeoffMass({ aircraft: own, stageLength_m: 600_000, payload_kg: 5000, reserves: C45 });
    expectClose(r.loading.climbDescentFuel_kg, 0.02 * r.loading.takeoffMass_kg, { rel: 1e-12 }, 'profile δ');
    expect(r.designTakeoffMass_kg).toBeGreaterThan(designTakeoffMass({ aircraft: CURLEW, stageLength_m: 600_000, payload_kg: 5000, reserves: C45 }).designTakeoffMass_kg);
  });

  it('holding fuel flow of its own: 30 min at 1100 kg/h = 550 kg (tern, international); 400 kg/h = 200 kg (curlew, δ 1 %)', () => {
    const t = designTakeoffMass({ aircraft: withHoldFlow(TERN, 1100), stageLength_m: 1_200_000, payload_kg: 7600, reserves: INTL });
    expectClose(t.loading.finalReserveFuel_kg, 550, { abs: 1e-9 }, 'tern hold fuel = flow × time');
    expectClose(t.designTakeoffMass_kg, 34662.4298, { abs: 1e-3 }, 'tern TOW (forward evaluation)');
    expectClose(t.loading.alternateFuel_kg, 565.8286, { abs: 1e-3 }, 'tern alternate');
    expect(t.trace.find((x) => x.key === 'holdFuel_kg')!.value).toBeCloseTo(550, 9);
    const cu = { ...withHoldFlow(CURLEW, 400), cruise: { ...CURLEW.cruise!, holdFuelFlow_kgph: 400, climbDescentFraction: 0.01 } };
    const c = designTakeoffMass({ aircraft: cu, stageLength_m: 1_200_000, payload_kg: 5760, reserves: INTL });
    expectClose(c.loading.finalReserveFuel_kg, 200, { abs: 1e-9 }, 'curlew hold fuel');
    expectClose(c.designTakeoffMass_kg, 21905.9627, { abs: 1e-3 }, 'curlew TOW (forward evaluation)');
    expectClose(c.loading.tripFuel_kg, 1824.5704, { abs: 1e-3 }, 'curlew trip');
    // The flow only applies to reserve time flown in the hold: 45 min at normal cruise is unchanged.
    expect(tern900(C45, withHoldFlow(TERN, 1100)).designTakeoffMass_kg).toBe(tern900(C45).designTakeoffMass_kg);
  });

  it('cruise-45min carries a 200 NM alternate by default (121.639 / 91.167); 0 means none; custom never defaults', () => {
    expect(resolveReserves(C45, 0.05)).toMatchObject({ alternateDistance_m: ALTERNATE_DEFAULT_M, alternateDefaulted: true });
    expectClose(ALTERNATE_DEFAULT_M, 370_400, { abs: 1e-9 }, '200 NM');
    expect(resolveReserves({ kind: 'cruise-45min', alternateDistance_m: 0 }, 0.05)).toMatchObject({ alternateDistance_m: 0, alternateDefaulted: false });
    expect(resolveReserves({ kind: 'custom', alternateDistance_m: 0, holdMinutes: 30 }, 0.05).alternateDistance_m).toBe(0);
    expect(tern900().loading.alternateFuel_kg).toBeGreaterThan(0);
  });

  it('payload-range corners with a fixed-flow hold match the bisection (tern, international, 1100 kg/h) and stay consistent for every demo type', () => {
    const t = payloadRangeDiagram({ aircraft: withHoldFlow(TERN, 1100), reserves: INTL }).corners;
    expectClose(t.B.stageLength_m, 2_813_811.764, { rel: 1e-9 }, 'B');
    expectClose(t.C.stageLength_m, 4_500_782.066, { rel: 1e-9 }, 'C');
    expectClose(t.D.stageLength_m, 5_684_778.331, { rel: 1e-9 }, 'D');
    for (const a0 of FLEET) {
      const a = withHoldFlow(a0);
      const d = payloadRangeDiagram({ aircraft: a, reserves: INTL });
      expect(d.status).toBe('ok');
      for (const k of [d.corners.B, d.corners.C, d.corners.D]) {
        if (k.activeLimits.includes('mtow')) expectClose(a.oew_kg + k.payload_kg + k.takeoffFuel_kg, a.mtow_kg, { abs: 1e-6 }, `${a.id} ${k.label}: MTOW`);
        if (k.activeLimits.includes('max-fuel')) expectClose(k.rampFuel_kg, a.maxFuel_kg, { abs: 1e-6 }, `${a.id} ${k.label}: full tanks`);
        if (k.activeLimits.includes('mlw')) expectClose(k.arrivalMass_kg, a.mlw_kg, { abs: 1e-6 }, `${a.id} ${k.label}: MLW`);
        if (k.stageLength_m < 1000) continue;
        const r = designTakeoffMass({ aircraft: a, stageLength_m: k.stageLength_m, payload_kg: Math.min(a.maxPayload_kg, Math.max(0, k.payload_kg)), reserves: INTL });
        expect(r.status, `${a.id} ${k.label}: ${r.reason ?? ''}`).toBe('ok');
        expectClose(r.designTakeoffMass_kg, k.takeoffMass_kg, { abs: 1e-5 }, `${a.id} ${k.label}: TOW`);
      }
      expect(allFinite(d)).toEqual([]);
    }
  });

  it('property: with a fixed-flow hold, payloadForRange and rangeForPayload stay consistent with designTakeoffMass', () => {
    expectInverseConsistency(withHoldFlow(TERN, 1100), INTL);
  });
});

describe('input domain — InputDomainError names the field', () => {
  const ok = { aircraft: TERN, stageLength_m: 1_200_000, payload_kg: 5000, reserves: C45 };
  it('stage length 1 km to 20 000 km', () => {
    expectDomainError(() => designTakeoffMass({ ...ok, stageLength_m: 999 }), 'stageLength_m');
    expectDomainError(() => designTakeoffMass({ ...ok, stageLength_m: 20_000_001 }), 'stageLength_m');
    expectDomainError(() => designTakeoffMass({ ...ok, stageLength_m: Number.NaN }), 'stageLength_m');
    expect(designTakeoffMass({ ...ok, stageLength_m: 1000 }).status).toBe('ok');
  });
  it('payload 0 to the maximum payload', () => {
    expectDomainError(() => designTakeoffMass({ ...ok, payload_kg: -1 }), 'payload_kg');
    expectDomainError(() => designTakeoffMass({ ...ok, payload_kg: 9500.5 }), 'payload_kg');
  });
  it('the aircraft must carry cruise data, complete for its engine type', () => {
    const { cruise: _c, ...bare } = TERN;
    expectDomainError(() => designTakeoffMass({ ...ok, aircraft: bare as AircraftProfile }), 'aircraft.cruise');
    const { tsfc_perh: _t, ...noTsfc } = TERN.cruise!;
    expectDomainError(() => designTakeoffMass({ ...ok, aircraft: { ...TERN, cruise: noTsfc } }), 'aircraft.cruise.tsfc_perh');
  });
  it('reserve policy parameters', () => {
    expectDomainError(() => designTakeoffMass({ ...ok, reserves: { kind: 'weekly' } as unknown as ReservePolicy }), 'reserves.kind');
    expectDomainError(() => designTakeoffMass({ ...ok, reserves: { kind: 'custom', alternateDistance_m: 0, holdMinutes: 300 } }), 'reserves.holdMinutes');
    expectDomainError(() => designTakeoffMass({ ...ok, reserves: { kind: 'international', alternateDistance_m: -5 } }), 'reserves.alternateDistance_m');
  });
  it('takeoff mass above 0 and at most MTOW for the inverse helpers', () => {
    expectDomainError(() => payloadForRange({ aircraft: TERN, takeoffMass_kg: 40_001, stageLength_m: 1e6, reserves: C45 }), 'takeoffMass_kg');
    expectDomainError(() => rangeForPayload({ aircraft: TERN, takeoffMass_kg: 0, payload_kg: 0, reserves: C45 }), 'takeoffMass_kg');
  });
});
