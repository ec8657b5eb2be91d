/**
 * Study engine speed: the demo study with its sweeps (`demo_study_ms`, target ≤ 50 ms) and a large
 * invented study of 50 aircraft × 3 scenarios with sweeps (`large_study_ms`, target ≤ 500 ms).
 * Median of several runs of the whole engine (validation, site, rows, existing runway, sensitivity).
 */
import { readFileSync } from 'node:fs';
import { runStudy, type AircraftProfile, type StudyInput } from '../core/index.js';
import { parseStudyDocument } from '../server/studies/index.js';
import { medianMs, type BenchModule } from './harness.js';

function load(): StudyInput {
  const p = parseStudyDocument(JSON.parse(readFileSync(new URL('../examples/demo-study.json', import.meta.url), 'utf8')));
  if (!p.ok) throw new Error('demo study invalid');
  return p.input;
}

/** 50 invented variants of the demo fleet: masses, thrust or power and wing area scaled together. */
export function largeStudy(demo: StudyInput): StudyInput {
  const aircraft: AircraftProfile[] = [];
  for (let i = 0; i < 50; i++) {
    const base = demo.aircraft[i % demo.aircraft.length]!;
    const k = 0.92 + 0.16 * ((i * 37) % 50) / 49; // 0.92 … 1.08, deterministic spread
    aircraft.push({
      ...base,
      id: `${base.id}-v${i}`,
      name: `${base.name} variant ${i}`,
      group: `${base.id}-v${i}`,
      wingArea_m2: base.wingArea_m2 * k,
      ...(base.staticThrust_N ? { staticThrust_N: base.staticThrust_N * k } : {}),
      ...(base.shaftPower_W ? { shaftPower_W: base.shaftPower_W * k } : {}),
    });
  }
  const scenario = (name: string, f: number) => ({
    name,
    fleet: aircraft.map((a, i) => {
      const row = demo.scenarios.flatMap((s) => s.fleet).find((r) => a.id.startsWith(r.aircraft + '-v'))!;
      return { aircraft: a.id, annualOperations: Math.round((300 + 40 * (i % 20)) * f), stageLength_km: row.stageLength_km, payload_kg: row.payload_kg };
    }),
  });
  return { ...demo, name: 'Large invented study', aircraft, scenarios: [scenario('Low', 0.8), scenario('Mid', 1), scenario('High', 1.3)] };
}

const bench: BenchModule = {
  name: 'study',
  async run() {
    const demo = load();
    const large = largeStudy(demo);
    const demoMs = await medianMs(() => runStudy(demo), 9);
    const largeMs = await medianMs(() => runStudy(large), 5);
    return [
      { key: 'demo_study_ms', label: 'Demo study with sweeps', value: demoMs, unit: 'ms', target: { op: '<=', value: 50 } },
      { key: 'large_study_ms', label: '50 aircraft × 3 scenarios with sweeps', value: largeMs, unit: 'ms', target: { op: '<=', value: 500 } },
    ];
  },
};
export default bench;
