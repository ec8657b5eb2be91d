/**
 * Aircraft catalogue pages: the list (one page of it, with the search box and page links) with key
 * figures, the grouped form, the detail page with what-if.
 */
import {
  CERTIFICATION_BASES, ENGINE_TYPES, GEAR_LAYOUTS, THRUST_LAPSE_MODELS,
  type AircraftProfile, type Notice as CoreNotice, type UnitSystem,
} from '../../core/index.js';
import { AIRCRAFT_FORM_FIELDS, AIRCRAFT_LABELS, AIRCRAFT_TEXT_FIELDS, FORM_SECTIONS } from './fields.js';
import { ActionButton, Facts, ImportProblems, Notice, PostForm } from '../components.js';
import { ErrorSummary, Field, Section, SelectField, type Errors, type Values } from '../forms.js';
import { fmt, fmtInput, fmtLengthBoth, fmtPct, say } from '../format.js';
import { IDS } from '../ids.js';
import { useView } from '../view.js';
import { WhatIfPanel, type WhatIfProps } from '../whatif/index.js';
import { Pager } from '../pager.js';

/** Key figures of a catalogue aircraft (the server's computation, structurally). */
export interface AircraftFiguresView {
  /** Aeroplane reference field length: the planning figure when given, else the model's. */
  readonly arfl_m?: number;
  readonly arflSource?: 'planning figure' | 'physics model';
  /** The physics model's length at the same condition (MTOW, sea level, ISA), for comparison. */
  readonly modelArfl_m?: number;
  readonly vref_mps?: number;
  readonly aerodromeCode?: string | null;
  readonly approachCategory?: string;
  readonly designGroup?: string | null;
  readonly runwayDesignCode?: string | null;
  /** Why there are no figures (rendered in the reader's units). */
  readonly note?: CoreNotice | string;
}

const ENGINE_LABEL: Record<string, string> = { turbofan: 'turbofan', turboprop: 'turboprop', piston: 'piston' };
const CERT_LABEL: Record<string, string> = { transport: 'Transport', commuter: 'Commuter', normal: 'Normal' };

export function engineText(a: AircraftProfile): string {
  return `${a.engineCount} × ${ENGINE_LABEL[a.engineType] ?? a.engineType}${a.gear === 'tailwheel' ? ', tailwheel' : ''}`;
}

/** Display strings for the form fields of a stored profile, in the user's units. */
export function aircraftFormValues(a: AircraftProfile, system: UnitSystem): Record<string, string> {
  const rec = a as unknown as Record<string, unknown>;
  const out: Record<string, string> = {
    id: a.id,
    name: a.name,
    group: a.group ?? '',
    certification: a.certification,
    engineType: a.engineType,
    gear: a.gear,
    thrustLapse: a.thrustLapse ?? '',
  };
  for (const f of AIRCRAFT_FORM_FIELDS) {
    let v: unknown = rec;
    for (const k of f.name.split('.')) v = v === undefined || v === null ? undefined : (v as Record<string, unknown>)[k];
    out[f.name] = typeof v === 'number' ? fmtInput(v, f.kind, system) : '';
  }
  return out;
}

export interface AircraftListRow {
  readonly profile: AircraftProfile;
  readonly figures: AircraftFiguresView;
}

export interface AircraftListProps {
  /** The aircraft of this page (already bounded by the route). */
  readonly rows: readonly AircraftListRow[];
  /** Aircraft matching the search, all pages. */
  readonly total: number;
  /** Aircraft in the whole catalogue. */
  readonly catalogueSize: number;
  readonly page: number;
  readonly pages: number;
  /** Rows before this page. */
  readonly offset: number;
  /** The search term ('' for none). */
  readonly search: string;
  /** Longest search term the server reads, characters. */
  readonly searchMax: number;
  /** Why the requested page was not shown as asked. */
  readonly pageProblem?: string;
  readonly imported?: number;
  readonly deleted?: string;
  readonly importProblems?: readonly string[];
  readonly importValues?: Values;
}

/** URL of the catalogue page with a search term and page number (defaults left out). */
export function aircraftListHref(search: string, page: number): string {
  const q = new URLSearchParams();
  if (search !== '') q.set('q', search);
  if (page > 1) q.set('page', String(page));
  const s = q.toString();
  return s === '' ? '/aircraft' : `/aircraft?${s}`;
}

/** The catalogue search box: a plain GET form; with htmx the list region follows as the user types. */
function AircraftSearch(p: { search: string; searchMax: number }) {
  const target = `#${IDS.aircraftResults}`;
  return (
    <form class="search" method="get" action="/aircraft" role="search" aria-label="Search the catalogue"
      hx-get="/aircraft" hx-target={target} hx-swap="outerHTML" hx-push-url="true">
      <label for="f-aircraft-search">Search</label>{' '}
      <input id="f-aircraft-search" type="search" name="q" value={p.search} maxlength={p.searchMax} autocomplete="off"
        placeholder="id, name, group, certification or engine type"
        hx-get="/aircraft" hx-trigger="input changed delay:300ms, search" hx-target={target} hx-swap="outerHTML" hx-push-url="true"
        aria-describedby="f-aircraft-search-hint" />{' '}
      <button type="submit">Search</button>
      {p.search !== '' ? <>{' '}<a href="/aircraft">Show all</a></> : null}
      <span id="f-aircraft-search-hint" class="hint"> Part of an id, name, group, certification or engine type; not case-sensitive.</span>
    </form>
  );
}

/** The list region: the count, the page's table and the page links (what search and paging swap). */
export function AircraftResults(p: AircraftListProps) {
  const { units } = useView();
  const first = p.offset + 1;
  const last = first + p.rows.length - 1;
  const what = p.search === '' ? `${p.total.toLocaleString('en-US')} aircraft` : `${p.total.toLocaleString('en-US')} of ${p.catalogueSize.toLocaleString('en-US')} aircraft match “${p.search}”`;
  return (
    <div id={IDS.aircraftResults} class="list-results" aria-live="polite">
      {p.pageProblem ? <Notice kind="error">{p.pageProblem}</Notice> : null}
      {p.catalogueSize === 0 ? <p>The catalogue is empty. Create an aircraft or import a file.</p>
        : p.total === 0 ? <p>No aircraft match “{p.search}”. <a href="/aircraft">Show all</a>.</p> : (
        <>
          <div class="scroll">
            <table class="list">
              <caption>{what}{p.pages > 1 ? `; ${first.toLocaleString('en-US')}–${last.toLocaleString('en-US')} shown` : ''}; aeroplane reference field length at MTOW, sea level, ISA: the profile's planning figure where it gives one (P), else the physics model's (M)</caption>
              <thead>
                <tr>
                  <th scope="col">Name</th><th scope="col">Engines</th><th scope="col">Certification</th>
                  <th scope="col" class="num">MTOW</th><th scope="col" class="num">Wingspan</th>
                  <th scope="col" class="num">Ref. field length</th><th scope="col">Code</th><th scope="col">Approach cat.</th>
                  <th scope="col">Design group</th><th scope="col"><span class="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody>
                {p.rows.map(({ profile: a, figures: f }) => (
                  <tr>
                    <td><a href={`/aircraft/${encodeURIComponent(a.id)}`}>{a.name}</a><br /><span class="muted id">{a.id}</span></td>
                    <td>{engineText(a)}</td>
                    <td>{CERT_LABEL[a.certification] ?? a.certification}</td>
                    <td class="num">{fmt(a.mtow_kg, 'mass', units)}</td>
                    <td class="num">{fmt(a.wingspan_m, 'shortLength', units)}</td>
                    <td class="num">{f.arfl_m === undefined ? <span title={f.note === undefined ? undefined : say(f.note, units)}>—</span> : <>{fmt(f.arfl_m, 'length', units)} <abbr class="muted" title={f.arflSource}>{f.arflSource === 'planning figure' ? 'P' : 'M'}</abbr></>}</td>
                    <td>{f.aerodromeCode ?? '—'}</td>
                    <td>{f.approachCategory ?? '—'}</td>
                    <td>{f.designGroup ?? '—'}</td>
                    <td class="row-actions">
                      <a href={`/aircraft/${encodeURIComponent(a.id)}/edit`}>Edit<span class="sr-only"> {a.name}</span></a>
                      {' '}<a href={`/aircraft/${encodeURIComponent(a.id)}/delete`}>Delete<span class="sr-only"> {a.name}</span></a>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <Pager page={p.page} pages={p.pages} href={(n) => aircraftListHref(p.search, n)} target={IDS.aircraftResults} label="Catalogue pages" />
        </>
      )}
    </div>
  );
}

function ImportPanel(p: { problems?: readonly string[]; values?: Values }) {
  const v = p.values ?? {};
  return (
    <section class="panel" aria-labelledby={IDS.aircraftImport}>
      <h2 id={IDS.aircraftImport}>Import and export</h2>
      <p>
        Export: <a href="/aircraft/export.csv" download>catalogue as CSV</a> · <a href="/aircraft/export.json" download>as JSON</a>.
        {' '}CSV columns are the profile's field names with SI units in the name (see the storage guide).
      </p>
      <PostForm action="/aircraft/import" multipart label="Import aircraft" scrollTo={`#${IDS.aircraftImport}`}>
        <ImportProblems what="The file" problems={p.problems ?? []} />
        <div class="row">
          <div class="field">
            <label for="f-import-file">File (CSV or JSON)</label>
            <input id="f-import-file" type="file" name="file" accept=".csv,.json,text/csv,application/json" />
          </div>
          <div class="field">
            <label for="f-import-format">Format</label>
            <select id="f-import-format" name="format">
              {[['auto', 'From the file name'], ['csv', 'CSV'], ['json', 'JSON (a list of profiles)']].map(([val, label]) => (
                <option value={val} selected={(v.format ?? 'auto') === val}>{label}</option>
              ))}
            </select>
          </div>
          <div class="field checkbox">
            <input id="f-import-replace" type="checkbox" name="replace" value="yes" checked={v.replace === 'yes'} />
            <label for="f-import-replace">Replace aircraft whose id is already in the catalogue</label>
          </div>
        </div>
        <p class="actions"><button type="submit">Import</button> <span class="muted">All or nothing: one bad row rejects the file.</span></p>
      </PostForm>
    </section>
  );
}

export function AircraftListPage(p: AircraftListProps) {
  return (
    <>
      <h1>Aircraft catalogue</h1>
      {p.imported !== undefined ? <Notice kind="ok">Imported {p.imported.toLocaleString('en-US')} aircraft.</Notice> : null}
      {p.deleted !== undefined ? <Notice kind="ok">Deleted aircraft “{p.deleted}”.</Notice> : null}
      <p class="actions"><a class="button" href="/aircraft/new">New aircraft</a></p>
      {p.catalogueSize > 0 ? <AircraftSearch search={p.search} searchMax={p.searchMax} /> : null}
      <AircraftResults {...p} />
      <ImportPanel problems={p.importProblems} values={p.importValues} />
    </>
  );
}

export interface AircraftFormProps {
  readonly mode: 'new' | 'edit';
  readonly action: string;
  readonly values: Values;
  readonly errors: Errors;
  readonly hasReferenceTable?: boolean;
  readonly cancel: string;
}

const opt = (xs: readonly string[], labels?: Record<string, string>) => xs.map((x) => ({ value: x, label: labels?.[x] ?? x }));

export function AircraftFormPage(p: AircraftFormProps) {
  const required = (when: string) => when === 'always';
  return (
    <>
      <h1>{p.mode === 'new' ? 'New aircraft' : `Edit ${p.values.name || p.values.id || 'aircraft'}`}</h1>
      <p class="muted">Fields marked * are always required; others depend on the engine type, gear and engine count, as noted in each section. Numbers are in the units shown.</p>
      <PostForm action={p.action} class="aircraft-form" label="Aircraft profile">
        <ErrorSummary errors={p.errors} labels={AIRCRAFT_LABELS} />
        {FORM_SECTIONS.map((s) => (
          <Section legend={s.legend}>
            {s.note ? <p class="hint">{s.note}</p> : null}
            <div class="grid">
              {s.id === 'identity' ? (
                <>
                  <Field name="id" label={AIRCRAFT_TEXT_FIELDS.id} values={p.values} errors={p.errors} required hint="Letters, digits, dot, dash, underscore." />
                  <Field name="name" label={AIRCRAFT_TEXT_FIELDS.name} values={p.values} errors={p.errors} required />
                  <Field name="group" label={AIRCRAFT_TEXT_FIELDS.group} values={p.values} errors={p.errors} hint="Aircraft in one group share their operations count (optional)." />
                  <SelectField name="certification" label={AIRCRAFT_TEXT_FIELDS.certification} values={p.values} errors={p.errors} options={opt(CERTIFICATION_BASES, CERT_LABEL)} />
                  <SelectField name="engineType" label={AIRCRAFT_TEXT_FIELDS.engineType} values={p.values} errors={p.errors} options={opt(ENGINE_TYPES)} />
                  <SelectField name="gear" label={AIRCRAFT_TEXT_FIELDS.gear} values={p.values} errors={p.errors} options={opt(GEAR_LAYOUTS)} />
                  <SelectField name="thrustLapse" label={AIRCRAFT_TEXT_FIELDS.thrustLapse} values={p.values} errors={p.errors} options={[{ value: '', label: 'default' }, ...opt(THRUST_LAPSE_MODELS)]} hint="Turbofans only." />
                </>
              ) : null}
              {AIRCRAFT_FORM_FIELDS.filter((f) => f.section === s.id).map((f) => (
                <Field name={f.name} label={f.label} kind={f.kind} values={p.values} errors={p.errors} required={required(f.when) && s.id !== 'route'} hint={f.doc} />
              ))}
            </div>
            {s.id === 'reference' && p.hasReferenceTable ? <p class="hint">This aircraft has a reference table; it is kept.</p> : null}
          </Section>
        ))}
        <p class="actions sticky-actions">
          <button type="submit" class="primary">Save aircraft</button> <a href={p.cancel}>Cancel</a>
        </p>
      </PostForm>
    </>
  );
}

export interface AircraftDetailProps {
  readonly profile: AircraftProfile;
  readonly figures: AircraftFiguresView;
  readonly uses: readonly { readonly studyId: number; readonly studyName: string; readonly scenarioName: string }[];
  readonly whatif: WhatIfProps;
  readonly saved?: boolean;
}

export function AircraftDetailPage(p: AircraftDetailProps) {
  const { units } = useView();
  const a = p.profile;
  const f = p.figures;
  const rec = a as unknown as Record<string, unknown>;
  const valueOf = (name: string): unknown => name.split('.').reduce<unknown>((o, k) => (o === undefined || o === null ? undefined : (o as Record<string, unknown>)[k]), rec);
  return (
    <>
      <h1>{a.name} <span class="muted id">{a.id}</span></h1>
      {p.saved ? <Notice kind="ok">Saved.</Notice> : null}
      <div class="actions">
        <a class="button" href={`/aircraft/${encodeURIComponent(a.id)}/edit`}>Edit</a>
        <ActionButton action={`/aircraft/${encodeURIComponent(a.id)}/duplicate`} label="Duplicate" />
        <a class="button danger" href={`/aircraft/${encodeURIComponent(a.id)}/delete`}>Delete…</a>
        <a href={`/api/aircraft/${encodeURIComponent(a.id)}`}>JSON</a>
      </div>
      <div class="two-col">
        <Facts caption="Key figures" rows={[
          ['Engines', engineText(a)],
          ['Certification', CERT_LABEL[a.certification] ?? a.certification],
          ['MTOW / MLW / OEW', `${fmt(a.mtow_kg, 'mass', units)} / ${fmt(a.mlw_kg, 'mass', units)} / ${fmt(a.oew_kg, 'mass', units)}`],
          ['Aeroplane reference field length (MTOW, sea level, ISA)', f.arfl_m === undefined ? (f.note === undefined ? '—' : say(f.note, units)) : `${fmtLengthBoth(f.arfl_m, units)}, ${f.arflSource ?? 'physics model'}`],
          ...(f.arflSource === 'planning figure' ? [['Physics model at the same condition', f.modelArfl_m === undefined ? 'no takeoff found' : `${fmtLengthBoth(f.modelArfl_m, units)} (${fmtPct((f.modelArfl_m - f.arfl_m!) / f.arfl_m!)} against the planning figure)`] as [string, string]] : []),
          ['VREF at MLW (sea level, ISA)', fmt(f.vref_mps, 'speed', units)],
          ['Aerodrome reference code', f.aerodromeCode ?? '—'],
          ['Approach category / design group', `${f.approachCategory ?? '—'} / ${f.designGroup ?? '—'}`],
          ['Runway design code', f.runwayDesignCode ?? '—'],
        ]} />
        <div>
          <h2>Used by</h2>
          {p.uses.length === 0 ? <p class="muted">No study uses this aircraft.</p> : (
            <ul>{p.uses.map((u) => <li><a href={`/studies/${u.studyId}`}>{u.studyName}</a>: {u.scenarioName}</li>)}</ul>
          )}
        </div>
      </div>
      <WhatIfPanel {...p.whatif} />
      <details class="profile-data">
        <summary>All profile data</summary>
        {FORM_SECTIONS.filter((s) => s.id !== 'identity').map((s) => {
          const fields = AIRCRAFT_FORM_FIELDS.filter((x) => x.section === s.id && valueOf(x.name) !== undefined);
          if (fields.length === 0) return null;
          return (
            <Facts caption={s.legend} rows={fields.map((x) => [x.label, fmt(valueOf(x.name) as number, x.kind, units, x.kind === 'ratio' ? 3 : undefined)] as const)} />
          );
        })}
      </details>
    </>
  );
}
