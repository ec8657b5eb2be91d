/**
 * The PDF appendix download: GET /studies/:id/appendix.pdf.
 *
 * Renders the appendix of the study's current saved result (server/pdf) in the study's units (or
 * `?units=si|us`), dated by the injected clock. Without a saved result matching the current input the
 * request goes to the results page, which offers to compute it. Rendered PDFs are kept for the same
 * saved result, units and date, since the same inputs give the same bytes.
 *
 * The drawing runs in the job pool (the 'pdf' task, server/jobs/pdfTask.ts): a large study's appendix
 * takes seconds of synchronous work that would otherwise freeze every other request. Concurrent
 * requests for the same appendix share one rendering; a failed rendering is not kept.
 */
import { Hono } from 'hono';
import { getStudy } from '../../db/repos/studies.js';
import type { Db } from '../../db/types.js';
import type { JobRunner } from '../jobs/index.js';
import { appendixFileName, issueDate, runwrightVersion } from '../pdf/index.js';
import type { StudyService } from './state.js';
import type { AppEnv } from '../web/env.js';
import { Lru } from '../web/lru.js';
import { seeOther, viewOf } from '../web/page.js';
import { download, idParam, notFound } from '../web/routeHelpers.js';

export interface ReportRouteDeps {
  readonly db: Db;
  readonly clock: () => Date;
  readonly jobs: JobRunner;
  /** Study state and the cached saved results (current input, digest, latest result). */
  readonly service: StudyService;
}

export function reportRoutes(deps: ReportRouteDeps): Hono<AppEnv> {
  const app = new Hono<AppEnv>();
  const cache = new Lru<string, Promise<Uint8Array>>(8);
  app.get('/:id/appendix.pdf', async (c) => {
    const id = idParam(c.req.param('id'));
    const study = id === undefined ? undefined : getStudy(deps.db, id);
    if (!study) return notFound(c, 'study', c.req.param('id'));
    const state = deps.service.state(study.id);
    const latest = state.ready ? deps.service.latest(state) : undefined;
    if (!latest || !latest.current) return seeOther(c, `/studies/${study.id}/results`);
    const { output, input, saved } = latest.loaded;
    const units = viewOf(c, study.options.units).units;
    const now = deps.clock();
    const key = `${saved.id}:${units}:${issueDate(now)}`;
    let pdf = cache.get(key);
    if (pdf === undefined) {
      const rendering = deps.jobs.run('pdf', { input, output, issuedAt: now.getTime(), version: runwrightVersion(), units });
      pdf = rendering;
      cache.set(key, rendering);
      rendering.catch(() => { if (cache.get(key) === rendering) cache.delete(key); });
    }
    return download(c, await pdf, 'application/pdf', appendixFileName(study.name, now));
  });
  return app;
}
