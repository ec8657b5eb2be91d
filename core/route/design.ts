/**
 * Design takeoff mass for a stage length and payload, and the two inverses the runway check needs
 * (greatest payload for a stage at a given takeoff mass; greatest stage for a payload at a given
 * takeoff mass).
 *
 * Source: Breguet range equation, Aeronautical Engineer's Data Book ch. 9 (closed form, weights multiplicative; design TOW = min(MTOW, W_TO);
 * check the landing mass against MLW and the fuel against capacity) with the reserve rules of §9.2
 * (reserves.ts) and the Breguet forms of §9.1 (breguet.ts). All solves are closed form (model.ts).
 *
 * Validity: stage length 1 km to 20 000 km; payload 0 to the structural maximum; takeoff mass above 0
 * and at most MTOW. Results are planning estimates: trip fuel is Breguet cruise over the stage plus a
 * climb/descent allowance (model.ts); trip time is stage / cruise TAS; no wind.
 */
import { notice, qty, siText, type Notice } from '../notices.js';
import type { AircraftProfile } from '../aircraft.js';
import { finite, inRange } from '../validate.js';
import type { ReservePolicy, ResolvedReserves } from './reserves.js';
import {
  ROUTE_LIMIT_LABELS, ROUTE_MASS_SLACK_KG, ROUTE_METHOD_VERSION, ROUTE_STAGE_LENGTH_RANGE, buildRouteFuelModel,
  routeCapacity, routeFactors, routeLoading, routeModelTrace, routeReach, routeViolations,
  type RouteFuelModel, type RouteLimit, type RouteLoading, type RouteTraceItem,
} from './model.js';

export type RouteStatus = 'ok' | 'payload-limited' | 'fuel-limited' | 'out-of-range';

export interface DesignTakeoffMassInput {
  readonly aircraft: AircraftProfile;
  /** Stage length (great-circle trip distance), m: 1 000 to 20 000 000. */
  readonly stageLength_m: number;
  /** Payload to carry, kg: 0 to aircraft.maxPayload_kg. */
  readonly payload_kg: number;
  readonly reserves: ReservePolicy;
}

export interface RouteResult {
  readonly method: string;
  readonly status: RouteStatus;
  /** Why the result is not 'ok' (absent when ok), as SI text. */
  readonly reason?: string;
  /** The same, as a notice (rendered in the reader's units). */
  readonly why?: Notice;
  readonly aircraftId: string;
  readonly reserves: ResolvedReserves;
  readonly stageLength_m: number;
  readonly requestedPayload_kg: number;
  /**
   * The design loading. 'ok': the requested payload over the stage. 'payload-limited' / 'fuel-limited':
   * the greatest payload that flies the stage. 'out-of-range': zero payload over the farthest stage
   * the aircraft can reach (`reachZeroPayload_m`), or over 0 m when even that fails.
   */
  readonly loading: RouteLoading;
  /** Brake-release mass of the design loading, kg (≤ MTOW except when out of range at stage 0). */
  readonly designTakeoffMass_kg: number;
  /** Requested payload minus the payload carried, kg (≥ 0). */
  readonly payloadOffload_kg: number;
  /** The limit that caps the carried payload (absent when ok). */
  readonly limitedBy?: RouteLimit;
  /** Limits the requested loading breaks (empty when ok). */
  readonly violated: readonly RouteLimit[];
  /** Takeoff mass the requested payload would need over the stage, kg, when the fuel rules can close. */
  readonly uncappedTakeoffMass_kg?: number;
  /** Arrival mass the requested payload would have, kg, when the fuel rules can close. */
  readonly uncappedArrivalMass_kg?: number;
  /** Greatest stage with the requested payload, m (0 when it cannot fly at all). */
  readonly reachWithPayload_m: number;
  /** Greatest stage with zero payload (ferry reach), m (0 when none). */
  readonly reachZeroPayload_m: number;
  readonly trace: readonly RouteTraceItem[];
  readonly warnings: readonly Notice[];
}

const kg = (x: number) => qty.mass(x);
const km = (x: number) => qty.distance(x, 1);

function checkLoading(l: RouteLoading): RouteLoading {
  for (const [k, v] of Object.entries(l)) finite(`route loading ${k}`, v as number);
  return l;
}

function loadingTrace(l: RouteLoading): RouteTraceItem[] {
  return [
    { key: 'tripTime_s', label: 'Trip time at cruise speed', value: l.tripTime_s, unit: 's' },
    { key: 'zeroFuelMass_kg', label: 'Zero-fuel mass', value: l.zeroFuelMass_kg, unit: 'kg' },
    { key: 'reserveFuel_kg', label: 'Reserve fuel (alternate + final reserve)', value: l.reserveFuel_kg, unit: 'kg' },
    { key: 'contingencyFuel_kg', label: 'Contingency fuel', value: l.contingencyFuel_kg, unit: 'kg' },
    { key: 'arrivalMass_kg', label: 'Arrival (landing) mass', value: l.arrivalMass_kg, unit: 'kg' },
    { key: 'cruiseFuel_kg', label: 'Cruise fuel (Breguet over the stage)', value: l.cruiseFuel_kg, unit: 'kg' },
    { key: 'climbDescentFuel_kg', label: 'Climb/descent allowance', value: l.climbDescentFuel_kg, unit: 'kg' },
    { key: 'tripFuel_kg', label: 'Trip fuel (cruise + climb/descent)', value: l.tripFuel_kg, unit: 'kg' },
    { key: 'blockFuel_kg', label: 'Block fuel (taxi + trip)', value: l.blockFuel_kg, unit: 'kg' },
    { key: 'takeoffMass_kg', label: 'Takeoff (brake-release) mass', value: l.takeoffMass_kg, unit: 'kg' },
    { key: 'rampMass_kg', label: 'Ramp mass', value: l.rampMass_kg, unit: 'kg' },
  ];
}

function clampPayload(m: RouteFuelModel, W: number): number {
  // Zero-fuel mass within the slack of OEW counts as zero payload.
  return W < m.oew_kg && W > m.oew_kg - ROUTE_MASS_SLACK_KG ? m.oew_kg : W;
}

function violationText(m: RouteFuelModel, lim: RouteLimit, l: RouteLoading): Notice {
  switch (lim) {
    case 'mtow': return notice('route.overMtow')`takeoff mass ${kg(l.takeoffMass_kg)} exceeds MTOW ${kg(m.mtow_kg)}`;
    case 'max-fuel': return notice('route.overFuelCapacity')`ramp fuel ${kg(l.rampFuel_kg)} exceeds the fuel capacity ${kg(m.maxFuel_kg)}`;
    case 'mlw': return notice('route.overMlw')`arrival mass ${kg(l.arrivalMass_kg)} exceeds MLW ${kg(m.mlw_kg)}`;
    case 'max-payload': return notice('route.overMaxPayload')`payload ${kg(l.payload_kg)} exceeds the maximum payload ${kg(m.maxPayload_kg)}`;
  }
}

/**
 * Takeoff mass for a stage length and payload with the named reserve policy (§9.3): trip,
 * contingency, reserve and taxi fuel; takeoff, ramp and arrival masses; capped by MTOW, fuel capacity
 * and MLW. Bad input throws InputDomainError; a route the aircraft cannot fly is a result.
 */
export function designTakeoffMass(input: DesignTakeoffMassInput): RouteResult {
  const { aircraft } = input;
  const m = buildRouteFuelModel(aircraft, input.reserves);
  const s = inRange('stageLength_m', input.stageLength_m, ROUTE_STAGE_LENGTH_RANGE);
  const P = inRange('payload_kg', input.payload_kg, { min: 0, max: aircraft.maxPayload_kg, unit: 'kg' });
  const warnings = [...m.warnings];
  const Wzf = m.oew_kg + P;

  const reachP = routeReach(m, Wzf, m.mtow_kg);
  const reach0 = routeReach(m, m.oew_kg, m.mtow_kg);
  const f = routeFactors(m, s);
  const requested = f.finite ? checkLoading(routeLoading(m, s, Wzf)) : undefined;
  const violated = requested ? routeViolations(m, requested, m.mtow_kg) : (['max-fuel'] as RouteLimit[]);

  let status: RouteStatus;
  let why: Notice | undefined;
  let loading: RouteLoading;
  let limitedBy: RouteLimit | undefined;

  if (requested && violated.length === 0) {
    status = 'ok';
    loading = requested;
  } else {
    const cap = routeCapacity(m, s, m.mtow_kg);
    const broken: readonly Notice[] = requested
      ? violated.map((v) => violationText(m, v, requested))
      : [notice('route.contingencyUnfundable')`the contingency rule needs more fuel than any loading can carry`];
    if (cap.payload_kg >= -ROUTE_MASS_SLACK_KG) {
      limitedBy = cap.limitedBy;
      loading = checkLoading(routeLoading(m, s, clampPayload(m, cap.zeroFuelMass_kg)));
      status = limitedBy === 'max-fuel' ? 'fuel-limited' : 'payload-limited';
      why = notice('route.payloadLimited')`With the requested payload ${kg(P)} over ${km(s)}: ${broken}. Limited by the ${ROUTE_LIMIT_LABELS[limitedBy]}: the greatest payload for this stage is ${kg(loading.payload_kg)}, ${kg(P - loading.payload_kg)} left behind (takeoff mass ${kg(loading.takeoffMass_kg)}).`;
    } else {
      status = 'out-of-range';
      limitedBy = reach0?.limitedBy ?? cap.limitedBy;
      const stage0 = reach0 ? reach0.stage_m : 0;
      const f0 = routeFactors(m, stage0);
      loading = checkLoading(f0.finite ? routeLoading(m, stage0, m.oew_kg) : routeLoading(m, 0, m.oew_kg));
      why = reach0
        ? notice('route.outOfRange')`Stage ${km(s)} cannot be flown even with zero payload: the farthest reach is ${km(reach0.stage_m)}, limited by the ${ROUTE_LIMIT_LABELS[reach0.limitedBy]} (${broken}).`
        : notice('route.reservesUnfundable')`The aircraft cannot carry its reserve fuel within its limits even with zero payload and zero stage (${broken}).`;
    }
  }

  const trace: RouteTraceItem[] = [
    ...routeModelTrace(m),
    { key: 'stageLength_m', label: 'Stage length', value: s, unit: 'm' },
    { key: 'requestedPayload_kg', label: 'Requested payload', value: P, unit: 'kg' },
    { key: 'phi', label: 'W_TO / (W_ZF + fixed-flow holding fuel) for the stage', value: f.finite ? f.phi : 0, unit: '' },
    ...loadingTrace(loading),
  ];
  if (status !== 'ok') warnings.push(why!);
  const reason = why === undefined ? undefined : siText(why);

  const result: RouteResult = {
    method: ROUTE_METHOD_VERSION,
    status,
    ...(reason !== undefined ? { reason, why } : {}),
    aircraftId: aircraft.id,
    reserves: m.reserves,
    stageLength_m: s,
    requestedPayload_kg: P,
    loading,
    // A loading capped at MTOW can land a rounding error above it (22800.000000000004 kg): the design
    // mass is a takeoff mass, so it is held to MTOW within the route model's mass slack.
    designTakeoffMass_kg: loading.takeoffMass_kg > m.mtow_kg && loading.takeoffMass_kg <= m.mtow_kg + ROUTE_MASS_SLACK_KG ? m.mtow_kg : loading.takeoffMass_kg,
    payloadOffload_kg: Math.max(0, P - loading.payload_kg),
    ...(limitedBy !== undefined ? { limitedBy } : {}),
    violated: status === 'ok' ? [] : violated,
    ...(requested ? { uncappedTakeoffMass_kg: requested.takeoffMass_kg, uncappedArrivalMass_kg: requested.arrivalMass_kg } : {}),
    reachWithPayload_m: finite('reachWithPayload_m', reachP ? reachP.stage_m : 0),
    reachZeroPayload_m: finite('reachZeroPayload_m', reach0 ? reach0.stage_m : 0),
    trace,
    warnings,
  };
  return result;
}

export interface PayloadForRangeInput {
  readonly aircraft: AircraftProfile;
  /** Takeoff (brake-release) mass available, kg: above 0 and at most MTOW (e.g. the runway-limited mass). */
  readonly takeoffMass_kg: number;
  /** Stage length, m: 1 000 to 20 000 000. */
  readonly stageLength_m: number;
  readonly reserves: ReservePolicy;
}

export interface RoutePayloadResult {
  readonly method: string;
  readonly status: 'ok' | 'cannot-fly';
  readonly reason?: string;
  /** Greatest payload that flies the stage without exceeding the takeoff mass, kg (0 when it cannot fly). */
  readonly payload_kg: number;
  /** The binding limit ('mtow' here means the given takeoff mass). */
  readonly limitedBy: RouteLimit;
  /** The loading with that payload (present when ok). Its takeoff mass may be below the given one. */
  readonly loading?: RouteLoading;
  readonly trace: readonly RouteTraceItem[];
  readonly warnings: readonly Notice[];
}

/** Greatest payload (≥ 0) that can fly a stage at a given takeoff mass, or 'cannot-fly' (closed form). */
export function payloadForRange(input: PayloadForRangeInput): RoutePayloadResult {
  const { aircraft } = input;
  const m = buildRouteFuelModel(aircraft, input.reserves);
  const tow = inRange('takeoffMass_kg', input.takeoffMass_kg, { min: 0, minInclusive: false, max: aircraft.mtow_kg, unit: 'kg' });
  const s = inRange('stageLength_m', input.stageLength_m, ROUTE_STAGE_LENGTH_RANGE);
  const cap = routeCapacity(m, s, tow);
  const trace: RouteTraceItem[] = [
    ...routeModelTrace(m),
    { key: 'takeoffMassCap_kg', label: 'Takeoff mass available', value: tow, unit: 'kg' },
    { key: 'stageLength_m', label: 'Stage length', value: s, unit: 'm' },
  ];
  if (cap.payload_kg < -ROUTE_MASS_SLACK_KG) {
    const why = notice('route.cannotFlyAtMass')`Stage ${km(s)} cannot be flown at a takeoff mass of ${kg(tow)} even with zero payload (limited by the ${ROUTE_LIMIT_LABELS[cap.limitedBy]}).`;
    return { method: ROUTE_METHOD_VERSION, status: 'cannot-fly', reason: siText(why), payload_kg: 0, limitedBy: cap.limitedBy, trace, warnings: [...m.warnings, why] };
  }
  const loading = checkLoading(routeLoading(m, s, clampPayload(m, cap.zeroFuelMass_kg)));
  return {
    method: ROUTE_METHOD_VERSION,
    status: 'ok',
    payload_kg: finite('payload_kg', Math.max(0, loading.payload_kg)),
    limitedBy: cap.limitedBy,
    loading,
    trace: [...trace, ...loadingTrace(loading)],
    warnings: [...m.warnings],
  };
}

export interface RangeForPayloadInput {
  readonly aircraft: AircraftProfile;
  /** Takeoff (brake-release) mass available, kg: above 0 and at most MTOW. */
  readonly takeoffMass_kg: number;
  /** Payload, kg: 0 to aircraft.maxPayload_kg. */
  readonly payload_kg: number;
  readonly reserves: ReservePolicy;
}

export interface RouteRangeResult {
  readonly method: string;
  readonly status: 'ok' | 'cannot-fly';
  readonly reason?: string;
  /** Greatest stage length, m (0 when it cannot fly). */
  readonly range_m: number;
  /** The binding limit ('mtow' here means the given takeoff mass). */
  readonly limitedBy?: RouteLimit;
  /** The loading over that stage (present when ok). Its takeoff mass may be below the given one. */
  readonly loading?: RouteLoading;
  readonly trace: readonly RouteTraceItem[];
  readonly warnings: readonly Notice[];
}

/** Greatest stage length for a payload at a given takeoff mass (closed form). */
export function rangeForPayload(input: RangeForPayloadInput): RouteRangeResult {
  const { aircraft } = input;
  const m = buildRouteFuelModel(aircraft, input.reserves);
  const tow = inRange('takeoffMass_kg', input.takeoffMass_kg, { min: 0, minInclusive: false, max: aircraft.mtow_kg, unit: 'kg' });
  const P = inRange('payload_kg', input.payload_kg, { min: 0, max: aircraft.maxPayload_kg, unit: 'kg' });
  const r = routeReach(m, m.oew_kg + P, tow);
  const trace: RouteTraceItem[] = [
    ...routeModelTrace(m),
    { key: 'takeoffMassCap_kg', label: 'Takeoff mass available', value: tow, unit: 'kg' },
    { key: 'payload_kg', label: 'Payload', value: P, unit: 'kg' },
  ];
  if (r === null) {
    const why = notice('route.payloadDoesNotFit')`A payload of ${kg(P)} with its reserves does not fit a takeoff mass of ${kg(tow)} and the aircraft limits.`;
    return { method: ROUTE_METHOD_VERSION, status: 'cannot-fly', reason: siText(why), range_m: 0, trace, warnings: [...m.warnings, why] };
  }
  const loading = checkLoading(routeLoading(m, r.stage_m, m.oew_kg + P));
  return {
    method: ROUTE_METHOD_VERSION,
    status: 'ok',
    range_m: finite('range_m', r.stage_m),
    limitedBy: r.limitedBy,
    loading,
    trace: [...trace, ...loadingTrace(loading)],
    warnings: [...m.warnings],
  };
}
