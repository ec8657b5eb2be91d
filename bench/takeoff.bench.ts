/**
 * Takeoff engine benchmark.
 *
 * - takeoff_analyses_per_s: complete analyses (all engines + engine failure with the balanced V1 +
 *   climb + empirical checks) per second on one core, cycling over the demo twins at several
 *   conditions, measured in process CPU time (robust when other work shares the cores); the label
 *   also shows the wall-clock rate. Target ≥ 20 000.
 * - integration_error_pct: largest relative error (%) of the production ground-run integration
 *   (Gauss–Legendre quadrature over speed) against an independent reference written here: classical
 *   fourth-order Runge–Kutta in time with a 1 ms step on the same force model, the final step of each
 *   phase shortened by bisection so it ends exactly on the target speed. Compared: all-engines
 *   distance to VR and to VLOF, engine-out ground run to VR after failure at VEF, and both
 *   accelerate-stop distances (with the activation step after V1), over the demo fleet and a spread
 *   of conditions. Target ≤ 0.1 %.
 * - airborne_error_pct: largest relative error (%) of the engine-out energy-method air segment
 *   (AIR_STEPS RK4 steps in height) against the same integration with 4,000 steps. Target ≤ 0.1 %.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { BenchFigure, BenchModule } from './harness.js';
import { ratePerSecond } from './harness.js';
import type { AircraftProfile, Surface } from '../core/index.js';
import type { TakeoffInput } from '../core/takeoff/types.js';
import { analyseTakeoff } from '../core/index.js';
import { energyAirborne } from '../core/takeoff/energyAirborne.js';
import { engineOutAirInput } from '../core/takeoff/index.js';
import { rollAcceleration, stopDeceleration, takeoffSetup } from '../core/takeoff/model.js';
import { STOP_ALLOWANCE_S } from '../core/takeoff/regulations.js';

const fleet = JSON.parse(
  readFileSync(fileURLToPath(new URL('../examples/demo-study.json', import.meta.url)), 'utf8'),
).aircraft as AircraftProfile[];

/** Reference step, s. */
const DT = 1e-3;

interface State { v: number; s: number; t: number }

function rk4Step(a: (v: number) => number, st: State, h: number): State {
  const k1v = a(st.v);
  const k1s = st.v;
  const k2v = a(st.v + 0.5 * h * k1v);
  const k2s = st.v + 0.5 * h * k1v;
  const k3v = a(st.v + 0.5 * h * k2v);
  const k3s = st.v + 0.5 * h * k2v;
  const k4v = a(st.v + h * k3v);
  const k4s = st.v + h * k3v;
  return {
    v: st.v + (h / 6) * (k1v + 2 * k2v + 2 * k3v + k4v),
    s: st.s + (h / 6) * (k1s + 2 * k2s + 2 * k3s + k4s),
    t: st.t + h,
  };
}

/** Integrates until v reaches `target` (rising when dir = +1, falling when −1). */
function untilSpeed(a: (v: number) => number, st0: State, target: number, dir: 1 | -1): State {
  let st = st0;
  if ((target - st.v) * dir <= 0) return st;
  for (let i = 0; i < 10_000_000; i++) {
    const next = rk4Step(a, st, DT);
    if ((next.v - target) * dir >= 0) {
      let lo = 0;
      let hi = DT;
      for (let k = 0; k < 60; k++) {
        const mid = 0.5 * (lo + hi);
        if ((rk4Step(a, st, mid).v - target) * dir >= 0) hi = mid; else lo = mid;
      }
      return rk4Step(a, st, 0.5 * (lo + hi));
    }
    st = next;
  }
  throw new Error('reference integration did not reach its target speed');
}

function forTime(a: (v: number) => number, st0: State, time_s: number): State {
  const n = Math.max(1, Math.ceil(time_s / DT));
  const h = time_s / n;
  let st = st0;
  for (let i = 0; i < n; i++) st = rk4Step(a, st, h);
  return st;
}

const relErr = (x: number, ref: number): number => (Math.abs(x - ref) / Math.abs(ref)) * 100;

function cases(): TakeoffInput[] {
  const conds: { pa: number; t: number; wind: number; slope: number; surface: Surface; massF: number }[] = [
    { pa: 0, t: 15, wind: 0, slope: 0, surface: 'dry', massF: 1 },
    { pa: 1600, t: 38, wind: 0, slope: 0, surface: 'dry', massF: 0.85 },
    { pa: 500, t: 25, wind: 8, slope: 0.01, surface: 'dry', massF: 0.95 },
    { pa: 0, t: 30, wind: -5, slope: -0.01, surface: 'wet', massF: 1 },
    { pa: 1000, t: 5, wind: -10, slope: 0.02, surface: 'grass-short', massF: 0.9 },
    { pa: 2500, t: 20, wind: 3, slope: -0.02, surface: 'dry', massF: 0.8 },
  ];
  const out: TakeoffInput[] = [];
  for (const a of fleet) {
    for (const c of conds) {
      out.push({
        aircraft: a, mass_kg: Math.max(a.oew_kg, c.massF * a.mtow_kg), pressureAltitude_m: c.pa,
        temperature_c: c.t, slope: c.slope, headwind_mps: c.wind, surface: c.surface,
      });
    }
  }
  return out;
}

function integrationError(): { maxPct: number; compared: number } {
  let maxPct = 0;
  let compared = 0;
  const note = (x: number, ref: number): void => {
    maxPct = Math.max(maxPct, relErr(x, ref));
    compared++;
  };
  for (const input of cases()) {
    const r = analyseTakeoff(input);
    const ae = r.feasible ? r.allEngines : r.allEngines;
    if (!ae) continue;
    const s = takeoffSetup(input);
    const n = s.engineCount;
    const aeo = rollAcceleration(s, n, 0);
    const rest: State = { v: 0, s: 0, t: 0 };
    const atVr = untilSpeed(aeo, rest, s.vrG, 1);
    note(ae.groundRun_m, atVr.s);
    const atVlof = untilSpeed(aeo, atVr, s.vlofG, 1);
    note(ae.groundRunToVlof_m, atVlof.s);
    if (!r.feasible || !r.engineOut || r.speeds.vef_mps === undefined || r.speeds.v1_mps === undefined) continue;
    const eo = r.engineOut;
    const oei = rollAcceleration(s, n - 1, s.aircraft.engineOutDrag);
    const vefG = r.speeds.vef_mps - s.wind_mps;
    const atVef = untilSpeed(aeo, rest, vefG, 1);
    // Engine-out: recognition time, then braking (accelerate-stop) or on to VR (continued).
    const atV1 = forTime(oei, atVef, s.aircraft.recognitionTime_s);
    // Activation time at the acceleration reached at V1 (the model's constant-acceleration step).
    const act = (st: State, acc: number): State => {
      const a0 = Math.max(acc, 0);
      const t = s.activation_s;
      return { v: st.v + a0 * t, s: st.s + st.v * t + 0.5 * a0 * t * t, t: st.t + t };
    };
    const bOei = act(atV1, oei(atV1.v));
    const stoppedOei = untilSpeed((v) => -stopDeceleration(s, n - 1, s.aircraft.engineOutDrag)(v), { ...bOei, s: 0 }, 0, -1);
    note(eo.accelerateStopEngineOut_m, bOei.s + stoppedOei.s + STOP_ALLOWANCE_S * atV1.v);
    const goVr = untilSpeed(oei, atVef, s.vrG, 1);
    note(eo.groundRun_m, goVr.s);
    // All engines to V1, then braking with all engines idle.
    const v1G = r.speeds.v1_mps - s.wind_mps;
    const aeoV1 = untilSpeed(aeo, rest, v1G, 1);
    const bAeo = act(aeoV1, aeo(aeoV1.v));
    const stoppedAeo = untilSpeed((v) => -stopDeceleration(s, n, 0)(v), { ...bAeo, s: 0 }, 0, -1);
    note(eo.accelerateStopAllEngines_m, bAeo.s + stoppedAeo.s + STOP_ALLOWANCE_S * v1G);
  }
  return { maxPct, compared };
}

/**
 * Largest relative error (%) of the production engine-out air segment (AIR_STEPS RK4 steps in height)
 * against a fine-step reference (4,000 steps) over the bench cases, including hot and high ones.
 */
export function airborneError(): { maxPct: number; compared: number } {
  let maxPct = 0;
  let compared = 0;
  const extra: TakeoffInput[] = [];
  for (const a of fleet.filter((x) => x.engineCount > 1)) {
    for (const [pa, t, f] of [[0, 15, 1], [0, 15, 0.75], [1346, 35.4, 0.85], [2000, 25, 0.8]] as const) {
      extra.push({ aircraft: a, mass_kg: a.oew_kg + f * (a.mtow_kg - a.oew_kg), pressureAltitude_m: pa, temperature_c: t, slope: 0, headwind_mps: 0, surface: 'dry' });
    }
  }
  for (const input of [...cases(), ...extra]) {
    const s = takeoffSetup(input);
    if (s.engineCount < 2) continue;
    const prod = energyAirborne(engineOutAirInput(s));
    const ref = energyAirborne({ ...engineOutAirInput(s, 4000), maxAir_m: Infinity });
    if (!prod.ok || !ref.ok) continue;
    maxPct = Math.max(maxPct, relErr(prod.airDistance_m, ref.airDistance_m));
    compared++;
  }
  return { maxPct, compared };
}

const bench: BenchModule = {
  name: 'takeoff',
  run(): BenchFigure[] {
    const inputs: TakeoffInput[] = [];
    for (const id of ['tern-rj90', 'curlew-rt70', 'albatross-nb180', 'swift-bj8', 'plover-ct19']) {
      const a = fleet.find((x) => x.id === id)!;
      for (const [pa, t] of [[0, 15], [500, 30], [1000, 20]] as const) {
        inputs.push({ aircraft: a, mass_kg: 0.95 * a.mtow_kg, pressureAltitude_m: pa, temperature_c: t, slope: 0.005, headwind_mps: 0, surface: 'dry' });
      }
    }
    let i = 0;
    let sink = 0;
    const one = (): void => {
      const r = analyseTakeoff(inputs[i++ % inputs.length]!);
      sink += r.feasible ? r.required_m : 1;
    };
    // Wall-clock rate (harness) and, because other work may share the two cores, the rate per
    // CPU-second of this single-threaded process; the figure is the CPU-time rate.
    const wallRate = ratePerSecond(one, 1500);
    const calls = Math.max(1000, Math.round(wallRate * 2));
    const c0 = process.cpuUsage();
    for (let k = 0; k < calls; k++) one();
    const c = process.cpuUsage(c0);
    const rate = calls / ((c.user + c.system) / 1e6);
    if (!Number.isFinite(sink)) throw new Error('non-finite result in the speed run');
    const err = integrationError();
    const airErr = airborneError();
    return [
      { key: 'takeoff_analyses_per_s', label: `complete takeoff analyses per CPU-second, one core (wall clock ${Math.round(wallRate)}/s)`, value: rate, unit: '1/s', target: { op: '>=', value: 20000 } },
      { key: 'integration_error_pct', label: `largest ground-run error vs RK4 reference (${err.compared} distances)`, value: err.maxPct, unit: '%', target: { op: '<=', value: 0.1 } },
      { key: 'airborne_error_pct', label: `largest engine-out air-segment error vs a 4,000-step reference (${airErr.compared} segments)`, value: airErr.maxPct, unit: '%', target: { op: '<=', value: 0.1 } },
    ];
  },
};

export default bench;
