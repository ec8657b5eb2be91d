/**
 * The job pool: studies and station files computed in worker threads give the same results and the
 * same typed errors as inline; while a long computation runs, other requests are still answered.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { getAircraft, openDatabase, seedDemoIfEmpty } from '../../../db/index.js';
import { commitCatalogue } from '../../../server/aircraft/catalogue.js';
import { aircraftToCsv } from '../../../server/io/csv.js';
import { ImportError } from '../../../server/io/errors.js';
import { inlineJobs, workerJobs } from '../../../server/jobs/index.js';
import { demoInput, makeApp } from './helpers.js';

const pool = workerJobs({ size: 1 });
afterAll(() => pool.close());

describe('worker-thread job pool', () => {
  it('computes the demo study exactly as inline does', async () => {
    const input = demoInput();
    const [a, b] = await Promise.all([pool.run('study', input), inlineJobs().run('study', input)]);
    expect(a).toEqual(b);
  });

  it('carries an ImportError across the thread boundary with its problems', async () => {
    const err = await pool.run('climate', { format: 'monthly-normals', data: 'not,a,normals,file\n' }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ImportError);
    expect((err as ImportError).problems.length).toBeGreaterThan(0);
  });

  it('parses a catalogue in the worker (no database there) and the main thread commits the rows; a bad file is refused', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'runwright-jobs-'));
    const dbFile = join(dir, 'cat.sqlite');
    const { db, sqlite } = openDatabase(dbFile);
    try {
      seedDemoIfEmpty(db, demoInput());
      const jet = { ...demoInput().aircraft.find((a) => a.id === 'swift-bj8')!, id: 'swift-w', name: 'Swift W' };
      const csv = aircraftToCsv([jet]);
      const bad = await pool.run('catalogue', { format: 'csv', data: new TextEncoder().encode(csv.replace(`,${jet.mtow_kg},`, ',12,')) }).catch((e: unknown) => e);
      expect(bad).toBeInstanceOf(ImportError);
      const parsed = await pool.run('catalogue', { format: 'csv', data: new TextEncoder().encode(csv) });
      // What came back is plain validated rows: the worker wrote nothing.
      expect(parsed.rows.count).toBe(1);
      expect(getAircraft(db, 'swift-w')).toBeUndefined();
      expect(commitCatalogue(db, parsed).created).toEqual(['swift-w']);
      expect(getAircraft(db, 'swift-w')).toEqual(jet);
    } finally {
      sqlite.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('answers other requests while a large study computes', async () => {
    const { app } = makeApp({ jobs: pool });
    const base = demoInput();
    const big = { ...base, scenarios: Array.from({ length: 40 }, (_, i) => ({ ...base.scenarios[i % base.scenarios.length]!, name: `Scenario ${i}` })) };
    const order: string[] = [];
    const job = pool.run('study', big).then(() => order.push('study'));
    const health = Promise.resolve(app.request('/health')).then((r) => { order.push(`health ${r.status}`); });
    await Promise.all([job, health]);
    expect(order).toEqual(['health 200', 'study']);
  });
});

describe('typed errors across the thread boundary (issue 14 regression)', () => {
  it('ConvergenceError and InputDomainError (with its range) survive serialise → rebuild', async () => {
    const { ConvergenceError, InputDomainError } = await import('../../../core/index.js');
    const { rebuildError, serialiseError } = await import('../../../server/jobs/tasks.js');
    const c = rebuildError(serialiseError(new ConvergenceError('greatest takeoff mass', 80, 0.4)));
    expect(c).toBeInstanceOf(ConvergenceError);
    expect(c.message).toBe('greatest takeoff mass did not converge after 80 iterations (residual 0.4)');
    const d = rebuildError(serialiseError(new InputDomainError('mass_kg', 9, '≥ 10 kg', { min: 10, unit: 'kg' })));
    expect(d).toBeInstanceOf(InputDomainError);
    expect((d as InstanceType<typeof InputDomainError>).range).toEqual({ min: 10, unit: 'kg' });
  });

  it('a study whose computation fails to converge in a worker answers 422 with the solver\'s message, page and API', async () => {
    const { ConvergenceError } = await import('../../../core/index.js');
    const { rebuildError, serialiseError } = await import('../../../server/jobs/tasks.js');
    // The worker's path: the task throws, the worker posts serialiseError(e), the pool rejects with rebuildError.
    const failing = {
      mode: 'workers' as const,
      close: async () => {},
      run: async () => { throw rebuildError(serialiseError(new ConvergenceError('balanced V1', 60, 0.02))); },
    };
    const { app, studyId } = makeApp({ jobs: failing as never });
    const api = await app.request(`/api/studies/${studyId}/run`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' });
    expect(api.status).toBe(422);
    expect(((await api.json()) as { message: string }).message).toContain('balanced V1 did not converge after 60 iterations');
    const { browser } = await import('./helpers.js');
    const c = await browser(app);
    const pageRes = await c.post(`/studies/${studyId}/run`, {});
    expect(pageRes.status).toBe(422);
    expect(pageRes.text).toContain('A calculation did not converge: balanced V1 did not converge');
  });
});
