/**
 * Monthly climate statistics and the design temperature from daily station records spanning years.
 *
 * Steps (NOAA NCEI Global Summary of the Month completeness rule):
 * 1. Per (year, month) and element (TMAX, TMIN, TAVG): the mean of the days that have a value, the
 *    number of missing days and the longest run of consecutive missing days. An element's monthly
 *    value is used only when no more than 5 days are missing and no more than 3 consecutive days are
 *    missing (NOAA Global Summary of the Month field description, completeness rule for monthly
 *    TMAX/TMIN, as cited in NOAA NCEI GHCN-Daily documentation). The thresholds can be changed by the caller.
 * 2. A (year, month) is used when its TMAX is complete and its mean temperature can be formed: the
 *    TAVG mean when TAVG is complete (unless the caller asks for max-min only), else
 *    (mean TMAX + mean TMIN)/2 when TMIN is complete.
 * 3. Per calendar month: the average over the years used of the yearly monthly values.
 * 4. The design temperature from those twelve months (design.ts: hottest month by mean temperature,
 *    its mean daily maximum = aerodrome reference temperature, and the month of highest mean maximum).
 *
 * Leap years follow the Gregorian rule (February has 29 days in a leap year).
 * Validity: daily temperatures −90 °C to 60 °C, years 1700 to 2200, one record per date.
 */
import { notice, siText, type Notice } from '../notices.js';
import { InputDomainError } from '../errors.js';
import { check, inRange } from '../validate.js';
import { CLIMATE_YEAR_RANGE, daysInMonth, formatCalendarDate, pad2, parseCalendarDate, type CalendarDate } from './calendar.js';
import {
  CLIMATE_METHOD_VERSION,
  CLIMATE_TEMPERATURE_RANGE,
  designTemperatureFromMonthly,
  monthName,
  type ClimateTraceEntry,
  type DesignTemperatureResult,
  type MonthlyNormal,
} from './design.js';

/** One day of a station record; a missing element is left out (never 0). */
export interface DailyTemperature {
  /** `YYYY-MM-DD`. */
  readonly date: string;
  /** Daily maximum, °C. */
  readonly tmax_c?: number;
  /** Daily minimum, °C. */
  readonly tmin_c?: number;
  /** Daily average, °C. */
  readonly tavg_c?: number;
}

export type TemperatureElement = 'TMAX' | 'TMIN' | 'TAVG';

/** When a month's value of one element counts as complete. */
export interface CompletenessRule {
  /** Most missing days allowed in the month (a month with more is excluded). */
  readonly maxMissingDays: number;
  /** Longest run of consecutive missing days allowed. */
  readonly maxConsecutiveMissingDays: number;
}

/** NOAA GSOM rule: excluded when more than 5 days, or more than 3 consecutive days, are missing. */
export const NOAA_GSOM_COMPLETENESS: CompletenessRule = { maxMissingDays: 5, maxConsecutiveMissingDays: 3 };

/** How the monthly mean temperature is formed. */
export type MeanTemperatureSource = 'tavg-then-max-min' | 'max-min';

export interface DailyClimateInput {
  /** Station days in any order, one record per date. */
  readonly days: readonly DailyTemperature[];
  /** First calendar year to use (default: the first year of the record). */
  readonly fromYear?: number;
  /** Last calendar year to use (default: the last year of the record). */
  readonly toYear?: number;
  /** Default NOAA_GSOM_COMPLETENESS. */
  readonly completeness?: CompletenessRule;
  /** Default 'tavg-then-max-min' (NOAA NCEI Global Summary of the Month completeness rule step 2). */
  readonly meanSource?: MeanTemperatureSource;
  /** Also compute the older formula Ta + (Tm − Ta)/3. */
  readonly includeOlderFormula?: boolean;
}

/** One element over one (year, month). */
export interface ElementMonthStats {
  readonly daysWithValue: number;
  readonly missingDays: number;
  readonly longestMissingRun_days: number;
  /** Mean of the days with a value, °C; absent when there is none. */
  readonly mean_c?: number;
  /** True when the completeness rule is met. */
  readonly complete: boolean;
}

/** Statistics of one (year, month) of the record. */
export interface StationMonth {
  readonly year: number;
  readonly month: number;
  readonly daysInMonth: number;
  readonly tmax: ElementMonthStats;
  readonly tmin: ElementMonthStats;
  readonly tavg: ElementMonthStats;
  /** True when this (year, month) enters the calendar-month averages. */
  readonly used: boolean;
  /** Mean daily maximum, °C (when used). */
  readonly meanMax_c?: number;
  /** Mean daily minimum, °C (when used and TMIN complete). */
  readonly meanMin_c?: number;
  /** Mean temperature, °C (when used). */
  readonly mean_c?: number;
  readonly meanSource?: 'tavg' | 'max-min';
}

export type ExclusionRule = 'no-data' | 'missing-days' | 'consecutive-missing';

export interface ExclusionReason {
  readonly element: TemperatureElement;
  readonly rule: ExclusionRule;
  readonly missingDays: number;
  readonly longestMissingRun_days: number;
}

/** A (year, month) left out of the averages, and why. */
export interface MonthExclusion {
  readonly year: number;
  readonly month: number;
  readonly reasons: readonly ExclusionReason[];
  /** The reasons in words. */
  readonly detail: string;
}

/** One calendar month averaged over the years used. */
export interface CalendarMonthClimate {
  readonly month: number;
  /** Years whose value of this month was used, ascending. */
  readonly yearsUsed: readonly number[];
  /** Average over the years used of the mean daily maximum, °C. */
  readonly meanMax_c?: number;
  /** Average of the mean daily minimum, °C, when every year used has a complete TMIN. */
  readonly meanMin_c?: number;
  /** Average of the monthly mean temperature, °C. */
  readonly mean_c?: number;
}

export interface DailyClimateResult {
  readonly method: string;
  /** Dates of the first and last day holding a temperature, and the years analysed. */
  readonly period: {
    readonly firstDate: string;
    readonly lastDate: string;
    readonly fromYear: number;
    readonly toYear: number;
  };
  readonly completeness: CompletenessRule;
  readonly meanSource: MeanTemperatureSource;
  /** Every (year, month) from the first to the last month analysed. */
  readonly stationMonths: readonly StationMonth[];
  /** Twelve entries, January first. */
  readonly calendarMonths: readonly CalendarMonthClimate[];
  readonly excluded: readonly MonthExclusion[];
  /** Years contributing at least one month, ascending. */
  readonly yearsUsed: readonly number[];
  /** Years in which all twelve months were used, ascending. */
  readonly completeYears: readonly number[];
  /** The design temperature; absent when no month is usable (see `reason`). */
  readonly design?: DesignTemperatureResult;
  /** Why there is no design temperature. */
  readonly reason?: string;
  readonly trace: readonly ClimateTraceEntry[];
  readonly warnings: readonly Notice[];
}

/** Fewer years than this for the design month raises a warning (5-10 recent years or a 30-year normal; from memory). */
export const MIN_RECOMMENDED_YEARS = 5;

const ELEMENTS: readonly { readonly key: 'tmax_c' | 'tmin_c' | 'tavg_c'; readonly name: TemperatureElement }[] = [
  { key: 'tmax_c', name: 'TMAX' },
  { key: 'tmin_c', name: 'TMIN' },
  { key: 'tavg_c', name: 'TAVG' },
];

interface MonthBuffer {
  readonly tmax: (number | undefined)[];
  readonly tmin: (number | undefined)[];
  readonly tavg: (number | undefined)[];
}

const mean = (xs: readonly number[]): number => xs.reduce((s, x) => s + x, 0) / xs.length;

function elementStats(values: readonly (number | undefined)[], rule: CompletenessRule): ElementMonthStats {
  let n = 0;
  let sum = 0;
  let run = 0;
  let longest = 0;
  for (const v of values) {
    if (v === undefined) {
      run += 1;
      if (run > longest) longest = run;
    } else {
      run = 0;
      n += 1;
      sum += v;
    }
  }
  const missing = values.length - n;
  const complete = ruleBroken(n, missing, longest, rule).length === 0;
  return {
    daysWithValue: n,
    missingDays: missing,
    longestMissingRun_days: longest,
    ...(n > 0 ? { mean_c: sum / n } : {}),
    complete,
  };
}

/** The completeness rules a month breaks (empty = complete); the single place the rule is applied. */
function ruleBroken(daysWithValue: number, missingDays: number, longestRun: number, rule: CompletenessRule): ExclusionRule[] {
  if (daysWithValue === 0) return ['no-data'];
  const out: ExclusionRule[] = [];
  if (missingDays > rule.maxMissingDays) out.push('missing-days');
  if (longestRun > rule.maxConsecutiveMissingDays) out.push('consecutive-missing');
  return out;
}

function failures(element: TemperatureElement, s: ElementMonthStats, rule: CompletenessRule): ExclusionReason[] {
  return ruleBroken(s.daysWithValue, s.missingDays, s.longestMissingRun_days, rule).map((r) => ({
    element,
    rule: r,
    missingDays: s.missingDays,
    longestMissingRun_days: s.longestMissingRun_days,
  }));
}

function describeReason(r: ExclusionReason, rule: CompletenessRule): string {
  switch (r.rule) {
    case 'no-data':
      return `${r.element}: no data`;
    case 'missing-days':
      return `${r.element}: ${r.missingDays} days missing (more than ${rule.maxMissingDays})`;
    case 'consecutive-missing':
      return `${r.element}: ${r.longestMissingRun_days} consecutive days missing (more than ${rule.maxConsecutiveMissingDays})`;
  }
}

function validateRule(rule: CompletenessRule): CompletenessRule {
  const a = inRange('completeness.maxMissingDays', rule.maxMissingDays, { min: 0, max: 31, unit: 'days' });
  const b = inRange('completeness.maxConsecutiveMissingDays', rule.maxConsecutiveMissingDays, { min: 0, max: 31, unit: 'days' });
  check(Number.isInteger(a), 'completeness.maxMissingDays', a, 'a whole number of days 0..31');
  check(Number.isInteger(b), 'completeness.maxConsecutiveMissingDays', b, 'a whole number of days 0..31');
  return { maxMissingDays: a, maxConsecutiveMissingDays: b };
}

function optionalYear(field: string, v: number | undefined): number | undefined {
  if (v === undefined) return undefined;
  const y = inRange(field, v, CLIMATE_YEAR_RANGE);
  check(Number.isInteger(y), field, y, 'a whole calendar year');
  return y;
}

/**
 * Monthly statistics per year, calendar-month averages with the years used, the months excluded and
 * why, and the design temperature (ART and highest mean maximum).
 */
export function climateFromDaily(input: DailyClimateInput): DailyClimateResult {
  const rule = validateRule(input.completeness ?? NOAA_GSOM_COMPLETENESS);
  const meanSource: MeanTemperatureSource = input.meanSource ?? 'tavg-then-max-min';
  check(meanSource === 'tavg-then-max-min' || meanSource === 'max-min', 'meanSource', meanSource, "'tavg-then-max-min' or 'max-min'");
  const fromYear = optionalYear('fromYear', input.fromYear);
  const toYear = optionalYear('toYear', input.toYear);
  if (fromYear !== undefined && toYear !== undefined) {
    check(fromYear <= toYear, 'toYear', toYear, `at least fromYear (${fromYear})`);
  }
  const days = input.days;
  check(Array.isArray(days) && days.length > 0, 'days', Array.isArray(days) ? 'no days' : days, 'at least one daily record');

  // Validate every record and place it in its month buffer.
  const buffers = new Map<number, MonthBuffer>();
  const seenDates = new Map<string, number>();
  let first: CalendarDate | undefined;
  let last: CalendarDate | undefined;
  let anyTavg = false;
  const key = (y: number, m: number): number => y * 100 + m;
  const order = (d: CalendarDate): number => d.year * 10000 + d.month * 100 + d.day;

  for (const [i, rec] of days.entries()) {
    const f = `days[${i}]`;
    const parsed = typeof rec.date === 'string' ? parseCalendarDate(rec.date) : 'not text';
    if (typeof parsed === 'string') {
      throw new InputDomainError(`${f}.date`, rec.date, `a real calendar date written YYYY-MM-DD (${parsed})`);
    }
    const d = parsed;
    const text = formatCalendarDate(d);
    const dup = seenDates.get(text);
    check(dup === undefined, `${f}.date`, rec.date, `a date not already given (days[${dup}] has the same date)`);
    seenDates.set(text, i);
    const vals: Partial<Record<'tmax_c' | 'tmin_c' | 'tavg_c', number>> = {};
    for (const e of ELEMENTS) {
      const v = rec[e.key];
      if (v !== undefined) vals[e.key] = inRange(`${f}.${e.key}`, v, CLIMATE_TEMPERATURE_RANGE);
    }
    if (vals.tmax_c !== undefined && vals.tmin_c !== undefined) {
      check(vals.tmin_c <= vals.tmax_c, `${f}.tmin_c`, vals.tmin_c, `at most tmax_c (${vals.tmax_c} °C) of the same day`);
    }
    const inPeriod = (fromYear === undefined || d.year >= fromYear) && (toYear === undefined || d.year <= toYear);
    const hasValue = vals.tmax_c !== undefined || vals.tmin_c !== undefined || vals.tavg_c !== undefined;
    if (!inPeriod || !hasValue) continue;
    if (vals.tavg_c !== undefined) anyTavg = true;
    if (first === undefined || order(d) < order(first)) first = d;
    if (last === undefined || order(d) > order(last)) last = d;
    const k = key(d.year, d.month);
    let b = buffers.get(k);
    if (!b) {
      const n = daysInMonth(d.year, d.month);
      b = { tmax: Array<number | undefined>(n).fill(undefined), tmin: Array<number | undefined>(n).fill(undefined), tavg: Array<number | undefined>(n).fill(undefined) };
      buffers.set(k, b);
    }
    b.tmax[d.day - 1] = vals.tmax_c;
    b.tmin[d.day - 1] = vals.tmin_c;
    b.tavg[d.day - 1] = vals.tavg_c;
  }

  const warnings: Notice[] = [];
  const calendarEmpty = (): CalendarMonthClimate[] => [...Array(12).keys()].map((k) => ({ month: k + 1, yearsUsed: [] }));
  if (first === undefined || last === undefined) {
    const empty =
      fromYear !== undefined || toYear !== undefined
        ? notice('climate.noValuesInYears')`No temperature values in the years ${String(fromYear ?? '…')} to ${String(toYear ?? '…')}.`
        : notice('climate.noValues')`No temperature values in the record.`;
    const reason = siText(empty);
    return {
      method: CLIMATE_METHOD_VERSION,
      period: { firstDate: '', lastDate: '', fromYear: fromYear ?? 0, toYear: toYear ?? 0 },
      completeness: rule,
      meanSource,
      stationMonths: [],
      calendarMonths: calendarEmpty(),
      excluded: [],
      yearsUsed: [],
      completeYears: [],
      reason,
      trace: [],
      warnings: [empty],
    };
  }
  const firstDay: CalendarDate = first;
  const lastDay: CalendarDate = last;
  if (fromYear !== undefined && firstDay.year > fromYear) {
    warnings.push(notice('climate.recordStartsLater')`The years asked for start in ${fromYear}, but the record starts on ${formatCalendarDate(firstDay)}.`);
  }
  if (toYear !== undefined && lastDay.year < toYear) {
    warnings.push(notice('climate.recordEndsEarlier')`The years asked for end in ${toYear}, but the record ends on ${formatCalendarDate(lastDay)}.`);
  }

  // Step 1-2: every (year, month) from the first to the last month of the record.
  const stationMonths: StationMonth[] = [];
  const excluded: MonthExclusion[] = [];
  let y = firstDay.year;
  let m = firstDay.month;
  while (key(y, m) <= key(lastDay.year, lastDay.month)) {
    const n = daysInMonth(y, m);
    const empty = Array<number | undefined>(n).fill(undefined);
    const b = buffers.get(key(y, m)) ?? { tmax: empty, tmin: empty, tavg: empty };
    const tmax = elementStats(b.tmax, rule);
    const tmin = elementStats(b.tmin, rule);
    const tavg = elementStats(b.tavg, rule);
    const reasons: ExclusionReason[] = [];
    if (!tmax.complete) reasons.push(...failures('TMAX', tmax, rule));
    let meanC: number | undefined;
    let src: 'tavg' | 'max-min' | undefined;
    if (meanSource === 'tavg-then-max-min' && tavg.complete) {
      meanC = tavg.mean_c;
      src = 'tavg';
    } else if (tmin.complete && tmax.complete) {
      meanC = ((tmax.mean_c as number) + (tmin.mean_c as number)) / 2;
      src = 'max-min';
    } else if (!tmin.complete) {
      reasons.push(...failures('TMIN', tmin, rule));
      if (meanSource === 'tavg-then-max-min' && anyTavg) reasons.push(...failures('TAVG', tavg, rule));
    }
    const used = reasons.length === 0;
    if (used) {
      stationMonths.push({
        year: y, month: m, daysInMonth: n, tmax, tmin, tavg, used,
        meanMax_c: tmax.mean_c as number,
        ...(tmin.complete ? { meanMin_c: tmin.mean_c as number } : {}),
        mean_c: meanC as number,
        meanSource: src as 'tavg' | 'max-min',
      });
    } else {
      stationMonths.push({ year: y, month: m, daysInMonth: n, tmax, tmin, tavg, used });
      excluded.push({ year: y, month: m, reasons, detail: `${y}-${pad2(m)}: ${reasons.map((r) => describeReason(r, rule)).join('; ')}` });
    }
    if (m === 12) {
      y += 1;
      m = 1;
    } else {
      m += 1;
    }
  }

  // Step 3: calendar-month averages over the years used.
  const calendarMonths: CalendarMonthClimate[] = [];
  for (let cm = 1; cm <= 12; cm++) {
    const ms = stationMonths.filter((s) => s.used && s.month === cm);
    if (ms.length === 0) {
      calendarMonths.push({ month: cm, yearsUsed: [] });
      continue;
    }
    const allMin = ms.every((s) => s.meanMin_c !== undefined);
    const sources = new Set(ms.map((s) => s.meanSource));
    if (sources.size > 1) {
      warnings.push(notice('climate.mixedMeanSources')`${monthName(cm)}: the monthly mean comes from TAVG in some years and from (TMAX + TMIN)/2 in others; choose meanSource 'max-min' for one consistent definition.`);
    }
    calendarMonths.push({
      month: cm,
      yearsUsed: ms.map((s) => s.year),
      meanMax_c: mean(ms.map((s) => s.meanMax_c as number)),
      ...(allMin ? { meanMin_c: mean(ms.map((s) => s.meanMin_c as number)) } : {}),
      mean_c: mean(ms.map((s) => s.mean_c as number)),
    });
  }

  const yearsUsed = [...new Set(stationMonths.filter((s) => s.used).map((s) => s.year))].sort((a, b) => a - b);
  const completeYears = yearsUsed.filter((y) => stationMonths.filter((s) => s.used && s.year === y).length === 12);
  const period = {
    firstDate: formatCalendarDate(firstDay),
    lastDate: formatCalendarDate(lastDay),
    fromYear: fromYear ?? firstDay.year,
    toYear: toYear ?? lastDay.year,
  };
  const trace: ClimateTraceEntry[] = [
    { label: 'first year analysed', value: period.fromYear, unit: 'year' },
    { label: 'last year analysed', value: period.toYear, unit: 'year' },
    { label: 'station months analysed', value: stationMonths.length, unit: 'months' },
    { label: 'station months excluded', value: excluded.length, unit: 'months' },
    { label: 'years contributing at least one month', value: yearsUsed.length, unit: 'years' },
    { label: 'years with all twelve months used', value: completeYears.length, unit: 'years' },
  ];

  const normals: MonthlyNormal[] = calendarMonths
    .filter((c) => c.meanMax_c !== undefined && c.mean_c !== undefined)
    .map((c) => ({ month: c.month, meanMax_c: c.meanMax_c as number, mean_c: c.mean_c as number }));
  if (normals.length === 0) {
    const none = notice('climate.noCompleteMonth')`No month meets the completeness rule (at most ${rule.maxMissingDays} missing days, at most ${rule.maxConsecutiveMissingDays} consecutive).`;
    const reason = siText(none);
    return {
      method: CLIMATE_METHOD_VERSION, period, completeness: rule, meanSource, stationMonths, calendarMonths,
      excluded, yearsUsed, completeYears, reason, trace, warnings: [...warnings, none],
    };
  }

  // Step 4: design temperature.
  const design = designTemperatureFromMonthly({ months: normals, ...(input.includeOlderFormula ? { includeOlderFormula: true } : {}) });
  const hotYears = calendarMonths[design.hottestMonth - 1]?.yearsUsed.length ?? 0;
  trace.push({ label: 'years used for the hottest month', value: hotYears, unit: 'years' });
  if (hotYears < MIN_RECOMMENDED_YEARS) {
    warnings.push(notice('climate.fewYears')`${monthName(design.hottestMonth)} rests on ${hotYears} year(s) of data; at least ${MIN_RECOMMENDED_YEARS} to 10 complete years, or a 30-year normal, are usual (from memory).`);
  }
  return {
    method: CLIMATE_METHOD_VERSION, period, completeness: rule, meanSource, stationMonths, calendarMonths,
    excluded, yearsUsed, completeYears, design, trace: [...trace, ...design.trace], warnings: [...warnings, ...design.warnings],
  };
}
