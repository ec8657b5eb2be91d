/**
 * Readers for open climate files (text in, records out; no I/O): GHCN-Daily station CSV, the
 * per-station daily CSV with a header row, and the monthly normals CSV.
 *
 * Formats (NOAA NCEI GHCN-Daily format description (readme), §10.3; NOAA NCEI GHCN-Daily readme and normals documentation):
 * - GHCN-Daily by-station CSV: no header; ID, DATE (YYYYMMDD), ELEMENT, VALUE, M-FLAG, Q-FLAG,
 *   S-FLAG, OBS-TIME; TMAX/TMIN/TAVG in tenths of °C; a non-blank Q-flag marks a value that failed
 *   quality control; −9999 = missing.
 * - Per-station daily CSV: header row (STATION, DATE as YYYY-MM-DD, ..., TMAX, TMAX_ATTRIBUTES, ...);
 *   each *_ATTRIBUTES field holds "M,Q,S,OBSTIME" and a non-empty second token marks failed QC. The
 *   temperature unit depends on how the file was requested, so the caller states it.
 * - Monthly normals CSV: header row; DATE = MM; MLY-TMAX-NORMAL, MLY-TMIN-NORMAL, MLY-TAVG-NORMAL
 *   in °F; −9999 = missing.
 *
 * Every import is all-or-nothing: a bad row refuses the whole file with a ClimateFileError naming
 * the 1-based line and column. Flagged and missing values are dropped and counted. Temperatures must
 * lie in −90..60 °C after conversion (a value outside usually means the wrong unit was stated).
 */
import { parse } from 'csv-parse/sync';
import { fToC } from '../units.js';
import { parseCalendarDate, formatCalendarDate, pad2 } from './calendar.js';
import { CLIMATE_TEMPERATURE_RANGE, monthName, type MonthlyNormal } from './design.js';
import type { DailyTemperature } from './daily.js';
import { notice, type Notice } from '../notices.js';

/** A climate file that cannot be imported. `line` and `column` are 1-based; absent for whole-file problems. */
export class ClimateFileError extends Error {
  override readonly name = 'ClimateFileError';
  readonly line?: number;
  readonly column?: number;
  /** Header name of the column, when the file has a header. */
  readonly columnName?: string;
  readonly reason: string;
  constructor(where: { readonly line?: number; readonly column?: number; readonly columnName?: string }, reason: string) {
    const at =
      where.line === undefined
        ? 'file'
        : `line ${where.line}${where.column === undefined ? '' : `, column ${where.column}`}${where.columnName ? ` (${where.columnName})` : ''}`;
    super(`${at}: ${reason}`);
    if (where.line !== undefined) this.line = where.line;
    if (where.column !== undefined) this.column = where.column;
    if (where.columnName !== undefined) this.columnName = where.columnName;
    this.reason = reason;
  }
}

/** Unit of the temperature columns of a per-station daily CSV. */
export type DailyFileTemperatureUnit = 'c' | 'f' | 'tenths-c';

export interface DailyFileSummary {
  /** Data rows read (header excluded). */
  readonly rowsRead: number;
  /** Temperature values kept. */
  readonly valuesKept: number;
  /** Temperature values dropped because a quality-control flag was set. */
  readonly valuesDroppedQc: number;
  /** Temperature values blank or −9999. */
  readonly valuesMissing: number;
  /** Rows of other elements (GHCN-Daily file only), ignored. */
  readonly rowsOtherElements: number;
}

export interface DailyFileReadResult {
  readonly station: string;
  /** One record per date, ascending. */
  readonly days: readonly DailyTemperature[];
  readonly summary: DailyFileSummary;
  readonly warnings: readonly Notice[];
}

export interface MonthlyNormalsReadResult {
  readonly station: string;
  /** Usable months (a mean daily maximum and a mean or minimum), ascending. */
  readonly months: readonly MonthlyNormal[];
  /** Months present in the file but not usable, with the reason. */
  readonly skipped: readonly { readonly month: number; readonly reason: string }[];
  readonly warnings: readonly Notice[];
}

/** The GHCN-Daily missing-value sentinel. */
export const GHCN_MISSING = -9999;

interface Row {
  readonly fields: readonly string[];
  /** 1-based line where the row starts. */
  readonly line: number;
}

/** Parses CSV text with csv-parse; a syntax error becomes a ClimateFileError with its position. */
function csvRows(text: string): Row[] {
  if (typeof text !== 'string') throw new ClimateFileError({}, 'the file content is not text');
  // Line ends are normalised so that line numbers count CRLF, LF and CR files alike.
  const normalised = text.replace(/\r\n?/g, '\n');
  let records: { record: string[]; raw: string; info: { lines: number } }[];
  try {
    records = parse(normalised, {
      bom: true,
      info: true,
      raw: true,
      skip_empty_lines: true,
      relax_column_count: true,
    }) as unknown as { record: string[]; raw: string; info: { lines: number } }[];
  } catch (e) {
    const err = e as { lines?: unknown; column?: unknown; message?: unknown; code?: unknown };
    const line = typeof err.lines === 'number' ? err.lines : undefined;
    const column = typeof err.column === 'number' ? err.column + 1 : undefined;
    const msg = typeof err.message === 'string' ? err.message.replace(/ at line \d+.*$/, '') : 'unreadable CSV';
    throw new ClimateFileError({ ...(line !== undefined ? { line } : {}), ...(column !== undefined ? { column } : {}) }, `not valid CSV: ${msg}`);
  }
  return records.map((r) => {
    const inner = r.raw.replace(/^\n+|\n+$/g, '');
    const extraLines = inner.split('\n').length - 1;
    return { fields: r.record.map((f) => f.trim()), line: r.info.lines - extraLines };
  });
}

const NUMBER = /^[-+]?(\d+(\.\d*)?|\.\d+)$/;
const INTEGER = /^[-+]?\d+$/;

function temperatureOrThrow(
  c: number,
  where: { line: number; column: number; columnName?: string },
  shown: string,
  unitHint: string,
): number {
  if (!(c >= CLIMATE_TEMPERATURE_RANGE.min && c <= CLIMATE_TEMPERATURE_RANGE.max)) {
    const text = shown.length > 40 ? `${shown.slice(0, 40)}…` : shown;
    const limit = c > CLIMATE_TEMPERATURE_RANGE.max ? `too large (maximum ${CLIMATE_TEMPERATURE_RANGE.max} °C)` : `too small (minimum ${CLIMATE_TEMPERATURE_RANGE.min} °C)`;
    // A value too long for the machine ("1000…0") converts to no number at all: never print "Infinity".
    const converted = Number.isFinite(c) ? ` is ${c.toFixed(1)} °C:` : ':';
    throw new ClimateFileError(where, `temperature ${text}${converted} ${limit}${unitHint}`);
  }
  return c;
}

type ElementKey = 'tmax_c' | 'tmin_c' | 'tavg_c';
const ELEMENT_KEYS: Readonly<Record<string, ElementKey>> = { TMAX: 'tmax_c', TMIN: 'tmin_c', TAVG: 'tavg_c' };

/** Collects values per date; refuses a second value of the same element and TMIN above TMAX. */
class DayTable {
  private readonly days = new Map<string, { tmax_c?: number; tmin_c?: number; tavg_c?: number; lines: Partial<Record<ElementKey, number>> }>();

  put(date: string, key: ElementKey, value: number, where: { line: number; column: number; columnName?: string }): void {
    let d = this.days.get(date);
    if (!d) {
      d = { lines: {} };
      this.days.set(date, d);
    }
    const prev = d.lines[key];
    if (prev !== undefined) {
      throw new ClimateFileError(where, `a second ${key.slice(0, 4).toUpperCase()} value for ${date} (the first is on line ${prev})`);
    }
    d[key] = value;
    d.lines[key] = where.line;
    if (d.tmax_c !== undefined && d.tmin_c !== undefined && d.tmin_c > d.tmax_c) {
      throw new ClimateFileError(where, `TMIN ${d.tmin_c} °C is above TMAX ${d.tmax_c} °C on ${date}`);
    }
  }

  hasTmax(): boolean {
    for (const d of this.days.values()) if (d.tmax_c !== undefined) return true;
    return false;
  }

  list(): DailyTemperature[] {
    return [...this.days.entries()]
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([date, d]) => ({
        date,
        ...(d.tmax_c !== undefined ? { tmax_c: d.tmax_c } : {}),
        ...(d.tmin_c !== undefined ? { tmin_c: d.tmin_c } : {}),
        ...(d.tavg_c !== undefined ? { tavg_c: d.tavg_c } : {}),
      }));
  }
}

function noTmax(summary: DailyFileSummary): ClimateFileError {
  return new ClimateFileError(
    {},
    `no usable TMAX values (${summary.rowsRead} rows read, ${summary.valuesKept} temperature values kept, ` +
      `${summary.valuesDroppedQc} dropped by quality flag, ${summary.valuesMissing} missing); a design temperature needs daily maxima`,
  );
}

const GHCN_FIELDS = ['ID', 'DATE', 'ELEMENT', 'VALUE', 'M-FLAG', 'Q-FLAG', 'S-FLAG', 'OBS-TIME'] as const;

/**
 * Reads a GHCN-Daily by-station CSV (no header, 8 fields). Keeps TMAX, TMIN and TAVG (tenths of °C),
 * drops rows with a non-blank Q-flag and −9999 values; other elements are counted and ignored.
 */
export function readGhcnDailyCsv(input: { readonly text: string }): DailyFileReadResult {
  const rows = csvRows(input.text);
  const table = new DayTable();
  let station: string | undefined;
  let kept = 0;
  let qc = 0;
  let missing = 0;
  let other = 0;
  const head = rows[0];
  if (head && /^[A-Za-z]/.test(head.fields[1] ?? '')) {
    throw new ClimateFileError(
      { line: head.line, column: 2 },
      `${JSON.stringify(head.fields[1])} where a date YYYYMMDD is expected: this looks like a header row, and the ` +
        'GHCN-Daily by-station layout has none (use the station daily CSV reader for files with a header)',
    );
  }
  for (const { fields, line } of rows) {
    if (fields.length !== GHCN_FIELDS.length) {
      throw new ClimateFileError(
        { line, column: Math.min(fields.length + 1, GHCN_FIELDS.length + 1) },
        `expected ${GHCN_FIELDS.length} fields (${GHCN_FIELDS.join(', ')}), found ${fields.length}`,
      );
    }
    const [id, dateText, element, valueText, , qFlag] = fields as unknown as readonly string[];
    if (!/^[A-Z0-9]{11}$/.test(id!)) {
      throw new ClimateFileError({ line, column: 1, columnName: 'ID' }, `station ID ${JSON.stringify(id)} is not 11 letters or digits`);
    }
    if (station === undefined) station = id!;
    else if (id !== station) {
      throw new ClimateFileError({ line, column: 1, columnName: 'ID' }, `a second station ${id} (the file starts with ${station}); read one station per file`);
    }
    const date = parseCalendarDate(dateText!, true);
    if (typeof date === 'string') {
      throw new ClimateFileError({ line, column: 2, columnName: 'DATE' }, `${JSON.stringify(dateText)}: ${date}`);
    }
    if (!/^[A-Z0-9]{4}$/.test(element!)) {
      throw new ClimateFileError({ line, column: 3, columnName: 'ELEMENT' }, `element ${JSON.stringify(element)} is not a 4-character code`);
    }
    const key = ELEMENT_KEYS[element!];
    if (key === undefined) {
      other += 1;
      continue;
    }
    if (!INTEGER.test(valueText!)) {
      throw new ClimateFileError({ line, column: 4, columnName: 'VALUE' }, `value ${JSON.stringify(valueText)} is not a whole number of tenths of °C`);
    }
    const raw = Number(valueText);
    if (raw === GHCN_MISSING) {
      missing += 1;
      continue;
    }
    if (qFlag !== '') {
      qc += 1;
      continue;
    }
    const c = temperatureOrThrow(raw / 10, { line, column: 4, columnName: 'VALUE' }, `${valueText} tenths °C`, '');
    table.put(formatCalendarDate(date), key, c, { line, column: 4, columnName: 'VALUE' });
    kept += 1;
  }
  const summary: DailyFileSummary = { rowsRead: rows.length, valuesKept: kept, valuesDroppedQc: qc, valuesMissing: missing, rowsOtherElements: other };
  if (station === undefined || !table.hasTmax()) throw noTmax(summary);
  return { station, days: table.list(), summary, warnings: readWarnings(summary) };
}

function readWarnings(s: DailyFileSummary): Notice[] {
  const out: Notice[] = [];
  if (s.valuesDroppedQc > 0) out.push(notice('climate.qcDropped')`${s.valuesDroppedQc} temperature value(s) dropped because a quality-control flag was set.`);
  return out;
}

interface Header {
  readonly index: ReadonlyMap<string, number>;
  readonly names: readonly string[];
}

function readHeader(rows: readonly Row[], required: readonly string[], what: string): Header {
  const head = rows[0];
  if (!head) throw new ClimateFileError({}, `the file is empty; expected a header row and ${what}`);
  const names = head.fields.map((f) => f.toUpperCase());
  const index = new Map<string, number>();
  names.forEach((n, i) => {
    if (n === '') throw new ClimateFileError({ line: head.line, column: i + 1 }, 'a header field is empty');
    if (index.has(n)) throw new ClimateFileError({ line: head.line, column: i + 1, columnName: n }, `column ${n} appears twice`);
    index.set(n, i);
  });
  for (const r of required) {
    if (!index.has(r)) {
      throw new ClimateFileError({ line: head.line }, `the header has no ${r} column (columns found: ${names.join(', ')})`);
    }
  }
  return { index, names };
}

function checkWidth(row: Row, header: Header): void {
  if (row.fields.length !== header.names.length) {
    throw new ClimateFileError(
      { line: row.line, column: Math.min(row.fields.length, header.names.length) + 1 },
      `expected ${header.names.length} fields as in the header, found ${row.fields.length}`,
    );
  }
}

function sameStation(current: string | undefined, value: string, where: { line: number; column: number; columnName: string }): string {
  if (value === '') throw new ClimateFileError(where, 'the station is blank');
  if (current !== undefined && value !== current) {
    throw new ClimateFileError(where, `a second station ${value} (the file starts with ${current}); read one station per file`);
  }
  return value;
}

const UNIT_TO_C: Readonly<Record<DailyFileTemperatureUnit, (x: number) => number>> = {
  c: (x) => x,
  f: (x) => fToC(x),
  'tenths-c': (x) => x / 10,
};
const UNIT_LABEL: Readonly<Record<DailyFileTemperatureUnit, string>> = { c: '°C', f: '°F', 'tenths-c': 'tenths °C' };

/**
 * Reads a per-station daily CSV with a header row (STATION, DATE, ..., TMAX, TMAX_ATTRIBUTES, TMIN, ...).
 * The temperature unit of the file is stated by the caller. A non-empty second token of a
 * *_ATTRIBUTES field drops that value; blank and −9999 values are missing.
 */
export function readStationDailyCsv(input: { readonly text: string; readonly unit: DailyFileTemperatureUnit }): DailyFileReadResult {
  const convert = UNIT_TO_C[input.unit];
  if (convert === undefined) {
    throw new ClimateFileError({}, `temperature unit ${JSON.stringify(input.unit)} is not one of 'c', 'f', 'tenths-c'`);
  }
  const rows = csvRows(input.text);
  const header = readHeader(rows, ['STATION', 'DATE', 'TMAX'], 'daily rows');
  const stationCol = header.index.get('STATION') as number;
  const dateCol = header.index.get('DATE') as number;
  const elements = (['TMAX', 'TMIN', 'TAVG'] as const)
    .filter((e) => header.index.has(e))
    .map((e) => ({ name: e, key: ELEMENT_KEYS[e] as ElementKey, col: header.index.get(e) as number, attr: header.index.get(`${e}_ATTRIBUTES`) }));
  const warnings: Notice[] = [];
  const noAttr = elements.filter((e) => e.attr === undefined).map((e) => e.name);
  if (noAttr.length > 0) warnings.push(notice('climate.noQualityFlags')`No quality-flag column for ${noAttr.join(', ')}: values are taken as they are.`);
  const unitHint = ` (the file's unit was stated as ${UNIT_LABEL[input.unit]}; check it)`;

  const table = new DayTable();
  const seenDates = new Map<string, number>();
  let station: string | undefined;
  let kept = 0;
  let qc = 0;
  let missing = 0;
  for (const row of rows.slice(1)) {
    checkWidth(row, header);
    const f = row.fields;
    const line = row.line;
    station = sameStation(station, f[stationCol] ?? '', { line, column: stationCol + 1, columnName: 'STATION' });
    const dateText = f[dateCol] ?? '';
    const date = parseCalendarDate(dateText);
    const dateWhere = { line, column: dateCol + 1, columnName: 'DATE' };
    if (typeof date === 'string') throw new ClimateFileError(dateWhere, `${JSON.stringify(dateText)}: ${date}`);
    const iso = formatCalendarDate(date);
    const prev = seenDates.get(iso);
    if (prev !== undefined) throw new ClimateFileError(dateWhere, `date ${iso} appears again (first on line ${prev})`);
    seenDates.set(iso, line);
    for (const e of elements) {
      const text = f[e.col] ?? '';
      const where = { line, column: e.col + 1, columnName: e.name };
      if (text === '') {
        missing += 1;
        continue;
      }
      if (!NUMBER.test(text)) throw new ClimateFileError(where, `${JSON.stringify(text)} is not a number`);
      const raw = Number(text);
      if (raw === GHCN_MISSING) {
        missing += 1;
        continue;
      }
      const attr = e.attr === undefined ? '' : (f[e.attr] ?? '');
      if ((attr.split(',')[1] ?? '').trim() !== '') {
        qc += 1;
        continue;
      }
      const c = temperatureOrThrow(convert(raw), where, `${text} ${UNIT_LABEL[input.unit]}`, unitHint);
      table.put(iso, e.key, c, where);
      kept += 1;
    }
  }
  const summary: DailyFileSummary = { rowsRead: rows.length - 1, valuesKept: kept, valuesDroppedQc: qc, valuesMissing: missing, rowsOtherElements: 0 };
  if (station === undefined || !table.hasTmax()) throw noTmax(summary);
  return { station, days: table.list(), summary, warnings: [...warnings, ...readWarnings(summary)] };
}

const NORMAL_COLUMNS = { max: 'MLY-TMAX-NORMAL', min: 'MLY-TMIN-NORMAL', mean: 'MLY-TAVG-NORMAL' } as const;

/**
 * Reads a monthly normals CSV (DATE = MM; MLY-TMAX-NORMAL, MLY-TMIN-NORMAL, MLY-TAVG-NORMAL in °F;
 * −9999 missing) into monthly statistics in °C. A month without a maximum, or without both a mean
 * and a minimum, is listed as skipped.
 */
export function readMonthlyNormalsCsv(input: { readonly text: string }): MonthlyNormalsReadResult {
  const rows = csvRows(input.text);
  const header = readHeader(rows, ['STATION', 'DATE', NORMAL_COLUMNS.max], 'one row per month');
  const stationCol = header.index.get('STATION') as number;
  const dateCol = header.index.get('DATE') as number;
  const cols = {
    max: header.index.get(NORMAL_COLUMNS.max) as number,
    min: header.index.get(NORMAL_COLUMNS.min),
    mean: header.index.get(NORMAL_COLUMNS.mean),
  };
  let station: string | undefined;
  const seen = new Map<number, number>();
  const months: MonthlyNormal[] = [];
  const skipped: { month: number; reason: string }[] = [];

  for (const row of rows.slice(1)) {
    checkWidth(row, header);
    const f = row.fields;
    const line = row.line;
    station = sameStation(station, f[stationCol] ?? '', { line, column: stationCol + 1, columnName: 'STATION' });
    const dateText = f[dateCol] ?? '';
    const dateWhere = { line, column: dateCol + 1, columnName: 'DATE' };
    if (!/^\d{1,2}$/.test(dateText) || Number(dateText) < 1 || Number(dateText) > 12) {
      const hint = /^\d{2}-\d{2}$/.test(dateText) ? ' (MM-DD is a daily normals file; this reader takes monthly normals)' : '';
      throw new ClimateFileError(dateWhere, `${JSON.stringify(dateText)} is not a month 01..12${hint}`);
    }
    const month = Number(dateText);
    const prev = seen.get(month);
    if (prev !== undefined) throw new ClimateFileError(dateWhere, `month ${pad2(month)} appears again (first on line ${prev})`);
    seen.set(month, line);

    const value = (col: number | undefined, name: string): number | undefined => {
      if (col === undefined) return undefined;
      const text = f[col] ?? '';
      const where = { line, column: col + 1, columnName: name };
      if (text === '') return undefined;
      if (!NUMBER.test(text)) throw new ClimateFileError(where, `${JSON.stringify(text)} is not a number`);
      const raw = Number(text);
      if (raw === GHCN_MISSING) return undefined;
      return temperatureOrThrow(fToC(raw), where, `${text} °F`, '');
    };
    const max = value(cols.max, NORMAL_COLUMNS.max);
    const min = value(cols.min, NORMAL_COLUMNS.min);
    const mean = value(cols.mean, NORMAL_COLUMNS.mean);
    if (max !== undefined && min !== undefined && min > max) {
      throw new ClimateFileError(
        { line, column: (cols.min as number) + 1, columnName: NORMAL_COLUMNS.min },
        `the minimum normal is above the maximum normal`,
      );
    }
    if (max === undefined) {
      skipped.push({ month, reason: `${monthName(month)}: no maximum normal` });
    } else if (mean === undefined && min === undefined) {
      skipped.push({ month, reason: `${monthName(month)}: neither a mean nor a minimum normal` });
    } else {
      months.push({ month, meanMax_c: max, ...(min !== undefined ? { meanMin_c: min } : {}), ...(mean !== undefined ? { mean_c: mean } : {}) });
    }
  }
  if (station === undefined || months.length === 0) {
    throw new ClimateFileError({}, `no usable month: ${rows.length - 1} rows read, each month needs ${NORMAL_COLUMNS.max} and ${NORMAL_COLUMNS.mean} or ${NORMAL_COLUMNS.min}`);
  }
  months.sort((a, b) => a.month - b.month);
  const warnings: Notice[] = skipped.map((s) => notice('climate.monthLeftOut')`${s.reason}; month left out.`);
  const absent = [...Array(12).keys()].map((k) => k + 1).filter((k) => !seen.has(k));
  if (absent.length > 0) warnings.push(notice('climate.monthAbsent')`The file has no row for ${absent.map(monthName).join(', ')}.`);
  return { station, months, skipped, warnings };
}
