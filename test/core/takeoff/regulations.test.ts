import { describe, expect, it } from 'vitest';
import {
  ALL_ENGINES_FACTOR, SCREEN_NORMAL_M, SCREEN_TRANSPORT_M, STOP_ALLOWANCE_S, climbMinimum, screenHeight,
  takeoffDistance25113, takeoffRun25113, firstSegmentMinimum, v2StallFloor,
} from '../../../core/takeoff/regulations.js';
import { expectClose } from '../../helpers/close.js';

describe('14 CFR 25.113(a) takeoff distance — check case 18 (C; derived)', () => {
  it('D35_OEI 2100 m, D35_AEO 1900 m → TOD = max(2100, 1.15·1900) = 2185 m', () => {
    expectClose(takeoffDistance25113({ engineOut_m: 2100, allEngines_m: 1900 }), 2185, { abs: 1e-9 });
  });
  it('the engine-out distance governs when it is the larger', () => {
    expect(takeoffDistance25113({ engineOut_m: 2300, allEngines_m: 1900 })).toBe(2300);
  });
});

describe('14 CFR 25.113(c) takeoff run with clearway (14 CFR 25.113; derived)', () => {
  it('TOR = max(Dmid_OEI, 1.15·Dmid_AEO)', () => {
    expectClose(takeoffRun25113({ engineOutMid_m: 1800, allEnginesMid_m: 1700 }), 1955, { abs: 1e-9 });
    expect(takeoffRun25113({ engineOutMid_m: 2000, allEnginesMid_m: 1700 })).toBe(2000);
  });
});

describe('Screen heights and factors (14 CFR 25.113, 23.59, 23.2115; 25.109(a) 2 s)', () => {
  it('35 ft transport and commuter, 50 ft normal; 1.15 and 2 s', () => {
    expectClose(SCREEN_TRANSPORT_M, 10.668, { abs: 1e-12 });
    expectClose(SCREEN_NORMAL_M, 15.24, { abs: 1e-12 });
    expect(screenHeight('transport')).toBe(SCREEN_TRANSPORT_M);
    expect(screenHeight('commuter')).toBe(SCREEN_TRANSPORT_M);
    expect(screenHeight('normal')).toBe(SCREEN_NORMAL_M);
    expect(ALL_ENGINES_FACTOR).toBe(1.15);
    expect(STOP_ALLOWANCE_S).toBe(2);
  });
});

describe('Engine-out climb minima: 14 CFR 25.121(b) 2.4/2.7/3.0 % (from memory); positive gradient otherwise (common practice)', () => {
  it('transport by engine count', () => {
    expect(climbMinimum('transport', 2).minimum).toBe(0.024);
    expect(climbMinimum('transport', 3).minimum).toBe(0.027);
    expect(climbMinimum('transport', 4).minimum).toBe(0.03);
  });
  it('commuter 2.0 % gear up (23.2120(b)(3), legacy 23.67(c)(2), from memory); normal twins positive (project convention); singles positive', () => {
    expect(climbMinimum('commuter', 2).minimum).toBe(0.02);
    expect(climbMinimum('commuter', 2).source).toMatch(/23\.2120\(b\)\(3\)/);
    expect(climbMinimum('normal', 2).minimum).toBe(0);
    expect(climbMinimum('transport', 1).minimum).toBe(0);
    expect(climbMinimum('normal', 2).source).toMatch(/project convention/);
    expect(climbMinimum('transport', 1).source).toMatch(/common practice/);
  });

  it('first segment (25.121(a), from memory): positive / 0.3 % / 0.5 % for 2 / 3 / 4 engines; commuter measurably positive; none for normal and singles', () => {
    expect(firstSegmentMinimum('transport', 2)!.minimum).toBe(0);
    expect(firstSegmentMinimum('transport', 3)!.minimum).toBe(0.003);
    expect(firstSegmentMinimum('transport', 4)!.minimum).toBe(0.005);
    expect(firstSegmentMinimum('commuter', 2)!.minimum).toBe(0);
    expect(firstSegmentMinimum('normal', 2)).toBeUndefined();
    expect(firstSegmentMinimum('transport', 1)).toBeUndefined();
  });

  it('V2 floors of 25.107(b) (from memory): 1.13 VSR up to three engines, 1.08 VSR with four; none outside transport', () => {
    expect(v2StallFloor('transport', 2)).toBe(1.13);
    expect(v2StallFloor('transport', 3)).toBe(1.13);
    expect(v2StallFloor('transport', 4)).toBe(1.08);
    expect(v2StallFloor('commuter', 2)).toBeUndefined();
  });
});
