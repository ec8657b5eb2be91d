/**
 * Design (hot-day) temperature of a site from monthly temperature statistics.
 *
 * Computes:
 * - the aerodrome reference temperature (ART): the monthly mean of the daily maximum temperatures of
 *   the hottest month, the hottest month being the one with the highest monthly mean temperature
 *   (ICAO Annex 14 Vol. I, 2.4.1 standard and 2.4.2 recommendation, as quoted in ICAO Annex 14 Vol I §2.4.1–2.4.2);
 * - the month with the highest mean daily maximum and its value (the "mean daily maximum temperature
 *   of the hottest month" read by the authority's runway-length curves; whether that hottest month is
 *   chosen by mean or by mean maximum is from memory, so both are reported and a flag is raised when
 *   the two months differ);
 * - optionally the older textbook formula ART = Ta + (Tm − Ta)/3 (Ashford & Wright, *Airport
 *   Engineering*, 3rd ed., p. 234), Ta = monthly mean of the average daily temperature and
 *   Tm = monthly mean of the daily maximum, both of the hottest month.
 *
 * Monthly mean temperature = the given mean, else (mean daily max + mean daily min)/2.
 * Validity: monthly values in the study's field ranges (core/fields.ts: mean daily maximum −60 to
 * 55 °C, mean daily minimum −80 to 50 °C, mean −70 to 55 °C); one to twelve distinct calendar months.
 */
import { DESIGN_TEMPERATURE_RANGE, MONTHLY_MEAN_MAX_RANGE, MONTHLY_MEAN_MIN_RANGE, MONTHLY_MEAN_RANGE } from '../fields.js';
import { check, inRange } from '../validate.js';
import { notice, qty, type Notice } from '../notices.js';

/** Version stamp of the climate methods (design temperature, daily aggregation). */
export const CLIMATE_METHOD_VERSION = 'climate-design-temperature/1';

/** Plausible range of any temperature statistic of a weather station, °C (common practice). */
export const CLIMATE_TEMPERATURE_RANGE = { min: -90, max: 60, unit: '°C' } as const;

/** One intermediate value shown with a climate result. */
export interface ClimateTraceEntry {
  readonly label: string;
  readonly value: number;
  /** Unit symbol ("°C", "month", "years", ...). */
  readonly unit: string;
}

/** Temperature statistics of one calendar month (normals, or averages over years of station data). */
export interface MonthlyNormal {
  /** Calendar month 1..12. */
  readonly month: number;
  /** Monthly mean of the daily maximum temperature, °C. */
  readonly meanMax_c: number;
  /** Monthly mean of the daily minimum temperature, °C (used for the mean when `mean_c` is absent). */
  readonly meanMin_c?: number;
  /** Monthly mean temperature, °C (e.g. a TAVG normal). */
  readonly mean_c?: number;
}

export interface DesignTemperatureInput {
  /** One to twelve distinct months; all twelve are expected (a warning names the missing ones). */
  readonly months: readonly MonthlyNormal[];
  /** Also compute the older formula Ta + (Tm − Ta)/3 for the hottest month. */
  readonly includeOlderFormula?: boolean;
}

/** A month with its resolved mean temperature. */
export interface ResolvedMonth {
  readonly month: number;
  /** °C. */
  readonly meanMax_c: number;
  /** °C. */
  readonly mean_c: number;
  /** Where the mean came from. */
  readonly meanSource: 'given' | 'max-min';
}

export interface OlderFormulaInput {
  /** Ta: monthly mean of the average daily temperature of the hottest month, °C. */
  readonly ta_c: number;
  /** Tm: monthly mean of the daily maximum temperature of the same month, °C. */
  readonly tm_c: number;
}

export interface OlderFormulaResult extends OlderFormulaInput {
  /** Ta + (Tm − Ta)/3, °C. */
  readonly art_c: number;
}

export interface DesignTemperatureResult {
  readonly method: string;
  /** The months used, sorted by month, with their resolved mean temperature. */
  readonly months: readonly ResolvedMonth[];
  /** Hottest month by monthly mean temperature (ICAO), 1..12. */
  readonly hottestMonth: number;
  /** Its monthly mean temperature, °C. */
  readonly hottestMonthMean_c: number;
  /** Aerodrome reference temperature: mean daily maximum of the hottest month, °C. */
  readonly art_c: number;
  /** Month with the highest mean daily maximum, 1..12. */
  readonly maxMeanMaxMonth: number;
  /** Its mean daily maximum, °C (≥ art_c). */
  readonly maxMeanMax_c: number;
  /** True when the two months above differ. */
  readonly monthsDiffer: boolean;
  /** Older formula applied to the hottest month, when asked for. */
  readonly olderFormula?: OlderFormulaResult;
  readonly trace: readonly ClimateTraceEntry[];
  readonly warnings: readonly Notice[];
}

const MONTH_NAMES = [
  'January', 'February', 'March', 'April', 'May', 'June',
  'July', 'August', 'September', 'October', 'November', 'December',
] as const;

/** English name of month 1..12. */
export function monthName(month: number): string {
  return MONTH_NAMES[month - 1] ?? `month ${month}`;
}

/** Older textbook ART formula: Ta + (Tm − Ta)/3 (Ashford & Wright, 3rd ed., p. 234). */
export function olderFormulaArt(input: OlderFormulaInput): OlderFormulaResult {
  const ta = inRange('ta_c', input.ta_c, CLIMATE_TEMPERATURE_RANGE);
  const tm = inRange('tm_c', input.tm_c, CLIMATE_TEMPERATURE_RANGE);
  check(tm >= ta, 'tm_c', tm, `at least ta_c (${ta} °C): a mean daily maximum cannot be below the mean temperature`);
  return { ta_c: ta, tm_c: tm, art_c: olderFormula(ta, tm) };
}

function olderFormula(ta: number, tm: number): number {
  return ta + (tm - ta) / 3;
}

function validateMonth(m: MonthlyNormal, i: number): ResolvedMonth {
  const f = `months[${i}]`;
  const month = inRange(`${f}.month`, m.month, { min: 1, max: 12, unit: '' });
  check(Number.isInteger(month), `${f}.month`, month, 'a whole month number 1..12');
  const max = inRange(`${f}.meanMax_c`, m.meanMax_c, MONTHLY_MEAN_MAX_RANGE);
  const min = m.meanMin_c === undefined ? undefined : inRange(`${f}.meanMin_c`, m.meanMin_c, MONTHLY_MEAN_MIN_RANGE);
  const mean = m.mean_c === undefined ? undefined : inRange(`${f}.mean_c`, m.mean_c, MONTHLY_MEAN_RANGE);
  if (min !== undefined) {
    check(min <= max, `${f}.meanMin_c`, min, `at most meanMax_c (${max} °C)`);
  }
  if (mean !== undefined) return { month, meanMax_c: max, mean_c: mean, meanSource: 'given' };
  check(
    min !== undefined,
    `${f}.meanMin_c`,
    m.meanMin_c,
    'a value: a monthly mean (mean_c) or a mean daily minimum (meanMin_c) is needed to rank months by mean temperature',
  );
  return { month, meanMax_c: max, mean_c: (max + (min as number)) / 2, meanSource: 'max-min' };
}

/**
 * A design temperature derived from monthly data must lie in the range a given one has
 * (DESIGN_TEMPERATURE_RANGE, core/fields.ts). Throws InputDomainError on the hottest month's mean
 * maximum, `${path}[i].meanMax_c` where i is its place in `months` as given.
 */
export function checkDerivedDesignTemperature(months: readonly MonthlyNormal[], d: DesignTemperatureResult, path: string): void {
  const i = Math.max(0, months.findIndex((m) => m.month === d.hottestMonth));
  for (const t of [d.art_c, d.maxMeanMax_c]) {
    check(
      t >= DESIGN_TEMPERATURE_RANGE.min && t <= DESIGN_TEMPERATURE_RANGE.max,
      `${path}[${i}].meanMax_c`,
      d.art_c,
      `a hottest-month design temperature from ${DESIGN_TEMPERATURE_RANGE.min} to ${DESIGN_TEMPERATURE_RANGE.max} °C, the range of a given design temperature (${monthName(d.hottestMonth)} is the hottest month)`,
    );
  }
}

/**
 * Hottest month (by mean temperature) and its mean daily maximum (the ART), the month with the
 * highest mean daily maximum, and the flag when they differ.
 *
 * Ties: among months with the same mean temperature the one with the higher mean maximum is taken
 * (then the earlier month); among months with the same mean maximum the ICAO hottest month is
 * preferred, so a tie never raises the "months differ" flag.
 */
export function designTemperatureFromMonthly(input: DesignTemperatureInput): DesignTemperatureResult {
  const list = input.months;
  check(
    Array.isArray(list) && list.length >= 1 && list.length <= 12,
    'months',
    Array.isArray(list) ? `${list.length} months` : list,
    'one to twelve calendar months',
  );
  const seen = new Map<number, number>();
  const months: ResolvedMonth[] = [];
  list.forEach((m, i) => {
    const r = validateMonth(m, i);
    const first = seen.get(r.month);
    check(first === undefined, `months[${i}].month`, r.month, `a month not already given (months[${first}] is also ${r.month})`);
    seen.set(r.month, i);
    months.push(r);
  });
  months.sort((a, b) => a.month - b.month);

  const warnings: Notice[] = [];
  const missing = [...Array(12).keys()].map((k) => k + 1).filter((k) => !seen.has(k));
  if (missing.length > 0) {
    warnings.push(notice('climate.monthsMissing')`No data for ${missing.map(monthName).join(', ')}: the hottest month is chosen among ${months.length} of 12 months only.`);
  }
  for (const m of months) {
    if (m.mean_c > m.meanMax_c) {
      warnings.push(notice('climate.meanAboveMax')`${monthName(m.month)}: mean temperature ${qty.temperature(m.mean_c)} is above the mean daily maximum ${qty.temperature(m.meanMax_c)}; check the data.`);
    }
  }

  let hot = months[0] as ResolvedMonth;
  for (const m of months) {
    if (m.mean_c > hot.mean_c || (m.mean_c === hot.mean_c && m.meanMax_c > hot.meanMax_c)) hot = m;
  }
  const tiedMean = months.filter((m) => m !== hot && m.mean_c === hot.mean_c);
  if (tiedMean.length > 0) {
    warnings.push(notice('climate.tiedHottestMonth')`${[hot, ...tiedMean].map((m) => monthName(m.month)).join(' and ')} share the highest mean temperature (${qty.temperature(hot.mean_c)}); ${monthName(hot.month)} is taken because its mean daily maximum is highest.`);
  }
  let top = hot;
  for (const m of months) if (m.meanMax_c > top.meanMax_c) top = m;
  const differ = top.month !== hot.month;
  if (differ) {
    warnings.push(notice('climate.criteriaDiffer')`The hottest month by mean temperature (${monthName(hot.month)}, ART ${qty.temperature(hot.meanMax_c)}) is not the month with the highest mean daily maximum (${monthName(top.month)}, ${qty.temperature(top.meanMax_c)}). ICAO uses the first; check which one the applicable guidance intends.`);
  }

  const older = input.includeOlderFormula
    ? { ta_c: hot.mean_c, tm_c: hot.meanMax_c, art_c: olderFormula(hot.mean_c, hot.meanMax_c) }
    : undefined;

  const trace: ClimateTraceEntry[] = [
    { label: 'months with data', value: months.length, unit: 'months' },
    { label: 'hottest month by mean temperature', value: hot.month, unit: 'month' },
    { label: 'mean temperature of the hottest month', value: hot.mean_c, unit: '°C' },
    { label: 'aerodrome reference temperature (mean daily maximum of the hottest month)', value: hot.meanMax_c, unit: '°C' },
    { label: 'month with the highest mean daily maximum', value: top.month, unit: 'month' },
    { label: 'highest mean daily maximum', value: top.meanMax_c, unit: '°C' },
  ];
  if (older) trace.push({ label: 'older formula Ta + (Tm − Ta)/3', value: older.art_c, unit: '°C' });

  return {
    method: CLIMATE_METHOD_VERSION,
    months,
    hottestMonth: hot.month,
    hottestMonthMean_c: hot.mean_c,
    art_c: hot.meanMax_c,
    maxMeanMaxMonth: top.month,
    maxMeanMax_c: top.meanMax_c,
    monthsDiffer: differ,
    ...(older ? { olderFormula: older } : {}),
    trace,
    warnings,
  };
}
