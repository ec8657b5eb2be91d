/**
 * Results as CSV: one line per fleet row of every scenario, in the study's display units; the unit of
 * each column is in its header; the first line is the caution, as a '#' comment. Same result, same bytes.
 * A row that cannot operate has empty requirement cells and its reason in the `reason` column.
 */
import { stringify } from 'csv-stringify/sync';
import { CAUTION_TEXT, noticeText, plainFormat, unitOf, type UnitSystem } from '../../core/index.js';
import type { StudyOutput } from './document.js';
import { csvSafeRecords } from '../io/csvSafe.js';

const round = (v: number, digits: number): string => (Number.isFinite(v) ? v.toFixed(digits) : '');

export function resultsCsv(out: StudyOutput, units: UnitSystem): string {
  const len = unitOf('length', units);
  const mass = unitOf('mass', units);
  const L = (v: number | null | undefined) => (v === null || v === undefined ? '' : round(len.from(v), 0));
  const M = (v: number | null | undefined) => (v === null || v === undefined ? '' : round(mass.from(v), 0));
  const text = plainFormat(units);
  const header = [
    'scenario', 'aircraft_id', 'aircraft', 'annual_operations', 'group_operations', 'regular_use', 'status', 'reason',
    `takeoff_mass_${mass.symbol}`, `required_takeoff_${len.symbol}`, `required_landing_${len.symbol}`, `required_${len.symbol}`,
    'governing_side', 'takeoff_governing_case', 'takeoff_source', 'runway_design_code', 'aerodrome_code', 'critical',
    `recommended_length_${len.symbol}`,
    // The spread between methods: the physics takeoff, the corrected reference length and the
    // indicative cross-checks (never governing), and the landing rule with its source.
    `takeoff_physics_${len.symbol}`, `takeoff_reference_corrected_${len.symbol}`, `takeoff_torenbeek_indicative_${len.symbol}`,
    `takeoff_roskam_indicative_${len.symbol}`, `landing_distance_unfactored_${len.symbol}`, 'landing_rule', 'landing_rule_source',
    `landing_roskam_indicative_${len.symbol}`, 'warnings',
  ];
  const rows: string[][] = [];
  for (const s of out.scenarios) {
    for (const r of s.rows) {
      const ok = r.status === 'ok';
      const critical = s.criticalAircraft === r.aircraft;
      rows.push([
        s.name, r.aircraft, r.aircraftName, String(r.annualOperations), String(r.groupOperations), r.regularUse ? 'yes' : 'no', r.status,
        // Why a row has no requirement (cannot operate, or beyond the plausibility bound): never a bare blank.
        r.reason ? noticeText(r.reason, text) : '',
        M(r.takeoffMass_kg), ok ? L(r.requiredTakeoff_m) : '', ok ? L(r.requiredLanding_m) : '', ok ? L(r.required_m) : '',
        ok ? r.governing : '', r.takeoff?.governing ?? '', ok ? r.takeoff?.source ?? '' : '', r.classification.runwayDesignCode, r.classification.aerodromeCode,
        critical ? 'yes' : 'no', critical ? L(s.recommendedLength_m) : '',
        // A row that cannot operate carries its reason only: no method figure that could read as a length.
        ...(ok
          ? [L(r.takeoff?.physics_m), L(r.takeoff?.reference_m), L(r.takeoff?.torenbeek_m), L(r.takeoff?.roskam_m),
            L(r.landing?.distance_m), r.landing?.rule ?? '', r.landing?.ruleSource ?? '', L(r.landing?.roskam_m)]
          : ['', '', '', '', '', '', '', '']),
        r.warnings.map((w) => noticeText(w, text)).join(' | '),
      ]);
    }
  }
  // The caution travels with the numbers: a leading comment line (csv-parse reads it with `comment: '#'`).
  return `# ${CAUTION_TEXT}\n` + stringify(csvSafeRecords([header, ...rows]), { record_delimiter: '\n' });
}
