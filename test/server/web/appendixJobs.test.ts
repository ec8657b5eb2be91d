/**
 * The appendix PDF is drawn in the job pool (issue 12, finding 2): the route gives the same bytes
 * through worker threads as inline (fixed clock), the event loop answers other requests while it
 * draws, and a drawing that runs past the pool's time limit gets a clear 503 page instead of hanging.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { workerJobs, inlineJobs, JobTimeoutError } from '../../../server/jobs/index.js';
import { StudyService } from '../../../server/studies/state.js';
import { FIXED_TIME, makeApp } from './helpers.js';

const pool = workerJobs({ size: 1 });
afterAll(() => pool.close());

async function appWithResult(jobs = inlineJobs()) {
  const t = makeApp({ jobs });
  const service = new StudyService(t.db, inlineJobs(), () => FIXED_TIME);
  await service.compute(service.state(t.studyId));
  return t;
}

describe('appendix PDF in the job pool', () => {
  it('gives the same PDF bytes through a worker thread as inline, and answers /health meanwhile', async () => {
    const inline = await appWithResult();
    const viaWorker = await appWithResult(pool);
    const a = await inline.app.request(`/studies/${inline.studyId}/appendix.pdf`);
    const order: string[] = [];
    const pdf = Promise.resolve(viaWorker.app.request(`/studies/${viaWorker.studyId}/appendix.pdf`)).then((r) => { order.push('pdf'); return r; });
    const health = Promise.resolve(viaWorker.app.request('/health')).then((r) => { order.push(`health ${r.status}`); });
    const [b] = await Promise.all([pdf, health]);
    expect(order).toEqual(['health 200', 'pdf']);
    expect(a.status).toBe(200);
    expect(b.status).toBe(200);
    expect(b.headers.get('content-type')).toBe('application/pdf');
    const ab = Buffer.from(await a.arrayBuffer());
    const bb = Buffer.from(await b.arrayBuffer());
    expect(bb.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(bb.length).toBeGreaterThan(10_000);
    expect(bb.equals(ab)).toBe(true);
    // A second request is served from the cache (same bytes, no second rendering needed).
    const again = Buffer.from(await (await viaWorker.app.request(`/studies/${viaWorker.studyId}/appendix.pdf`)).arrayBuffer());
    expect(again.equals(bb)).toBe(true);
    inline.sqlite.close();
    viaWorker.sqlite.close();
  });

  it('the pdf task itself returns a Uint8Array owning its buffer (transferable)', async () => {
    const t = await appWithResult();
    const service = new StudyService(t.db, inlineJobs(), () => FIXED_TIME);
    const latest = service.latest(service.state(t.studyId))!;
    const bytes = await pool.run('pdf', { input: latest.loaded.input, output: latest.loaded.output, issuedAt: FIXED_TIME.getTime(), version: '0.0.0-test', units: 'si' });
    expect(bytes).toBeInstanceOf(Uint8Array);
    expect(bytes.byteOffset).toBe(0);
    expect(bytes.byteLength).toBe(bytes.buffer.byteLength);
    expect(Buffer.from(bytes.subarray(0, 5)).toString('latin1')).toBe('%PDF-');
    t.sqlite.close();
  });

  it('a rendering past the time limit answers 503 with a clear message, and the next request renders again', async () => {
    const slow = workerJobs({ size: 1, timeoutMs: 1 });
    try {
      const t = await appWithResult(slow);
      const r = await t.app.request(`/studies/${t.studyId}/appendix.pdf`);
      expect(r.status).toBe(503);
      const html = await r.text();
      expect(html).toContain('Try again later');
      expect(html).toContain('Drawing the appendix PDF took longer than 0.001 s and was stopped; nothing was changed.');
      // The failed rendering is not cached: the pool is asked again (and times out again).
      const err = await slow.run('pdf', { input: {} as never, output: {} as never, issuedAt: 0, version: 'x', units: 'si' }).catch((e: unknown) => e);
      expect(err).toBeInstanceOf(JobTimeoutError);
      expect((await t.app.request(`/studies/${t.studyId}/appendix.pdf`)).status).toBe(503);
      t.sqlite.close();
    } finally {
      await slow.close();
    }
  });
});
