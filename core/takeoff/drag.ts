/**
 * Takeoff zero-lift drag by gear position.
 *
 * The profile's `cd0Takeoff` is the takeoff-flap C_D0 with the gear down (ground run, first segment).
 * The gear-up value (second segment) is the profile's `cd0TakeoffGearUp` when given (it must be less
 * than the gear-down value; validateAircraft checks it), otherwise derived: C_D0,takeoff less the
 * landing-gear increment ΔC_D0 = (W/S)·K_uc·m^(−0.215), K_uc = 4.5·10⁻⁵ (W/S in N/m², m in kg;
 * Anderson, *Aircraft Performance and Design*, §6.7; Raymer §12.5 and Torenbeek (1982) App. F, landing-gear drag), never below 40 % of the
 * takeoff C_D0 (this project's guard against an increment larger than the profile's drag allows; the
 * result says when that floor binds). The derived value is a statistical estimate and marked so.
 */
import { G0 } from '../units.js';
import type { AircraftProfile } from '../aircraft.js';

/** Anderson's landing-gear drag constant, moderate flap deflection. */
export const GEAR_DRAG_K = 4.5e-5;
/** Derived gear-up C_D0 is never taken below this fraction of the takeoff C_D0. */
export const GEAR_UP_CD0_FLOOR = 0.4;

export interface GearDragInput {
  readonly mass_kg: number;
  readonly wingArea_m2: number;
}

/** Landing-gear zero-lift drag increment (Anderson §6.7). */
export function gearDragIncrement(i: GearDragInput): number {
  const ws = (i.mass_kg * G0) / i.wingArea_m2;
  return ws * GEAR_DRAG_K * Math.pow(i.mass_kg, -0.215);
}

export interface GearUpCd0 {
  readonly cd0: number;
  readonly source: 'profile' | 'derived';
  /** Whether the derived value hit the floor. */
  readonly floorBound: boolean;
}

/** Takeoff-flap C_D0 with the gear up (profile value, or derived at this mass). */
export function gearUpCd0(a: AircraftProfile, mass_kg: number): GearUpCd0 {
  if (a.cd0TakeoffGearUp !== undefined) return { cd0: a.cd0TakeoffGearUp, source: 'profile', floorBound: false };
  const raw = a.cd0Takeoff - gearDragIncrement({ mass_kg, wingArea_m2: a.wingArea_m2 });
  const floor = GEAR_UP_CD0_FLOOR * a.cd0Takeoff;
  return raw < floor ? { cd0: floor, source: 'derived', floorBound: true } : { cd0: raw, source: 'derived', floorBound: false };
}
