/**
 * Calibration throughput: complete takeoff calibrations (Brent fit of one factor to the reference
 * length, each step a full takeoff analysis at MTOW, sea level, ISA) per CPU-second on one core,
 * cycling over the demo aircraft that carry reference lengths (tern-rj90, albatross-nb180) with the
 * thrust and the CLmax factor, and over a spread of given reference lengths. The label also shows the
 * wall-clock rate. No target set by an issue yet.
 */
import { readFileSync } from 'node:fs';
import type { AircraftProfile } from '../core/index.js';
import { calibrateTakeoff, type CalibrateTakeoffInput } from '../core/calibrate.js';
import { fitTakeoffChart, profileWithParameters, type ChartPoint } from '../core/chartFit.js';
import { analyseTakeoff } from '../core/takeoff/index.js';
import { medianMs, ratePerSecond, type BenchFigure, type BenchModule } from './harness.js';

const fleet = JSON.parse(readFileSync(new URL('../examples/demo-study.json', import.meta.url), 'utf8')).aircraft as AircraftProfile[];
const pick = (id: string): AircraftProfile => fleet.find((a) => a.id === id)!;

/**
 * A 24-point takeoff chart (3 masses × 2 pressure altitudes × 4 temperatures) drawn by the model with
 * thrust 0.92, CLmax 1.05, flat rating ISA + 10 K and CD0 1.15 (the shape of test/core/chartFit.test.ts).
 */
function chart24(a: AircraftProfile): ChartPoint[] {
  const truth = { thrustScale: 0.92, clMaxScale: 1.05, flatRatingDeltaIsa_k: 10, dragScale: 1.15 };
  const prof = profileWithParameters(a, truth);
  const out: ChartPoint[] = [];
  for (const m of [0.7, 0.8, 0.9]) for (const h of [0, 500]) for (const t of [0, 10, 20, 30]) {
    const r = analyseTakeoff({ aircraft: prof, mass_kg: m * a.mtow_kg, pressureAltitude_m: h, temperature_c: t, slope: 0, headwind_mps: 0, surface: 'dry', thrustScale: truth.thrustScale, clMaxScale: truth.clMaxScale });
    if (!r.feasible) throw new Error('the bench chart point is infeasible');
    out.push({ mass_kg: m * a.mtow_kg, pressureAltitude_m: h, temperature_c: t, length_m: r.required_m });
  }
  return out;
}

const mod: BenchModule = {
  name: 'calibration',
  async run(): Promise<BenchFigure[]> {
    const nb = pick('albatross-nb180');
    const chart = chart24(nb);
    let fitOk = true;
    const fitMs = await medianMs(() => { fitOk = fitTakeoffChart({ aircraft: nb, points: chart }).status === 'ok' && fitOk; }, 7);
    if (!fitOk) throw new Error('the 24-point bench fit was refused');
    const inputs: CalibrateTakeoffInput[] = [];
    for (const a of [pick('tern-rj90'), pick('albatross-nb180')]) {
      inputs.push({ aircraft: a }, { aircraft: a, parameter: 'clmax' });
      for (const f of [0.9, 1.05, 1.15]) inputs.push({ aircraft: a, reference_m: f * a.reference!.takeoff_m! });
    }
    let i = 0;
    let sink = 0;
    const one = (): void => {
      const r = calibrateTakeoff(inputs[i++ % inputs.length]!);
      sink += r.status === 'ok' ? r.factor : 1;
    };
    const wall = ratePerSecond(one, 1500);
    const calls = Math.max(200, Math.round(wall * 2));
    const c0 = process.cpuUsage();
    for (let k = 0; k < calls; k++) one();
    const c = process.cpuUsage(c0);
    const rate = calls / ((c.user + c.system) / 1e6);
    if (!Number.isFinite(sink)) throw new Error('non-finite result in the calibration run');
    return [
      { key: 'calibration_fit_ms', label: 'Multi-point calibration: 4 parameters fitted to a 24-point takeoff chart (median of 7)', value: fitMs, unit: 'ms' },
      { key: 'calibrations_per_s', label: `takeoff calibrations per CPU-second, one core (wall clock ${Math.round(wall)}/s)`, value: rate, unit: '1/s' },
    ];
  },
};
export default mod;
