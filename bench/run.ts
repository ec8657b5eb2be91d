/**
 * `npm run bench` — runs every bench/*.bench.ts module and prints a table;
 * `npm run bench -- --json` prints one JSON object of figures instead.
 * `npm run bench -- --only takeoff` runs the modules whose name contains "takeoff".
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';
import type { BenchFigure, BenchModule } from './harness.js';

const args = process.argv.slice(2);
const asJson = args.includes('--json');
const onlyAt = args.indexOf('--only');
const only = onlyAt >= 0 ? args[onlyAt + 1] : undefined;

const dir = fileURLToPath(new URL('.', import.meta.url));
const files = readdirSync(dir).filter((f) => f.endsWith('.bench.ts')).sort();
const figures: BenchFigure[] = [];
for (const file of files) {
  const mod = (await import(pathToFileURL(join(dir, file)).href)) as { default: BenchModule };
  if (only && !mod.default.name.includes(only)) continue;
  if (!asJson) process.stderr.write(`running ${mod.default.name}…\n`);
  figures.push(...(await mod.default.run()));
}

if (asJson) {
  const out: Record<string, number> = {};
  for (const f of figures) out[f.key] = Number(f.value.toPrecision(6));
  process.stdout.write(JSON.stringify(out) + '\n');
} else {
  const rows = figures.map((f) => {
    const met = f.target ? (f.target.op === '>=' ? f.value >= f.target.value : f.value <= f.target.value) : undefined;
    return [
      f.key,
      f.label,
      fmt(f.value),
      f.unit,
      f.target ? `${f.target.op === '>=' ? '≥' : '≤'} ${f.target.value}` : '',
      met === undefined ? '' : met ? 'met' : 'MISSED',
    ];
  });
  const head = ['key', 'figure', 'value', 'unit', 'target', ''];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (r: string[]) => r.map((c, i) => c.padEnd(widths[i]!)).join('  ').trimEnd();
  console.log(line(head));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const r of rows) console.log(line(r));
}

function fmt(v: number): string {
  if (Math.abs(v) >= 1000) return Math.round(v).toLocaleString('en-US');
  if (Math.abs(v) >= 1) return v.toFixed(2);
  return v.toPrecision(3);
}
