/**
 * Web benchmark (issue: web app), on loopback with autocannon, the app in this process on 127.0.0.1
 * port 0 over a temporary database file seeded with the invented demo (the demo study computed once):
 * - results_page_rps: requests per second of the demo study's results page (the whole page), 20
 *   connections for about 5 s. Target ≥ 500.
 * - whatif_p99_ms: 99th-percentile latency of the study what-if panel requests (htmx fragment; the
 *   temperature varies from request to request, so every answer is a fresh computation), 4 connections
 *   for about 3 s. Target ≤ 50 ms.
 * The load generator runs in a worker thread (autocannon `workers: 1`) so that it does not share the
 * server's event loop; both still share the machine's cores.
 */
import { serve, type ServerType } from '@hono/node-server';
import autocannon from 'autocannon';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openDatabase, seedDemoIfEmpty } from '../db/index.js';
import { createApp } from '../server/app.js';
import { inlineJobs } from '../server/jobs/index.js';
import { parseAll } from '../server/common/schema.js';
import { studyFileSchema, studyInputOf } from '../server/studies/index.js';
import type { BenchModule } from './harness.js';

const DEMO = new URL('../examples/demo-study.json', import.meta.url);

const mod: BenchModule = {
  name: 'web',
  async run() {
    const dir = mkdtempSync(join(tmpdir(), 'runwright-web-bench-'));
    const { db, sqlite } = openDatabase(join(dir, 'bench.sqlite'));
    let server: ServerType | undefined;
    try {
      const demo = parseAll(studyFileSchema, JSON.parse(readFileSync(DEMO, 'utf8')));
      if (!demo.ok) throw new Error('demo study invalid');
      const seeded = seedDemoIfEmpty(db, studyInputOf(demo.value));
      if (!seeded.seeded) throw new Error('expected a fresh database');
      const app = createApp({ db, clock: () => new Date(), jobs: inlineJobs() });
      // Compute the demo once, as a browser would (CSRF cookie and token).
      const first = await app.request('/');
      const token = /rw_csrf=([^;]+)/.exec(first.headers.get('set-cookie') ?? '')?.[1];
      if (!token) throw new Error('no CSRF cookie');
      const run = await app.request(`/studies/${seeded.studyId}/run`, {
        method: 'POST', headers: { cookie: `rw_csrf=${token}`, 'content-type': 'application/x-www-form-urlencoded', host: 'localhost' }, body: `_csrf=${token}`,
      });
      if (run.status !== 303) throw new Error(`computing the demo answered ${run.status}`);
      server = await new Promise<ServerType>((resolve) => {
        const s = serve({ fetch: app.fetch, port: 0, hostname: '127.0.0.1' }, () => resolve(s));
      });
      const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
      const headers = { cookie: `rw_csrf=${token}` };

      const results = `${base}/studies/${seeded.studyId}/results`;
      const check = await fetch(results, { headers });
      if (check.status !== 200 || !(await check.text()).includes('data-testid="recommended-0"')) throw new Error('results page not ready');
      await autocannon({ url: results, connections: 20, duration: 1, workers: 1, headers }); // warm-up
      const page = await autocannon({ url: results, connections: 20, duration: 5, workers: 1, headers });
      if (page.errors > 0 || page.non2xx > 0) throw new Error(`results page: ${page.errors} errors, ${page.non2xx} non-2xx`);

      const whatif = (t: number) => `/studies/${seeded.studyId}/whatif?units=si&aircraft=tern-rj90&prev=tern-rj90&temperature=${t}&elevation=1346&mass=34000&slope=0.29&wind=0&surface=dry`;
      const requests = Array.from({ length: 31 }, (_, i) => ({ method: 'GET', path: whatif(5 + i), headers: { ...headers, 'hx-request': 'true' } }));
      await autocannon({ url: base, connections: 4, duration: 1, workers: 1, requests }); // warm-up
      const w = await autocannon({ url: base, connections: 4, duration: 3, workers: 1, requests });
      if (w.errors > 0 || w.non2xx > 0) throw new Error(`what-if: ${w.errors} errors, ${w.non2xx} non-2xx`);

      return [
        { key: 'results_page_rps', label: `Results page of the demo study, 20 connections, 5 s (${Math.round(page.throughput.average / 1024)} KiB/s)`, value: page.requests.average, unit: 'req/s', target: { op: '>=', value: 500 } },
        { key: 'whatif_p99_ms', label: `What-if panel requests, 4 connections, 3 s (p50 ${w.latency.p50} ms, ${Math.round(w.requests.average)} req/s)`, value: w.latency.p99, unit: 'ms', target: { op: '<=', value: 50 } },
      ];
    } finally {
      await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
      sqlite.close();
      rmSync(dir, { recursive: true, force: true });
    }
  },
};

export default mod;
