/**
 * What-if: above the climb-limited mass the takeoff is sized at that mass, as the study sizes its rows
 * (core/takeoff/climbCap.ts); the panel says so with the offload, and a mass no lighter mass can rescue
 * is a reason, never a length.
 */
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/index.js';
import { whatIf } from '../../core/index.js';
import { say } from '../../templates/format.js';
import demo from '../../examples/demo-study.json' with { type: 'json' };

const tern = demo.aircraft.find((a) => a.id === 'tern-rj90') as unknown as AircraftProfile;
const base = { aircraft: tern, elevation_m: 1600, temperature_c: 38, slope: 0, headwind_mps: 0, surface: 'dry' as const };

describe('whatIf climb limit (14 CFR 25.121(b) engine-out minimum, 2.4 % for twins, from memory)', () => {
  it('at MTOW on a hot, high day sizes the takeoff at the climb-limited mass and says so with the offload', () => {
    const r = whatIf({ ...base, mass_kg: tern.mtow_kg });
    expect(r.takeoff.ok).toBe(true);
    const m = r.takeoff.climbLimitedMass_kg!;
    expect(m).toBeLessThan(tern.mtow_kg);
    // The study's own sentence (climbCapNotices.capped), in the page's units.
    const note = r.takeoff.note!.map((n) => say(n, 'si')).join(' ');
    expect(note).toMatch(new RegExp(`^Climb-limited at ${tern.mtow_kg.toLocaleString('en-US')} kg: the gradient of the .* is [\\d.]+ %, below the 2\\.4 % minimum\\. The greatest mass meeting every climb minimum is ${Math.round(m).toLocaleString('en-US')} kg \\(${Math.round(tern.mtow_kg - m).toLocaleString('en-US')} kg to offload\\)`));
    expect(r.takeoff.note!.map((n) => n.code)[0]).toBe('climb.capped');
    // The number is the takeoff at that mass (or the cooler-day peak the note names), never the heavier one.
    const atCap = whatIf({ ...base, mass_kg: m });
    expect(atCap.takeoff.climbLimitedMass_kg).toBeUndefined();
    if (!r.takeoff.note!.some((n) => n.code === 'climb.peakBelowTemperature')) expect(r.takeoff.required_m).toBe(atCap.takeoff.required_m);
    else expect(r.takeoff.required_m!).toBeGreaterThan(atCap.takeoff.required_m!);
  });
  it('a what-if at the study design conditions gives the study row (same climb-cap rule, demo site)', async () => {
    const { runStudy } = await import('../../core/index.js');
    const study = runStudy(JSON.parse(JSON.stringify(demo)));
    const row = study.scenarios.flatMap((s) => s.rows).find((x) => x.aircraft === 'pipit-lt2' && x.status === 'ok' && x.climbOffload_kg !== undefined)!;
    expect(row).toBeDefined();
    const site = demo.site as { elevation_m: number; designTemperature_c?: number };
    const r = whatIf({
      aircraft: demo.aircraft.find((a) => a.id === 'pipit-lt2') as unknown as AircraftProfile,
      elevation_m: study.site.elevation_m, temperature_c: study.site.designTemperature_c, slope: study.site.designSlope,
      headwind_mps: 0, surface: 'dry', mass_kg: row.takeoffMass_kg + row.climbOffload_kg!,
    });
    expect(site.elevation_m).toBe(study.site.elevation_m);
    expect(r.takeoff.climbLimitedMass_kg).toBe(row.takeoffMass_kg);
    // The demo twin's requirement peaks at a cooler temperature: both size on that peak.
    expect(row.takeoff!.peakTemperature_c).toBeDefined();
    expect(r.takeoff.note!.map((n) => n.code)).toContain('climb.peakBelowTemperature');
    expect(r.takeoff.required_m).toBeCloseTo(row.takeoff!.required_m, 6);
  });
  it('gives a length below that mass', () => {
    const r = whatIf({ ...base, mass_kg: 33000 });
    expect(r.takeoff.ok).toBe(true);
    expect(r.required_m).toBeGreaterThan(1000);
    expect(r.required_m).toBeLessThan(5000);
  });
});
