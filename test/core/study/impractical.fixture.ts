/**
 * Issue 12, finding 3: a single-engine commuter at a hot and high site. The demo site is raised to
 * 3 500 m (runway profile with it) at the given design temperature; the fleet is an invented
 * single-engine variant of the demo commuter (Plover CT-19 with one engine, MTOW 7 294 kg, no cruise
 * data, so it is sized at MTOW) in regular use beside the demo single turboprop (Heron ST-1). At that
 * mass the model's all-engines climb gradient at V2 at 45 °C is a few hundredths of a per cent, and
 * the airborne distance to the screen height runs to kilometres: 37 113 m at 45 °C, 6 915 m at 40 °C
 * with today's takeoff model (the issue reported 35 900 m and 6 900 m; the variant here is invented to
 * reproduce it). At 30 °C it needs 3 471 m, within the bound.
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
