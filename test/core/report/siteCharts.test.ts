/**
 * Site chart models (core/report/siteCharts.ts): they arrange the given SI values without computing;
 * expected values are the inputs themselves or their means (derived).
 */
import { describe, expect, it } from 'vitest';
import { climateChart, runwayProfileChart } from '../../../core/index.js';

describe('climate chart model', () => {
  it('has the monthly maxima, the means (given or from max and min) and the minima, sorted by month, and marks the design temperature', () => {
    const m = climateChart({
      siteName: 'Invented',
      monthly: [
        { month: 2, meanMax_c: 20, meanMin_c: 10 },
        { month: 1, meanMax_c: 18, mean_c: 12 },
      ],
      designTemperature_c: 20,
    });
    expect(m.series.map((s) => s.name)).toEqual(['Mean daily maximum', 'Mean', 'Mean daily minimum']);
    expect(m.series[0]!.points).toEqual([{ x: 1, y: 18 }, { x: 2, y: 20 }]);
    expect(m.series[1]!.points).toEqual([{ x: 1, y: 12 }, { x: 2, y: 15 }]); // (20 + 10)/2 = 15 (derived)
    expect(m.series[2]!.points).toEqual([{ x: 2, y: 10 }]);
    expect(m.rules).toEqual([{ axis: 'y', value: 20, label: 'Design temperature' }]);
    expect(m.xKind).toBe('count');
    expect(m.yKind).toBe('temperature');
  });

  it('without minima or means it draws the maxima alone', () => {
    const m = climateChart({ siteName: 'x', monthly: [{ month: 7, meanMax_c: 30 }] });
    expect(m.series).toHaveLength(1);
    expect(m.rules).toEqual([]);
  });
});

describe('runway profile chart model', () => {
  it('draws the centreline and marks the high and low points (the first on a tie)', () => {
    const m = runwayProfileChart({ runwayName: '09/27', index: 2, profile: [{ chainage_m: 0, elevation_m: 100 }, { chainage_m: 500, elevation_m: 103 }, { chainage_m: 1000, elevation_m: 99 }, { chainage_m: 1500, elevation_m: 103 }] });
    expect(m.id).toBe('profile-2');
    expect(m.series[0]!.points).toHaveLength(4);
    expect(m.series[1]!.points).toEqual([{ x: 500, y: 103 }, { x: 1000, y: 99 }]);
    expect(m.xKind).toBe('length');
    expect(m.yKind).toBe('altitude');
  });
});
