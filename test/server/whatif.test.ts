/** What-if: a climb-limited mass shows the limit, never a runway length (no runway cures it). */
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/index.js';
import { whatIf } from '../../server/whatif.js';
import demo from '../../examples/demo-study.json' with { type: 'json' };

const tern = demo.aircraft.find((a) => a.id === 'tern-rj90') as unknown as AircraftProfile;
const base = { aircraft: tern, elevation_m: 1600, temperature_c: 38, slope: 0, headwind_mps: 0, surface: 'dry' as const };

describe('whatIf climb limit (14 CFR 25.121(b) engine-out minimum, 2.4 % for twins, from memory)', () => {
  it('refuses a length at MTOW on a hot, high day and names the greatest mass', () => {
    const r = whatIf({ ...base, mass_kg: tern.mtow_kg });
    expect(r.takeoff.ok).toBe(false);
    expect(r.takeoff.reason).toMatch(/Climb-limited: .* the greatest mass meeting it is \d+ kg\. A longer runway does not cure this\./);
    expect(r.required_m).toBeUndefined();
  });
  it('gives a length below that mass', () => {
    const r = whatIf({ ...base, mass_kg: 33000 });
    expect(r.takeoff.ok).toBe(true);
    expect(r.required_m).toBeGreaterThan(1000);
    expect(r.required_m).toBeLessThan(5000);
  });
});
