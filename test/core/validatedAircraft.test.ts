/**
 * The validated profile (core/aircraft.ts, ValidAircraft): a profile is checked once, when it first
 * reaches core, and core's models and solvers then take it as it is. Convention of the project.
 */
import { describe, expect, it } from 'vitest';
import { validateAircraft, type AircraftProfile } from '../../core/aircraft.js';
import { InputDomainError } from '../../core/errors.js';
import { analyseTakeoff } from '../../core/takeoff/index.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };

const fresh = (): AircraftProfile => structuredClone(demoStudy.aircraft[0]) as unknown as AircraftProfile;

describe('validateAircraft: once per profile', () => {
  it('returns the profile itself, typed as validated', () => {
    const a = fresh();
    expect(validateAircraft(a)).toBe(a);
    expect(validateAircraft(a)).toBe(a);
  });

  it('a changed profile is a new object and is checked again: a bad copy of a good profile is refused', () => {
    const a = fresh();
    validateAircraft(a);
    const bad = { ...a, mlw_kg: a.mtow_kg + 1 };
    expect(() => validateAircraft(bad)).toThrow(InputDomainError);
    expect(() => analyseTakeoff({ aircraft: bad, mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry' }))
      .toThrow(/mlw_kg/);
  });

  it('a profile that passed is not checked again (the checks run once; profiles are values and are never changed in place)', () => {
    const a = fresh();
    validateAircraft(a);
    // Changing a member in place goes around the readonly type on purpose, to show the memo: the
    // same object is not re-checked. A fresh object with the same change is refused.
    (a as { mlw_kg: number }).mlw_kg = a.mtow_kg + 1;
    expect(() => validateAircraft(a)).not.toThrow();
    expect(() => validateAircraft({ ...a })).toThrow(/mlw_kg: .* at most the maximum takeoff mass/);
  });

  it('a refused profile stays refused on every call', () => {
    const bad = { ...fresh(), oew_kg: -1 };
    expect(() => validateAircraft(bad)).toThrow(InputDomainError);
    expect(() => validateAircraft(bad)).toThrow(InputDomainError);
  });
});

describe('validateStudy: once per study input', () => {
  it('returns the input itself; a copy with a fleet row naming an unknown aircraft is refused with the ids allowed', async () => {
    const { validateStudy } = await import('../../core/study/run.js');
    const { parseStudyDocument } = await import('../../server/studies/document.js');
    const parsed = parseStudyDocument(structuredClone(demoStudy));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(validateStudy(parsed.input)).toBe(parsed.input);
    const s0 = parsed.input.scenarios[0]!;
    const bad = { ...parsed.input, scenarios: [{ ...s0, fleet: [{ ...s0.fleet[0]!, aircraft: 'nobody' }] }] };
    expect(() => validateStudy(bad)).toThrow(/scenarios\[0\]\.fleet\[0\]\.aircraft: "?nobody"?.*one of the study's aircraft ids \(kestrel-ut1, /);
  });
});
