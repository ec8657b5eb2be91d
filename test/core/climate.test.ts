import { siText } from '../../core/notices.js';
import { describe, expect, it } from 'vitest';
import {
  ClimateFileError,
  NOAA_GSOM_COMPLETENESS,
  climateFromDaily,
  daysInMonth,
  designTemperatureFromMonthly,
  isLeapYear,
  olderFormulaArt,
  readGhcnDailyCsv,
  readMonthlyNormalsCsv,
  readStationDailyCsv,
  type DailyTemperature,
  type MonthlyNormal,
} from '../../core/climate/index.js';
import { InputDomainError } from '../../core/errors.js';
import { expectClose } from '../helpers/close.js';

const ABS = 1e-9;

/** Runs `fn`, expects a ClimateFileError and returns it. */
function fileError(fn: () => unknown): ClimateFileError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(ClimateFileError);
    expect(e).toBeInstanceOf(Error);
    return e as ClimateFileError;
  }
  return expect.fail('expected a ClimateFileError');
}

function domainError(fn: () => unknown): InputDomainError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(InputDomainError);
    return e as InputDomainError;
  }
  return expect.fail('expected an InputDomainError');
}

describe('older ART formula Ta + (Tm − Ta)/3 (Ashford & Wright p. 234; check cases 9 and 10)', () => {
  it('check case 9: Ta 28.12, Tm 44.62 → 33.62 °C (Made Easy solved problem [C2])', () => {
    expectClose(olderFormulaArt({ ta_c: 28.12, tm_c: 44.62 }).art_c, 33.62, { abs: 1e-9 });
  });
  it('check case 10: Ta 21, Tm 30 → 24.0 °C (Made Easy Ex. 3.3 [C2])', () => {
    expectClose(olderFormulaArt({ ta_c: 21, tm_c: 30 }).art_c, 24.0, { abs: 1e-12 });
  });
  it('refuses Tm below Ta and out-of-range values', () => {
    expect(domainError(() => olderFormulaArt({ ta_c: 30, tm_c: 21 })).field).toBe('tm_c');
    expect(domainError(() => olderFormulaArt({ ta_c: Number.NaN, tm_c: 21 })).field).toBe('ta_c');
    expect(domainError(() => olderFormulaArt({ ta_c: 20, tm_c: 61 })).field).toBe('tm_c');
  });
});

// Check case 34 (NOAA NCEI Global Summary of the Month completeness rule worked example [D]): July TMAX 34.5, 35.1; TMIN 22.1, 22.9, 23.0;
// August TMAX 36.2, 35.8; TMIN 20.1, 20.5.
const JULY: MonthlyNormal = { month: 7, meanMax_c: (34.5 + 35.1) / 2, meanMin_c: (22.1 + 22.9 + 23.0) / 3 };
const AUGUST: MonthlyNormal = { month: 8, meanMax_c: (36.2 + 35.8) / 2, meanMin_c: (20.1 + 20.5) / 2 };

describe('design temperature from monthly values (ICAO Annex 14 Vol I §2.4.1–2.4.2)', () => {
  it('check case 34 (§10.4 [D]): hottest month by mean = July, ART 34.80 °C; highest mean maximum August 36.00 °C', () => {
    const r = designTemperatureFromMonthly({ months: [AUGUST, JULY], includeOlderFormula: true });
    expect(r.hottestMonth).toBe(7);
    expectClose(r.art_c, 34.8, { abs: ABS });
    expectClose(r.hottestMonthMean_c, 28.7333333, { abs: 1e-6 });
    expect(r.maxMeanMaxMonth).toBe(8);
    expectClose(r.maxMeanMax_c, 36.0, { abs: ABS });
    expect(r.monthsDiffer).toBe(true);
    // Older formula on July: 28.73 + (34.80 − 28.73)/3 = 30.76 °C (§10.4 [D]).
    expectClose(r.olderFormula?.art_c ?? Number.NaN, 30.76, { abs: 0.005 });
    expect(r.months.map((m) => m.month)).toEqual([7, 8]);
    expect(r.months[1]?.meanSource).toBe('max-min');
    expect(r.warnings.map(siText).some((w) => w.includes('is not the month with the highest mean daily maximum'))).toBe(true);
    expect(r.warnings.map(siText).some((w) => w.includes('among 2 of 12 months'))).toBe(true);
    expect(r.trace.find((t) => t.label.startsWith('aerodrome reference temperature'))?.value).toBe(r.art_c);
  });

  it('a given mean takes precedence over (max + min)/2', () => {
    const r = designTemperatureFromMonthly({
      months: [
        { month: 7, meanMax_c: 34.8, meanMin_c: 22.67, mean_c: 27.0 },
        { month: 8, meanMax_c: 36.0, meanMin_c: 20.3, mean_c: 28.0 },
      ],
    });
    expect(r.hottestMonth).toBe(8);
    expect(r.monthsDiffer).toBe(false);
    expect(r.olderFormula).toBeUndefined();
    expect(r.months[0]?.meanSource).toBe('given');
  });

  it('twelve months of a normal give no warning when the months agree (invented values, derived)', () => {
    const max = [20, 22, 25, 28, 31, 33, 36, 35, 32, 28, 24, 21];
    const min = [8, 9, 12, 15, 19, 22, 24, 23, 20, 16, 11, 9];
    const r = designTemperatureFromMonthly({ months: max.map((m, i) => ({ month: i + 1, meanMax_c: m, meanMin_c: min[i] as number })) });
    expect(r.hottestMonth).toBe(7);
    expect(r.art_c).toBe(36);
    expect(r.monthsDiffer).toBe(false);
    expect(r.warnings).toEqual([]);
  });

  it('on a tie of mean temperature the month with the higher mean maximum is taken, and flagged', () => {
    const r = designTemperatureFromMonthly({
      months: [
        { month: 7, meanMax_c: 34, mean_c: 28 },
        { month: 8, meanMax_c: 35, mean_c: 28 },
      ],
    });
    expect(r.hottestMonth).toBe(8);
    expect(r.monthsDiffer).toBe(false);
    expect(r.warnings.map(siText).some((w) => w.includes('share the highest mean temperature'))).toBe(true);
  });

  it('refuses bad input with InputDomainError naming the field', () => {
    expect(domainError(() => designTemperatureFromMonthly({ months: [] })).field).toBe('months');
    expect(domainError(() => designTemperatureFromMonthly({ months: [{ month: 13, meanMax_c: 30, mean_c: 25 }] })).field).toBe('months[0].month');
    expect(domainError(() => designTemperatureFromMonthly({ months: [{ month: 6.5, meanMax_c: 30, mean_c: 25 }] })).field).toBe('months[0].month');
    expect(domainError(() => designTemperatureFromMonthly({ months: [{ month: 7, meanMax_c: 30 }] })).field).toBe('months[0].meanMin_c');
    expect(domainError(() => designTemperatureFromMonthly({ months: [{ month: 7, meanMax_c: 30, meanMin_c: 31 }] })).field).toBe('months[0].meanMin_c');
    expect(domainError(() => designTemperatureFromMonthly({ months: [{ month: 7, meanMax_c: 61, mean_c: 25 }] })).field).toBe('months[0].meanMax_c');
    expect(
      domainError(() =>
        designTemperatureFromMonthly({ months: [{ month: 7, meanMax_c: 30, mean_c: 25 }, { month: 7, meanMax_c: 31, mean_c: 26 }] }),
      ).field,
    ).toBe('months[1].month');
    expect(domainError(() => designTemperatureFromMonthly({ months: [{ month: 7, meanMax_c: Number.NaN, mean_c: 25 }] })).field).toBe('months[0].meanMax_c');
  });
});

describe('calendar (Gregorian rule, common practice)', () => {
  it('leap years and month lengths', () => {
    expect([1900, 2000, 2016, 2019, 2020, 2100].map(isLeapYear)).toEqual([false, true, true, false, true, false]);
    expect(daysInMonth(2016, 2)).toBe(29);
    expect(daysInMonth(2019, 2)).toBe(28);
    expect(daysInMonth(2019, 4)).toBe(30);
    expect(daysInMonth(2019, 12)).toBe(31);
  });
});

// ---------------------------------------------------------------------------------------------
// Synthetic five-year station record (invented). Known answer derived by hand below.

const MAX = [20, 22, 25, 28, 31, 33, 34, 35, 32, 28, 24, 21];
const MIN = [8, 9, 12, 15, 19, 22, 24, 22, 20, 16, 11, 9];
const OFFSET: Readonly<Record<number, number>> = { 2016: 0, 2017: 1, 2018: -1, 2019: 2, 2020: -2 };
/** TMAX gaps: missing days, and the value on the other days of that month (45 °C marks a month that must drop out). */
const GAPS: Readonly<Record<string, { days: readonly number[]; value?: number }>> = {
  '2019-07': { days: [2, 6, 10, 14, 18, 22], value: 45 }, // 6 scattered missing → excluded (> 5)
  '2017-08': { days: [10, 11, 12, 13], value: 45 }, // 4 consecutive missing → excluded (> 3)
  '2018-07': { days: [3, 9, 15, 21, 27] }, // 5 scattered missing → kept (limit)
  '2016-08': { days: [5, 6, 7] }, // 3 consecutive missing → kept (limit)
  '2020-02': { days: [26, 27, 28, 29], value: 45 }, // leap February: 4 consecutive → excluded
};

const pad = (n: number): string => String(n).padStart(2, '0');
/** Month length by an independent route (the JavaScript Date), to check the core's calendar. */
const monthLength = (y: number, m: number): number => new Date(Date.UTC(y, m, 0)).getUTCDate();

function syntheticRecord(): DailyTemperature[] {
  const out: DailyTemperature[] = [];
  for (let y = 2016; y <= 2020; y++) {
    const off = OFFSET[y] as number;
    for (let m = 1; m <= 12; m++) {
      const gap = GAPS[`${y}-${pad(m)}`];
      for (let d = 1; d <= monthLength(y, m); d++) {
        const missing = gap?.days.includes(d) ?? false;
        const tmax = gap?.value ?? (MAX[m - 1] as number) + off;
        out.push({
          date: `${y}-${pad(m)}-${pad(d)}`,
          ...(missing ? {} : { tmax_c: tmax }),
          tmin_c: (MIN[m - 1] as number) + off,
        });
      }
    }
  }
  return out;
}

describe('design temperature from daily records (§10.4 steps; NOAA GSOM completeness rule as cited in §10.1)', () => {
  // Derived: July uses 2016, 2017, 2018, 2020 (offsets 0, +1, −1, −2 → −0.5): max 33.5, mean 29 − 0.5 = 28.5.
  // August uses 2016, 2018, 2019, 2020 (offsets 0, −1, +2, −2 → −0.25): max 34.75, mean 28.5 − 0.25 = 28.25.
  const r = climateFromDaily({ days: syntheticRecord(), includeOlderFormula: true });

  it('excludes exactly the months that break the rule, with the reason', () => {
    expect(r.excluded.map((e) => [e.year, e.month])).toEqual([[2017, 8], [2019, 7], [2020, 2]]);
    const [aug17, jul19, feb20] = r.excluded;
    expect(aug17?.reasons).toEqual([{ element: 'TMAX', rule: 'consecutive-missing', missingDays: 4, longestMissingRun_days: 4 }]);
    expect(jul19?.reasons).toEqual([{ element: 'TMAX', rule: 'missing-days', missingDays: 6, longestMissingRun_days: 1 }]);
    expect(feb20?.reasons).toEqual([{ element: 'TMAX', rule: 'consecutive-missing', missingDays: 4, longestMissingRun_days: 4 }]);
    expect(jul19?.detail).toContain('6 days missing (more than 5)');
    expect(aug17?.detail).toContain('4 consecutive days missing (more than 3)');
  });

  it('keeps the months at the limits (5 missing; 3 consecutive missing)', () => {
    const jul18 = r.stationMonths.find((s) => s.year === 2018 && s.month === 7);
    const aug16 = r.stationMonths.find((s) => s.year === 2016 && s.month === 8);
    expect(jul18?.used).toBe(true);
    expect(jul18?.tmax.missingDays).toBe(5);
    expect(aug16?.used).toBe(true);
    expect(aug16?.tmax.longestMissingRun_days).toBe(3);
  });

  it('handles leap years: February 2016 and 2020 have 29 days', () => {
    const feb16 = r.stationMonths.find((s) => s.year === 2016 && s.month === 2);
    const feb19 = r.stationMonths.find((s) => s.year === 2019 && s.month === 2);
    expect(feb16?.daysInMonth).toBe(29);
    expect(feb16?.tmax.daysWithValue).toBe(29);
    expect(feb19?.daysInMonth).toBe(28);
    expect(r.calendarMonths[1]?.yearsUsed).toEqual([2016, 2017, 2018, 2019]);
  });

  it('averages each calendar month over the years used and reports them', () => {
    const jul = r.calendarMonths[6];
    const aug = r.calendarMonths[7];
    expect(jul?.yearsUsed).toEqual([2016, 2017, 2018, 2020]);
    expect(aug?.yearsUsed).toEqual([2016, 2018, 2019, 2020]);
    expectClose(jul?.meanMax_c ?? Number.NaN, 33.5, { abs: ABS });
    expectClose(jul?.mean_c ?? Number.NaN, 28.5, { abs: ABS });
    expectClose(jul?.meanMin_c ?? Number.NaN, 23.5, { abs: ABS });
    expectClose(aug?.meanMax_c ?? Number.NaN, 34.75, { abs: ABS });
    expectClose(aug?.mean_c ?? Number.NaN, 28.25, { abs: ABS });
    expect(r.yearsUsed).toEqual([2016, 2017, 2018, 2019, 2020]);
    expect(r.completeYears).toEqual([2016, 2018]);
    expect(r.stationMonths).toHaveLength(60);
    expect(r.period).toEqual({ firstDate: '2016-01-01', lastDate: '2020-12-31', fromYear: 2016, toYear: 2020 });
  });

  it('derives the design temperature: July by mean (ART 33.50 °C), August by mean maximum (34.75 °C)', () => {
    expect(r.design?.hottestMonth).toBe(7);
    expectClose(r.design?.art_c ?? Number.NaN, 33.5, { abs: ABS });
    expect(r.design?.maxMeanMaxMonth).toBe(8);
    expectClose(r.design?.maxMeanMax_c ?? Number.NaN, 34.75, { abs: ABS });
    expect(r.design?.monthsDiffer).toBe(true);
    // Older formula on July: 28.5 + (33.5 − 28.5)/3 (derived).
    expectClose(r.design?.olderFormula?.art_c ?? Number.NaN, 28.5 + 5 / 3, { abs: ABS });
    // Four years for the design month: fewer than the five usually asked for.
    expect(r.warnings.map(siText).some((w) => w.includes('July rests on 4 year(s)'))).toBe(true);
    expect(r.trace.find((t) => t.label === 'years used for the hottest month')?.value).toBe(4);
  });

  it('a chosen period restricts the years (2017-2018: July 34.0 = August 34.0, tie goes to the hottest month)', () => {
    const p = climateFromDaily({ days: syntheticRecord(), fromYear: 2017, toYear: 2018 });
    expect(p.calendarMonths[6]?.yearsUsed).toEqual([2017, 2018]);
    expect(p.calendarMonths[7]?.yearsUsed).toEqual([2018]);
    expect(p.design?.hottestMonth).toBe(7);
    expectClose(p.design?.art_c ?? Number.NaN, 34, { abs: ABS });
    expect(p.design?.monthsDiffer).toBe(false);
    expect(p.excluded.map((e) => `${e.year}-${e.month}`)).toEqual(['2017-8']);
  });

  it('the thresholds can be changed: a strict rule (no missing day) drops the limit months too', () => {
    const s = climateFromDaily({ days: syntheticRecord(), completeness: { maxMissingDays: 0, maxConsecutiveMissingDays: 0 } });
    expect(s.excluded.map((e) => `${e.year}-${e.month}`)).toEqual(['2016-8', '2017-8', '2018-7', '2019-7', '2020-2']);
    expect(s.calendarMonths[6]?.yearsUsed).toEqual([2016, 2017, 2020]);
  });
});

describe('daily aggregation details (derived by hand)', () => {
  it('a month mean uses only the days with a value: 1..31 without days 5 and 20 → 471/29', () => {
    const days: DailyTemperature[] = [];
    for (let d = 1; d <= 31; d++) if (d !== 5 && d !== 20) days.push({ date: `2016-01-${pad(d)}`, tmax_c: d, tmin_c: 0 });
    const r = climateFromDaily({ days });
    const jan = r.stationMonths[0];
    expectClose(jan?.meanMax_c ?? Number.NaN, 471 / 29, { abs: ABS });
    expect(jan?.tmax.missingDays).toBe(2);
    expect(jan?.tmax.longestMissingRun_days).toBe(1);
    expect(jan?.used).toBe(true);
    expect(r.design?.hottestMonth).toBe(1);
    expect(r.warnings.map(siText).some((w) => w.includes('among 1 of 12 months'))).toBe(true);
  });

  it('TAVG is used for the mean when complete; meanSource "max-min" ignores it', () => {
    const days: DailyTemperature[] = [];
    for (let d = 1; d <= 30; d++) days.push({ date: `2021-06-${pad(d)}`, tmax_c: 30, tmin_c: 20, tavg_c: 24 });
    const a = climateFromDaily({ days });
    expect(a.stationMonths[0]?.meanSource).toBe('tavg');
    expect(a.calendarMonths[5]?.mean_c).toBe(24);
    const b = climateFromDaily({ days, meanSource: 'max-min' });
    expect(b.stationMonths[0]?.meanSource).toBe('max-min');
    expect(b.calendarMonths[5]?.mean_c).toBe(25);
  });

  it('a month without complete TMIN or TAVG is excluded for its mean, naming both', () => {
    const days: DailyTemperature[] = [];
    for (let d = 1; d <= 30; d++) days.push({ date: `2021-06-${pad(d)}`, tmax_c: 30, ...(d <= 20 ? { tmin_c: 20, tavg_c: 25 } : {}) });
    const r = climateFromDaily({ days });
    expect(r.excluded[0]?.reasons.map((x) => `${x.element}:${x.rule}`)).toEqual(['TMIN:missing-days', 'TMIN:consecutive-missing', 'TAVG:missing-days', 'TAVG:consecutive-missing']);
    expect(r.design).toBeUndefined();
    expect(r.reason).toContain('No month meets the completeness rule');
  });

  it('mixed TAVG and max-min sources across years are flagged', () => {
    const days: DailyTemperature[] = [];
    for (const y of [2020, 2021]) {
      for (let d = 1; d <= 31; d++) days.push({ date: `${y}-07-${pad(d)}`, tmax_c: 30, tmin_c: 20, ...(y === 2020 ? { tavg_c: 26 } : {}) });
    }
    const r = climateFromDaily({ days, fromYear: 2020, toYear: 2021 });
    expect(r.calendarMonths[6]?.mean_c).toBe((26 + 25) / 2);
    expect(r.warnings.map(siText).some((w) => w.includes('from TAVG in some years'))).toBe(true);
  });

  it('a record with no temperatures gives a result with a reason, not an exception', () => {
    const r = climateFromDaily({ days: [{ date: '2020-01-01' }] });
    expect(r.design).toBeUndefined();
    expect(r.reason).toBe('No temperature values in the record.');
  });

  it('refuses bad days with InputDomainError naming the record', () => {
    expect(domainError(() => climateFromDaily({ days: [] })).field).toBe('days');
    expect(domainError(() => climateFromDaily({ days: [{ date: '2019-02-29', tmax_c: 20 }] })).field).toBe('days[0].date');
    expect(domainError(() => climateFromDaily({ days: [{ date: '2019/02/01', tmax_c: 20 }] })).field).toBe('days[0].date');
    expect(
      domainError(() => climateFromDaily({ days: [{ date: '2020-02-29', tmax_c: 20 }, { date: '2020-02-29', tmin_c: 10 }] })).field,
    ).toBe('days[1].date');
    expect(domainError(() => climateFromDaily({ days: [{ date: '2020-07-01', tmax_c: 20, tmin_c: 21 }] })).field).toBe('days[0].tmin_c');
    expect(domainError(() => climateFromDaily({ days: [{ date: '2020-07-01', tmax_c: 61 }] })).field).toBe('days[0].tmax_c');
    expect(domainError(() => climateFromDaily({ days: [{ date: '2020-07-01', tmax_c: Number.POSITIVE_INFINITY }] })).field).toBe('days[0].tmax_c');
    expect(domainError(() => climateFromDaily({ days: [{ date: '2020-07-01', tmax_c: 20 }], fromYear: 2021, toYear: 2020 })).field).toBe('toYear');
    expect(
      domainError(() => climateFromDaily({ days: [{ date: '2020-07-01', tmax_c: 20 }], completeness: { ...NOAA_GSOM_COMPLETENESS, maxMissingDays: 40 } })).field,
    ).toBe('completeness.maxMissingDays');
  });
});

// ---------------------------------------------------------------------------------------------
// Readers. Station identifiers and values are invented.

const STATION = 'XX000012345';
const ghcn = (lines: readonly string[]): string => lines.join('\n') + '\n';

/** The §10.4 worked example as GHCN-Daily by-station rows (tenths of °C). */
const CASE_34_GHCN = ghcn([
  `${STATION},20230701,TMAX,345,,,S,`,
  `${STATION},20230701,TMIN,221,,,S,`,
  `${STATION},20230701,PRCP,0,,,S,`,
  `${STATION},20230702,TMAX,351,,,S,`,
  `${STATION},20230702,TMIN,229,,,S,`,
  `${STATION},20230703,TMAX,999,,X,S,`,
  `${STATION},20230703,TMIN,230,,,S,`,
  `${STATION},20230801,TMAX,362,,,S,0700`,
  `${STATION},20230801,TMIN,201,,,S,0700`,
  `${STATION},20230802,TMAX,358,,,S,0700`,
  `${STATION},20230802,TMIN,205,,,S,0700`,
  `${STATION},20230803,TMAX,-9999,,,S,0700`,
]);

describe('GHCN-Daily by-station CSV (GHCN-D readme field list and units, NOAA NCEI GHCN-Daily format description (readme); check cases 34 and 35)', () => {
  it('check case 35: "345" TMAX → 34.5 °C; the Q-flag "X" row is excluded', () => {
    const r = readGhcnDailyCsv({ text: CASE_34_GHCN });
    expect(r.station).toBe(STATION);
    expect(r.days[0]).toEqual({ date: '2023-07-01', tmax_c: 34.5, tmin_c: 22.1 });
    expect(r.days.find((d) => d.date === '2023-07-03')).toEqual({ date: '2023-07-03', tmin_c: 23 });
    expect(r.summary).toEqual({ rowsRead: 12, valuesKept: 9, valuesDroppedQc: 1, valuesMissing: 1, rowsOtherElements: 1 });
    expect(siText(r.warnings[0]!)).toContain('1 temperature value(s) dropped');
    expect(r.days.map((d) => d.date)).toEqual(['2023-07-01', '2023-07-02', '2023-07-03', '2023-08-01', '2023-08-02']);
  });

  it('check case 34 end to end: July ART 34.80 °C, August highest mean maximum 36.00 °C', () => {
    const { days } = readGhcnDailyCsv({ text: CASE_34_GHCN });
    // The worked example has a few days per month only, so the completeness rule is relaxed to admit them.
    const r = climateFromDaily({ days, completeness: { maxMissingDays: 31, maxConsecutiveMissingDays: 31 }, includeOlderFormula: true });
    const jul = r.calendarMonths[6];
    expectClose(jul?.meanMax_c ?? Number.NaN, 34.8, { abs: ABS });
    expectClose(jul?.meanMin_c ?? Number.NaN, 22.6666667, { abs: 1e-6 });
    expectClose(jul?.mean_c ?? Number.NaN, 28.7333333, { abs: 1e-6 });
    expectClose(r.calendarMonths[7]?.mean_c ?? Number.NaN, 28.15, { abs: ABS });
    expect(r.design?.hottestMonth).toBe(7);
    expectClose(r.design?.art_c ?? Number.NaN, 34.8, { abs: ABS });
    expect(r.design?.maxMeanMaxMonth).toBe(8);
    expectClose(r.design?.maxMeanMax_c ?? Number.NaN, 36.0, { abs: ABS });
    expectClose(r.design?.olderFormula?.art_c ?? Number.NaN, 30.76, { abs: 0.005 });
  });

  it('with the NOAA rule the same few days are all excluded (more than 5 missing)', () => {
    const { days } = readGhcnDailyCsv({ text: CASE_34_GHCN });
    const r = climateFromDaily({ days });
    expect(r.excluded.map((e) => e.month)).toEqual([7, 8]);
    expect(r.design).toBeUndefined();
  });

  it('reads CRLF files and keeps line numbers right', () => {
    const text = [`${STATION},20230701,TMAX,345,,,S,`, `${STATION},20230702,TMAX,34x,,,S,`].join('\r\n');
    const e = fileError(() => readGhcnDailyCsv({ text }));
    expect([e.line, e.column, e.columnName]).toEqual([2, 4, 'VALUE']);
  });

  it('refuses bad rows with line and column (1-based)', () => {
    const ok = `${STATION},20230701,TMAX,345,,,S,`;
    const cases: readonly [string, number | undefined, number | undefined, string][] = [
      [ghcn([ok, `${STATION},20230231,TMAX,345,,,S,`]), 2, 2, 'does not exist'],
      [ghcn([ok, `${STATION},20230702,TMAX,345,,`]), 2, 7, 'expected 8 fields'],
      [ghcn([ok, `${STATION},20230702,TMAX,34.5,,,S,`]), 2, 4, 'whole number of tenths'],
      [ghcn([ok, `${STATION},20230702,TMAX,700,,,S,`]), 2, 4, 'is 70.0 °C: too large (maximum 60 °C)'],
      [ghcn([ok, `XX000099999,20230702,TMAX,345,,,S,`]), 2, 1, 'a second station'],
      [ghcn([ok, `${STATION},20230702,TMIN,400,,,S,`, `${STATION},20230702,TMAX,345,,,S,`]), 3, 4, 'TMIN 40 °C is above TMAX 34.5 °C'],
      [ghcn([ok, ok]), 2, 4, 'a second TMAX value for 2023-07-01 (the first is on line 1)'],
      [ghcn(['ID,DATE,ELEMENT,DATA_VALUE,M_FLAG,Q_FLAG,S_FLAG,OBS_TIME', ok]), 1, 2, 'looks like a header row'],
      [ghcn([ok, `${STATION},20230702,"TMAX,345,,,S,`]), 2, 3, 'not valid CSV'],
      [ghcn([ok, `XX0001,20230702,TMAX,345,,,S,`]), 2, 1, 'not 11 letters or digits'],
    ];
    for (const [text, line, column, reason] of cases) {
      const e = fileError(() => readGhcnDailyCsv({ text }));
      expect(e.reason, text).toContain(reason);
      expect([e.line, e.column], e.message).toEqual([line, column]);
      expect(e.message.startsWith(`line ${line}, column ${column}`)).toBe(true);
    }
  });

  it('refuses a file with no usable TMAX (empty, other elements only, all flagged)', () => {
    for (const text of ['', '\n\n', ghcn([`${STATION},20230701,PRCP,12,,,S,`]), ghcn([`${STATION},20230701,TMAX,345,,X,S,`])]) {
      const e = fileError(() => readGhcnDailyCsv({ text }));
      expect(e.line).toBeUndefined();
      expect(e.reason).toContain('no usable TMAX values');
    }
  });
});

const ACCESS_HEADER = '"STATION","DATE","LATITUDE","LONGITUDE","ELEVATION","NAME","PRCP","PRCP_ATTRIBUTES","TMAX","TMAX_ATTRIBUTES","TMIN","TMIN_ATTRIBUTES"';
const access = (rows: readonly string[]): string => [ACCESS_HEADER, ...rows].join('\n') + '\n';
const accessRow = (date: string, tmax: string, tmin: string, tmaxAttr = ',,W,2400', tminAttr = ',,W,2400'): string =>
  `"${STATION}","${date}","10.5","-20.25","512.0","INVENTED FIELD","0.0",",,W,","${tmax}","${tmaxAttr}","${tmin}","${tminAttr}"`;

describe('per-station daily CSV with header (access CSV layout, NOAA NCEI GHCN-Daily format description (readme) d)', () => {
  it('converts the stated unit: °F, °C and tenths of °C (exact conversions §5.5)', () => {
    const f = readStationDailyCsv({ text: access([accessRow('2022-07-01', '95', '68')]), unit: 'f' });
    expectClose(f.days[0]?.tmax_c ?? Number.NaN, 35, { abs: 1e-12 });
    expectClose(f.days[0]?.tmin_c ?? Number.NaN, 20, { abs: 1e-12 });
    const c = readStationDailyCsv({ text: access([accessRow('2022-07-01', '34.5', '20.1')]), unit: 'c' });
    expect(c.days[0]).toEqual({ date: '2022-07-01', tmax_c: 34.5, tmin_c: 20.1 });
    const t = readStationDailyCsv({ text: access([accessRow('2022-07-01', '345', '201')]), unit: 'tenths-c' });
    expect(t.days[0]).toEqual({ date: '2022-07-01', tmax_c: 34.5, tmin_c: 20.1 });
    expect(t.station).toBe(STATION);
  });

  it('drops a value whose attributes carry a QC flag (2nd token), and treats blanks and -9999 as missing', () => {
    const r = readStationDailyCsv({
      text: access([
        accessRow('2022-07-01', '34.5', '20.1', ',X,W,2400'),
        accessRow('2022-07-02', '', '20.5'),
        accessRow('2022-07-03', '-9999', '21.0'),
        accessRow('2022-07-04', '35.0', '21.5'),
      ]),
      unit: 'c',
    });
    expect(r.days).toEqual([
      { date: '2022-07-01', tmin_c: 20.1 },
      { date: '2022-07-02', tmin_c: 20.5 },
      { date: '2022-07-03', tmin_c: 21 },
      { date: '2022-07-04', tmax_c: 35, tmin_c: 21.5 },
    ]);
    expect(r.summary).toEqual({ rowsRead: 4, valuesKept: 5, valuesDroppedQc: 1, valuesMissing: 2, rowsOtherElements: 0 });
  });

  it('a wrong unit shows up as an out-of-range value with a hint (tenths read as °C)', () => {
    const e = fileError(() => readStationDailyCsv({ text: access([accessRow('2022-07-01', '345', '201')]), unit: 'c' }));
    expect([e.line, e.column, e.columnName]).toEqual([2, 9, 'TMAX']);
    expect(e.reason).toContain("stated as °C; check it");
  });

  it('refuses bad files with line and column', () => {
    const noTmax = fileError(() => readStationDailyCsv({ text: '"STATION","DATE","TMIN"\n"A","2022-07-01","20"\n', unit: 'c' }));
    expect([noTmax.line, noTmax.column]).toEqual([1, undefined]);
    expect(noTmax.reason).toContain('no TMAX column');
    const badDate = fileError(() => readStationDailyCsv({ text: access([accessRow('2022-07-01', '30', '20'), accessRow('2022-13-01', '30', '20')]), unit: 'c' }));
    expect([badDate.line, badDate.column, badDate.columnName]).toEqual([3, 2, 'DATE']);
    const dupDate = fileError(() => readStationDailyCsv({ text: access([accessRow('2022-07-01', '30', '20'), accessRow('2022-07-01', '31', '20')]), unit: 'c' }));
    expect([dupDate.line, dupDate.column]).toEqual([3, 2]);
    const notNumber = fileError(() => readStationDailyCsv({ text: access([accessRow('2022-07-01', '30', 'warm')]), unit: 'c' }));
    expect([notNumber.line, notNumber.column, notNumber.columnName]).toEqual([2, 11, 'TMIN']);
    const short = fileError(() => readStationDailyCsv({ text: access([`"${STATION}","2022-07-01"`]), unit: 'c' }));
    expect([short.line, short.column]).toEqual([2, 3]);
    const empty = fileError(() => readStationDailyCsv({ text: '', unit: 'c' }));
    expect(empty.reason).toContain('the file is empty');
    const headerOnly = fileError(() => readStationDailyCsv({ text: access([]), unit: 'c' }));
    expect(headerOnly.reason).toContain('no usable TMAX values');
    const badUnit = fileError(() => readStationDailyCsv({ text: access([accessRow('2022-07-01', '30', '20')]), unit: 'kelvin' as 'c' }));
    expect(badUnit.reason).toContain('not one of');
  });

  it('feeds the daily method (a full July in °F)', () => {
    const rows: string[] = [];
    for (let d = 1; d <= 31; d++) rows.push(accessRow(`2022-07-${pad(d)}`, '95', '77'));
    const r = climateFromDaily({ days: readStationDailyCsv({ text: access(rows), unit: 'f' }).days });
    expectClose(r.design?.art_c ?? Number.NaN, 35, { abs: 1e-12 });
    expectClose(r.design?.hottestMonthMean_c ?? Number.NaN, 30, { abs: 1e-12 });
  });
});

const NORMALS_HEADER =
  '"STATION","DATE","LATITUDE","LONGITUDE","ELEVATION","NAME","MLY-TAVG-NORMAL","MLY-TMAX-NORMAL","MLY-TMIN-NORMAL","comp_flag_MLY-TMAX-NORMAL"';
const normalsRow = (mm: string, tavg: string, tmax: string, tmin: string): string =>
  `"${STATION}","${mm}","10.5","-20.25","512.0","INVENTED FIELD","${tavg}","${tmax}","${tmin}","S"`;

describe('monthly normals CSV (normals 1991-2020 access layout, °F, NOAA NCEI U.S. Climate Normals 1991–2020 documentation)', () => {
  // Invented normals in °F; July mean 86 °F (30 °C), August max 96.8 °F (36 °C).
  const tmaxF = [68, 71.6, 77, 82.4, 87.8, 91.4, 95, 96.8, 89.6, 82.4, 75.2, 69.8];
  const tavgF = [57.2, 60.8, 64.4, 69.8, 75.2, 80.6, 86, 84.2, 78.8, 71.6, 64.4, 59];
  const tminF = tavgF.map((a, i) => 2 * a - (tmaxF[i] as number));
  const text = [NORMALS_HEADER, ...tmaxF.map((x, i) => normalsRow(pad(i + 1), String(tavgF[i]), String(x), String(tminF[i]))), ''].join('\n');

  it('reads twelve months and converts °F to °C: °C = (°F − 32)·5/9 (exact)', () => {
    const r = readMonthlyNormalsCsv({ text });
    expect(r.station).toBe(STATION);
    expect(r.months).toHaveLength(12);
    expectClose(r.months[6]?.meanMax_c ?? Number.NaN, 35, { abs: 1e-12 });
    expectClose(r.months[6]?.mean_c ?? Number.NaN, 30, { abs: 1e-12 });
    expectClose(r.months[7]?.meanMax_c ?? Number.NaN, 36, { abs: 1e-12 });
    expect(r.warnings).toEqual([]);
    const d = designTemperatureFromMonthly({ months: r.months });
    expect(d.hottestMonth).toBe(7);
    expectClose(d.art_c, 35, { abs: 1e-12 });
    expect(d.maxMeanMaxMonth).toBe(8);
  });

  it('a -9999 maximum leaves the month out with a warning', () => {
    const t = [NORMALS_HEADER, normalsRow('07', '86', '95', '77'), normalsRow('08', '84.2', '-9999', '71.6')].join('\n');
    const r = readMonthlyNormalsCsv({ text: t });
    expect(r.months.map((m) => m.month)).toEqual([7]);
    expect(r.skipped).toEqual([{ month: 8, reason: 'August: no maximum normal' }]);
    expect(r.warnings.map(siText).some((w) => w.includes('no row for January'))).toBe(true);
  });

  it('refuses bad rows with line and column', () => {
    const daily = fileError(() => readMonthlyNormalsCsv({ text: [NORMALS_HEADER, normalsRow('07-15', '86', '95', '77')].join('\n') }));
    expect([daily.line, daily.column]).toEqual([2, 2]);
    expect(daily.reason).toContain('daily normals');
    const dup = fileError(() => readMonthlyNormalsCsv({ text: [NORMALS_HEADER, normalsRow('07', '86', '95', '77'), normalsRow('07', '86', '95', '77')].join('\n') }));
    expect([dup.line, dup.column]).toEqual([3, 2]);
    const hot = fileError(() => readMonthlyNormalsCsv({ text: [NORMALS_HEADER, normalsRow('07', '86', '150', '77')].join('\n') }));
    expect([hot.line, hot.column, hot.columnName]).toEqual([2, 8, 'MLY-TMAX-NORMAL']);
    const none = fileError(() => readMonthlyNormalsCsv({ text: [NORMALS_HEADER, normalsRow('07', '-9999', '-9999', '-9999')].join('\n') }));
    expect(none.reason).toContain('no usable month');
    const noCol = fileError(() => readMonthlyNormalsCsv({ text: '"STATION","DATE","MLY-TAVG-NORMAL"\n"A","07","80"\n' }));
    expect(noCol.line).toBe(1);
    expect(noCol.reason).toContain('no MLY-TMAX-NORMAL column');
  });
});
