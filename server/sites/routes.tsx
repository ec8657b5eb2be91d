/**
 * Site routes: list, create, edit (name, elevation, design temperature, twelve monthly values),
 * delete with confirmation, station-file import (parsed in a worker thread), and the runways of a site
 * (add, edit, delete) with their centreline profile and declared distances.
 */
import { Hono, type Context } from 'hono';
import {
  InputDomainError, analyseRunwayProfile, checkRunwayDeclaredDistances, climateChart, siteDesignTemperature,
  runwayProfileChart, type DailyFileTemperatureUnit, type RunwayInput, type SiteInput,
  type Notice,
} from '../../core/index.js';
import { NotFoundError, SiteInUseError } from '../../db/errors.js';
import { createSite, deleteSite, getSite, listSites, setSiteClimate, siteInput, updateSite } from '../../db/repos/sites.js';
import { listStudies } from '../../db/repos/studies.js';
import type { Db } from '../../db/types.js';
import { ConfirmDeletePage } from '../../templates/confirm.js';
import {
  RunwayFormPage, SiteDetailPage, SiteFormPage, SitesListPage, runwayFormValues, siteFormValues,
  type DesignTemperatureView, type RunwayView,
} from '../../templates/sites/index.js';
import { formValues, type FormValues } from '../common/formFields.js';
import { readRunwayForm, readSiteForm } from './form.js';
import { CLIMATE_FILE_FORMATS, type ClimateFileFormat } from '../io/climate.js';
import { ImportError, formatProblem } from '../io/errors.js';
import type { JobRunner } from '../jobs/index.js';
import { pageOfList } from '../web/paging.js';
import type { AppEnv } from '../web/env.js';
import { page, seeOther, viewOf } from '../web/page.js';
import { formUnits, idParam, notFound } from '../web/routeHelpers.js';

export interface SiteRouteDeps {
  readonly db: Db;
  readonly jobs: JobRunner;
}

/** The design temperature as the study derives it (core `siteDesignTemperature`), for the site page. */
function designView(s: SiteInput): DesignTemperatureView {
  if (s.designTemperature_c === undefined && !(s.climate?.monthly.length)) return { source: 'none', warnings: [] };
  let d: ReturnType<typeof siteDesignTemperature>;
  try {
    d = siteDesignTemperature(s);
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    const warnings = [`The design temperature cannot be derived from the monthly values: ${e.message}`];
    return s.designTemperature_c === undefined ? { source: 'none', warnings } : { source: 'given', used_c: s.designTemperature_c, warnings };
  }
  const c = d.climate;
  return {
    source: d.source,
    used_c: d.designTemperature_c,
    ...(c ? {
      hottestMonth: c.hottestMonth, art_c: c.art_c, maxMeanMaxMonth: c.maxMeanMaxMonth, maxMeanMax_c: c.maxMeanMax_c, monthsDiffer: c.monthsDiffer,
      ...(c.olderFormula_c !== undefined ? { olderFormula_c: c.olderFormula_c } : {}),
    } : {}),
    ...(d.hottestMonthMean_c !== undefined ? { hottestMonthMean_c: d.hottestMonthMean_c } : {}),
    warnings: d.warnings,
  };
}

function runwayView(r: RunwayInput, index: number): RunwayView {
  const warnings: (string | Notice)[] = [];
  let geo: ReturnType<typeof analyseRunwayProfile> | undefined;
  try {
    const [a, b] = r.directions;
    geo = analyseRunwayProfile({ points: r.profile, ...(a && b ? { designators: { increasingChainage: a.designator, decreasingChainage: b.designator } } : {}) });
    warnings.push(...geo.warnings);
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    warnings.push(`Profile: ${e.message}`);
  }
  let declared: ReturnType<typeof checkRunwayDeclaredDistances> | undefined;
  try {
    declared = checkRunwayDeclaredDistances({ directions: r.directions });
    warnings.push(...declared.warnings);
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    warnings.push(`Declared distances: ${e.message}`);
  }
  return {
    index,
    runway: r,
    ...(geo ? { length_m: geo.length_m, effectiveGradient: geo.effectiveGradient, elevationDifference_m: geo.elevationDifference_m } : {}),
    directions: r.directions.map((d, i) => ({
      ...d,
      ...(declared?.directions[i] ? { stopway_m: declared.directions[i]!.stopway_m, clearway_m: declared.directions[i]!.clearway_m } : {}),
      ...(geo?.takeoffDirections[i] ? { slope: geo.takeoffDirections[i]!.averageSlope } : {}),
    })),
    ...(r.profile.length >= 2 ? { chart: runwayProfileChart({ runwayName: r.name, profile: r.profile, index }) } : {}),
    warnings,
  };
}

const NOTICES: Record<string, string> = {
  saved: 'Saved.',
  climate: 'Station file imported: the monthly climate was replaced.',
  runway: 'Runway saved.',
  'runway-deleted': 'Runway deleted.',
};

export function siteRoutes(deps: SiteRouteDeps): Hono<AppEnv> {
  const { db, jobs } = deps;
  const app = new Hono<AppEnv>();

  const detail = (c: Context<AppEnv>, id: number, extra: { climateValues?: FormValues; climateProblems?: string[]; status?: 200 | 422 } = {}) => {
    const rec = getSite(db, id);
    if (!rec) return notFound(c, 'site', id);
    const s = siteInput(rec);
    const design = designView(s);
    const notice = NOTICES[c.req.query('notice') ?? ''];
    return page(c, { title: s.name, status: extra.status ?? 200 }, () => (
      <SiteDetailPage
        id={id}
        site={s}
        design={design}
        {...(s.climate && s.climate.monthly.length > 0 ? { climateChart: climateChart({ siteName: s.name, monthly: s.climate.monthly, ...(design.used_c === undefined ? {} : { designTemperature_c: design.used_c }) }) } : {})}
        runways={s.runways.map(runwayView)}
        usedBy={listStudies(db).filter((x) => x.siteId === id).map((x) => ({ id: x.id, name: x.name }))}
        climateImport={{ values: extra.climateValues ?? { format: 'ghcn-daily', unit: 'c' }, problems: extra.climateProblems ?? [] }}
        {...(notice ? { notice } : {})}
      />
    ));
  };

  app.get('/', (c) => {
    const deleted = c.req.query('deleted');
    const l = pageOfList(listSites(db), c.req.query('page'));
    return page(c, { title: 'Sites', status: l.status }, () => <SitesListPage sites={l.rows} paging={l.paging} {...(deleted !== undefined ? { deleted } : {})} />);
  });

  app.get('/new', (c) => page(c, { title: 'New site' }, () => <SiteFormPage mode="new" action="/sites" values={{}} errors={{}} cancel="/sites" />));

  app.post('/', async (c) => {
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const r = readSiteForm(values, units);
    if (!r.ok) return page(c, { title: 'New site', status: 422, units }, () => <SiteFormPage mode="new" action="/sites" values={values} errors={r.errors} cancel="/sites" />);
    const id = createSite(db, { ...r.value, runways: [] });
    return seeOther(c, `/sites/${id}?notice=saved`);
  });

  app.get('/:id', (c) => {
    const id = idParam(c.req.param('id'));
    return id === undefined ? notFound(c, 'site', c.req.param('id')) : detail(c, id);
  });

  app.get('/:id/edit', (c) => {
    const id = idParam(c.req.param('id'));
    const rec = id === undefined ? undefined : getSite(db, id);
    if (!rec) return notFound(c, 'site', c.req.param('id'));
    const values = siteFormValues(rec, viewOf(c).units);
    return page(c, { title: `Edit ${rec.name}` }, () => <SiteFormPage mode="edit" action={`/sites/${rec.id}`} values={values} errors={{}} cancel={`/sites/${rec.id}`} />);
  });

  app.post('/:id', async (c) => {
    const id = idParam(c.req.param('id'));
    const rec = id === undefined ? undefined : getSite(db, id);
    if (!rec) return notFound(c, 'site', c.req.param('id'));
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const r = readSiteForm(values, units);
    if (!r.ok) return page(c, { title: `Edit ${rec.name}`, status: 422, units }, () => <SiteFormPage mode="edit" action={`/sites/${rec.id}`} values={values} errors={r.errors} cancel={`/sites/${rec.id}`} />);
    updateSite(db, rec.id, { ...r.value, runways: rec.runways });
    return seeOther(c, `/sites/${rec.id}?notice=saved`);
  });

  app.get('/:id/delete', (c) => {
    const id = idParam(c.req.param('id'));
    const rec = id === undefined ? undefined : getSite(db, id);
    if (!rec) return notFound(c, 'site', c.req.param('id'));
    const users = listStudies(db).filter((x) => x.siteId === rec.id);
    const blocked = users.length > 0 ? new SiteInUseError(rec.id, users).message : undefined;
    return page(c, { title: `Delete ${rec.name}` }, () => (
      <ConfirmDeletePage what="site" name={rec.name} action={`/sites/${rec.id}/delete`} cancel={`/sites/${rec.id}`}
        consequences={['Its climate, runways, centreline profiles and declared distances are deleted with it.']} {...(blocked ? { blocked } : {})} />
    ));
  });

  app.post('/:id/delete', async (c) => {
    const id = idParam(c.req.param('id'));
    const rec = id === undefined ? undefined : getSite(db, id);
    if (!rec) return notFound(c, 'site', c.req.param('id'));
    if (formValues(await c.req.parseBody()).confirm !== 'yes') return seeOther(c, `/sites/${rec.id}/delete`);
    try {
      deleteSite(db, rec.id);
    } catch (e) {
      if (e instanceof SiteInUseError) {
        return page(c, { title: `Delete ${rec.name}`, status: 409 }, () => <ConfirmDeletePage what="site" name={rec.name} action={`/sites/${rec.id}/delete`} cancel={`/sites/${rec.id}`} blocked={e.message} />);
      }
      throw e;
    }
    return seeOther(c, `/sites?deleted=${encodeURIComponent(rec.name)}`);
  });

  app.post('/:id/climate/import', async (c) => {
    const id = idParam(c.req.param('id'));
    if (id === undefined || !getSite(db, id)) return notFound(c, 'site', c.req.param('id'));
    const body = await c.req.parseBody();
    const values = formValues(body);
    const fail = (problems: string[]) => detail(c, id, { climateValues: values, climateProblems: problems, status: 422 });
    const file = body.file;
    if (!(file instanceof File) || file.size === 0) return fail(['choose a station file to import']);
    const format = values.format as ClimateFileFormat;
    if (!CLIMATE_FILE_FORMATS.includes(format)) return fail([`choose a file format: ${CLIMATE_FILE_FORMATS.join(', ')}`]);
    const year = (k: string): number | undefined | 'bad' => {
      const raw = (values[k] ?? '').trim();
      if (raw === '') return undefined;
      return /^\d{4}$/.test(raw) ? Number(raw) : 'bad';
    };
    const fromYear = year('fromYear');
    const toYear = year('toYear');
    if (fromYear === 'bad' || toYear === 'bad') return fail(['first and last year: four-digit years, or blank']);
    const unit = (['c', 'f', 'tenths-c'] as const).find((u) => u === values.unit) as DailyFileTemperatureUnit | undefined;
    try {
      const result = await jobs.run('climate', {
        format,
        data: new Uint8Array(await file.arrayBuffer()),
        ...(unit ? { unit } : {}),
        ...(fromYear === undefined ? {} : { fromYear }),
        ...(toYear === undefined ? {} : { toYear }),
        fileName: file.name.slice(0, 100),
      });
      setSiteClimate(db, id, result.climate);
    } catch (e) {
      if (e instanceof ImportError) return fail(e.problems.map(formatProblem));
      if (e instanceof NotFoundError) return notFound(c, 'site', id);
      throw e;
    }
    return seeOther(c, `/sites/${id}?notice=climate`);
  });

  // Runways ------------------------------------------------------------------------------------

  const runwayOf = (c: Context<AppEnv>): { rec: NonNullable<ReturnType<typeof getSite>>; n?: number } | undefined => {
    const id = idParam(c.req.param('id'));
    const rec = id === undefined ? undefined : getSite(db, id);
    if (!rec) return undefined;
    const raw = c.req.param('n');
    if (raw === undefined) return { rec };
    const n = /^\d{1,2}$/.test(raw) ? Number(raw) : -1;
    return n >= 0 && n < rec.runways.length ? { rec, n } : undefined;
  };

  app.get('/:id/runways/new', (c) => {
    const x = runwayOf(c);
    if (!x) return notFound(c, 'site', c.req.param('id'));
    return page(c, { title: 'New runway' }, () => (
      <RunwayFormPage mode="new" siteName={x.rec.name} action={`/sites/${x.rec.id}/runways`} values={{ pavement: 'paved' }} errors={{}} cancel={`/sites/${x.rec.id}`} />
    ));
  });

  app.post('/:id/runways', async (c) => {
    const x = runwayOf(c);
    if (!x) return notFound(c, 'site', c.req.param('id'));
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const r = readRunwayForm(values, units);
    if (!r.ok) {
      return page(c, { title: 'New runway', status: 422, units }, () => (
        <RunwayFormPage mode="new" siteName={x.rec.name} action={`/sites/${x.rec.id}/runways`} values={values} errors={r.errors} cancel={`/sites/${x.rec.id}`} />
      ));
    }
    if (x.rec.runways.length >= 8) {
      return page(c, { title: 'New runway', status: 422, units }, () => (
        <RunwayFormPage mode="new" siteName={x.rec.name} action={`/sites/${x.rec.id}/runways`} values={values} errors={{ name: 'a site has at most 8 runways' }} cancel={`/sites/${x.rec.id}`} />
      ));
    }
    updateSite(db, x.rec.id, { ...siteInput(x.rec), runways: [...x.rec.runways, r.value] });
    return seeOther(c, `/sites/${x.rec.id}?notice=runway`);
  });

  app.get('/:id/runways/:n/edit', (c) => {
    const x = runwayOf(c);
    if (!x || x.n === undefined) return notFound(c, 'runway', `${c.req.param('id')}/${c.req.param('n')}`);
    const rw = x.rec.runways[x.n]!;
    return page(c, { title: `Edit runway ${rw.name}` }, () => (
      <RunwayFormPage mode="edit" siteName={x.rec.name} action={`/sites/${x.rec.id}/runways/${x.n}`} values={runwayFormValues(rw, viewOf(c).units)} errors={{}} cancel={`/sites/${x.rec.id}`} />
    ));
  });

  app.post('/:id/runways/:n', async (c) => {
    const x = runwayOf(c);
    if (!x || x.n === undefined) return notFound(c, 'runway', `${c.req.param('id')}/${c.req.param('n')}`);
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const r = readRunwayForm(values, units);
    if (!r.ok) {
      return page(c, { title: 'Edit runway', status: 422, units }, () => (
        <RunwayFormPage mode="edit" siteName={x.rec.name} action={`/sites/${x.rec.id}/runways/${x.n}`} values={values} errors={r.errors} cancel={`/sites/${x.rec.id}`} />
      ));
    }
    const runways = x.rec.runways.map((rw, i) => (i === x.n ? r.value : rw));
    updateSite(db, x.rec.id, { ...siteInput(x.rec), runways });
    return seeOther(c, `/sites/${x.rec.id}?notice=runway`);
  });

  app.get('/:id/runways/:n/delete', (c) => {
    const x = runwayOf(c);
    if (!x || x.n === undefined) return notFound(c, 'runway', `${c.req.param('id')}/${c.req.param('n')}`);
    const rw = x.rec.runways[x.n]!;
    return page(c, { title: `Delete runway ${rw.name}` }, () => (
      <ConfirmDeletePage what="runway" name={rw.name} action={`/sites/${x.rec.id}/runways/${x.n}/delete`} cancel={`/sites/${x.rec.id}`}
        consequences={['Its centreline profile and declared distances go with it. Studies of this site use the runways that remain.']} />
    ));
  });

  app.post('/:id/runways/:n/delete', async (c) => {
    const x = runwayOf(c);
    if (!x || x.n === undefined) return notFound(c, 'runway', `${c.req.param('id')}/${c.req.param('n')}`);
    if (formValues(await c.req.parseBody()).confirm !== 'yes') return seeOther(c, `/sites/${x.rec.id}/runways/${x.n}/delete`);
    updateSite(db, x.rec.id, { ...siteInput(x.rec), runways: x.rec.runways.filter((_, i) => i !== x.n) });
    return seeOther(c, `/sites/${x.rec.id}?notice=runway-deleted`);
  });

  return app;
}
