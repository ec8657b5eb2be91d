/**
 * Key figures of a catalogue aircraft for the list and detail pages: the aeroplane reference field
 * length (takeoff requirement at MTOW, sea level, ISA, zero wind and slope, dry paved runway; ICAO
 * Annex 14 definition), VREF at MLW (sea level, ISA) and the classification built on them (aerodrome
 * reference code, approach category, design group). A profile the models cannot classify gets a note
 * instead of figures.
 */
import type { AircraftFiguresView } from '../../templates/aircraft/index.js';
import {
  InputDomainError, aeroplaneReferenceFieldLength, classifyAircraft, notice, referenceLandingSpeed, type AircraftProfile,
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
    // The study's rule (core/plausibility.ts): the planning figure when the profile gives one, else the model's.
    const { arfl_m, source, model: to } = aeroplaneReferenceFieldLength(a);
    if (arfl_m === undefined) return { vref_mps, note: notice('aircraft.noReferenceFieldLength')`No reference field length: ${to.feasible ? '' : to.message}` };
    const c = classifyAircraft(a, { arfl_m, vref_mps });
    return {
      arfl_m,
      arflSource: source === 'flight-manual' ? 'planning figure' : 'physics model',
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
