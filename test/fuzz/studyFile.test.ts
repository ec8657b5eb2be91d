/**
 * Bounded fuzz run of study files (issue 12, "Tests"), in process: the examples with one to three
 * members replaced by a random value (raw tokens such as 1e999 included) or removed, read by the
 * study parser and by the command line. The parser answers ok or a problems list and never throws;
 * an ok study either runs (every number of the output finite, so nothing becomes null in the JSON)
 * or is refused by the engine with an InputDomainError (the CLI's exit code 2); the CLI exits 0 or 2,
 * never 1, and prints no NaN/Infinity/undefined that the file did not bring. Checks: harness.ts.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputDomainError } from '../../core/index.js';
import { runCli } from '../../server/cli.js';
import { parseStudyDocument, studyOutput } from '../../server/studies/document.js';
import { FUZZ_TIMEOUT_MS, Tally, applyJsonEdits, assertClean, jsonEchoes, jsonEdits, fuzzParams, nonFinitePath, short } from './harness.js';

const DEMO = JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8')) as unknown;
const MINIMAL = JSON.parse(readFileSync(new URL('../../examples/minimal-study.json', import.meta.url), 'utf8')) as unknown;

/** Parses, and runs the engine when `compute`: returns what happened, failing on a throw or a non-finite number. */
function parseAndRun(text: string, echoed: readonly string[], where: string, compute: boolean): 'problems' | 'ok' | 'engine-refused' | 'parsed' {
  const parsed = parseStudyDocument(JSON.parse(text));
  if (!parsed.ok) {
    expect(parsed.problems.length, `${short(where)}: not ok but no problem listed`).toBeGreaterThan(0);
    for (const p of parsed.problems) {
      expect(typeof p.path === 'string' && typeof p.message === 'string' && p.message !== '', `${short(where)}: malformed problem ${JSON.stringify(p)}`).toBe(true);
    }
    assertClean(JSON.stringify(parsed.problems.map((p) => ({ path: p.path, field: p.field, message: p.message }))), echoed, where);
    return 'problems';
  }
  const bad = nonFinitePath(parsed.input);
  if (bad) expect.fail(`${short(where)}: accepted input holds a non-finite number at ${bad}`);
  if (!compute) return 'parsed';
  let out: ReturnType<typeof studyOutput>;
  try {
    out = studyOutput(parsed.input);
  } catch (e) {
    if (e instanceof InputDomainError) {
      assertClean(e.message, echoed, where);
      return 'engine-refused';
    }
    throw new Error(`${short(where)}: the engine threw ${(e as Error).stack ?? String(e)}`);
  }
  const nf = nonFinitePath(out);
  if (nf) expect.fail(`${short(where)}: output holds a non-finite number at ${nf}`);
  assertClean(JSON.stringify(out), echoed, where);
  return 'ok';
}

describe('fuzz: study files through the parser and the engine', () => {
  it('mutated demo and minimal study files: ok or a problems list, never a throw; results all finite', async () => {
    const tally = new Map<string, number>();
    let demoRuns = 0;
    fc.assert(fc.property(fc.boolean(), jsonEdits, (demo, edits) => {
      const { text, tokens, described } = applyJsonEdits(demo ? DEMO : MINIMAL, edits);
      // Every minimal study runs (3 ms); the demo (about 100 ms) runs for the first few accepted files.
      const compute = !demo || demoRuns < 6;
      const r = parseAndRun(text, jsonEchoes(tokens), `${demo ? 'demo' : 'minimal'} study with ${described}`, compute);
      if (demo && r !== 'problems' && r !== 'parsed') demoRuns++;
      tally.set(r, (tally.get(r) ?? 0) + 1);
    }), fuzzParams(300));
    console.info(`study files: ${[...tally].map(([k, v]) => `${k}: ${v}`).join(', ')}`);
    expect(tally.get('problems') ?? 0).toBeGreaterThan(0);
    expect(tally.get('ok') ?? 0).toBeGreaterThan(0);
  }, FUZZ_TIMEOUT_MS);

  it('mutated study files through the command line: exit 0 or 2, never 1 or a throw; clean output', async () => {
    const tally = new Tally();
    await fc.assert(fc.asyncProperty(jsonEdits, fc.constantFrom('json', 'csv'), fc.constantFrom<('si' | 'us')[]>('si', 'us'), async (edits, format, units) => {
      const { text, tokens, described } = applyJsonEdits(MINIMAL, edits);
      const where = `study --format ${format} --units ${units}: minimal study with ${described}`;
      let out = '';
      let err = '';
      let code: number;
      try {
        code = await runCli(['study.json', '--format', format, '--units', units], {
          readFile: () => text, writeFile: () => {}, stdout: (t) => { out += typeof t === 'string' ? t : Buffer.from(t).toString('utf8'); }, stderr: (t) => { err += t; },
        });
      } catch (e) {
        expect.fail(`${short(where)}: the CLI threw (exit 1): ${(e as Error).stack ?? String(e)}`);
      }
      tally.add(code === 0 ? 200 : 422);
      expect(code, `${short(where)}: exit ${code}; stderr ${err.slice(0, 800)}`).toSatisfy((c: number) => c === 0 || c === 2);
      if (code === 2) expect(err, `${short(where)}: exit 2 without a message`).not.toBe('');
      const echoed = jsonEchoes(tokens);
      assertClean(out, echoed, where);
      assertClean(err, echoed, where);
      // JSON text cannot hold NaN (it would print as null): the in-process test above walks the numbers.
      if (code === 0 && format === 'json') expect(() => JSON.parse(out), short(where)).not.toThrow();
    }), fuzzParams(200));
    console.info(`study CLI: ${tally}`);
    tally.expectMix('study CLI');
  }, FUZZ_TIMEOUT_MS);

  it('deeply nested study files through the command line: exit 2 with a message, never 1', async () => {
    await fc.assert(fc.asyncProperty(fc.integer({ min: 1, max: 6000 }), fc.constantFrom('array', 'object'), async (depth, kind) => {
      const deep = kind === 'array' ? `${'['.repeat(depth)}1${']'.repeat(depth)}` : `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;
      const text = JSON.stringify(MINIMAL).replace('"Minimal one-aircraft study"', deep);
      let err = '';
      let code: number;
      try {
        code = await runCli(['study.json'], { readFile: () => text, writeFile: () => {}, stdout: () => {}, stderr: (t) => { err += t; } });
      } catch (e) {
        expect.fail(`name nested ${kind} × ${depth}: the CLI threw (exit 1): ${(e as Error).message}`);
      }
      expect(code, `name nested ${kind} × ${depth}: ${err.slice(0, 300)}`).toBe(2);
    }), fuzzParams(25));
  }, FUZZ_TIMEOUT_MS);
});
