/**
 * Existing-runway check throughput: greatest-takeoff-mass solves (climb cap, lightest mass with a
 * decision speed when needed, bisection to 10 kg; each step a full takeoff analysis) per CPU-second on
 * one core, cycling over the demo fleet on the demo site's runway directions 12 (2600/2750/2600 m)
 * and 22 (1400/1460/1400 m) at 1346 m, 35 °C, dry, calm. The label also shows the wall-clock rate.
 * No target set by an issue yet.
 */
import { readFileSync } from 'node:fs';
import type { AircraftProfile } from '../core/index.js';
import { maxTakeoffMassForRunway, type MaxTakeoffMassInput } from '../core/runwayCheck.js';
import { ratePerSecond, type BenchFigure, type BenchModule } from './harness.js';

const fleet = JSON.parse(readFileSync(new URL('../examples/demo-study.json', import.meta.url), 'utf8')).aircraft as AircraftProfile[];

const mod: BenchModule = {
  name: 'runwayCheck',
  run(): BenchFigure[] {
    const inputs: MaxTakeoffMassInput[] = [];
    const site = { pressureAltitude_m: 1346, temperature_c: 35, headwind_mps: 0, surface: 'dry' as const };
    for (const a of fleet) {
      inputs.push({ aircraft: a, ...site, slope: -7.6 / 2600, direction: { tora_m: 2600, toda_m: 2750, asda_m: 2600 } });
      inputs.push({ aircraft: a, ...site, slope: -2.1 / 1400, direction: { tora_m: 1400, toda_m: 1460, asda_m: 1400 } });
    }
    let i = 0;
    let sink = 0;
    let steps = 0;
    const one = (): void => {
      const r = maxTakeoffMassForRunway(inputs[i++ % inputs.length]!);
      sink += r.maxTakeoffMass_kg ?? 0;
      steps += r.iterations;
    };
    const wall = ratePerSecond(one, 1500);
    const calls = Math.max(200, Math.round(wall * 2));
    steps = 0;
    const c0 = process.cpuUsage();
    for (let k = 0; k < calls; k++) one();
    const c = process.cpuUsage(c0);
    const rate = calls / ((c.user + c.system) / 1e6);
    if (!Number.isFinite(sink)) throw new Error('non-finite result in the runway-check run');
    return [
      {
        key: 'max_mass_solves_per_s',
        label: `greatest-takeoff-mass solves per CPU-second, one core (wall clock ${Math.round(wall)}/s; ${(steps / calls).toFixed(1)} bisection steps on average)`,
        value: rate, unit: '1/s',
      },
    ];
  },
};
export default mod;
