/**
 * Text of a report-model cell (core/report/model.ts) in the user's units: one formatter for the
 * results page and the PDF appendix, so both print the same label with the same number.
 */
import { unitOf, type Cell, type Column, type UnitSystem, type ValueKind } from '../core/index.js';
import { fmt, fmtLengthBoth, fmtNumber, fmtPct, say } from './format.js';

/** Significant digits of the input listing (the attached file holds the exact values). */
export const LISTING_DIGITS = 6;

export function kindSymbol(kind: ValueKind, units: UnitSystem): string {
  if (kind === 'lengthBoth' || kind === 'percent' || kind === 'passengers') return '';
  return unitOf(kind, units).symbol;
}

function numberOf(si: number | null | undefined, kind: ValueKind, units: UnitSystem, withUnit: boolean, digits?: number, listing?: boolean): string {
  if (kind === 'lengthBoth') return fmtLengthBoth(si, units);
  if (kind === 'percent') return fmtPct(si, digits ?? 1);
  if (kind === 'passengers') {
    // The penalty in passengers is not rounded in the result; a view rounds it up to whole passengers.
    if (si === null || si === undefined || !Number.isFinite(si)) return '—';
    return Math.ceil(si - 1e-9).toLocaleString('en-US');
  }
  if (listing) {
    if (si === null || si === undefined || !Number.isFinite(si)) return '—';
    const v = String(Number(unitOf(kind, units).from(si).toPrecision(LISTING_DIGITS)));
    const sym = unitOf(kind, units).symbol;
    return withUnit && sym ? `${v} ${sym}` : v;
  }
  return withUnit ? fmt(si, kind, units, digits) : fmtNumber(si, kind, units, digits);
}

/** Text of a cell; in a column with a kind the unit is in the header and the cell shows the number only. */
export function cellText(cell: Cell, column: Column | undefined, units: UnitSystem): string {
  if ('text' in cell) return cell.text;
  if ('notice' in cell) return say(cell.notice, units);
  const inHeader = column?.kind !== undefined && kindSymbol(column.kind, units) !== '';
  if ('pair' in cell) {
    const [a, b] = cell.pair;
    const s = `${numberOf(a, cell.kind, units, false)} / ${numberOf(b, cell.kind, units, false)}`;
    const sym = unitOf(cell.kind, units).symbol;
    return inHeader || !sym ? s : `${s} ${sym}`;
  }
  if ('unit' in cell) {
    const v = Number(cell.si.toPrecision(4)).toLocaleString('en-US', { maximumFractionDigits: 6 });
    return cell.unit ? `${v} ${cell.unit}` : v;
  }
  return numberOf(cell.si, cell.kind, units, !inHeader, cell.digits, cell.listing);
}

