/**
 * Climate import into a site, from the open formats core/climate reads:
 * - 'ghcn-daily': GHCN-Daily by-station CSV (no header; TMAX/TMIN/TAVG in tenths of °C);
 * - 'station-daily': per-station daily CSV with a header row (temperature unit stated by the caller);
 * - 'monthly-normals': monthly normals CSV (°F).
 *
 * Daily records are reduced to twelve calendar months with core's `climateFromDaily` (completeness
 * rule, years used); normals are taken as they are. The site's climate is replaced only when the file
 * yields all twelve months within range: a problem anywhere rejects the file (ImportError with line,
 * column and reason) and the site keeps its previous climate.
 */
import {
  ClimateFileError,
  InputDomainError,
  climateFromDaily,
  monthName,
  readGhcnDailyCsv,
  readMonthlyNormalsCsv,
  readStationDailyCsv,
  type DailyFileTemperatureUnit,
  type MonthlyClimate,
  type SiteClimate,
  type Notice,
} from '../../core/index.js';
import { NotFoundError } from '../../db/errors.js';
import { getSite, setSiteClimate } from '../../db/repos/sites.js';
import { transaction } from '../../db/transaction.js';
import type { Db } from '../../db/types.js';
import { formatPath } from '../common/schema.js';
import { climateSchema } from '../sites/index.js';
import { ImportError } from './errors.js';
import { decodeUtf8 } from './text.js';

export type ClimateFileFormat = 'ghcn-daily' | 'station-daily' | 'monthly-normals';
export const CLIMATE_FILE_FORMATS: readonly ClimateFileFormat[] = ['ghcn-daily', 'station-daily', 'monthly-normals'];

export interface ClimateFileInput {
  readonly format: ClimateFileFormat;
  readonly data: string | Uint8Array;
  /** Temperature unit of a 'station-daily' file (required for that format). */
  readonly unit?: DailyFileTemperatureUnit;
  /** Daily formats: first and last calendar year to use (default: the whole record). */
  readonly fromYear?: number;
  readonly toYear?: number;
  /** Shown in the climate's source text. */
  readonly fileName?: string;
}

export interface ClimateFileResult {
  readonly climate: SiteClimate;
  /** Warnings from the reader and the monthly reduction. */
  readonly warnings: readonly Notice[];
}

const FORMAT_LABEL: Record<ClimateFileFormat, string> = {
  'ghcn-daily': 'GHCN-Daily station file',
  'station-daily': 'station daily file',
  'monthly-normals': 'monthly normals file',
};

function fail(reason: string, where: { line?: number; column?: number; field?: string } = {}): never {
  throw new ImportError('climate file', [{ ...where, reason }]);
}

function describeSource(station: string, input: ClimateFileInput, tail: string): string {
  const name = input.fileName ? ` ${input.fileName}` : '';
  const s = `${station || 'unnamed station'}, ${FORMAT_LABEL[input.format]}${name}${tail}`;
  return s.length > 300 ? s.slice(0, 300) : s;
}

function readMonths(text: string, input: ClimateFileInput): { climate: SiteClimate; warnings: Notice[] } {
  if (input.format === 'monthly-normals') {
    const r = readMonthlyNormalsCsv({ text });
    if (r.skipped.length > 0 || r.months.length < 12) {
      const missing = [...Array(12).keys()].map((k) => k + 1).filter((m) => !r.months.some((x) => x.month === m));
      const why = r.skipped.map((s) => s.reason).join('; ');
      fail(`the file gives no usable values for ${missing.map(monthName).join(', ')}${why ? ` (${why})` : ''}; a site's climate needs all twelve months`);
    }
    return { climate: { source: describeSource(r.station, input, ' (monthly normals)'), monthly: r.months.map(toMonthly) }, warnings: [...r.warnings] };
  }
  let read;
  if (input.format === 'ghcn-daily') read = readGhcnDailyCsv({ text });
  else {
    if (input.unit === undefined) fail('state the temperature unit of a station daily file (c, f or tenths-c)');
    read = readStationDailyCsv({ text, unit: input.unit });
  }
  const daily = climateFromDaily({
    days: read.days,
    ...(input.fromYear === undefined ? {} : { fromYear: input.fromYear }),
    ...(input.toYear === undefined ? {} : { toYear: input.toYear }),
  });
  const missing = daily.calendarMonths.filter((m) => m.meanMax_c === undefined).map((m) => monthName(m.month));
  if (missing.length > 0) {
    fail(`no complete month of data for ${missing.join(', ')}${daily.reason ? ` (${daily.reason})` : ''}; a site's climate needs all twelve months`);
  }
  const monthly = daily.calendarMonths.map((m) => toMonthly({ month: m.month, meanMax_c: m.meanMax_c!, ...(m.meanMin_c === undefined ? {} : { meanMin_c: m.meanMin_c }), ...(m.mean_c === undefined ? {} : { mean_c: m.mean_c }) }));
  const years = daily.yearsUsed.length;
  const tail = `, ${daily.period.fromYear}–${daily.period.toYear}, ${years} year${years === 1 ? '' : 's'} used`;
  return {
    climate: { source: describeSource(read.station, input, tail), ...(years > 0 ? { years } : {}), monthly },
    warnings: [...read.warnings, ...daily.warnings],
  };
}

function toMonthly(m: MonthlyClimate): MonthlyClimate {
  return {
    month: m.month,
    meanMax_c: m.meanMax_c,
    ...(m.meanMin_c === undefined ? {} : { meanMin_c: m.meanMin_c }),
    ...(m.mean_c === undefined ? {} : { mean_c: m.mean_c }),
  };
}

/** Reads a climate file into a site climate (twelve months), or throws ImportError. Writes nothing. */
export function readClimateFile(input: ClimateFileInput): ClimateFileResult {
  if (!CLIMATE_FILE_FORMATS.includes(input.format)) fail(`unknown climate file format ${JSON.stringify(input.format)}; one of ${CLIMATE_FILE_FORMATS.join(', ')}`);
  const text = decodeUtf8(input.data, 'climate file');
  let out: { climate: SiteClimate; warnings: Notice[] };
  try {
    out = readMonths(text, input);
  } catch (e) {
    if (e instanceof ClimateFileError) {
      fail(e.reason, { ...(e.line === undefined ? {} : { line: e.line }), ...(e.column === undefined ? {} : { column: e.column }), ...(e.columnName === undefined ? {} : { field: e.columnName }) });
    }
    if (e instanceof InputDomainError) fail(e.message);
    throw e;
  }
  const checked = climateSchema.safeParse(out.climate, { reportInput: true });
  if (!checked.success) {
    throw new ImportError('climate file', checked.error.issues.map((i) => ({ field: formatPath(i.path), reason: i.message })));
  }
  return out;
}

/** Reads a climate file and replaces the climate of site `siteId` with it (all or nothing). */
export function importClimateIntoSite(db: Db, siteId: number, input: ClimateFileInput): ClimateFileResult {
  const result = readClimateFile(input);
  transaction(db, (tx) => {
    if (!getSite(tx, siteId)) throw new NotFoundError('site', siteId);
    setSiteClimate(tx, siteId, result.climate);
  });
  return result;
}
