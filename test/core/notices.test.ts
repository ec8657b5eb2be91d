/**
 * Structured warnings (core/notices.ts): one emission site per code, quantities rendered in the
 * reader's units, and the JSON form that files carry. Conventions of the project (no external source);
 * the unit factors behind the US figures are those of core/units.ts (NIST SP 811: 1 lb = 0.45359237 kg,
 * 1 ft = 0.3048 m), checked in test/core/units.test.ts.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { analyseLanding } from '../../core/landing.js';
import {
  notice, noticeCodes, noticeJson, noticeText, plainFormat, qty, scoped, siText, uniqueNotices, type Notice,
} from '../../core/notices.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };

const root = resolve(import.meta.dirname, '..', '..');

function sourceFiles(dir: string): string[] {
  return readdirSync(join(root, dir)).flatMap((name) => {
    const p = join(dir, name);
    return statSync(join(root, p)).isDirectory() ? sourceFiles(p) : /\.tsx?$/.test(name) ? [p] : [];
  });
}

describe('notice codes', () => {
  const sites = [...sourceFiles('core'), ...sourceFiles('server')].filter((f) => !f.endsWith('notices.ts')).flatMap((f) =>
    [...readFileSync(join(root, f), 'utf8').matchAll(/\bnotice\('([^']+)'\)/g)].map((m) => ({ code: m[1]!, file: f })));

  it('core writes its warnings as notices (a scan that finds them)', () => {
    expect(sites.length).toBeGreaterThan(50);
  });

  it('each code is written at exactly one place (core, or the server for its own figures), so a code names one sentence', () => {
    const byCode = new Map<string, string[]>();
    for (const s of sites) byCode.set(s.code, [...(byCode.get(s.code) ?? []), s.file]);
    expect([...byCode].filter(([, files]) => files.length > 1)).toEqual([]);
  });

  it('codes are "area.what" in lower camel case', () => {
    expect(sites.filter((s) => !/^[a-z][A-Za-z]*\.[a-z][A-Za-z0-9]*$/.test(s.code)).map((s) => s.code)).toEqual([]);
  });
});

describe('rendering in the reader\'s units', () => {
  const fleet = demoStudy.aircraft as unknown as AircraftProfile[];
  const jet = fleet.find((a) => a.certification === 'transport')!;

  it('an overweight landing says kilograms on an SI page and pounds on a US page, from one notice', () => {
    const mass = Math.round((jet.mlw_kg + jet.mtow_kg) / 2);
    const r = analyseLanding({ aircraft: jet, mass_kg: mass, pressureAltitude_m: 0, slope: 0, headwind_mps: 0, surface: 'dry' });
    const w = r.warnings.find((n) => n.code === 'landing.overweight');
    expect(w, 'the landing above MLW carries the overweight notice').toBeDefined();
    const si = noticeText(w!, plainFormat('si'));
    const us = noticeText(w!, plainFormat('us'));
    // Masses show to the kilogram or pound (core/units.ts display table).
    const kg = Math.round(mass);
    const lb = Math.round(mass / 0.45359237);
    expect(si).toContain(`${kg.toLocaleString('en-US')} kg`);
    expect(us).toContain(`${lb.toLocaleString('en-US')} lb`);
    expect(us).not.toMatch(/\bkg\b/);
  });

  it('lengths, temperatures and temperature differences convert by kind (°F differences without the 32 offset)', () => {
    const n = notice('test.kinds')`${qty.length(1000)} at ${qty.temperature(30)}, ${qty.temperatureDelta(10)} above ISA`;
    expect(noticeText(n, plainFormat('si'))).toBe('1,000 m at 30.0 °C, 10.0 K above ISA');
    expect(noticeText(n, plainFormat('us'))).toBe('3,281 ft at 86.0 °F, 18.0 °F above ISA');
  });

  it('a value that is not finite is shown as a dash, never NaN or Infinity', () => {
    const n = notice('test.nan')`${qty.length(Number.NaN)} / ${Number.POSITIVE_INFINITY}`;
    expect(siText(n)).toBe('— / —');
  });

  it('nested notices and lists render inside the sentence; scoped() keeps code and values', () => {
    const a = notice('test.a')`${qty.length(100)}`;
    const b = notice('test.b')`b`;
    const outer = scoped('Runway 09', notice('test.outer')`because ${[a, b]}.`);
    expect(siText(outer)).toBe('Runway 09: because 100 m; b.');
    expect(outer.code).toBe('test.outer');
    expect(noticeCodes([outer])).toEqual(['test.outer', 'test.a', 'test.b']);
  });

  it('uniqueNotices drops repeats of the same code and values only', () => {
    const x = notice('test.x')`${qty.mass(1)}`;
    const y = notice('test.x')`${qty.mass(2)}`;
    expect(uniqueNotices([x, { ...x }, y])).toEqual([x, y]);
  });
});

describe('notices in JSON', () => {
  it('each notice carries its code, its sentence in the file\'s units as message, and its SI parts', () => {
    const n: Notice = notice('test.json')`Landing mass ${qty.mass(20000)} exceeds MLW.`;
    const body = { warnings: [n], nested: { reason: notice('test.outer')`because ${[n]}` } };
    const parsed = JSON.parse(noticeJson(body, 'us')) as { warnings: Record<string, unknown>[]; nested: { reason: { message: string; args: Record<string, unknown>[][] } } };
    expect(parsed.warnings[0]).toEqual({
      code: 'test.json',
      message: 'Landing mass 44,092 lb exceeds MLW.',
      text: ['Landing mass ', ' exceeds MLW.'],
      args: [{ kind: 'mass', si: 20000 }],
    });
    expect(parsed.nested.reason.message).toBe('because Landing mass 44,092 lb exceeds MLW.');
    expect(parsed.nested.reason.args[0]![0]!.message).toBe('Landing mass 44,092 lb exceeds MLW.');
    // The value itself is left as it was: no message stays behind on the notices.
    expect(Object.keys(n)).toEqual(['code', 'text', 'args']);
    expect(JSON.stringify(body)).not.toContain('message');
  });
});
