/**
 * Chart model: what a chart shows, in SI, independent of how it is drawn. The web page (SVG) and the
 * PDF (vector paths) both render this model, so the same numbers appear in both.
 */
import type { QuantityKind } from '../aircraft.js';
import type { Notice } from '../notices.js';

export interface ChartPoint {
  readonly x: number;
  readonly y: number;
}

export interface ChartSeries {
  /** Legend text; a notice when it carries a value (rendered in the reader's units). */
  readonly name: string | Notice;
  readonly points: readonly ChartPoint[];
  /**
   * 'line' joins points; 'step' draws a step function (after); 'points' draws markers only; 'bar' draws
   * a bar per point at category index x (see ChartModel.categories), grouped by series.
   */
  readonly style: 'line' | 'step' | 'points' | 'bar';
  /** Drawn heavier (e.g. the critical aircraft). */
  readonly emphasis?: boolean;
}

export interface ChartRule {
  readonly axis: 'x' | 'y';
  /** SI value where the rule is drawn. */
  readonly value: number;
  readonly label: string;
}

export interface ChartModel {
  readonly id: string;
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly xKind: QuantityKind | 'percent';
  readonly yKind: QuantityKind | 'percent';
  readonly series: readonly ChartSeries[];
  readonly rules: readonly ChartRule[];
  /** Optional fixed domains (SI); otherwise derived from the data and rules. */
  readonly xDomain?: readonly [number, number];
  readonly yDomain?: readonly [number, number];
  /** Draw the y axis from zero. */
  readonly yFromZero?: boolean;
  /** Category names for bar charts: point x = index into this list. */
  readonly categories?: readonly string[];
}
