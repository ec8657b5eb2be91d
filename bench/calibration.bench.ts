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
import { ratePerSecond, type BenchFigure, type BenchModule } from './harness.js';

const fleet = JSON.parse(readFileSync(new URL('../examples/demo-study.json', import.meta.url), 'utf8')).aircraft as AircraftProfile[];
const pick = (id: string): AircraftProfile => fleet.find((a) => a.id === id)!;

const mod: BenchModule = {
  name: 'calibration',
  run(): BenchFigure[] {
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
      { key: 'calibrations_per_s', label: `takeoff calibrations per CPU-second, one core (wall clock ${Math.round(wall)}/s)`, value: rate, unit: '1/s' },
    ];
  },
};
export default mod;
