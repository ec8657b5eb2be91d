/**
 * Site pages: list, site form (with the twelve monthly climate values), site detail (climate chart and
 * table, the design temperature by both hottest-month criteria, runways with their profile table and
 * chart and declared distances, the station-file import), and the runway form.
 */
import type { ChartModel, RunwayInput, SiteInput, UnitSystem, Notice as CoreNotice } from '../../core/index.js';
import { ListPager, listCaption, type ListPaging } from '../pager.js';
import { CLIMATE_FIELDS, DIRECTION_FIELDS, MONTHLY_FIELDS, SITE_FIELDS, fieldInputText, inputField, monthName } from '../../core/index.js';
import { ChartSvg } from '../charts/svg.js';
import { ImportProblems, Notice, PostForm, Warnings } from '../components.js';
import { ErrorSummary, Field, Section, SelectField, SpecField, fieldId, type Errors, type Values } from '../forms.js';
import { fmt, fmtInput, fmtLengthBoth, fmtSlope, unitSymbol } from '../format.js';
import { IDS } from '../ids.js';
import { useView } from '../view.js';

export const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;
const mf = (m: number, w: string): string => `m${m}_${w}`;
const df = (i: number, f: string): string => `d${i}_${f}`;
/** The site form's numeric fields, from the field tables (core/studyFields.ts). */
const ELEVATION = inputField(SITE_FIELDS, 'elevation_m');
const DESIGN_TEMPERATURE = inputField(SITE_FIELDS, 'designTemperature_c');
const YEARS = inputField(CLIMATE_FIELDS, 'years');

export interface SiteListItem {
  readonly id: number;
  readonly name: string;
  readonly elevation_m: number;
  readonly runwayCount: number;
  readonly hasClimate: boolean;
}

export function SitesListPage(p: { sites: readonly SiteListItem[]; deleted?: string; paging?: ListPaging }) {
  const { units } = useView();
  return (
    <>
      <h1>Sites</h1>
      {p.deleted !== undefined ? <Notice kind="ok">Deleted site “{p.deleted}”.</Notice> : null}
      {p.paging?.problem ? <Notice kind="error">{p.paging.problem}</Notice> : null}
      <p class="actions"><a class="button" href="/sites/new">New site</a></p>
      {p.sites.length === 0 ? <p>No sites yet.</p> : (
        <table class="list">
          <caption>{p.paging ? listCaption(p.paging, p.sites.length, 'site', 'sites') : `${p.sites.length} site${p.sites.length === 1 ? '' : 's'}`}</caption>
          <thead><tr><th scope="col">Name</th><th scope="col" class="num">Elevation</th><th scope="col" class="num">Runways</th><th scope="col">Climate</th><th scope="col"><span class="sr-only">Actions</span></th></tr></thead>
          <tbody>
            {p.sites.map((s) => (
              <tr>
                <td><a href={`/sites/${s.id}`}>{s.name}</a></td>
                <td class="num">{fmt(s.elevation_m, 'altitude', units)}</td>
                <td class="num">{s.runwayCount}</td>
                <td>{s.hasClimate ? 'monthly values' : '—'}</td>
                <td class="row-actions"><a href={`/sites/${s.id}/edit`}>Edit<span class="sr-only"> {s.name}</span></a> <a href={`/sites/${s.id}/delete`}>Delete<span class="sr-only"> {s.name}</span></a></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {p.paging ? <ListPager paging={p.paging} path="/sites" label="Site list pages" /> : null}
    </>
  );
}

/** Display strings of a stored site's form fields. */
export function siteFormValues(s: SiteInput, system: UnitSystem): Record<string, string> {
  const out: Record<string, string> = {
    name: s.name,
    [ELEVATION.form]: fieldInputText(ELEVATION, s.elevation_m, system),
    [DESIGN_TEMPERATURE.form]: fieldInputText(DESIGN_TEMPERATURE, s.designTemperature_c, system),
    climateSource: s.climate?.source ?? '',
    [YEARS.form]: fieldInputText(YEARS, s.climate?.years, system),
  };
  for (const m of s.climate?.monthly ?? []) {
    for (const f of MONTHLY_FIELDS) out[mf(m.month, f.form)] = fieldInputText(f, m[f.key as 'meanMax_c'], system);
  }
  return out;
}

const SITE_LABELS: Record<string, string> = {
  name: 'Name', climateSource: 'Climate source',
  ...Object.fromEntries([ELEVATION, DESIGN_TEMPERATURE, YEARS].map((f) => [f.form, f.label])),
  ...Object.fromEntries([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12].flatMap((m) => MONTHLY_FIELDS.map((f) => [mf(m, f.form), `${monthName(m)} ${f.label.toLowerCase()}`]))),
};

function MonthInput(p: { name: string; label: string; values: Values; errors: Errors }) {
  const err = p.errors[p.name];
  return (
    <td class={err ? 'has-error' : undefined}>
      <input id={fieldId(p.name)} name={p.name} type="text" inputmode="decimal" value={p.values[p.name] ?? ''} aria-label={p.label}
        aria-invalid={err ? 'true' : undefined} title={err} class="cell" autocomplete="off" />
      {err ? <span class="error small">{err}</span> : null}
    </td>
  );
}

export function SiteFormPage(p: { mode: 'new' | 'edit'; action: string; values: Values; errors: Errors; cancel: string }) {
  const { units } = useView();
  const t = unitSymbol('temperature', units);
  return (
    <>
      <h1>{p.mode === 'new' ? 'New site' : `Edit ${p.values.name || 'site'}`}</h1>
      <PostForm action={p.action} label="Site">
        <ErrorSummary errors={p.errors} labels={SITE_LABELS} />
        <Section legend="Site">
          <div class="grid">
            <Field name="name" label="Name" values={p.values} errors={p.errors} required />
            <SpecField spec={ELEVATION} values={p.values} errors={p.errors} />
            <SpecField spec={DESIGN_TEMPERATURE} values={p.values} errors={p.errors} />
          </div>
        </Section>
        <Section legend="Monthly climate">
          <p class="hint">Enter twelve monthly values, or leave the whole table blank and import a station file from the site page. The mean is optional (default: the average of maximum and minimum).</p>
          <div class="grid">
            <Field name="climateSource" label="Source" values={p.values} errors={p.errors} hint="Station, product and period." />
            <SpecField spec={YEARS} values={p.values} errors={p.errors} />
          </div>
          <div class="scroll">
            <table class="month-table">
              <caption>Monthly temperatures ({t})</caption>
              <thead><tr><th scope="col">Month</th>{MONTHLY_FIELDS.map((f) => <th scope="col" title={f.help}>{f.label}</th>)}</tr></thead>
              <tbody>
                {MONTHS.map((name, i) => (
                  <tr>
                    <th scope="row">{name}</th>
                    {MONTHLY_FIELDS.map((f) => <MonthInput name={mf(i + 1, f.form)} label={`${monthName(i + 1)} ${f.label.toLowerCase()} (${t})`} values={p.values} errors={p.errors} />)}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </Section>
        <p class="actions"><button type="submit" class="primary">Save site</button> <a href={p.cancel}>Cancel</a></p>
      </PostForm>
    </>
  );
}

export interface DesignTemperatureView {
  readonly used_c?: number;
  readonly source: 'given' | 'climate' | 'none';
  readonly hottestMonth?: number;
  readonly hottestMonthMean_c?: number;
  readonly art_c?: number;
  readonly maxMeanMaxMonth?: number;
  readonly maxMeanMax_c?: number;
  readonly monthsDiffer?: boolean;
  readonly olderFormula_c?: number;
  readonly warnings: readonly (string | CoreNotice)[];
}

export interface RunwayView {
  readonly index: number;
  readonly runway: RunwayInput;
  readonly length_m?: number;
  readonly effectiveGradient?: number;
  readonly elevationDifference_m?: number;
  readonly directions: readonly { designator: string; tora_m: number; toda_m: number; asda_m: number; lda_m: number; stopway_m?: number; clearway_m?: number; slope?: number }[];
  readonly chart?: ChartModel;
  readonly warnings: readonly (string | CoreNotice)[];
}

export interface SiteDetailProps {
  readonly id: number;
  readonly site: SiteInput;
  readonly design: DesignTemperatureView;
  readonly climateChart?: ChartModel;
  readonly runways: readonly RunwayView[];
  readonly usedBy: readonly { id: number; name: string }[];
  readonly climateImport: { readonly values: Values; readonly problems: readonly string[] };
  readonly notice?: string;
}

function DesignTemperature(p: { d: DesignTemperatureView }) {
  const { units } = useView();
  const d = p.d;
  if (d.source === 'none') return <p class="notice notice-error">No design temperature yet: enter the monthly climate or a design temperature, or import a station file below.</p>;
  return (
    <div class="design-temp">
      <p class="headline">Design temperature: <strong>{fmt(d.used_c, 'temperature', units)}</strong>{' '}
        <span class="muted">({d.source === 'given' ? 'entered for the site' : 'derived from the monthly climate'})</span></p>
      {d.art_c !== undefined ? (
        <table class="compact">
          <caption>Hottest month, by both criteria</caption>
          <tbody>
            <tr><th scope="row">Hottest month by mean temperature (aerodrome reference temperature)</th>
              <td>{monthName(d.hottestMonth!)} (mean {fmt(d.hottestMonthMean_c, 'temperature', units)})</td>
              <td class="num"><strong>{fmt(d.art_c, 'temperature', units)}</strong> mean daily maximum</td></tr>
            <tr><th scope="row">Month with the highest mean daily maximum</th>
              <td>{monthName(d.maxMeanMaxMonth!)}</td>
              <td class="num">{fmt(d.maxMeanMax_c, 'temperature', units)}</td></tr>
            {d.olderFormula_c !== undefined ? (
              <tr><th scope="row">Older formula Ta + (Tm − Ta)/3, hottest month</th><td></td><td class="num">{fmt(d.olderFormula_c, 'temperature', units)}</td></tr>
            ) : null}
          </tbody>
        </table>
      ) : null}
      {d.monthsDiffer ? <p class="notice">The two criteria pick different months; the design uses the mean daily maximum of the hottest month by mean temperature.</p> : null}
      <Warnings items={d.warnings} title="Climate notes" />
    </div>
  );
}

function ClimateImport(p: { siteId: number; values: Values; problems: readonly string[] }) {
  const v = p.values;
  return (
    <section class="panel" aria-labelledby={IDS.climateImport}>
      <h3 id={IDS.climateImport}>Import a station file</h3>
      <p class="hint">Replaces the monthly climate with the values the file gives; all or nothing. Daily records are averaged into calendar months (incomplete months are left out). Large files take a few seconds.</p>
      <PostForm action={`/sites/${p.siteId}/climate/import`} multipart label="Import a station file" scrollTo={`#${IDS.climateImport}`}>
        <ImportProblems what="The station file" problems={p.problems} />
        <div class="grid">
          <div class="field"><label for="f-climate-file">File</label><input id="f-climate-file" type="file" name="file" accept=".csv,.txt,text/csv" /></div>
          <SelectField name="format" label="Format" values={v} errors={{}} options={[
            { value: 'ghcn-daily', label: 'GHCN-Daily station CSV' },
            { value: 'station-daily', label: 'Station daily CSV with a header' },
            { value: 'monthly-normals', label: 'Monthly normals CSV (°F)' },
          ]} />
          <SelectField name="unit" label="Temperature unit (station daily CSV)" values={v} errors={{}} options={[
            { value: 'c', label: '°C' }, { value: 'f', label: '°F' }, { value: 'tenths-c', label: 'tenths of °C' },
          ]} />
          <Field name="fromYear" label="First year (optional)" values={v} errors={{}} type="number" />
          <Field name="toYear" label="Last year (optional)" values={v} errors={{}} type="number" />
        </div>
        <p class="actions"><button type="submit">Import station file</button></p>
      </PostForm>
    </section>
  );
}

function RunwaySection(p: { siteId: number; r: RunwayView }) {
  const { units } = useView();
  const r = p.r;
  return (
    <section class="runway" aria-labelledby={`runway-${r.index}`}>
      <h3 id={`runway-${r.index}`}>Runway {r.runway.name} <span class="muted">({r.runway.pavement})</span></h3>
      <p class="actions">
        <a href={`/sites/${p.siteId}/runways/${r.index}/edit`}>Edit runway<span class="sr-only"> {r.runway.name}</span></a>{' '}
        <a href={`/sites/${p.siteId}/runways/${r.index}/delete`}>Delete runway<span class="sr-only"> {r.runway.name}</span></a>
      </p>
      <ul class="inline-facts">
        <li>Length: {fmtLengthBoth(r.length_m, units)}</li>
        <li>Effective gradient: {fmtSlope(r.effectiveGradient)}</li>
        <li>High − low: {fmt(r.elevationDifference_m, 'shortLength', units)}</li>
      </ul>
      <div class="two-col">
        <div class="scroll">
          <table class="compact">
            <caption>Declared distances</caption>
            <thead><tr><th scope="col">Direction</th><th scope="col" class="num">TORA</th><th scope="col" class="num">TODA</th><th scope="col" class="num">ASDA</th><th scope="col" class="num">LDA</th><th scope="col" class="num">Stopway</th><th scope="col" class="num">Clearway</th><th scope="col" class="num">Average slope</th></tr></thead>
            <tbody>
              {r.directions.map((d) => (
                <tr>
                  <th scope="row">{d.designator}</th>
                  <td class="num">{fmt(d.tora_m, 'length', units)}</td><td class="num">{fmt(d.toda_m, 'length', units)}</td>
                  <td class="num">{fmt(d.asda_m, 'length', units)}</td><td class="num">{fmt(d.lda_m, 'length', units)}</td>
                  <td class="num">{fmt(d.stopway_m, 'length', units)}</td><td class="num">{fmt(d.clearway_m, 'length', units)}</td>
                  <td class="num">{fmtSlope(d.slope)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <table class="compact">
            <caption>Centreline profile</caption>
            <thead><tr><th scope="col" class="num">Chainage</th><th scope="col" class="num">Elevation</th></tr></thead>
            <tbody>
              {r.runway.profile.map((pt) => <tr><td class="num">{fmt(pt.chainage_m, 'length', units)}</td><td class="num">{fmt(pt.elevation_m, 'altitude', units, units === 'si' ? 1 : 0)}</td></tr>)}
            </tbody>
          </table>
        </div>
        {r.chart ? <ChartSvg model={r.chart} units={units} /> : null}
      </div>
      <Warnings items={r.warnings} title="Runway checks" />
    </section>
  );
}

export function SiteDetailPage(p: SiteDetailProps) {
  const { units } = useView();
  const s = p.site;
  const t = unitSymbol('temperature', units);
  return (
    <>
      <h1>{s.name}</h1>
      {p.notice ? <Notice kind="ok">{p.notice}</Notice> : null}
      <p class="actions">
        <a class="button" href={`/sites/${p.id}/edit`}>Edit site and climate</a>{' '}
        <a class="button" href={`/sites/${p.id}/runways/new`}>Add runway</a>{' '}
        <a class="button danger" href={`/sites/${p.id}/delete`}>Delete…</a>{' '}
        <a href={`/api/sites/${p.id}`}>JSON</a>
      </p>
      <p>Aerodrome elevation: <strong>{fmt(s.elevation_m, 'altitude', units)}</strong>
        {p.usedBy.length > 0 ? <> · Used by {p.usedBy.map((u, i) => <>{i > 0 ? ', ' : ''}<a href={`/studies/${u.id}`}>{u.name}</a></>)}</> : null}</p>
      <h2>Climate and design temperature</h2>
      <DesignTemperature d={p.design} />
      {s.climate ? (
        <div class="two-col">
          <div class="scroll">
            <table class="compact">
              <caption>Monthly temperatures ({t}); source: {s.climate.source}{s.climate.years ? `, ${s.climate.years} years` : ''}</caption>
              <thead><tr><th scope="col">Month</th><th scope="col" class="num">Mean daily max.</th><th scope="col" class="num">Mean daily min.</th><th scope="col" class="num">Mean</th></tr></thead>
              <tbody>
                {[...s.climate.monthly].sort((a, b) => a.month - b.month).map((m) => (
                  <tr class={m.month === p.design.hottestMonth ? 'highlight' : undefined}>
                    <th scope="row">{MONTHS[m.month - 1]}</th>
                    <td class="num">{fmt(m.meanMax_c, 'temperature', units)}</td>
                    <td class="num">{fmt(m.meanMin_c, 'temperature', units)}</td>
                    <td class="num">{fmt(m.mean_c ?? (m.meanMin_c === undefined ? undefined : (m.meanMax_c + m.meanMin_c) / 2), 'temperature', units)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {p.climateChart ? <ChartSvg model={p.climateChart} units={units} /> : null}
        </div>
      ) : <p class="muted">No monthly climate stored.</p>}
      <ClimateImport siteId={p.id} values={p.climateImport.values} problems={p.climateImport.problems} />
      <h2>Runways</h2>
      {p.runways.length === 0 ? <p class="notice">No runways yet. <a href={`/sites/${p.id}/runways/new`}>Add one</a>: a study needs at least one.</p> : null}
      {p.runways.map((r) => <RunwaySection siteId={p.id} r={r} />)}
    </>
  );
}

/** Display strings of a stored runway's form fields. */
export function runwayFormValues(r: RunwayInput, system: UnitSystem): Record<string, string> {
  const out: Record<string, string> = {
    name: r.name,
    pavement: r.pavement,
    profile: r.profile.map((p) => `${fmtInput(p.chainage_m, 'length', system)} ${fmtInput(p.elevation_m, 'altitude', system)}`).join('\n'),
  };
  r.directions.forEach((d, i) => {
    out[df(i, 'designator')] = d.designator;
    for (const f of DIRECTION_FIELDS) out[df(i, f.form)] = fieldInputText(f, d[f.key as 'tora_m'], system);
  });
  return out;
}

const RUNWAY_LABELS: Record<string, string> = {
  name: 'Runway name', pavement: 'Pavement', profile: 'Centreline profile',
  ...Object.fromEntries([0, 1].flatMap((i) => [
    [df(i, 'designator'), `Direction ${i + 1} designator`], ...DIRECTION_FIELDS.map((f) => [df(i, f.form), `Direction ${i + 1} ${f.label}`]),
  ])),
};

export function RunwayFormPage(p: { mode: 'new' | 'edit'; siteName: string; action: string; values: Values; errors: Errors; cancel: string }) {
  const { units } = useView();
  const err = p.errors.profile;
  return (
    <>
      <h1>{p.mode === 'new' ? 'New runway' : `Edit runway ${p.values.name ?? ''}`} <span class="muted">at {p.siteName}</span></h1>
      <PostForm action={p.action} label="Runway">
        <ErrorSummary errors={p.errors} labels={RUNWAY_LABELS} />
        <Section legend="Runway">
          <div class="grid">
            <Field name="name" label="Name" values={p.values} errors={p.errors} required hint='For example "12/30".' />
            <SelectField name="pavement" label="Pavement" values={p.values} errors={p.errors} options={[{ value: 'paved', label: 'Paved' }, { value: 'grass', label: 'Grass' }]} />
          </div>
          <div class={`field wide${err ? ' has-error' : ''}`}>
            <label for={fieldId('profile')}>Centreline profile: one point per line, chainage then elevation ({unitSymbol('length', units)}, {unitSymbol('altitude', units)})</label>
            <textarea id={fieldId('profile')} name="profile" rows={8} aria-invalid={err ? 'true' : undefined} aria-describedby={err ? 'e-profile' : 'profile-hint'}>{p.values.profile ?? ''}</textarea>
            <p class="hint" id="profile-hint">Chainage from the threshold of the first direction below; the first and last points are the runway ends. Separate the two numbers with a space, comma or tab.</p>
            {err ? <p class="error" id="e-profile">{err}</p> : null}
          </div>
        </Section>
        {[0, 1].map((i) => (
          <Section legend={`Direction ${i + 1}${i === 1 ? ' (optional)' : ''}: declared distances`}>
            <div class="grid">
              <Field name={df(i, 'designator')} label="Designator" values={p.values} errors={p.errors} required={i === 0} hint="01 to 36, optionally L, C or R." />
              {DIRECTION_FIELDS.map((f) => <SpecField spec={f} name={df(i, f.form)} values={p.values} errors={p.errors} required={i === 0} />)}
            </div>
          </Section>
        ))}
        <p class="actions"><button type="submit" class="primary">Save runway</button> <a href={p.cancel}>Cancel</a></p>
      </PostForm>
    </>
  );
}
