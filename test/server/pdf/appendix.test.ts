/**
 * Study appendix PDF, checked through poppler (pdftotext, pdfinfo, pdfdetach, pdftoppm): the numbers
 * the reviewer reads, the structure (sections, contents, page numbers, running header, repeated table
 * headers), determinism, the climb-limited warning, the unit systems and regeneration from the
 * attached input. Expected values come from the JSON result of the same study (derived), formatted by
 * templates/format.ts, the formatter the web pages use.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../../../core/index.js';
import { climbLimitedRow } from '../../../core/report/model.js';
import { appendixModel, ATTACHMENT_NAME, studyFileText } from '../../../server/pdf/index.js';
import { canonicalJson, inputDigest, sha256Hex } from '../../../server/studies/document.js';
import { fmtLengthBoth, say } from '../../../templates/format.js';
import {
  climbLimitedDoc, clock, demoDoc, pagesText, pdfInfo, renderTo, root, runTool, studyOf, workDir,
} from './helpers.js';

const squash = (s: string): string => s.replace(/\s+/g, ' ');

describe('appendix of the demo study (SI)', () => {
  const dir = workDir();
  const study = studyOf(demoDoc());
  let file = '';
  let bytes: Buffer = Buffer.alloc(0);
  let pages: string[] = [];
  let all = '';

  beforeAll(async () => {
    ({ file, bytes } = await renderTo(dir, 'demo.pdf', study));
    pages = pagesText(file);
    all = pages.join('\n');
  });

  it('states the recommended length and critical aircraft of every scenario exactly as the JSON result gives them', () => {
    const json = JSON.parse(JSON.stringify(study.output)) as typeof study.output;
    expect(json.scenarios.length).toBeGreaterThan(1);
    for (const s of json.scenarios) {
      expect(s.criticalAircraftName).not.toBeNull();
      const length = fmtLengthBoth(s.recommendedLength_m, 'si');
      expect(length).toMatch(/^[\d,]+ m \([\d,]+ ft\)$/);
      // The comparison table and the title-page findings each have one line per scenario with both values.
      const lines = all.split('\n').filter((l) => l.includes(s.name) && l.includes(length));
      expect(lines.length, `lines naming ${s.name} with ${length}`).toBeGreaterThanOrEqual(2);
      for (const l of lines) expect(l).toContain(s.criticalAircraftName!);
      // The scenario's own results page states both as well.
      const own = pages.find((p) => p.includes(`Scenario: ${s.name}`) && p.includes('Critical aircraft') && p.includes(length));
      expect(own, `results page of ${s.name}`).toBeDefined();
      expect(own).toContain(s.criticalAircraftName!);
    }
  });

  it('has every section, in order, on the page its contents entry gives', () => {
    const model = appendixModel({ input: study.input, output: study.output, clock, version: '0.1.0-test' });
    const titles = model.sections.filter((s) => s.level === 1).map((s) => s.title);
    expect(titles).toEqual([
      'Purpose and cautions', 'Site and design conditions', 'Fleet scenarios', 'Method', 'Results per scenario',
      'Scenario comparison and recommendation', 'Existing runway assessment', 'Charts', 'Assumptions and warnings',
      'Input listing and digest',
    ]);
    const contents = pages[0]!;
    let lastPage = 1;
    for (const s of model.sections.filter((x) => x.level === 1 || x.id.startsWith('results-') || x.id.startsWith('existing-'))) {
      const title = s.title.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
      const m = new RegExp(`^\\s*${s.number.replace('.', '\\.')}\\s+${title}[ .]*?(\\d+)\\s*$`, 'm').exec(contents);
      expect(m, `contents entry ${s.number} ${s.title}`).not.toBeNull();
      const page = Number(m![1]);
      expect(page).toBeGreaterThanOrEqual(lastPage);
      lastPage = page;
      expect(squash(pages[page - 1]!), `heading ${s.number} on page ${page}`).toContain(`${s.number} ${s.title}`);
    }
  });

  it('numbers every page "Page n of N", with N the page count pdfinfo reports, and runs the header from page 2', () => {
    const n = Number(pdfInfo(file).Pages);
    expect(n).toBe(pages.length);
    expect(n).toBeGreaterThanOrEqual(12);
    expect(n).toBeLessThanOrEqual(60);
    pages.forEach((p, i) => {
      expect(p).toContain(`Page ${i + 1} of ${n}`);
      expect(p).toContain('Preliminary planning estimate; not for flight planning or dispatch.');
      if (i > 0) expect(p).toContain(`Runway length study appendix: ${study.output.name}`);
    });
  });

  it('repeats the header row of a table that continues on the next page', () => {
    const continued = pages.map((p, i) => ({ p, i })).filter(({ p }) => p.includes('(continued)') && !p.includes('Contents (continued)'));
    expect(continued.length).toBeGreaterThan(0);
    const components = continued.filter(({ p }) => p.includes('Components of each requirement') && p.includes('(continued)'));
    expect(components.length).toBeGreaterThan(0);
    for (const { p } of components) {
      // The header row: "Item" then the aircraft names of that table.
      const header = p.split('\n').find((l) => /^\s*Item\s{2,}/.test(l));
      expect(header, 'header row on the continuation page').toBeDefined();
    }
  });

  it('carries the caution, the method sources and the warnings of the computation', () => {
    expect(squash(all)).toContain(squash(CAUTION_TEXT));
    for (const ref of ['U.S. Standard Atmosphere, 1976', '14 CFR Part 25', 'Annex 14', 'Torenbeek']) expect(squash(all)).toContain(ref);
    const warnings = study.output.warnings;
    expect(warnings.length).toBeGreaterThan(0);
    expect(squash(all)).toContain(squash(say(warnings[0]!, study.output.options.units).replace(/−/g, '-')));
  });

  it('prints the input digest and attaches the exact input, which regenerates the same numbers', () => {
    const digest = study.output.inputDigest;
    // The digest is over the canonical input without the display units (docs/report.md).
    const { units: _units, ...options } = study.input.options;
    expect(digest).toBe(sha256Hex(canonicalJson({ ...study.input, options })));
    expect(all).toContain(digest);
    runTool('pdfdetach', ['-saveall', '-o', dir, file]);
    const attached = join(dir, ATTACHMENT_NAME);
    expect(existsSync(attached)).toBe(true);
    const text = readFileSync(attached, 'utf8');
    expect(text).toBe(studyFileText(study.input));
    const again = studyOf(JSON.parse(text));
    expect(inputDigest(again.input)).toBe(digest);
    expect(again.output.scenarios.map((s) => [s.criticalAircraft, s.recommendedLength_m]))
      .toEqual(study.output.scenarios.map((s) => [s.criticalAircraft, s.recommendedLength_m]));
  });

  it('is the same bytes for the same study and date, and differs only by the date for another date', async () => {
    const second = await renderTo(dir, 'demo-again.pdf', study);
    expect(second.bytes.equals(bytes)).toBe(true);
    const later = await renderTo(dir, 'demo-later.pdf', study, { clock: () => new Date('2027-03-15T12:00:00Z') });
    expect(later.bytes.equals(bytes)).toBe(false);
    const a = pages.join('\f').replaceAll('2026-12-02', 'DATE');
    const b = pagesText(later.file).join('\f').replaceAll('2027-03-15', 'DATE');
    expect(b).toBe(a);
    expect(pdfInfo(file).CreationDate).toMatch(/Dec\s+2 09:30:00 2026/);
  });

  it('renders to images (pdftoppm) with ink on the page', () => {
    runTool('pdftoppm', ['-r', '40', '-png', '-f', '1', '-l', '1', file, join(dir, 'page')]);
    const png = ['page-01.png', 'page-1.png', 'page-001.png'].map((f) => join(dir, f)).find(existsSync);
    expect(png).toBeDefined();
    expect(statSync(png!).size).toBeGreaterThan(5000);
  });
});

describe('appendix in US customary units', () => {
  it('shows lengths in feet with metres in parentheses for the recommendation, and lists inputs in US units', async () => {
    const dir = workDir();
    const study = studyOf(demoDoc());
    const { file } = await renderTo(dir, 'us.pdf', study, { units: 'us' });
    const all = pagesText(file).join('\n');
    for (const s of study.output.scenarios) {
      const length = fmtLengthBoth(s.recommendedLength_m, 'us');
      expect(length).toMatch(/^[\d,]+ ft \([\d,]+ m\)$/);
      expect(all).toContain(length);
    }
    expect(all).toMatch(/Aerodrome elevation\s+4416\.01 ft/); // 1346 m / 0.3048 (derived)
    expect(all).toContain('US customary (ft, lb, °F)');
  });
});

describe('appendix of a study with a climb-limited aircraft', () => {
  it('shows the climb-limited finding in the results and in the warnings', async () => {
    const dir = workDir();
    const study = studyOf(climbLimitedDoc());
    // Precondition: the jet is climb-limited (sized below its route mass, with the study's warning).
    const limited = study.output.scenarios.flatMap((s) => s.rows.filter(climbLimitedRow));
    expect(limited.map((r) => r.aircraft)).toEqual(['tern-rj90']);
    const warning = limited[0]!.warnings.map((w) => say(w, study.output.options.units)).find((w) => /climb-limited/i.test(w));
    expect(warning).toBeDefined();
    const { file } = await renderTo(dir, 'climb.pdf', study);
    const pages = pagesText(file);
    const all = squash(pages.join('\n'));
    expect(all).toContain('CLIMB-LIMITED: Tern RJ-90 in "Hot and high jet"');
    expect(all).toContain('a longer runway cannot cure');
    expect(all).toContain(squash(warning!)); // the computation's own warning, word for word
    const warningsPage = pages.findIndex((p, i) => i > 0 && /9\s+Assumptions and warnings/.test(p));
    expect(warningsPage).toBeGreaterThan(0);
    expect(squash(pages.slice(warningsPage).join('\n'))).toContain('CLIMB-LIMITED: Tern RJ-90');
    // The results table marks the governing case.
    expect(all).toMatch(/Tern RJ-90 .*climb-limited/);
  });
});

describe('appendix of a result and an input that do not belong together', () => {
  it('is refused, since its digest and attachment would not match its numbers', async () => {
    const study = studyOf(demoDoc());
    const other = studyOf(climbLimitedDoc());
    await expect(renderTo(workDir(), 'mixed.pdf', { input: other.input, output: study.output })).rejects.toThrow(/computed from another input/);
  });
});

describe('appendix from the command line', () => {
  it('npm run study -- <file> --format pdf --out <pdf> writes the appendix (exit 0)', () => {
    const dir = workDir();
    const out = join(dir, 'cli.pdf');
    const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli.ts', 'examples/demo-study.json', '--format', 'pdf', '--out', out], {
      cwd: root, encoding: 'utf8', timeout: 60000,
    });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const study = studyOf(demoDoc());
    const all = pagesText(out).join('\n');
    for (const s of study.output.scenarios) {
      expect(all).toContain(fmtLengthBoth(s.recommendedLength_m, 'si'));
      expect(all).toContain(s.criticalAircraftName!);
    }
    expect(all).toContain(study.output.inputDigest);
  });
});
