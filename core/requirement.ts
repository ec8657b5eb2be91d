/**
 * Required runway length for one aircraft: the greater of its takeoff and landing requirements,
 * with the governing side named (design brief, "Calculation methods"; common practice in runway
 * length studies). Ties are reported as governed by the takeoff.
 *
 * Validity: both lengths finite and positive, m. Pure, no rounding.
 */
import { inRange } from './validate.js';

export type GoverningSide = 'takeoff' | 'landing';

export interface RequiredLengthInput {
  /** Takeoff length requirement, m. */
  readonly takeoff_m: number;
  /** Landing length requirement (already factored by its operating rule), m. */
  readonly landing_m: number;
}

export interface RequiredLengthResult {
  /** The greater of the two, m. */
  readonly length_m: number;
  readonly governing: GoverningSide;
  /** Takeoff minus landing, m (positive when takeoff governs). */
  readonly margin_m: number;
}

export function requiredLength(input: RequiredLengthInput): RequiredLengthResult {
  const t = inRange('takeoff_m', input.takeoff_m, { min: 0, minInclusive: false, unit: 'm' });
  const l = inRange('landing_m', input.landing_m, { min: 0, minInclusive: false, unit: 'm' });
  return t >= l
    ? { length_m: t, governing: 'takeoff', margin_m: t - l }
    : { length_m: l, governing: 'landing', margin_m: t - l };
}
