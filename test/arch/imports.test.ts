/**
 * Dependency direction (DEVELOPERS.md, "Architecture"): core imports nothing outside core (and no
 * node: or package imports); templates never import db or server; db never imports server or
 * templates; nothing imports server except server itself, tests and bench; a feature folder (aircraft/,
 * sites/, studies/, whatif/ in server and templates) is imported from outside only through its index.ts;
 * core/index.ts lists core's public names one by one, and the application uses each of them.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve, dirname, sep } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = resolve(import.meta.dirname, '..', '..');

function files(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(join(root, dir))) {
    const p = join(dir, name);
    if (statSync(join(root, p)).isDirectory()) out.push(...files(p));
    else if (/\.(ts|tsx)$/.test(name)) out.push(p);
  }
  return out;
}

const IMPORT_RE = /(?:import|export)\s[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)|^\s*import\s*['"]([^'"]+)['"]/gm;

function specifiers(file: string): string[] {
  const src = readFileSync(join(root, file), 'utf8');
  return [...src.matchAll(IMPORT_RE)].map((m) => m[1] ?? m[2] ?? m[3]!).filter(Boolean);
}

/** Top-level folder a relative import lands in (and the path inside the repository), or the package name for bare imports. */
function target(file: string, spec: string): { folder?: string; pkg?: string; path?: string } {
  if (!spec.startsWith('.')) return { pkg: spec };
  const abs = resolve(root, dirname(file), spec);
  const path = relative(root, abs).split(sep).join('/');
  return { folder: path.split('/')[0], path };
}

function violations(folder: string, rule: (t: { folder?: string; pkg?: string; path?: string }, file: string) => string | undefined): string[] {
  const out: string[] = [];
  for (const f of files(folder)) {
    for (const s of specifiers(f)) {
      const why = rule(target(f, s), f.split(sep).join('/'));
      if (why) out.push(`${f}: imports '${s}' (${why})`);
    }
  }
  return out;
}

const CORE_ALLOWED_PACKAGES = new Set(['csv-parse/sync', 'ml-levenberg-marquardt']);

/** The application's folders: they see core only through its public face, core/index.ts. */
const APP_FOLDERS = ['server', 'templates', 'db', 'scripts'];

/** Names in an import or export list ("a, type B, c as d" → a, B, c). */
function names(list: string): string[] {
  return list.split(',').map((n) => n.trim().replace(/^type\s+/, '').split(/\s+as\s+/)[0]!.trim()).filter(Boolean);
}

describe('dependency direction (DEVELOPERS.md)', () => {
  it('core imports only core (plus the CSV parser for climate files and the least-squares solver)', () => {
    expect(
      violations('core', (t) =>
        t.pkg !== undefined
          ? CORE_ALLOWED_PACKAGES.has(t.pkg) ? undefined : 'core stays pure: no packages or node: modules'
          : t.folder !== 'core' ? 'core imports nothing outside core' : undefined,
      ),
    ).toEqual([]);
  });

  for (const folder of ['db', 'templates']) {
    it(`${folder} does not import server${folder === 'templates' ? ' or db' : ' or templates'}`, () => {
      const banned = folder === 'templates' ? ['server', 'db'] : ['server', 'templates'];
      expect(violations(folder, (t) => (t.folder && banned.includes(t.folder) ? `${folder} must not import ${t.folder}` : undefined))).toEqual([]);
    });
  }

  it('server, templates, db and scripts import core only through core/index.ts (tests and benchmarks may reach the internals)', () => {
    const v = APP_FOLDERS.flatMap((folder) =>
      violations(folder, (t) => (t.folder === 'core' && t.path !== 'core/index.js' ? 'import core through core/index.ts' : undefined)));
    expect(v).toEqual([]);
  });

  it('core/index.ts is the public face of core: it names its exports one by one, and each is used by server, templates, db or scripts', () => {
    const index = readFileSync(join(root, 'core/index.ts'), 'utf8');
    expect(index).not.toMatch(/export \*/);
    const exported = [...index.matchAll(/export\s*\{([^}]*)\}/g)].flatMap((m) => names(m[1]!));
    expect(exported.length).toBeGreaterThan(50);
    const used = new Set(APP_FOLDERS.flatMap((folder) => files(folder)).flatMap((f) => {
      const src = readFileSync(join(root, f), 'utf8');
      return [...src.matchAll(/import\s+(?:type\s+)?\{([^}]*)\}\s+from\s+['"]([^'"]*core\/index\.js)['"]/g)].flatMap((m) => names(m[1]!))
        .concat([...src.matchAll(/import\('[^']*core\/index\.js'\)\.(\w+)/g)].map((m) => m[1]!));
    }));
    expect(exported.filter((n) => !used.has(n)), 'exported from core/index.ts but used by none of server, templates, db, scripts: make it internal').toEqual([]);
  });

  it('inside core, only the study engine and the report model import core/study (the models stand below it)', () => {
    expect(violations('core', (t, file) =>
      t.path?.startsWith('core/study/') && !/^core\/(study|report)\//.test(file) && file !== 'core/index.ts'
        ? 'a model must not import the study engine above it' : undefined)).toEqual([]);
  });

  it('units are converted only through core/units.ts: the server\'s forms, schemas and exports do not import templates/format.ts, which holds no conversion table', () => {
    const v = violations('server', (t, file) =>
      (/\/(form|schema|resultsCsv)\.ts$|^server\/common\//.test(file) && t.path === 'templates/format.js' ? 'convert units through core/units.ts, not templates' : undefined));
    expect(v).toEqual([]);
    const fmt = readFileSync(join(root, 'templates/format.ts'), 'utf8');
    expect(fmt).not.toMatch(/\bfrom:\s*\(|\bto:\s*\(|lin\(/);
    expect(readFileSync(join(root, 'core/units.ts'), 'utf8')).toMatch(/export function unitOf/);
  });

  it('a feature folder (server/ or templates/ aircraft, sites, studies, whatif) is imported from outside only through its index.ts', () => {
    const feature = (path: string): string | undefined => /^(server|templates)\/(aircraft|sites|studies|whatif)\//.exec(path)?.[0];
    const v = ['server', 'templates', 'db', 'bench', 'scripts'].flatMap((folder) =>
      violations(folder, (t, file) => {
        const f = t.path ? feature(t.path) : undefined;
        return f && !file.startsWith(f) && t.path !== `${f}index.js` ? `import ${f} through ${f}index.ts` : undefined;
      }));
    expect(v).toEqual([]);
  });

  it('the rule checker finds a forbidden import when one exists', () => {
    // A check that can fail: this very test file imports node:fs, which the core rule rejects.
    const v = violations('test/arch', (t) => (t.pkg?.startsWith('node:') ? 'node module' : undefined));
    expect(v.length).toBeGreaterThan(0);
  });
});
