/**
 * Issue 12, finding 3: a single-engine commuter at a hot and high site. The demo site is raised to
 * 3 500 m (runway profile with it) at the given design temperature; the fleet is an invented
 * single-engine variant of the demo commuter (Plover CT-19 with one engine, MTOW 7 294 kg, no cruise
 * data, so it is sized at MTOW, one 984 kW engine, rolling friction 0.08 for a soft strip) in regular
 * use beside the demo single turboprop (Heron ST-1). Since the takeoff model revision the air segment
 * is guarded (a runaway air distance is a reasoned "cannot climb" result), so the variant reaches the
 * bound on the ground instead: the takeoff model gives about 6 360 m at 45 °C and 5 760 m at 40 °C,
 * and 4 860 m at 30 °C, within the bound (derived from the model, not a published value).
 */
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

const root = resolve(import.meta.dirname, '..', '..', '..');

export const SINGLE_COMMUTER_ID = 'plover-s1';
export const SINGLE_COMMUTER_MASS_KG = 7294;

export function impracticalDoc(temperature_c: number): any {
  const doc = JSON.parse(readFileSync(join(root, 'examples/demo-study.json'), 'utf8'));
  const plover = doc.aircraft.find((a: any) => a.id === 'plover-ct19');
  const single = {
    ...plover, id: SINGLE_COMMUTER_ID, name: 'Plover CT-19S', group: 'commuter-single', engineCount: 1,
    mtow_kg: SINGLE_COMMUTER_MASS_KG, mlw_kg: 7100, maxPayload_kg: 2000,
  };
  delete single.cruise;
  delete single.vmcg_mps;
  single.engineOutDrag = 0;
  // One larger engine on a soft strip: climbs at every temperature swept, but the ground run grows
  // past the bound (rolling friction 0.08, the top of the profile range).
  single.shaftPower_W = 984000;
  single.rollingFriction = 0.08;
  const raise = 3500 - doc.site.elevation_m;
  doc.name = 'Hot and high single-engine commuter';
  doc.site.elevation_m = 3500;
  doc.site.designTemperature_c = temperature_c;
  delete doc.site.climate;
  for (const r of doc.site.runways) for (const p of r.profile) p.elevation_m += raise;
  doc.aircraft = [single, doc.aircraft.find((a: any) => a.id === 'heron-st1')];
  doc.scenarios = [{
    name: 'Hot and high commuter',
    fleet: [
      { aircraft: SINGLE_COMMUTER_ID, annualOperations: 1000, stageLength_km: 300, payload_kg: 1200 },
      { aircraft: 'heron-st1', annualOperations: 800, stageLength_km: 300, payload_kg: 600 },
    ],
  }];
  return doc;
}
