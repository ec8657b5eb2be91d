/** Display conversion (exact definitions: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg; °F = °C × 1.8 + 32). */
import { describe, expect, it } from 'vitest';
import { fmt, fmtIsaDeviation, fmtLengthBoth } from '../../templates/format.js';

describe('display formatting', () => {
  it('converts temperatures with the offset and temperature differences without it', () => {
    expect(fmt(35, 'temperature', 'us')).toBe('95.0 °F');
    // Regression 2026-12-02: a deviation from ISA was once shown as a temperature (+32 °F offset).
    expect(fmtIsaDeviation(28.749, 'us')).toBe('ISA +51.7 °F');
    expect(fmtIsaDeviation(28.749, 'si')).toBe('ISA +28.7 K');
    expect(fmtIsaDeviation(-5, 'si')).toBe('ISA −5.0 K');
  });
  it('shows the other system in parentheses for a runway length', () => {
    expect(fmtLengthBoth(2050, 'si')).toBe('2,050 m (6,726 ft)');
    expect(fmtLengthBoth(2050, 'us')).toBe('6,726 ft (2,050 m)');
  });
  it('never prints a non-finite number', () => {
    expect(fmt(Number.NaN, 'length', 'si')).toBe('—');
    expect(fmt(Number.POSITIVE_INFINITY, 'mass', 'us')).toBe('—');
  });
});
