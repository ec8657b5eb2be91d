/**
 * Payload-range diagram: corners A–D and the sampled curve of greatest payload against stage length.
 *
 * Source: payload-range corners from the Breguet equation (Aeronautical Engineer's Data Book ch. 9) (corners: A maximum payload at zero range; B maximum payload at
 * MTOW; C MTOW with maximum fuel; D ferry, zero payload with maximum fuel) on the fuel model of §9.3
 * (model.ts). Every point is the greatest payload that flies that stage under MTOW, fuel capacity,
 * MLW and the structural payload, with the same reserves, contingency and taxi rules as
 * designTakeoffMass, so the diagram and the design takeoff mass agree.
 *
 * Shapes: normally payload is flat from A to B (payload-limited), falls from B to C at MTOW, and falls
 * faster from C to D at full tanks. When the tanks fill before MTOW at maximum payload, C coincides
 * with B; when full tanks cannot be loaded within MTOW even empty, C coincides with D; an MLW limit
 * may shorten a segment. Each corner names its binding limit.
 *
 * Validity: as the fuel model (stage 0–20 000 km, no wind; climb/descent as an allowance).
 */
import { notice, siText, type Notice } from '../notices.js';
import type { AircraftProfile } from '../aircraft.js';
import { finite, inRange } from '../validate.js';
import type { ReservePolicy, ResolvedReserves } from './reserves.js';
import {
  ROUTE_MASS_SLACK_KG, ROUTE_METHOD_VERSION, buildRouteFuelModel, routeCapacity, routeFactors, routeLoading,
  routeModelTrace, routeReach, routeStageForPhi,
  type RouteFuelModel, type RouteLimit, type RouteTraceItem,
} from './model.js';

/** Default number of evenly spaced curve samples from 0 to the ferry range. */
export const PAYLOAD_RANGE_DEFAULT_SAMPLES = 40;
export const PAYLOAD_RANGE_SAMPLES_RANGE = { min: 2, max: 400, unit: '' } as const;
/** Two stages closer than this (m) are one curve point. */
export const PAYLOAD_RANGE_STAGE_MERGE_M = 1e-3;

export type PayloadRangeCornerLabel = 'A' | 'B' | 'C' | 'D';

export interface PayloadRangePoint {
  readonly stageLength_m: number;
  readonly payload_kg: number;
  readonly zeroFuelMass_kg: number;
  readonly takeoffMass_kg: number;
  /** Fuel at brake release (trip + contingency + reserves), kg. */
  readonly takeoffFuel_kg: number;
  /** Fuel loaded at the ramp (takeoff fuel + taxi), kg. */
  readonly rampFuel_kg: number;
  readonly tripFuel_kg: number;
  /** Block fuel, ramp to landing: taxi + trip, kg. */
  readonly blockFuel_kg: number;
  readonly arrivalMass_kg: number;
  /** The limit that sets the payload at this stage (the first on a tie: max-payload, mtow, max-fuel, mlw). */
  readonly limitedBy: RouteLimit;
  /** Every limit met at this point (two at a corner, e.g. MTOW and fuel capacity at C). */
  readonly activeLimits: readonly RouteLimit[];
}

export interface PayloadRangeCorner extends PayloadRangePoint {
  readonly label: PayloadRangeCornerLabel;
  readonly description: string;
  /** Set when this corner collapses onto another one (degenerate shapes). */
  readonly coincidesWith?: PayloadRangeCornerLabel;
}

export interface PayloadRangeInput {
  readonly aircraft: AircraftProfile;
  readonly reserves: ReservePolicy;
  /** Evenly spaced samples from 0 to the ferry range (2–400, default 40); the corners are added. */
  readonly samples?: number;
}

export interface PayloadRangeDiagram {
  readonly method: string;
  readonly status: 'ok' | 'cannot-fly';
  readonly reason?: string;
  readonly aircraftId: string;
  readonly reserves: ResolvedReserves;
  readonly corners: Readonly<Record<PayloadRangeCornerLabel, PayloadRangeCorner>>;
  /** Curve points sorted by stage length, corners included. */
  readonly points: readonly PayloadRangePoint[];
  /** Stage length of corner D, m. */
  readonly ferryRange_m: number;
  readonly trace: readonly RouteTraceItem[];
  readonly warnings: readonly Notice[];
}

function pointAt(m: RouteFuelModel, stage_m: number): PayloadRangePoint | null {
  const cap = routeCapacity(m, stage_m, m.mtow_kg);
  if (cap.payload_kg < -ROUTE_MASS_SLACK_KG || !routeFactors(m, stage_m).finite) return null;
  const W = Math.max(m.oew_kg, cap.zeroFuelMass_kg);
  const l = routeLoading(m, stage_m, W);
  const p: PayloadRangePoint = {
    stageLength_m: finite('stageLength_m', stage_m),
    payload_kg: finite('payload_kg', l.payload_kg),
    zeroFuelMass_kg: finite('zeroFuelMass_kg', l.zeroFuelMass_kg),
    takeoffMass_kg: finite('takeoffMass_kg', l.takeoffMass_kg),
    takeoffFuel_kg: finite('takeoffFuel_kg', l.takeoffFuel_kg),
    rampFuel_kg: finite('rampFuel_kg', l.rampFuel_kg),
    tripFuel_kg: finite('tripFuel_kg', l.tripFuel_kg),
    blockFuel_kg: finite('blockFuel_kg', l.blockFuel_kg),
    arrivalMass_kg: finite('arrivalMass_kg', l.arrivalMass_kg),
    limitedBy: cap.limitedBy,
    activeLimits: cap.activeLimits,
  };
  return p;
}

const DESCRIPTIONS: Readonly<Record<PayloadRangeCornerLabel, string>> = {
  A: 'Maximum payload at zero range',
  B: 'Maximum payload at the end of the full-payload segment (normally MTOW)',
  C: 'MTOW with full tanks (payload reduced)',
  D: 'Ferry: zero payload, full tanks (or MTOW when full tanks do not fit)',
};

/** The payload-range diagram for an aircraft and reserve policy. */
export function payloadRangeDiagram(input: PayloadRangeInput): PayloadRangeDiagram {
  const { aircraft } = input;
  const m = buildRouteFuelModel(aircraft, input.reserves);
  const n = inRange('samples', input.samples ?? PAYLOAD_RANGE_DEFAULT_SAMPLES, PAYLOAD_RANGE_SAMPLES_RANGE);
  const samples = Math.round(n);
  const warnings = [...m.warnings];
  const trace: RouteTraceItem[] = routeModelTrace(m);
  const corner = (label: PayloadRangeCornerLabel, p: PayloadRangePoint, coincidesWith?: PayloadRangeCornerLabel): PayloadRangeCorner => ({
    ...p, label, description: DESCRIPTIONS[label], ...(coincidesWith ? { coincidesWith } : {}),
  });

  const Wmax = m.oew_kg + m.maxPayload_kg;
  const rD = routeReach(m, m.oew_kg, m.mtow_kg);
  const a0 = pointAt(m, 0);
  if (rD === null || a0 === null) {
    const l = routeLoading(m, 0, m.oew_kg);
    const p: PayloadRangePoint = {
      stageLength_m: 0, payload_kg: 0, zeroFuelMass_kg: l.zeroFuelMass_kg, takeoffMass_kg: l.takeoffMass_kg,
      takeoffFuel_kg: l.takeoffFuel_kg, rampFuel_kg: l.rampFuel_kg, tripFuel_kg: l.tripFuel_kg, blockFuel_kg: l.blockFuel_kg, arrivalMass_kg: l.arrivalMass_kg,
      limitedBy: routeCapacity(m, 0, m.mtow_kg).limitedBy,
      activeLimits: routeCapacity(m, 0, m.mtow_kg).activeLimits,
    };
    const why = notice('payloadRange.reservesUnfundable')`The aircraft cannot carry its reserve fuel within its limits even with zero payload.`;
    return {
      method: ROUTE_METHOD_VERSION, status: 'cannot-fly', reason: siText(why), aircraftId: aircraft.id, reserves: m.reserves,
      corners: { A: corner('A', p), B: corner('B', p, 'A'), C: corner('C', p, 'A'), D: corner('D', p, 'A') },
      points: [p], ferryRange_m: 0, trace, warnings: [...warnings, why],
    };
  }
  const sD = rD.stage_m;
  const rB = routeReach(m, Wmax, m.mtow_kg);
  const sB = rB ? rB.stage_m : 0;
  if (a0.payload_kg < m.maxPayload_kg - ROUTE_MASS_SLACK_KG) {
    warnings.push(notice('payloadRange.maxPayloadNotCarried')`The maximum payload cannot be carried even at zero range (limited by ${a0.limitedBy}); corner A shows the greatest payload.`);
  }

  // Corner C: MTOW with full tanks, W_ZF = MTOW − (maxFuel − taxi).
  const Wc = m.mtow_kg - m.fuelAtBrakeRelease_kg;
  let sC: number;
  let cWith: PayloadRangeCornerLabel | undefined;
  if (Wc >= Wmax) {
    sC = sB; cWith = 'B';
  } else if (Wc <= m.oew_kg) {
    sC = sD; cWith = 'D';
  } else {
    const s = routeStageForPhi(m, m.mtow_kg / (Wc + m.holdFuel_kg));
    sC = Math.min(sD, Math.max(sB, s ?? 0));
    if (s === null || s < sB || s > sD) {
      warnings.push(notice('payloadRange.cornerCCut')`Corner C (MTOW with full tanks) is cut by another limit; it is shown at the nearest reachable stage.`);
    }
  }

  const at = (s: number): PayloadRangePoint => {
    const p = pointAt(m, s);
    // Corner stages come from the closed-form reach, so a loading always exists there.
    if (p === null) throw new Error(`internal: no payload-range point at a corner stage (${s} m)`);
    return p;
  };
  const corners = {
    A: corner('A', a0),
    B: corner('B', at(sB), sB === 0 ? 'A' : undefined),
    C: corner('C', at(sC), cWith),
    D: corner('D', at(sD)),
  };

  const stages = new Set<number>();
  for (let i = 0; i < samples; i++) stages.add((sD * i) / (samples - 1));
  const all = [...stages, sB, sC, sD].sort((x, y) => x - y);
  const points: PayloadRangePoint[] = [];
  for (const s of all) {
    const last = points[points.length - 1];
    if (last && s - last.stageLength_m < PAYLOAD_RANGE_STAGE_MERGE_M) continue;
    const p = pointAt(m, s);
    if (p) points.push(p);
  }

  trace.push(
    { key: 'stageB_m', label: 'Corner B stage length', value: corners.B.stageLength_m, unit: 'm' },
    { key: 'stageC_m', label: 'Corner C stage length', value: corners.C.stageLength_m, unit: 'm' },
    { key: 'ferryRange_m', label: 'Corner D (ferry) stage length', value: sD, unit: 'm' },
  );
  return {
    method: ROUTE_METHOD_VERSION,
    status: 'ok',
    aircraftId: aircraft.id,
    reserves: m.reserves,
    corners,
    points,
    ferryRange_m: finite('ferryRange_m', sD),
    trace,
    warnings,
  };
}
