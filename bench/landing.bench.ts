/**
 * Landing analyses per second: the full `analyseLanding` (validation, segments, braking on the surface
 * and its dry equivalent, factoring, trace) over the demo fleet, alternating dry and wet runways and a
 * headwind case (quadrature path). Bounded to about 1.5 s.
 */
import type { AircraftProfile } from '../core/index.js';
import { analyseLanding } from '../core/index.js';
import demoStudy from '../examples/demo-study.json' with { type: 'json' };

const demoFleet = demoStudy.aircraft;
import { ratePerSecond, type BenchModule } from './harness.js';

const fleet = demoFleet as unknown as AircraftProfile[];

const bench: BenchModule = {
  name: 'landing',
  run() {
    let i = 0;
    const rate = ratePerSecond(() => {
      const a = fleet[i % fleet.length]!;
      const k = i++ % 3;
      return analyseLanding({
        aircraft: a, mass_kg: a.mlw_kg, pressureAltitude_m: 800, slope: 0.002,
        headwind_mps: k === 2 ? 5 : 0, surface: k === 1 ? 'wet' : 'dry',
      });
    }, 1500);
    return [{
      key: 'landing_analyses_per_s', label: 'Landing analyses per second', value: rate, unit: '1/s',
      target: { op: '>=', value: 10000 },
    }];
  },
};

export default bench;
