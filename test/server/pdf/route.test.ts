/**
 * GET /studies/:id/appendix.pdf through the app (in-memory database with the demo seeded): the PDF the
 * results page links to states, for every scenario, the same critical aircraft and recommended length
 * as the results page itself (read from its data-testid elements).
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type DatabaseHandle } from '../../../db/index.js';
import { seedDemoIfEmpty } from '../../../db/seed.js';
import { createApp } from '../../../server/app.js';
import { inlineJobs } from '../../../server/jobs/index.js';
import { StudyService } from '../../../server/studies/state.js';
import { clock, demoDoc, pagesText, workDir } from './helpers.js';

let h: DatabaseHandle;
let studyId = 0;

beforeAll(async () => {
  h = openDatabase(':memory:');
  const seeded = seedDemoIfEmpty(h.db, demoDoc());
  if (!seeded.seeded) throw new Error('demo not seeded');
  studyId = seeded.studyId;
});

afterAll(() => h.sqlite.close());

const testId = (html: string, id: string): string | undefined =>
  new RegExp(`data-testid="${id}"[^>]*>([^<]*)<`).exec(html)?.[1];

describe('appendix download', () => {
  it('sends the results page to be computed first when there is no saved result', async () => {
    const app = createApp({ db: h.db, clock });
    const res = await app.request(`/studies/${studyId}/appendix.pdf`);
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`/studies/${studyId}/results`);
  });

  it('answers 404 for a study that does not exist', async () => {
    const app = createApp({ db: h.db, clock });
    expect((await app.request('/studies/999999/appendix.pdf')).status).toBe(404);
  });

  it('serves the PDF with the recommendation the results page shows, the same bytes each time', async () => {
    const service = new StudyService(h.db, inlineJobs(), clock);
    await service.compute(service.state(studyId));
    const app = createApp({ db: h.db, clock });
    const html = await (await app.request(`/studies/${studyId}/results`)).text();
    const res = await app.request(`/studies/${studyId}/appendix.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(/attachment; filename=".*-appendix-2026-12-02\.pdf"/);
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const file = join(workDir(), 'route.pdf');
    writeFileSync(file, bytes);
    const text = pagesText(file).join('\n');
    const scenarios = demoDoc().scenarios as { name: string }[];
    for (let i = 0; i < scenarios.length; i++) {
      const critical = testId(html, `critical-${i}`);
      const recommended = testId(html, `recommended-${i}`);
      expect(critical, `critical-${i} on the results page`).toBeTruthy();
      expect(recommended, `recommended-${i} on the results page`).toMatch(/^[\d,]+ m \([\d,]+ ft\)$/);
      const line = text.split('\n').find((l) => l.includes(scenarios[i]!.name) && l.includes(recommended!));
      expect(line, `PDF line for ${scenarios[i]!.name}`).toBeDefined();
      expect(line).toContain(critical!);
    }
    const again = Buffer.from(await (await createApp({ db: h.db, clock }).request(`/studies/${studyId}/appendix.pdf`)).arrayBuffer());
    expect(again.equals(bytes)).toBe(true);
  });
});
