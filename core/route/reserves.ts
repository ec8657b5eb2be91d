/**
 * Reserve-fuel policies for the design takeoff mass (planning, not dispatch).
 *
 * Sources (14 CFR 121.639, 121.645, 91.167):
 * - 'cruise-45min': fuel to the destination, then to the most distant alternate, then 45 minutes at
 *   normal cruise — the shape of 14 CFR 121.639 (domestic) and 91.167 (IFR, Part 91). Both rules carry
 *   an alternate whenever one is required, so the policy carries one by default: 200 NM = 370.4 km when
 *   none is given (from memory / common practice for planning studies, not a rule). An explicit 0 m
 *   means no alternate (e.g. a destination whose weather makes one unnecessary).
 * - 'international': fuel to the destination, then 10 % of the trip time, then to the alternate, then
 *   30 minutes holding at 1500 ft above the alternate — the shape of 14 CFR 121.645(b) (flag and
 *   supplemental, turbine-engined aircraft other than turboprops). Default alternate distance
 *   200 NM = 370.4 km (from memory / common practice for planning studies, not a rule).
 * - 'custom': an alternate distance, a reserve time flown either in the hold or at normal cruise, and
 *   a contingency fraction of trip fuel (covers e.g. 91.151 VFR 30/45 minutes, or the 121.643(c)
 *   three hours at normal cruise).
 *
 * Contingency: 'cruise-45min' uses the aircraft's contingency fraction of trip fuel
 * (aircraft.cruise.contingencyFraction); 'international' uses the rule's 10 % of trip time instead
 * (the rule's allowance already is the en-route contingency, so the two are not added); 'custom' uses
 * its own fraction, or the aircraft's when omitted.
 *
 * Validity: the study's field ranges (core/fields.ts): alternate distance 0–2000 km, reserve time
 * 0–240 min, contingency fraction 0–0.2.
 */
import { InputDomainError } from '../errors.js';
import { ALTERNATE_DISTANCE_RANGE_KM, CONTINGENCY_FRACTION_RANGE, RESERVE_TIME_RANGE_MIN } from '../fields.js';
import { NM } from '../units.js';
import { check, inRange } from '../validate.js';

export type ReservePolicyKind = 'cruise-45min' | 'international' | 'custom';
export const RESERVE_POLICY_KINDS: readonly ReservePolicyKind[] = ['cruise-45min', 'international', 'custom'];

/** Where reserve time is flown: in the hold (holding L/D) or at normal cruise (cruise L/D and speed). */
export type ReserveFlight = 'hold' | 'cruise';

export type ReservePolicy =
  | {
      readonly kind: 'cruise-45min';
      /** Distance to the alternate, m (default 370 400 m = 200 NM, from memory / common practice; 0 for none). */
      readonly alternateDistance_m?: number;
    }
  | {
      readonly kind: 'international';
      /** Distance to the alternate, m (default 370 400 m = 200 NM). */
      readonly alternateDistance_m?: number;
      /** Holding time above the alternate, min (default 30). */
      readonly holdMinutes?: number;
    }
  | {
      readonly kind: 'custom';
      /** Distance to the alternate, m. */
      readonly alternateDistance_m: number;
      /** Reserve time, min. */
      readonly holdMinutes: number;
      /** Contingency as a fraction of trip fuel (default: the aircraft's). */
      readonly contingencyFraction?: number;
      /** Where the reserve time is flown (default 'hold'). */
      readonly reserveFlight?: ReserveFlight;
    };

/** Defaults and rule text per policy, for forms, docs and the report. */
export const RESERVE_POLICY_INFO: Readonly<Record<ReservePolicyKind, { readonly label: string; readonly rule: string }>> = {
  'cruise-45min': {
    label: '45 minutes at normal cruise',
    rule: 'Trip + contingency (aircraft fraction of trip fuel) + alternate (default 200 NM; 0 for none) + 45 min at normal cruise; 14 CFR 121.639 / 91.167 style.',
  },
  international: {
    label: 'International: 10 % trip time, alternate, 30 min hold',
    rule: 'Trip + 10 % of trip time at cruise + alternate (default 200 NM) + 30 min hold at 1500 ft above the alternate; 14 CFR 121.645(b) style.',
  },
  custom: {
    label: 'Custom reserves',
    rule: 'Trip + contingency fraction of trip fuel + alternate distance + reserve minutes in the hold or at normal cruise.',
  },
};

/**
 * Default alternate distance where a policy requires an alternate and none is given, m (200 NM; from
 * memory / common practice for planning studies, not a rule).
 */
export const ALTERNATE_DEFAULT_M = 200 * NM;
/** Default alternate distance of the international policy, m (ALTERNATE_DEFAULT_M). */
export const INTERNATIONAL_ALTERNATE_DEFAULT_M = ALTERNATE_DEFAULT_M;
/** Default alternate distance of the cruise-45min policy (14 CFR 121.639 / 91.167 carry one), m. */
export const CRUISE_ALTERNATE_DEFAULT_M = ALTERNATE_DEFAULT_M;
/** Holding time of the international policy, min (14 CFR 121.645(b)). */
export const INTERNATIONAL_HOLD_MINUTES = 30;
/** En-route allowance of the international policy as a fraction of trip time (14 CFR 121.645(b)). */
export const INTERNATIONAL_TRIP_TIME_FRACTION = 0.1;
/** Reserve time of the cruise-45min policy, min (14 CFR 121.639, 91.167). */
export const CRUISE_RESERVE_MINUTES = 45;

/** The study's alternate-distance range (core/fields.ts), in metres. */
export const RESERVE_ALTERNATE_DISTANCE_RANGE = { min: ALTERNATE_DISTANCE_RANGE_KM.min * 1000, max: ALTERNATE_DISTANCE_RANGE_KM.max * 1000, unit: 'm' } as const;
export const RESERVE_MINUTES_RANGE = RESERVE_TIME_RANGE_MIN;
export const RESERVE_CONTINGENCY_FRACTION_RANGE = CONTINGENCY_FRACTION_RANGE;

/** A policy with every parameter filled in. */
export interface ResolvedReserves {
  readonly kind: ReservePolicyKind;
  readonly alternateDistance_m: number;
  /** True when the alternate distance is the policy's default (none was given). */
  readonly alternateDefaulted: boolean;
  /** Reserve time after the alternate leg, s. */
  readonly reserveTime_s: number;
  readonly reserveFlight: ReserveFlight;
  /** Contingency rule: a fraction of trip fuel, or a fraction of trip time flown at cruise. */
  readonly contingency: { readonly basis: 'trip-fuel' | 'trip-time'; readonly fraction: number };
}

/** Fills the defaults of `policy` and checks its parameters; `aircraftContingency` is the profile's fraction. */
export function resolveReserves(policy: ReservePolicy, aircraftContingency: number, path = 'reserves'): ResolvedReserves {
  check(typeof policy === 'object' && policy !== null, path, policy, 'a reserve policy object');
  const kind = (policy as { kind?: unknown }).kind;
  if (typeof kind !== 'string' || !(RESERVE_POLICY_KINDS as readonly string[]).includes(kind)) {
    throw new InputDomainError(`${path}.kind`, kind, `one of ${RESERVE_POLICY_KINDS.join(', ')}`);
  }
  const alt = (v: number | undefined, dflt: number): number =>
    inRange(`${path}.alternateDistance_m`, v ?? dflt, RESERVE_ALTERNATE_DISTANCE_RANGE);
  const minutes = (v: number | undefined, dflt: number): number =>
    inRange(`${path}.holdMinutes`, v ?? dflt, RESERVE_MINUTES_RANGE);
  switch (policy.kind) {
    case 'cruise-45min':
      return {
        kind: policy.kind,
        alternateDistance_m: alt(policy.alternateDistance_m, CRUISE_ALTERNATE_DEFAULT_M),
        alternateDefaulted: policy.alternateDistance_m === undefined,
        reserveTime_s: CRUISE_RESERVE_MINUTES * 60,
        reserveFlight: 'cruise',
        contingency: { basis: 'trip-fuel', fraction: aircraftContingency },
      };
    case 'international':
      return {
        kind: policy.kind,
        alternateDistance_m: alt(policy.alternateDistance_m, INTERNATIONAL_ALTERNATE_DEFAULT_M),
        alternateDefaulted: policy.alternateDistance_m === undefined,
        reserveTime_s: minutes(policy.holdMinutes, INTERNATIONAL_HOLD_MINUTES) * 60,
        reserveFlight: 'hold',
        contingency: { basis: 'trip-time', fraction: INTERNATIONAL_TRIP_TIME_FRACTION },
      };
    case 'custom': {
      const flight = policy.reserveFlight ?? 'hold';
      check(flight === 'hold' || flight === 'cruise', `${path}.reserveFlight`, flight, 'one of hold, cruise');
      check(policy.alternateDistance_m !== undefined, `${path}.alternateDistance_m`, undefined, 'a distance in m (0 for none)');
      check(policy.holdMinutes !== undefined, `${path}.holdMinutes`, undefined, 'a reserve time in min (0 for none)');
      return {
        kind: policy.kind,
        alternateDistance_m: alt(policy.alternateDistance_m, 0),
        alternateDefaulted: false,
        reserveTime_s: minutes(policy.holdMinutes, 0) * 60,
        reserveFlight: flight,
        contingency: {
          basis: 'trip-fuel',
          fraction: inRange(`${path}.contingencyFraction`, policy.contingencyFraction ?? aircraftContingency, RESERVE_CONTINGENCY_FRACTION_RANGE),
        },
      };
    }
  }
}
