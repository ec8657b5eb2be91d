/**
 * Route model throughput: design takeoff masses and payload-range diagrams per second
 * (demo aircraft tern-rj90, 'cruise-45min' reserves). No target set by an issue yet.
 */
import { readFileSync } from 'node:fs';
import type { AircraftProfile } from '../core/index.js';
import { designTakeoffMass } from '../core/route/design.js';
import { payloadRangeDiagram } from '../core/route/payloadRange.js';
import { ratePerSecond, type BenchModule } from './harness.js';

const fleet = JSON.parse(readFileSync(new URL('../examples/demo-study.json', import.meta.url), 'utf8')).aircraft as AircraftProfile[];
const tern = fleet.find((a) => a.id === 'tern-rj90')!;

const mod: BenchModule = {
  name: 'route',
  run() {
    let s = 1_000_000;
    const design = ratePerSecond(() => {
      s = s >= 6_000_000 ? 1_000_000 : s + 12_345;
      return designTakeoffMass({ aircraft: tern, stageLength_m: s, payload_kg: 7600, reserves: { kind: 'cruise-45min' } });
    });
    const diagram = ratePerSecond(() => payloadRangeDiagram({ aircraft: tern, reserves: { kind: 'international' } }));
    return [
      { key: 'route_design_tow_per_s', label: 'Design takeoff masses per second', value: design, unit: '1/s' },
      { key: 'route_payload_range_per_s', label: 'Payload-range diagrams (40 samples) per second', value: diagram, unit: '1/s' },
    ];
  },
};
export default mod;
