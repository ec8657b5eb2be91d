/**
 * Key figures of a catalogue aircraft for the list and detail pages: the aeroplane reference field
 * length (takeoff requirement at MTOW, sea level, ISA, zero wind and slope, dry paved runway; ICAO
 * Annex 14 definition), VREF at MLW (sea level, ISA) and the classification built on them (aerodrome
 * reference code, approach category, design group). A profile the models cannot classify gets a note
 * instead of figures.
 */
import type { AircraftFiguresView } from '../../templates/aircraft/index.js';
import {
  InputDomainError, analyseTakeoff, classifyAircraft, notice, referenceLandingSpeed, type AircraftProfile,
} from '../../core/index.js';

/** Key figures of a catalogue aircraft; the view type lives with the template that shows it. */
export type AircraftFigures = AircraftFiguresView;

/** Figures by the profile's JSON: a profile that has not changed is not analysed again. */
const memo = new Map<string, AircraftFigures>();
const MEMO_LIMIT = 2000;

export function aircraftFigures(a: AircraftProfile): AircraftFigures {
  const key = JSON.stringify(a);
  const hit = memo.get(key);
  if (hit) return hit;
  const f = computeFigures(a);
  if (memo.size >= MEMO_LIMIT) memo.delete(memo.keys().next().value as string);
  memo.set(key, f);
  return f;
}

function computeFigures(a: AircraftProfile): AircraftFigures {
  try {
    const vref_mps = referenceLandingSpeed({ aircraft: a });
    const to = analyseTakeoff({ aircraft: a, mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry' });
    const planning = a.reference?.takeoff_m;
    // The aeroplane reference field length is the planning figure when the profile gives one, else
    // the physics model's (the study uses the same rule, core/plausibility.ts); it says which.
    if (!to.feasible && planning === undefined) return { vref_mps, note: notice('aircraft.noReferenceFieldLength')`No reference field length: ${to.message}` };
    const arfl_m = planning !== undefined ? planning : (to as Extract<typeof to, { feasible: true }>).required_m;
    const c = classifyAircraft(a, { arfl_m, vref_mps });
    return {
      arfl_m,
      arflSource: planning === undefined ? 'physics model' : 'planning figure',
      ...(to.feasible ? { modelArfl_m: to.required_m } : {}),
      vref_mps,
      aerodromeCode: c.aerodromeCode,
      approachCategory: c.approachCategory,
      designGroup: c.designGroup.group,
      runwayDesignCode: c.runwayDesignCode,
    };
  } catch (e) {
    if (e instanceof InputDomainError) return { note: e.message };
    throw e;
  }
}
