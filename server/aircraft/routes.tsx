/**
 * Aircraft catalogue routes: list (50 a page, searchable, with key figures), create, edit, duplicate,
 * delete (with a confirmation page), CSV/JSON import and export, and the detail page with its live
 * what-if panel.
 */
import { Hono, type Context } from 'hono';
import type { AircraftProfile, UnitSystem } from '../../core/index.js';
import {
  AIRCRAFT_SEARCH_MAX, aircraftChoices, aircraftUses, countAircraft, countAircraftMatching, createAircraft, deleteAircraft, duplicateAircraft, getAircraft,
  pageAircraft, updateAircraft,
} from '../../db/repos/aircraft.js';
import type { BulkWriter } from '../../db/bulk.js';
import { AircraftInUseError, DuplicateIdError } from '../../db/errors.js';
import type { Db } from '../../db/types.js';
import {
  AircraftDetailPage, AircraftFormPage, AircraftListPage, AircraftResults, aircraftFormValues,
} from '../../templates/aircraft/index.js';
import { IDS } from '../../templates/ids.js';
import { ConfirmDeletePage } from '../../templates/confirm.js';
import { AircraftChoices } from '../../templates/studies/index.js';
import { WhatIfResult } from '../../templates/whatif/index.js';
import { aircraftFigures } from './figures.js';
import { commitCatalogue, commitCatalogueBulk, exportAircraftJson } from './catalogue.js';
import { readAircraftForm } from './form.js';
import { formValues, type FormValues } from '../common/formFields.js';
import type { WhatIfConditions } from '../whatif/index.js';
import { whatIfPanel, type WhatIfPanelState } from '../whatif/index.js';
import { exportAircraftCsv } from '../io/csv.js';
import { ImportError, formatProblem } from '../io/errors.js';
import type { JobRunner } from '../jobs/index.js';
import type { AppEnv } from '../web/env.js';
import { FLEET_SUGGESTIONS, LIST_PAGE_SIZE, choosePage } from '../web/paging.js';
import { fragment, isHtmx, page, seeOther, viewOf } from '../web/page.js';
import { InputDomainError } from '../../core/index.js';
import { download, notFound, formUnits } from '../web/routeHelpers.js';

export interface AircraftRouteDeps {
  readonly db: Db;
  readonly jobs: JobRunner;
  /** The server's bulk connection: catalogue imports commit on it without blocking the event loop. */
  readonly bulk?: BulkWriter;
}

const path = (id: string): string => `/aircraft/${encodeURIComponent(id)}`;

/** Longest aircraft id (the id rule, server/common/schema.ts `ident`). */
const MAX_ID_LENGTH = 64;

/**
 * The id of the n-th copy of aircraft `id`: "<id>-copy", then "<id>-copy-2", …; the source id is cut
 * before the suffix so the copy keeps the id rule (at most 64 characters, starting as the source does).
 */
export function copyIdFor(id: string, n: number): string {
  const suffix = n <= 1 ? '-copy' : `-copy-${n}`;
  return `${id.slice(0, MAX_ID_LENGTH - suffix.length)}${suffix}`;
}

/** Reference conditions of the aircraft what-if: sea level, ISA, MTOW, dry, still air, level. */
function referenceConditions(a: AircraftProfile): WhatIfConditions {
  return { elevation_m: 0, temperature_c: 15, mass_kg: a.mtow_kg, slope: 0, headwind_mps: 0, surface: 'dry' };
}

/** The what-if panel of an aircraft, from the query (submitted panel) or the reference conditions. */
export function aircraftWhatIf(a: AircraftProfile, query: FormValues, system: UnitSystem): WhatIfPanelState {
  return whatIfPanel({
    action: `${path(a.id)}/whatif`, aircraft: a, start: referenceConditions(a),
    baselineLabel: 'sea level, ISA, MTOW, dry, still air',
    intro: 'Change the conditions and the requirement follows (physics model; landing at MLW).',
  }, query, system);
}

export function aircraftRoutes(deps: AircraftRouteDeps): Hono<AppEnv> {
  const { db } = deps;
  const app = new Hono<AppEnv>();

  /**
   * The catalogue page: one page of 50 aircraft (`page`, 1-based) matching the search (`q`), read as a
   * bounded slice; an htmx request aimed at the list region gets only that region.
   */
  const listPage = (c: Context<AppEnv>, extra: { imported?: number; deleted?: string; importProblems?: string[]; importValues?: FormValues }, status: 200 | 422 = 200) => {
    const search = (c.req.query('q') ?? '').trim().slice(0, AIRCRAFT_SEARCH_MAX);
    const catalogueSize = countAircraft(db);
    const total = search === '' ? catalogueSize : countAircraftMatching(db, search);
    const choice = choosePage(c.req.query('page'), total, LIST_PAGE_SIZE);
    const rows = pageAircraft(db, { search, limit: LIST_PAGE_SIZE, offset: choice.offset }).map((profile) => ({ profile, figures: aircraftFigures(profile) }));
    const props = {
      rows, total, catalogueSize, page: choice.page, pages: choice.pages, offset: choice.offset, search, searchMax: AIRCRAFT_SEARCH_MAX,
      ...(choice.problem ? { pageProblem: choice.problem } : {}), ...extra,
    };
    const code = status === 200 && choice.invalid ? 400 : status;
    if (isHtmx(c) && c.req.header('hx-target') === IDS.aircraftResults) return fragment(c, { status: code }, () => <AircraftResults {...props} />);
    return page(c, { title: 'Aircraft', status: code }, () => <AircraftListPage {...props} />);
  };

  app.get('/', (c) => {
    const imported = c.req.query('imported');
    const deleted = c.req.query('deleted');
    return listPage(c, {
      ...(imported !== undefined && /^\d+$/.test(imported) ? { imported: Number(imported) } : {}),
      ...(deleted !== undefined ? { deleted } : {}),
    });
  });

  // Suggestions for a fleet row's aircraft field (a datalist fragment): ids cannot start with "_", so
  // this never shadows an aircraft. The term is `q`, or the field's own value (`r<n>_aircraft`).
  app.get('/_choices', (c) => {
    const query = c.req.query();
    const term = query.q ?? Object.entries(query).find(([k]) => /^r\d{1,3}_aircraft$/.test(k))?.[1] ?? '';
    const aircraft = aircraftChoices(db, term.trim().slice(0, AIRCRAFT_SEARCH_MAX), FLEET_SUGGESTIONS);
    return fragment(c, {}, () => <AircraftChoices aircraft={aircraft} />);
  });

  app.get('/export.csv', (c) => download(c, exportAircraftCsv(db), 'text/csv; charset=utf-8', 'aircraft.csv'));
  app.get('/export.json', (c) => download(c, exportAircraftJson(db), 'application/json; charset=utf-8', 'aircraft.json'));

  app.post('/import', async (c) => {
    const body = await c.req.parseBody();
    const values = formValues(body);
    const file = body.file;
    const fail = (problems: string[]) => listPage(c, { importProblems: problems, importValues: values }, 422);
    if (!(file instanceof File) || file.size === 0) return fail(['choose a CSV or JSON file to import']);
    const format = values.format === 'csv' || values.format === 'json' ? values.format : /\.json$/i.test(file.name) ? 'json' : 'csv';
    const bytes = new Uint8Array(await file.arrayBuffer());
    const replace = values.replace === 'yes';
    try {
      // Parsing and checking run in the job pool; the main thread commits the validated rows (workers
      // never open the database). On the bulk connection the commit leaves the event loop free.
      const parsed = await deps.jobs.run('catalogue', { format, data: bytes });
      const r = deps.bulk ? await commitCatalogueBulk(deps.bulk, parsed, { replace }) : commitCatalogue(db, parsed, { replace });
      return seeOther(c, `/aircraft?imported=${r.created.length + r.replaced.length}`);
    } catch (e) {
      if (e instanceof ImportError) return fail(e.problems.map(formatProblem));
      if (e instanceof InputDomainError || e instanceof DuplicateIdError) return fail([e.message]);
      throw e;
    }
  });

  app.get('/new', (c) => {
    const values = { certification: 'transport', engineType: 'turbofan', gear: 'tricycle', engineCount: '2' };
    return page(c, { title: 'New aircraft' }, () => <AircraftFormPage mode="new" action="/aircraft" values={values} errors={{}} cancel="/aircraft" />);
  });

  app.post('/', async (c) => {
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const r = readAircraftForm(values, units);
    const again = (errors: Record<string, string>) =>
      page(c, { title: 'New aircraft', status: 422, units }, () => <AircraftFormPage mode="new" action="/aircraft" values={values} errors={errors} cancel="/aircraft" />);
    if (!r.ok) return again(r.errors);
    try {
      createAircraft(db, r.value);
    } catch (e) {
      if (e instanceof DuplicateIdError) return again({ id: `"${r.value.id}" is already in the catalogue; choose another identifier` });
      throw e;
    }
    return seeOther(c, `${path(r.value.id)}?saved=1`);
  });

  app.get('/:id', (c) => {
    const a = getAircraft(db, c.req.param('id'));
    if (!a) return notFound(c, 'aircraft', c.req.param('id'));
    const units = viewOf(c).units;
    const w = aircraftWhatIf(a, c.req.query(), units);
    return page(c, { title: a.name, status: w.invalid ? 422 : 200 }, () => (
      <AircraftDetailPage profile={a} figures={aircraftFigures(a)} uses={aircraftUses(db, a.id)} whatif={w.props} saved={c.req.query('saved') === '1'} />
    ));
  });

  app.get('/:id/whatif', (c) => {
    const a = getAircraft(db, c.req.param('id'));
    if (!a) return notFound(c, 'aircraft', c.req.param('id'));
    const units = viewOf(c).units;
    const w = aircraftWhatIf(a, c.req.query(), units);
    const status = w.invalid ? 422 : 200;
    if (isHtmx(c)) {
      return fragment(c, { status }, () => <WhatIfResult outcome={w.props.outcome} baseline={w.props.baseline} errors={w.props.errors} problem={w.props.problem} oob />);
    }
    return page(c, { title: a.name, status }, () => (
      <AircraftDetailPage profile={a} figures={aircraftFigures(a)} uses={aircraftUses(db, a.id)} whatif={w.props} />
    ));
  });

  app.get('/:id/edit', (c) => {
    const a = getAircraft(db, c.req.param('id'));
    if (!a) return notFound(c, 'aircraft', c.req.param('id'));
    const units = viewOf(c).units;
    return page(c, { title: `Edit ${a.name}` }, () => (
      <AircraftFormPage mode="edit" action={path(a.id)} values={{ ...aircraftFormValues(a, units) }} errors={{}} hasReferenceTable={a.reference?.table !== undefined} cancel={path(a.id)} />
    ));
  });

  app.post('/:id', async (c) => {
    const id = c.req.param('id');
    const stored = getAircraft(db, id);
    if (!stored) return notFound(c, 'aircraft', id);
    const values = formValues(await c.req.parseBody());
    const units = formUnits(c, values);
    const r = readAircraftForm(values, units, stored);
    const again = (errors: Record<string, string>) =>
      page(c, { title: `Edit ${stored.name}`, status: 422, units }, () => (
        <AircraftFormPage mode="edit" action={path(id)} values={values} errors={errors} hasReferenceTable={stored.reference?.table !== undefined} cancel={path(id)} />
      ));
    if (!r.ok) return again(r.errors);
    try {
      updateAircraft(db, id, r.value);
    } catch (e) {
      if (e instanceof DuplicateIdError) return again({ id: `"${r.value.id}" is already in the catalogue; choose another identifier` });
      throw e;
    }
    return seeOther(c, `${path(r.value.id)}?saved=1`);
  });

  app.post('/:id/duplicate', (c) => {
    const id = c.req.param('id');
    const src = getAircraft(db, id);
    if (!src) return notFound(c, 'aircraft', id);
    let copyId = copyIdFor(src.id, 1);
    for (let n = 2; getAircraft(db, copyId); n++) copyId = copyIdFor(src.id, n);
    duplicateAircraft(db, id, { id: copyId });
    return seeOther(c, `${path(copyId)}/edit`);
  });

  app.get('/:id/delete', (c) => {
    const a = getAircraft(db, c.req.param('id'));
    if (!a) return notFound(c, 'aircraft', c.req.param('id'));
    const uses = aircraftUses(db, a.id);
    const blocked = uses.length > 0 ? new AircraftInUseError(a.id, uses).message : undefined;
    return page(c, { title: `Delete ${a.name}` }, () => (
      <ConfirmDeletePage what="aircraft" name={a.name} action={`${path(a.id)}/delete`} cancel={path(a.id)} {...(blocked ? { blocked } : {})} />
    ));
  });

  app.post('/:id/delete', async (c) => {
    const id = c.req.param('id');
    const a = getAircraft(db, id);
    if (!a) return notFound(c, 'aircraft', id);
    const values = formValues(await c.req.parseBody());
    if (values.confirm !== 'yes') return seeOther(c, `${path(id)}/delete`);
    try {
      deleteAircraft(db, id);
    } catch (e) {
      if (e instanceof AircraftInUseError) {
        return page(c, { title: `Delete ${a.name}`, status: 409 }, () => (
          <ConfirmDeletePage what="aircraft" name={a.name} action={`${path(id)}/delete`} cancel={path(id)} blocked={e.message} />
        ));
      }
      throw e;
    }
    return seeOther(c, `/aircraft?deleted=${encodeURIComponent(a.name)}`);
  });

  return app;
}
