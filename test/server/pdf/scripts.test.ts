/**
 * Names in any script print as written in the appendix PDF (server/pdf/fonts.ts embeds Arimo, DejaVu,
 * Noto Sans SC and Noto Sans KR): a study, site, scenario and aircraft names in Polish, Czech, Greek,
 * Cyrillic, Chinese, Japanese and Korean come back from pdftotext exactly, with no "?" and no U+FFFD;
 * a script outside the fonts comes back as a visible U+FFFD. The fonts are embedded as subsets, the
 * same study and date still give the same bytes, and a long CJK name wraps inside its column.
 * Checked with poppler's pdftotext, pdffonts and pdftoppm (real PDFs, common practice).
 */
import { describe, expect, it } from 'vitest';
import { pagesText, renderTo, runTool, demoDoc, studyOf, workDir } from './helpers.js';

/** One name per script (invented names). */
const NAMES = {
  polish: 'Łódź Żółć',
  czech: 'Čáslav',
  greek: 'Ελληνικά',
  cyrillic: 'Кириллица',
  chinese: '机场跑道',
  japanese: '滑走路',
  korean: '활주로',
} as const;

const LONG_CJK = '机场跑道扩建研究第二阶段远期规划方案比较与推荐跑道长度';

/** The demo study with names in every script: aircraft, scenarios, study and site. */
function scriptsDoc(): any {
  const doc = demoDoc();
  const names = Object.values(NAMES);
  doc.name = `${NAMES.polish} ${NAMES.chinese} study`;
  doc.site.name = `${NAMES.czech} ${NAMES.japanese} ${NAMES.korean} airfield`;
  doc.aircraft.forEach((a: { name: string }, i: number) => {
    a.name = `${names[i % names.length]} ${a.name.split(' ').at(-1)}`;
  });
  doc.scenarios[0].name = `${NAMES.greek} ${NAMES.cyrillic} base`;
  doc.scenarios[1].name = LONG_CJK;
  doc.scenarios[2].name = `${NAMES.korean} 신규 제트 2031`;
  return doc;
}

describe('appendix PDF with names in many scripts', () => {
  const dir = workDir();
  const study = studyOf(scriptsDoc());
  const rendered = renderTo(dir, 'scripts.pdf', study);

  it('prints every name exactly as written (pdftotext), with no "?" or U+FFFD', async () => {
    const { file } = await rendered;
    const pages = pagesText(file);
    const all = pages.join('\n');
    for (const [script, name] of Object.entries(NAMES)) expect(all, script).toContain(name);
    // Aircraft names as the results tables show them (bold), and the study and site on the title page.
    for (const a of study.input.aircraft) expect(all, a.name).toContain(a.name);
    expect(pages[0]).toContain(`${NAMES.polish} ${NAMES.chinese} study`);
    expect(pages[0]).toContain(`${NAMES.czech} ${NAMES.japanese} ${NAMES.korean} airfield`);
    expect(pages[1]).toContain(`${NAMES.polish} ${NAMES.chinese} study`); // running header
    expect(all).toContain('신규 제트 2031');
    expect(all).not.toContain('\ufffd');
    for (const line of all.split('\n')) {
      if (Object.values(NAMES).some((n) => line.includes(n))) expect(line).not.toContain('?');
    }
  });

  it('embeds the fonts as subsets: Arimo for Latin, Greek and Cyrillic, Noto Sans SC and KR for CJK', async () => {
    const { file, bytes } = await rendered;
    const rows = runTool('pdffonts', [file]).split('\n').slice(2).filter((l) => l.trim() !== '');
    const fonts = rows.map((l) => l.split(/\s+/)[0]!.replace(/^[A-Z]{6}\+/, ''));
    expect(fonts).toEqual(expect.arrayContaining(['Arimo-Regular', 'Arimo-Bold', 'NotoSansSC-Regular', 'NotoSansSC-Bold', 'NotoSansKR-Regular', 'DejaVuSansMono']));
    // No standard (unembedded) font: every row says embedded, subset, with a ToUnicode map.
    for (const r of rows) expect(r, r).toMatch(/\byes\s+yes\s+yes\b/);
    // Subsets keep the file small (the CJK fonts alone are over 10 MB each).
    expect(bytes.length).toBeLessThan(2_000_000);
  });

  it('is the same bytes for the same study and date', async () => {
    const { bytes } = await rendered;
    const again = await renderTo(dir, 'scripts-again.pdf', studyOf(scriptsDoc()));
    expect(again.bytes.equals(bytes)).toBe(true);
  });

  it('wraps a long CJK scenario name inside the page and its table column', async () => {
    const { file } = await rendered;
    const xml = runTool('pdftotext', ['-bbox', file, '-']);
    const words = [...xml.matchAll(/<word xMin="([\d.]+)" yMin="[\d.]+" xMax="([\d.]+)"[^>]*>([^<]*)<\/word>/g)];
    expect(words.length).toBeGreaterThan(1000);
    // A4 is 595.28 pt wide with 50 pt margins; allow half a point for rounding.
    const outside = words.filter((w) => Number(w[1]) < 49.5 || Number(w[2]) > 545.8).map((w) => Buffer.from(w[3]!, 'latin1').toString('utf8'));
    expect(outside).toEqual([]);
    // The name is drawn whole somewhere once pdftotext joins the lines of a heading or a cell.
    const joined = pagesText(file).join('\n').replace(/\s+/g, '');
    expect(joined).toContain(LONG_CJK);
  });

  it('draws a script outside the fonts as a visible U+FFFD, keeping the rest of the name', async () => {
    const doc = scriptsDoc();
    doc.scenarios[0].name = 'Pune पुणे base';
    const { file } = await renderTo(dir, 'replacement.pdf', studyOf(doc));
    const all = pagesText(file).join('\n');
    expect(all).toContain('Pune \ufffd\ufffd\ufffd\ufffd base');
    expect(all).not.toContain('Pune ? base');
  });
});
