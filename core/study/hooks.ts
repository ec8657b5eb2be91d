// TEMPORARY adapter while the calibration and existing-runway modules are written; replaced before commit.
import type { AircraftProfile } from '../aircraft.js';
import type { Surface } from '../surface.js';
import type { ReservePolicy } from '../route/index.js';
import type { ExistingRunwayCheck, RunwayDirectionSummary } from './types.js';

export type TakeoffCalibration = { status: 'ok'; factor: number } | { status: 'refused'; reason: string };
export function calibrateTakeoff(_i: { aircraft: AircraftProfile }): TakeoffCalibration {
  return { status: 'refused', reason: 'not yet' };
}
export function assessExistingRunway(i: {
  aircraft: AircraftProfile; runway: string; direction: RunwayDirectionSummary; pressureAltitude_m: number; temperature_c: number;
  landingTemperature_c: number | undefined; surface: Surface; takeoffMass_kg: number; landingMass_kg: number; thrustScale: number;
  stageLength_m: number; payload_kg: number; reserves: ReservePolicy; passengerMass_kg: number;
}): ExistingRunwayCheck {
  const d = i.direction;
  return { runway: i.runway, designator: d.designator, takeoffRunNeeded_m: 0, takeoffDistanceNeeded_m: 0, landingNeeded_m: 0, tora_m: d.tora_m, toda_m: d.toda_m, asda_m: d.asda_m, lda_m: d.lda_m, takeoffOk: true, landingOk: true, limitedBy: 'none' };
}
