/** Study pages: list, study form (name, site, options), overview with scenarios, scenario (fleet) form. */
import { FLEET_FIELDS, DEFAULT_OPERATING_RULES, OPERATING_RULE_SETS, OPERATING_RULE_SET_INFO, STUDY_OPTION_FIELDS, SURFACES, SURFACE_LABELS, optionFieldByForm, type FleetRowInput, type StudyOptions } from '../../core/index.js';
import { ImportProblems, Notice, PostForm } from '../components.js';
import { IDS } from '../ids.js';
import { ErrorSummary, Field, Section, SelectField, fieldId, type Errors, type Values } from '../forms.js';
import { UNIT_SYSTEM_LABELS, fmt, fmtPct, unitSymbol } from '../format.js';
import { useView } from '../view.js';
import { WhatIfPanel, type WhatIfProps } from '../whatif/index.js';
import { ListPager, listCaption, type ListPaging } from '../pager.js';

/** Fleet rows shown per scenario on the study overview (the scenario page shows them all). */
export const OVERVIEW_FLEET_ROWS = 10;

export interface StudyListItem {
  readonly id: number;
  readonly name: string;
  readonly siteId: number;
  readonly siteName: string;
  readonly scenarioCount: number;
  readonly lastSavedAt?: string;
}

export function StudiesListPage(p: { studies: readonly StudyListItem[]; deleted?: string; paging?: ListPaging }) {
  return (
    <>
      <h1>Studies</h1>
      {p.deleted !== undefined ? <Notice kind="ok">Deleted study “{p.deleted}”.</Notice> : null}
      {p.paging?.problem ? <Notice kind="error">{p.paging.problem}</Notice> : null}
      <p class="actions"><a class="button" href="/studies/new">New study</a></p>
      {p.studies.length === 0 ? <p>No studies yet.</p> : (
        <table class="list">
          <caption>{p.paging ? listCaption(p.paging, p.studies.length, 'study', 'studies') : `${p.studies.length} stud${p.studies.length === 1 ? 'y' : 'ies'}`}</caption>
          <thead><tr><th scope="col">Name</th><th scope="col">Site</th><th scope="col" class="num">Scenarios</th><th scope="col">Last computed</th><th scope="col"><span class="sr-only">Actions</span></th></tr></thead>
          <tbody>
            {p.studies.map((s) => (
              <tr>
                <td><a href={`/studies/${s.id}`}>{s.name}</a></td>
                <td><a href={`/sites/${s.siteId}`}>{s.siteName}</a></td>
                <td class="num">{s.scenarioCount}</td>
                <td>{s.lastSavedAt ? s.lastSavedAt.replace('T', ' ').slice(0, 16) + ' UTC' : '—'}</td>
                <td class="row-actions"><a href={`/studies/${s.id}/results`}>Results<span class="sr-only"> of {s.name}</span></a> <a href={`/studies/${s.id}/delete`}>Delete<span class="sr-only"> {s.name}</span></a></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {p.paging ? <ListPager paging={p.paging} path="/studies" label="Study list pages" /> : null}
    </>
  );
}

const METHOD_LABELS: Record<string, string> = {
  planning: 'Planning data first (chart, else the model calibrated to the planning data; recommended)',
  physics: 'Physics model (first principles)',
  'reference-icao': 'Reference lengths with ICAO corrections',
  'reference-authority': 'Reference lengths with the authority adjustments',
  calibrated: 'Physics model calibrated to the reference length',
};
const POLICY_LABELS: Record<string, string> = {
  'cruise-45min': '45 minutes at cruise, alternate (200 NM unless given)',
  international: 'International: 10 % trip time, alternate, 30 min hold',
  custom: 'Custom: alternate distance, holding time, contingency',
};

/** Labels of the study form's fields: the option labels come from STUDY_OPTION_FIELDS (core/studyFields.ts). */
export const STUDY_LABELS: Record<string, string> = {
  name: 'Study name', siteId: 'Site',
  ...Object.fromEntries(STUDY_OPTION_FIELDS.map((f) => [f.form, f.label])),
};
/** The help text of an option's form field (core/studyFields.ts). */
const hint = (form: string): string => optionFieldByForm(form).help;

export function StudyFormPage(p: { mode: 'new' | 'edit'; action: string; values: Values; errors: Errors; sites: readonly { id: number; name: string }[]; cancel: string }) {
  return (
    <>
      <h1>{p.mode === 'new' ? 'New study' : `Edit ${p.values.name || 'study'}`}</h1>
      {p.sites.length === 0 ? <Notice kind="error">A study needs a site: <a href="/sites/new">create a site</a> first.</Notice> : null}
      <PostForm action={p.action} label="Study">
        <ErrorSummary errors={p.errors} labels={STUDY_LABELS} />
        <Section legend="Study">
          <div class="grid">
            <Field name="name" label={STUDY_LABELS.name!} values={p.values} errors={p.errors} required />
            <SelectField name="siteId" label={STUDY_LABELS.siteId!} values={p.values} errors={p.errors} options={[{ value: '', label: 'Choose a site' }, ...p.sites.map((s) => ({ value: String(s.id), label: s.name }))]} />
            <SelectField name="units" label={STUDY_LABELS.units!} values={p.values} errors={p.errors} options={(['si', 'us'] as const).map((u) => ({ value: u, label: UNIT_SYSTEM_LABELS[u] }))}
              hint={hint('units')} />
          </div>
        </Section>
        <Section legend="Options">
          <div class="grid">
            <Field name="regularUseThreshold" label={STUDY_LABELS.regularUseThreshold!} type="number" values={p.values} errors={p.errors} required hint={hint('regularUseThreshold')} />
            <Field name="roundingIncrement" label={STUDY_LABELS.roundingIncrement!} kind="length" values={p.values} errors={p.errors} required hint={hint('roundingIncrement')} />
            <SelectField name="surface" label={STUDY_LABELS.surface!} values={p.values} errors={p.errors} options={SURFACES.map((s) => ({ value: s, label: SURFACE_LABELS[s] }))} />
            <SelectField name="method" label={STUDY_LABELS.method!} values={p.values} errors={p.errors} options={Object.entries(METHOD_LABELS).map(([value, label]) => ({ value, label }))} />
            <SelectField name="landingTemperature" label={STUDY_LABELS.landingTemperature!} values={p.values} errors={p.errors} options={[{ value: 'isa', label: 'ISA at the field (certified data basis)' }, { value: 'design', label: 'The design temperature' }]} />
            <SelectField name="landingMass" label={STUDY_LABELS.landingMass!} values={p.values} errors={p.errors} options={[{ value: 'mlw', label: 'Maximum landing mass' }, { value: 'route', label: 'Arrival mass of the design route' }]} />
            <SelectField name="operatingRules" label={STUDY_LABELS.operatingRules!} values={p.values} errors={p.errors} options={OPERATING_RULE_SETS.map((r) => ({ value: r, label: OPERATING_RULE_SET_INFO[r].label }))}
              hint={hint('operatingRules')} />
            <Field name="referenceOverrideReason" label={STUDY_LABELS.referenceOverrideReason!} values={p.values} errors={p.errors}
              hint={hint('referenceOverrideReason')} />
          </div>
        </Section>
        <Section legend="Route and fuel">
          <div class="grid">
            <SelectField name="reservePolicy" label={STUDY_LABELS.reservePolicy!} values={p.values} errors={p.errors} options={Object.entries(POLICY_LABELS).map(([value, label]) => ({ value, label }))} />
            <Field name="alternate" label={STUDY_LABELS.alternate!} kind="distance" values={p.values} errors={p.errors} hint={hint('alternate')} />
            <Field name="holding" label={`${STUDY_LABELS.holding!} (min)`} type="number" values={p.values} errors={p.errors} hint={hint('holding')} />
            <Field name="contingency" label={`${STUDY_LABELS.contingency!} (% of trip fuel)`} type="number" values={p.values} errors={p.errors} hint={hint('contingency')} />
            <Field name="passengerMass" label={STUDY_LABELS.passengerMass!} kind="mass" values={p.values} errors={p.errors} required hint={hint('passengerMass')} />
          </div>
        </Section>
        <p class="actions"><button type="submit" class="primary">Save study</button> <a href={p.cancel}>Cancel</a></p>
      </PostForm>
    </>
  );
}

export interface ScenarioView {
  readonly id: number;
  readonly name: string;
  readonly fleet: readonly (FleetRowInput & { readonly aircraftName: string })[];
}

export interface StudyOverviewProps {
  readonly id: number;
  readonly name: string;
  readonly site: { readonly id: number; readonly name: string };
  readonly options: StudyOptions;
  readonly scenarios: readonly ScenarioView[];
  readonly status: 'never-saved' | 'changed' | 'unchanged';
  readonly savedAt?: string;
  readonly problems: readonly string[];
  readonly whatif?: WhatIfProps;
  readonly notice?: string;
}

export function UnitsNote(p: { studyUnits: 'si' | 'us'; base: string }) {
  const { units } = useView();
  const other = units === 'si' ? 'us' : 'si';
  return (
    <p class="units-note muted">
      Shown in {UNIT_SYSTEM_LABELS[units]}{units === p.studyUnits ? ' (the study’s units)' : ''}. <a href={`${p.base}?units=${other}`}>Show in {other === 'si' ? 'SI' : 'US customary'} units</a>
    </p>
  );
}

export function StudyOverviewPage(p: StudyOverviewProps) {
  const { units } = useView();
  const o = p.options;
  return (
    <>
      <h1>{p.name}</h1>
      {p.notice ? <Notice kind="ok">{p.notice}</Notice> : null}
      <UnitsNote studyUnits={o.units} base={`/studies/${p.id}`} />
      <p class="actions">
        <a class="button primary" href={`/studies/${p.id}/results`}>Results</a>{' '}
        <a class="button" href={`/studies/${p.id}/edit`}>Edit study and options</a>{' '}
        <a class="button danger" href={`/studies/${p.id}/delete`}>Delete…</a>{' '}
        <a href={`/api/studies/${p.id}`}>Study file (JSON)</a>
      </p>
      <p>
        Site: <a href={`/sites/${p.site.id}`}>{p.site.name}</a> · {p.status === 'never-saved' ? 'Not computed yet' : p.status === 'changed' ? 'Inputs changed since the last computation' : `Computed ${p.savedAt?.replace('T', ' ').slice(0, 16)} UTC`}
      </p>
      {p.problems.length > 0 ? (
        <div class="warnings" role="note">
          <h3>Before the study can be computed</h3>
          <ul>{p.problems.map((x) => <li>{x}</li>)}</ul>
        </div>
      ) : null}
      <details class="options">
        <summary>Options</summary>
        <ul>
          <li>Method: {METHOD_LABELS[o.method] ?? o.method}</li>
          <li>Regular use: at least {o.regularUseThreshold} annual operations · planning increment {fmt(o.roundingIncrement_m, 'length', units, units === 'si' ? 0 : 0)}</li>
          <li>Surface: {SURFACE_LABELS[o.surface]} · landing at {o.landingMass === 'mlw' ? 'MLW' : 'route arrival mass'}, {o.landingTemperature === 'isa' ? 'ISA' : 'design temperature'}</li>
          <li>Operating rules: {OPERATING_RULE_SET_INFO[o.operatingRules ?? DEFAULT_OPERATING_RULES].label} ({OPERATING_RULE_SET_INFO[o.operatingRules ?? DEFAULT_OPERATING_RULES].summary})</li>
          {o.referenceOverrideReason !== undefined ? <li><strong>Override recorded</strong>: corrected reference lengths beyond the 35 % limit govern. Reason: “{o.referenceOverrideReason}”</li> : null}
          <li>Reserves: {POLICY_LABELS[o.reserves.policy] ?? o.reserves.policy}{o.reserves.alternate_km !== undefined ? `, alternate ${fmt(o.reserves.alternate_km * 1000, 'distance', units)}` : ''}{o.reserves.contingencyFraction !== undefined ? `, contingency ${fmtPct(o.reserves.contingencyFraction)}` : ''} · {fmt(o.passengerMass_kg, 'mass', units)} per passenger</li>
        </ul>
      </details>
      <h2>Scenarios</h2>
      {p.scenarios.length === 0 ? <p>No scenarios yet.</p> : p.scenarios.map((s) => (
        <section class="scenario" aria-labelledby={`scenario-${s.id}`}>
          <h3 id={`scenario-${s.id}`}>{s.name}</h3>
          <p class="actions">
            <a href={`/studies/${p.id}/scenarios/${s.id}`}>Edit fleet<span class="sr-only"> of {s.name}</span></a>{' '}
            <a href={`/studies/${p.id}/scenarios/${s.id}/fleet.csv`} download>Fleet CSV</a>{' '}
            <a href={`/studies/${p.id}/scenarios/${s.id}/delete`}>Delete scenario<span class="sr-only"> {s.name}</span></a>
          </p>
          {s.fleet.length === 0 ? <p class="muted">No fleet rows yet.</p> : (
            <table class="compact">
              <thead><tr><th scope="col">Aircraft</th><th scope="col" class="num">Annual operations</th><th scope="col" class="num">Stage length</th><th scope="col" class="num">Payload</th></tr></thead>
              <tbody>
                {s.fleet.slice(0, OVERVIEW_FLEET_ROWS).map((r) => (
                  <tr><td><a href={`/aircraft/${encodeURIComponent(r.aircraft)}`}>{r.aircraftName}</a></td><td class="num">{r.annualOperations.toLocaleString('en-US')}</td>
                    <td class="num">{fmt(r.stageLength_km * 1000, 'distance', units)}</td><td class="num">{fmt(r.payload_kg, 'mass', units)}</td></tr>
                ))}
              </tbody>
              {s.fleet.length > OVERVIEW_FLEET_ROWS ? (
                <tfoot><tr><td colspan={4} class="muted">
                  … and {s.fleet.length - OVERVIEW_FLEET_ROWS} more rows ({s.fleet.length} in all, {s.fleet.reduce((n, r) => n + r.annualOperations, 0).toLocaleString('en-US')} annual operations): <a href={`/studies/${p.id}/scenarios/${s.id}`}>see every row<span class="sr-only"> of {s.name}</span></a>
                </td></tr></tfoot>
              ) : null}
            </table>
          )}
        </section>
      ))}
      <PostForm action={`/studies/${p.id}/scenarios`} class="inline-form" label="Add a scenario">
        <div class="field inline">
          <label for="f-new-scenario">New scenario</label>
          <input id="f-new-scenario" name="name" type="text" placeholder="e.g. Forecast 2040" autocomplete="off" />
          <button type="submit">Add scenario</button>
        </div>
      </PostForm>
      {p.whatif ? <WhatIfPanel {...p.whatif} /> : null}
    </>
  );
}

const rf = (i: number, f: string): string => `r${i}_${f}`;

export interface ScenarioFormProps {
  readonly studyId: number;
  readonly studyName: string;
  readonly scenarioId: number;
  readonly values: Values;
  readonly errors: Errors;
  readonly rows: number;
  /**
   * Aircraft to offer: the whole catalogue when `complete` (a select), else a bounded list of
   * suggestions for a text field with a datalist that htmx refreshes as the user types.
   */
  readonly aircraft: readonly { readonly id: number | string; readonly name: string }[];
  /** True when `aircraft` is the whole catalogue (small enough for a select in every row). */
  readonly complete?: boolean;
  /** Names of the aircraft ids typed in the rows (shown beside a text field). */
  readonly names?: ReadonlyMap<string, string>;
  readonly importProblems?: readonly string[];
}

/**
 * Suggestions for a fleet row's aircraft field: a datalist (native, no JavaScript needed) that the
 * fields' htmx requests replace with the aircraft matching what was typed.
 */
export function AircraftChoices(p: { aircraft: readonly { readonly id: string; readonly name: string }[] }) {
  return (
    <datalist id={IDS.aircraftChoices}>
      {p.aircraft.map((a) => <option value={a.id}>{a.name}</option>)}
    </datalist>
  );
}

export function ScenarioFormPage(p: ScenarioFormProps) {
  const { units } = useView();
  const base = `/studies/${p.studyId}/scenarios/${p.scenarioId}`;
  const labels: Record<string, string> = { name: 'Scenario name' };
  for (let i = 0; i < p.rows; i++) {
    labels[rf(i, 'aircraft')] = `Row ${i + 1} aircraft`;
    for (const f of FLEET_FIELDS) labels[rf(i, f.form)] = `Row ${i + 1} ${f.label.toLowerCase()}`;
  }
  const cell = (name: string, label: string) => {
    const err = p.errors[name];
    return (
      <td class={err ? 'has-error' : undefined}>
        <input id={fieldId(name)} name={name} type="text" inputmode="decimal" value={p.values[name] ?? ''} aria-label={label} aria-invalid={err ? 'true' : undefined} class="cell" autocomplete="off" />
        {err ? <span class="error small">{err}</span> : null}
      </td>
    );
  };
  return (
    <>
      <h1>Scenario <span class="muted">of <a href={`/studies/${p.studyId}`}>{p.studyName}</a></span></h1>
      <PostForm action={base} label="Scenario">
        <input type="hidden" name="rows" value={String(p.rows)} />
        <ErrorSummary errors={p.errors} labels={labels} />
        <Field name="name" label="Scenario name" values={p.values} errors={p.errors} required />
        <div class="scroll">
          <table class="fleet-table">
            <caption>Fleet: one row per aircraft; blank rows are ignored. The design route is the longest regular route.</caption>
            <thead><tr><th scope="col">#</th><th scope="col">Aircraft</th>{FLEET_FIELDS.map((f) => <th scope="col" title={f.help}>{f.label}{unitSymbol(f.kind, units) ? ` (${unitSymbol(f.kind, units)})` : ''}</th>)}</tr></thead>
            <tbody>
              {Array.from({ length: p.rows }, (_, i) => {
                const err = p.errors[rf(i, 'aircraft')];
                return (
                  <tr>
                    <th scope="row">{i + 1}</th>
                    <td class={err ? 'has-error' : undefined}>
                      {p.complete !== false ? (
                        <select id={fieldId(rf(i, 'aircraft'))} name={rf(i, 'aircraft')} aria-label={`Row ${i + 1} aircraft`} aria-invalid={err ? 'true' : undefined}>
                          <option value="">—</option>
                          {p.aircraft.map((a) => <option value={String(a.id)} selected={p.values[rf(i, 'aircraft')] === String(a.id)}>{a.name}</option>)}
                        </select>
                      ) : (
                        <>
                          <input id={fieldId(rf(i, 'aircraft'))} name={rf(i, 'aircraft')} type="text" list={IDS.aircraftChoices} value={p.values[rf(i, 'aircraft')] ?? ''}
                            aria-label={`Row ${i + 1} aircraft id`} aria-invalid={err ? 'true' : undefined} aria-describedby="fleet-aircraft-hint" autocomplete="off" class="cell aircraft-id"
                            hx-get="/aircraft/_choices" hx-trigger="input changed delay:250ms" hx-target={`#${IDS.aircraftChoices}`} hx-swap="outerHTML" hx-push-url="false" hx-indicator="this" />
                          {p.names?.get((p.values[rf(i, 'aircraft')] ?? '').trim()) !== undefined ? <span class="muted small aircraft-name">{p.names.get((p.values[rf(i, 'aircraft')] ?? '').trim())}</span> : null}
                        </>
                      )}
                      {err ? <span class="error small">{err}</span> : null}
                    </td>
                    {FLEET_FIELDS.map((f) => cell(rf(i, f.form), `Row ${i + 1} ${f.label.toLowerCase()}${unitSymbol(f.kind, units) ? ` (${unitSymbol(f.kind, units)})` : ''}`))}
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
        {p.complete === false ? (
          <>
            <p class="hint" id="fleet-aircraft-hint">
              Type an aircraft id, or part of its name to pick from the suggestions ({p.aircraft.length} shown at a time).
              {' '}<a href="/aircraft" target="_blank">Search the catalogue</a> to look up an id.
            </p>
            <AircraftChoices aircraft={p.aircraft.map((a) => ({ id: String(a.id), name: a.name }))} />
          </>
        ) : null}
        <p class="actions">
          <button type="submit" class="primary">Save scenario</button>{' '}
          <button type="submit" name="more" value="yes">Save and add rows</button>{' '}
          <a href={`/studies/${p.studyId}`}>Back to the study</a>
        </p>
      </PostForm>
      <section class="panel" aria-labelledby={IDS.fleetImport}>
        <h2 id={IDS.fleetImport}>Fleet rows from a CSV file</h2>
        <p class="hint">Columns aircraft, annualOperations, stageLength_km, payload_kg (SI). The file replaces every row of this scenario; all or nothing. <a href={`${base}/fleet.csv`} download>Download the current rows</a>.</p>
        <PostForm action={`${base}/fleet/import`} multipart label="Import fleet rows" scrollTo={`#${IDS.fleetImport}`}>
          <ImportProblems what="The fleet CSV" problems={p.importProblems ?? []} />
          <div class="field"><label for="f-fleet-file">CSV file</label><input id="f-fleet-file" type="file" name="file" accept=".csv,text/csv" /></div>
          <p class="actions"><button type="submit">Import fleet rows</button></p>
        </PostForm>
      </section>
    </>
  );
}

