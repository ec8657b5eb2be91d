/**
 * Operating rule sets: which regulatory factors turn a landing distance into a landing runway, and
 * the planning factors used for light (normal-category) aircraft, which no rule set factors.
 *
 * Sources (docs/methods.md, "Operating rules"; 14 CFR 121.195 and 135.385):
 * - us-121: 14 CFR 121.195(b) land within 60 % of the runway (÷ 0.60); (c) turboprop alternate 70 %;
 *   (d) turbojet on a wet runway 115 % of (b).
 * - us-135-eod: 14 CFR 135.385(f) eligible on-demand operators land within 80 % (÷ 0.80); 135.385(d)
 *   wet 115 % for turbojets (the 115 % taken on the 80 % length: from memory).
 * - us-91: 14 CFR Part 91 (other than subpart K) sets no landing factor: the distance on the surface.
 * - eu-cat: EU Air Operations, CAT.POL.A.230 (jets 60 %, turboprops 70 % at destination) and
 *   CAT.POL.A.235 (+15 % on a wet runway, all types); performance class B CAT.POL.A.325 / .330 (70 %,
 *   +15 % wet). Rule numbers and percentages from memory.
 * - Light aircraft under every rule set: takeoff × 1.25 and landing ÷ 0.70 (× 1.43), the performance
 *   class B factors of CAT.POL.A.305 and CAT.POL.A.325 (from memory), used as the project's planning
 *   default because the US rules set none for them. A profile's own lightAircraftFactor replaces both.
 * Pure data and small functions; SI only.
 */

export type OperatingRuleSet = 'us-121' | 'us-135-eod' | 'us-91' | 'eu-cat';
export const OPERATING_RULE_SETS: readonly OperatingRuleSet[] = ['us-121', 'us-135-eod', 'us-91', 'eu-cat'];
export const DEFAULT_OPERATING_RULES: OperatingRuleSet = 'us-121';

export interface OperatingRuleSetInfo {
  readonly id: OperatingRuleSet;
  /** Short name for forms and tables. */
  readonly label: string;
  /** What the set does to the landing length, in plain words. */
  readonly summary: string;
  /** Where the factors come from (and which parts are from memory). */
  readonly source: string;
}

export const OPERATING_RULE_SET_INFO: Readonly<Record<OperatingRuleSet, OperatingRuleSetInfo>> = {
  'us-121': {
    id: 'us-121', label: 'US Part 121 (scheduled)',
    summary: 'transports land within 60 % of the runway (÷ 0.60), turbojets × 1.15 on a wet runway; turboprop alternate 70 % on request',
    source: '14 CFR 121.195(b)–(d)',
  },
  'us-135-eod': {
    id: 'us-135-eod', label: 'US Part 135 eligible on-demand',
    summary: 'transports and commuters land within 80 % of the runway (÷ 0.80), turbojets × 1.15 on a wet runway',
    source: '14 CFR 135.385(f) and (d) (115 % on the 80 % length from memory)',
  },
  'us-91': {
    id: 'us-91', label: 'US Part 91 (unfactored)',
    summary: 'no landing factor: the landing distance on the surface is the landing runway',
    source: '14 CFR Part 91 (outside subpart K) sets no landing-distance factor',
  },
  'eu-cat': {
    id: 'eu-cat', label: 'EU commercial air transport',
    summary: 'jets land within 60 % (÷ 0.60), turboprops within 70 % (÷ 0.70) of the runway; × 1.15 on a wet runway for all types',
    source: 'EU Air Operations CAT.POL.A.230, CAT.POL.A.235, CAT.POL.A.325, CAT.POL.A.330 (from memory)',
  },
};

/** Light-aircraft planning factor on the all-engines takeoff distance to 50 ft (class B CAT.POL.A.305, from memory). */
export const LIGHT_TAKEOFF_FACTOR_DEFAULT = 1.25;
/** Light-aircraft planning factor on the landing distance: ÷ 0.70 (class B CAT.POL.A.325, from memory). */
export const LIGHT_LANDING_FACTOR_DEFAULT = 1 / 0.7;
export const LIGHT_FACTOR_SOURCE =
  'project planning default from the EU performance class B factors (takeoff × 1.25, CAT.POL.A.305; landing ÷ 0.70, CAT.POL.A.325; from memory)';

/** 14 CFR 135.385(f): eligible on-demand operators land within 80 % of the effective runway length. */
export const ON_DEMAND_LANDING_FRACTION = 0.8;
/** EU CAT.POL.A.230(a)(2): turboprops land within 70 % of the LDA at destination (from memory). */
export const EU_TURBOPROP_LANDING_FRACTION = 0.7;
/** EU CAT.POL.A.235 / .330: a wet runway needs 115 % of the dry requirement, all types (from memory). */
export const EU_WET_FACTOR = 1.15;

export function isOperatingRuleSet(x: unknown): x is OperatingRuleSet {
  return typeof x === 'string' && (OPERATING_RULE_SETS as readonly string[]).includes(x);
}
