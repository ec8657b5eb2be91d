/**
 * Study routes: list, create, edit (name, site, options), delete with confirmation; scenarios and their
 * fleet rows (form and CSV); the results page (computed in the job pool and saved), its downloads and
 * the components of each row on demand; and the study what-if panel.
 */
import { Hono, type Context } from 'hono';
import {
  InputDomainError, noticeJson, siteConditions, type AircraftProfile, type StudyInput, type UnitSystem,
} from '../../core/index.js';
import { aircraftByIds, aircraftChoices, aircraftNames, countAircraft } from '../../db/repos/aircraft.js';
import { getSite, listSites } from '../../db/repos/sites.js';
import {
  addScenario, createStudy, deleteScenario, deleteStudy, getScenario, getStudy, listStudies, updateScenario, updateStudy,
} from '../../db/repos/studies.js';
import type { Db } from '../../db/types.js';
import { ConfirmDeletePage } from '../../templates/confirm.js';
import { ProblemPage } from '../../templates/errors.js';
import { ComputePanel, ResultsContent, RowComponents } from '../../templates/studies/index.js';
import {
  ScenarioFormPage, StudiesListPage, StudyFormPage, StudyOverviewPage,
} from '../../templates/studies/index.js';
import { ViewContext } from '../../templates/view.js';
import { WhatIfPanel, WhatIfResult } from '../../templates/whatif/index.js';
import { resultsCsv } from './resultsCsv.js';
import { formValues, type FormValues } from '../common/formFields.js';
import { FLEET_SELECT_MAX, FLEET_SUGGESTIONS, pageOfList } from '../web/paging.js';
import { newStudyValues, readScenarioForm, readStudyForm, scenarioFormValues, studyFormValues } from './form.js';
import type { WhatIfConditions } from '../whatif/index.js';
import { whatIfPanel, type WhatIfPanelState } from '../whatif/index.js';
import { exportFleetCsv, importFleetCsv } from '../io/csv.js';
import { ImportError, formatProblem } from '../io/errors.js';
import type { JobRunner } from '../jobs/index.js';
import { StudyService, type LoadedResult } from './state.js';
import type { AppEnv } from '../web/env.js';
import { Lru } from '../web/lru.js';
import { fragment, isHtmx, page, pageWithContent, seeOther, viewOf } from '../web/page.js';
import { download, formUnits, idParam, notFound } from '../web/routeHelpers.js';

export interface StudyRouteDeps {
  readonly db: Db;
  readonly jobs: JobRunner;
  readonly clock: () => Date;
  /** Shared with the API so both see one cache and one set of running computations. */
  readonly service?: StudyService;
}

const DEFAULT_BLANK_ROWS = 3;

// ------------------------------------------------------------------------------------------- what-if

type StudyWhatIf = WhatIfPanelState;

function designMass(a: AircraftProfile, latest: LoadedResult | undefined): number {
  let m: number | undefined;
  for (const s of latest?.output.scenarios ?? []) for (const r of s.rows) if (r.aircraft === a.id && r.status === 'ok') m = Math.max(m ?? 0, r.takeoffMass_kg);
  return m ?? a.mtow_kg;
}

function studyWhatIf(studyId: number, input: StudyInput, latest: LoadedResult | undefined, query: FormValues, units: UnitSystem): StudyWhatIf | undefined {
  if (input.aircraft.length === 0) return undefined;
  let site;
  try {
    site = latest?.output.site ?? siteConditions(input);
  } catch (e) {
    if (e instanceof InputDomainError) return undefined;
    throw e;
  }
  const critical = latest?.output.scenarios.map((s) => s.criticalAircraft).find((x): x is string => x !== null);
  const chosen = input.aircraft.find((a) => a.id === query.aircraft) ?? input.aircraft.find((a) => a.id === critical) ?? input.aircraft[0]!;
  const exact: WhatIfConditions = {
    elevation_m: site.elevation_m,
    temperature_c: site.designTemperature_c,
    mass_kg: Math.min(chosen.mtow_kg, Math.max(chosen.oew_kg, designMass(chosen, latest))),
    slope: Math.max(-0.03, Math.min(0.03, site.designSlope)),
    headwind_mps: 0,
    surface: input.options.surface,
  };
  return whatIfPanel({
    action: `/studies/${studyId}/whatif`, aircraft: chosen, start: exact,
    choices: input.aircraft.map((a) => ({ value: a.id, label: a.name })),
    baselineLabel: 'the design conditions',
    intro: `Start from the site's design conditions and the aircraft's design takeoff mass; change any value (physics model, landing at MLW, ${input.options.landingTemperature === 'isa' ? 'ISA' : 'design temperature'} for the landing).`,
    options: { landingTemperature: input.options.landingTemperature, ...(input.options.operatingRules ? { operatingRules: input.options.operatingRules } : {}) },
  }, query, units);
}

// ------------------------------------------------------------------------------------------- routes

export function studyRoutes(deps: StudyRouteDeps): Hono<AppEnv> {
  const { db } = deps;
  const service = deps.service ?? new StudyService(db, deps.jobs, deps.clock);
  const app = new Hono<AppEnv>();
  /** Rendered results content by saved-result id, units and whether it is current (no per-user data inside). */
  const rendered = new Lru<string, Uint8Array>(64);
  /** Results CSV and JSON downloads of saved results, by kind, saved-result id and units. */
  const files = new Lru<string, Uint8Array>(8);

  const studyOr404 = (c: Context<AppEnv>) => {
    const id = idParam(c.req.param('id'));
    const s = id === undefined ? undefined : getStudy(db, id);
    return s;
  };

  app.get('/', (c) => {
    const deleted = c.req.query('deleted');
    const l = pageOfList(listStudies(db), c.req.query('page'));
    return page(c, { title: 'Studies', status: l.status }, () => <StudiesListPage studies={l.rows} paging={l.paging} {...(deleted !== undefined ? { deleted } : {})} />);
  });

  app.get('/new', (c) => {
    const sites = listSites(db);
    const siteQ = idParam(c.req.query('site'));
    return page(c, { title: 'New study' }, () => (
      <StudyFormPage mode="new" action="/studies" values={newStudyValues(viewOf(c).units, siteQ ?? (sites.length === 1 ? sites[0]!.id : undefined))} errors={{}} sites={sites} cancel="/studies" />
    ));
  });

  app.post('/', async (c) => {
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const sites = listSites(db);
    const r = readStudyForm(values, units, sites.map((s) => s.id));
    if (!r.ok) return page(c, { title: 'New study', status: 422, units }, () => <StudyFormPage mode="new" action="/studies" values={values} errors={r.errors} sites={sites} cancel="/studies" />);
    const id = createStudy(db, { ...r.value, scenarios: [] });
    return seeOther(c, `/studies/${id}?notice=created`);
  });

  app.get('/:id', (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(s.id);
    const latest = state.ready ? service.latest(state) : undefined;
    const units = viewOf(c, s.options.units).units;
    const names = aircraftNames(db, s.scenarios.flatMap((x) => x.fleet.map((r) => r.aircraft)));
    const site = getSite(db, s.siteId);
    const w = studyWhatIf(s.id, state.input, latest?.loaded, {}, units);
    const notice = ({ created: 'Study created: add scenarios with their fleet rows.', saved: 'Saved.', 'scenario-deleted': 'Scenario deleted.' } as Record<string, string>)[c.req.query('notice') ?? ''];
    return page(c, { title: s.name, units: s.options.units }, () => (
      <StudyOverviewPage
        id={s.id} name={s.name} site={{ id: s.siteId, name: site?.name ?? `site ${s.siteId}` }} options={s.options}
        scenarios={s.scenarios.map((x) => ({ id: x.id, name: x.name, fleet: x.fleet.map((r) => ({ ...r, aircraftName: names.get(r.aircraft) ?? r.aircraft })) }))}
        status={state.status.state} {...(state.status.state !== 'never-saved' ? { savedAt: state.status.saved.createdAt } : {})}
        problems={state.problems} {...(w ? { whatif: w.props } : {})} {...(notice ? { notice } : {})}
      />
    ));
  });

  app.get('/:id/edit', (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    const units = viewOf(c, s.options.units).units;
    return page(c, { title: `Edit ${s.name}`, units: s.options.units }, () => (
      <StudyFormPage mode="edit" action={`/studies/${s.id}`} values={studyFormValues(s, units)} errors={{}} sites={listSites(db)} cancel={`/studies/${s.id}`} />
    ));
  });

  app.post('/:id', async (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values, s.options.units);
    const sites = listSites(db);
    const r = readStudyForm(values, units, sites.map((x) => x.id));
    if (!r.ok) return page(c, { title: `Edit ${s.name}`, status: 422, units }, () => <StudyFormPage mode="edit" action={`/studies/${s.id}`} values={values} errors={r.errors} sites={sites} cancel={`/studies/${s.id}`} />);
    updateStudy(db, s.id, r.value);
    return seeOther(c, `/studies/${s.id}?notice=saved`);
  });

  app.get('/:id/delete', (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    return page(c, { title: `Delete ${s.name}` }, () => (
      <ConfirmDeletePage what="study" name={s.name} action={`/studies/${s.id}/delete`} cancel={`/studies/${s.id}`}
        consequences={[`Its ${s.scenarios.length} scenario(s), their fleet rows and every saved result go with it.`, 'The site and the aircraft stay.']} />
    ));
  });

  app.post('/:id/delete', async (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    if (formValues(await c.req.parseBody()).confirm !== 'yes') return seeOther(c, `/studies/${s.id}/delete`);
    deleteStudy(db, s.id);
    return seeOther(c, `/studies?deleted=${encodeURIComponent(s.name)}`);
  });

  // Scenarios ----------------------------------------------------------------------------------

  const scenarioOf = (c: Context<AppEnv>) => {
    const s = studyOr404(c);
    const sid = idParam(c.req.param('sid'));
    const sc = s && sid !== undefined ? getScenario(db, sid) : undefined;
    return s && sc && sc.studyId === s.id ? { study: s, scenario: sc } : undefined;
  };

  /**
   * The aircraft a fleet row offers: the whole catalogue as a select while it is small, else a
   * bounded list of suggestions for a text field (a large catalogue never renders into every row).
   */
  const catalogueChoices = (values: FormValues, rows: number) => {
    if (countAircraft(db) <= FLEET_SELECT_MAX) return { aircraft: aircraftChoices(db, undefined, FLEET_SELECT_MAX), complete: true };
    const typed = Array.from({ length: rows }, (_, i) => (values[`r${i}_aircraft`] ?? '').trim()).filter((x) => x !== '');
    return { aircraft: aircraftChoices(db, undefined, FLEET_SUGGESTIONS), complete: false, names: aircraftNames(db, typed) };
  };

  app.post('/:id/scenarios', async (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    const values = formValues(await c.req.parseBody());
    const name = (values.name ?? '').trim() || `Scenario ${s.scenarios.length + 1}`;
    if (name.length > 120) return page(c, { title: 'Scenario', status: 422 }, () => <ProblemPage title="Not added" message="A scenario name has at most 120 characters." back={`/studies/${s.id}`} />);
    if (s.scenarios.length >= 50) return page(c, { title: 'Scenario', status: 422 }, () => <ProblemPage title="Not added" message="A study has at most 50 scenarios." back={`/studies/${s.id}`} />);
    const sid = addScenario(db, s.id, { name, fleet: [] });
    return seeOther(c, `/studies/${s.id}/scenarios/${sid}`);
  });

  const scenarioPage = (c: Context<AppEnv>, x: NonNullable<ReturnType<typeof scenarioOf>>, values: FormValues, errors: Record<string, string>, rows: number, status: 200 | 422 = 200, importProblems?: string[]) =>
    page(c, { title: `Scenario ${x.scenario.name}`, status, units: x.study.options.units }, () => (
      <ScenarioFormPage studyId={x.study.id} studyName={x.study.name} scenarioId={x.scenario.id} values={values} errors={errors} rows={rows}
        {...catalogueChoices(values, rows)} {...(importProblems ? { importProblems } : {})} />
    ));

  app.get('/:id/scenarios/:sid', (c) => {
    const x = scenarioOf(c);
    if (!x) return notFound(c, 'scenario', c.req.param('sid'));
    const units = viewOf(c, x.study.options.units).units;
    const more = Math.min(200, Math.max(0, Number(c.req.query('add') ?? 0) || 0));
    const rows = Math.min(200, x.scenario.fleet.length + DEFAULT_BLANK_ROWS + more);
    return scenarioPage(c, x, scenarioFormValues(x.scenario, units), {}, rows);
  });

  app.post('/:id/scenarios/:sid', async (c) => {
    const x = scenarioOf(c);
    if (!x) return notFound(c, 'scenario', c.req.param('sid'));
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values, x.study.options.units);
    const rows = Math.min(200, Math.max(1, Number(values.rows) || 1));
    const catalogue = aircraftByIds(db, Array.from({ length: rows }, (_, i) => (values[`r${i}_aircraft`] ?? '').trim()).filter((x) => x !== ''));
    const r = readScenarioForm(values, units, rows, catalogue);
    if (!r.ok) return scenarioPage(c, x, values, r.errors, rows, 422);
    updateScenario(db, x.scenario.id, r.value);
    if (values.more === 'yes') return seeOther(c, `/studies/${x.study.id}/scenarios/${x.scenario.id}?add=5`);
    return seeOther(c, `/studies/${x.study.id}?notice=saved`);
  });

  app.get('/:id/scenarios/:sid/delete', (c) => {
    const x = scenarioOf(c);
    if (!x) return notFound(c, 'scenario', c.req.param('sid'));
    return page(c, { title: `Delete ${x.scenario.name}` }, () => (
      <ConfirmDeletePage what="scenario" name={x.scenario.name} action={`/studies/${x.study.id}/scenarios/${x.scenario.id}/delete`} cancel={`/studies/${x.study.id}`}
        consequences={[`Its ${x.scenario.fleet.length} fleet row(s) go with it.`]} />
    ));
  });

  app.post('/:id/scenarios/:sid/delete', async (c) => {
    const x = scenarioOf(c);
    if (!x) return notFound(c, 'scenario', c.req.param('sid'));
    if (formValues(await c.req.parseBody()).confirm !== 'yes') return seeOther(c, `/studies/${x.study.id}/scenarios/${x.scenario.id}/delete`);
    deleteScenario(db, x.scenario.id);
    return seeOther(c, `/studies/${x.study.id}?notice=scenario-deleted`);
  });

  app.get('/:id/scenarios/:sid/fleet.csv', (c) => {
    const x = scenarioOf(c);
    if (!x) return notFound(c, 'scenario', c.req.param('sid'));
    return download(c, exportFleetCsv(db, x.scenario.id), 'text/csv; charset=utf-8', `fleet-${x.scenario.name}.csv`);
  });

  app.post('/:id/scenarios/:sid/fleet/import', async (c) => {
    const x = scenarioOf(c);
    if (!x) return notFound(c, 'scenario', c.req.param('sid'));
    const body = await c.req.parseBody();
    const file = body.file;
    const units = viewOf(c, x.study.options.units).units;
    const again = (problems: string[]) => scenarioPage(c, x, scenarioFormValues(x.scenario, units), {}, x.scenario.fleet.length + DEFAULT_BLANK_ROWS, 422, problems);
    if (!(file instanceof File) || file.size === 0) return again(['choose a CSV file to import']);
    try {
      importFleetCsv(db, x.scenario.id, new Uint8Array(await file.arrayBuffer()));
    } catch (e) {
      if (e instanceof ImportError) return again(e.problems.map(formatProblem));
      throw e;
    }
    return seeOther(c, `/studies/${x.study.id}/scenarios/${x.scenario.id}`);
  });

  // Results ------------------------------------------------------------------------------------

  app.get('/:id/results', (c) => {
    const id = idParam(c.req.param('id'));
    if (id === undefined || !service.exists(id)) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(id);
    const s = { id, name: state.input.name, options: state.input.options };
    const latest = state.ready ? service.latest(state) : undefined;
    if (!latest || !latest.current) {
      const stale = state.status.state === 'never-saved' ? 'never-saved' : 'changed';
      return page(c, { title: `Results: ${s.name}`, units: s.options.units }, () => (
        <ComputePanel studyId={s.id} name={s.name} state={stale} methodChanged={state.status.state === 'changed' && state.status.methodChanged === true} problems={state.problems} auto={state.problems.length === 0 && c.req.query('auto') !== 'no'} />
      ));
    }
    const view = viewOf(c, s.options.units);
    const key = `${latest.loaded.saved.id}:${view.units}`;
    let content = rendered.get(key);
    if (content === undefined) {
      // Content and the what-if panel at design conditions depend only on the saved result and the
      // units; neither carries a per-user token, so the rendered bytes are shared.
      const l = latest.loaded;
      const w = studyWhatIf(s.id, state.input, l, {}, view.units);
      const html = (
        <ViewContext.Provider value={view}>
          <ResultsContent result={l.output} charts={l.charts} meta={{ studyId: s.id, createdAt: l.saved.createdAt, inputDigest: l.saved.inputDigest, methodVersion: l.saved.methodVersion, current: true }} />
          {w ? <WhatIfPanel {...w.props} /> : null}
        </ViewContext.Provider>
      ).toString();
      content = Buffer.from(html, 'utf8');
      rendered.set(key, content);
    }
    return pageWithContent(c, { title: `Results: ${s.name}`, units: s.options.units }, content);
  });

  app.post('/:id/run', async (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(s.id);
    if (state.problems.length > 0) {
      return page(c, { title: `Results: ${s.name}`, status: 422, units: s.options.units }, () => (
        <ComputePanel studyId={s.id} name={s.name} state="changed" problems={state.problems} auto={false} />
      ));
    }
    await service.compute(state);
    return seeOther(c, `/studies/${s.id}/results`);
  });

  /**
   * The saved result of the study's current inputs, as the page and the appendix use it. A result
   * saved for other inputs is never served as a download: `latest` is then undefined, and the caller
   * sends the user to the results page, which recomputes.
   */
  const currentResult = (c: Context<AppEnv>) => {
    const s = studyOr404(c);
    if (!s) return undefined;
    const state = service.state(s.id);
    const latest = state.ready ? service.latest(state) : undefined;
    return { study: s, latest: latest?.current ? latest : undefined };
  };

  app.get('/:id/results.csv', (c) => {
    const x = currentResult(c);
    if (!x) return notFound(c, 'study', c.req.param('id'));
    if (!x.latest) return seeOther(c, `/studies/${x.study.id}/results`);
    const units = viewOf(c, x.study.options.units).units;
    // A saved result never changes: its files are built once (a large study's take tens of ms).
    const key = `csv:${x.latest.loaded.saved.id}:${units}`;
    let bytes = files.get(key);
    if (bytes === undefined) files.set(key, (bytes = Buffer.from(resultsCsv(x.latest.loaded.output, units), 'utf8')));
    return download(c, bytes, 'text/csv; charset=utf-8', `${x.study.name}-results.csv`);
  });

  app.get('/:id/results.json', (c) => {
    const x = currentResult(c);
    if (!x) return notFound(c, 'study', c.req.param('id'));
    if (!x.latest) return seeOther(c, `/studies/${x.study.id}/results`);
    // Values stay SI; each notice's `message` is in the reader's units, as on the page.
    const units = viewOf(c, x.study.options.units).units;
    const key = `json:${x.latest.loaded.saved.id}:${units}`;
    let bytes = files.get(key);
    if (bytes === undefined) files.set(key, (bytes = Buffer.from(`${noticeJson(x.latest.loaded.output, units, 2)}\n`, 'utf8')));
    return download(c, bytes, 'application/json; charset=utf-8', `${x.study.name}-results.json`);
  });

  app.get('/:id/results/rows/:s/:r', (c) => {
    const x = currentResult(c);
    if (!x) return notFound(c, 'study', c.req.param('id'));
    if (!x.latest) return seeOther(c, `/studies/${x.study.id}/results`);
    const si = Number(c.req.param('s'));
    const ri = Number(c.req.param('r'));
    const row = x.latest.loaded.output.scenarios[si]?.rows[ri];
    if (!row) return notFound(c, 'result row', `${c.req.param('s')}/${c.req.param('r')}`);
    if (isHtmx(c)) return fragment(c, { units: x.study.options.units }, () => <RowComponents row={row} />);
    const scenario = x.latest.loaded.output.scenarios[si]!;
    return page(c, { title: `${row.aircraftName}: components`, units: x.study.options.units }, () => (
      <>
        <h1>{row.aircraftName} <span class="muted">in {scenario.name}</span></h1>
        <p><a href={`/studies/${x.study.id}/results`}>Back to the results</a></p>
        <RowComponents row={row} />
      </>
    ));
  });

  app.get('/:id/whatif', (c) => {
    const s = studyOr404(c);
    if (!s) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(s.id);
    const latest = state.ready ? service.latest(state) : undefined;
    const units = viewOf(c, s.options.units).units;
    const w = studyWhatIf(s.id, state.input, latest?.loaded, c.req.query(), units);
    if (!w) return page(c, { title: s.name, status: 422, units: s.options.units }, () => <ProblemPage title="No what-if yet" message="The study needs aircraft in its scenarios and a site with a design temperature and a runway." back={`/studies/${s.id}`} />);
    const status = w.invalid ? 422 : 200;
    if (isHtmx(c)) {
      return fragment(c, { status, units: s.options.units }, () => (
        <WhatIfResult outcome={w.props.outcome} baseline={w.props.baseline} errors={w.props.errors} problem={w.props.problem} oob
          {...(w.replaceMass !== undefined ? { replaceMass: w.replaceMass } : {})} prev={w.props.values.aircraft} />
      ));
    }
    return page(c, { title: `What if: ${s.name}`, status, units: s.options.units }, () => (
      <>
        <h1>What if… <span class="muted"><a href={`/studies/${s.id}`}>{s.name}</a></span></h1>
        <WhatIfPanel {...w.props} />
      </>
    ));
  });

  return app;
}
