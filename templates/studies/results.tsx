/**
 * Study results page: site and design conditions, the scenario comparison, per-scenario tables (the
 * critical aircraft and the recommended length highlighted; components of each row on demand), the
 * existing-runway assessment, warnings, charts, and the downloads. Values come from the saved result;
 * nothing is recomputed here, only formatted.
 */
import type { ChartModel, RowResult, ScenarioResult, StudyResult } from '../../core/index.js';
import { SURFACE_LABELS, componentSections } from '../../core/index.js';
import { ChartSvg } from '../charts/svg.js';
import { PostForm, Warnings } from '../components.js';
import { fmt, fmtIsaDeviation, fmtLengthBoth, fmtSlope, say } from '../format.js';
import { IDS } from '../ids.js';
import { cellText } from '../reportCells.js';
import { useView } from '../view.js';
import { UnitsNote } from './pages.js';

const shortDigest = (d: string): string => `${d.slice(0, 12)}…`;

export interface ResultsMeta {
  readonly studyId: number;
  readonly createdAt: string;
  readonly inputDigest: string;
  readonly methodVersion: string;
  /** Whether the study's inputs still match the saved result. */
  readonly current: boolean;
}

/**
 * Components of one row (the "on demand" fragment): the sections, labels and values of the
 * appendix's components table (core/report/model.ts `componentSections`), formatted by the same cell
 * formatter as the PDF, so the page and the appendix never differ in a label or a number.
 */
export function RowComponents(p: { row: RowResult }) {
  const { units } = useView();
  const r = p.row;
  return (
    <div class="components">
      {componentSections([r]).map((sec) => (
        <table class="compact">
          <caption>{sec.title}</caption>
          <tbody>
            {sec.lines.map((l) => {
              const c = l.cells[0];
              if (c === undefined) return null;
              const v = cellText(c, undefined, units);
              return <tr><th scope="row">{l.bold ? <strong>{l.label}</strong> : l.label}</th><td class={'text' in c ? undefined : 'num'}>{l.bold ? <strong>{v}</strong> : v}</td></tr>;
            })}
          </tbody>
        </table>
      ))}
      <ExistingDetail row={r} />
      {r.warnings.length > 0 ? <ul class="warnings-inline">{r.warnings.map((w) => <li>{say(w, units)}</li>)}</ul> : null}
    </div>
  );
}

function ScenarioTable(p: { s: ScenarioResult; index: number; studyId: number }) {
  const { units } = useView();
  const s = p.s;
  return (
    <section class="scenario-result" aria-labelledby={`scn-${p.index}`}>
      <h3 id={`scn-${p.index}`}>{s.name}</h3>
      <div class={`recommendation${s.recommendedLength_m === null ? ' none' : ''}`}>
        {s.recommendedLength_m === null ? (
          <p>No regular-use aircraft can operate here: no recommended length.</p>
        ) : (
          <>
            <p>Critical aircraft: <strong data-testid={`critical-${p.index}`}>{s.criticalAircraftName}</strong> ({s.governing} governs{s.runwayDesignCode ? `, runway design code ${s.runwayDesignCode}` : ''})</p>
            <p>Recommended runway length: <strong class="big" data-testid={`recommended-${p.index}`}>{fmtLengthBoth(s.recommendedLength_m, units)}</strong>
              <span class="muted"> (requirement {fmt(s.criticalRequired_m, 'length', units)}, rounded up)</span></p>
          </>
        )}
      </div>
      <div class="scroll">
        <table class="results">
          <caption>Requirements per aircraft at design conditions; {s.totalOperations.toLocaleString('en-US')} annual operations</caption>
          <thead>
            <tr>
              <th scope="col">Aircraft</th><th scope="col" class="num">Operations (group)</th><th scope="col">Regular use</th>
              <th scope="col" class="num">Takeoff mass</th><th scope="col" class="num">Takeoff</th><th scope="col" class="num">Landing</th>
              <th scope="col" class="num">Required</th><th scope="col">Governs</th><th scope="col">Code</th><th scope="col"><span class="sr-only">Components</span></th>
            </tr>
          </thead>
          <tbody>
            {s.rows.map((r, j) => {
              const critical = s.criticalAircraft === r.aircraft;
              const id = IDS.components(p.index, j);
              const url = `/studies/${p.studyId}/results/rows/${p.index}/${j}`;
              return (
                <>
                  <tr class={critical ? 'critical' : r.regularUse ? undefined : 'not-regular'}>
                    <th scope="row">{r.aircraftName}{critical ? <span class="badge">critical</span> : null}</th>
                    <td class="num">{r.annualOperations.toLocaleString('en-US')}{r.groupOperations !== r.annualOperations ? ` (${r.groupOperations.toLocaleString('en-US')})` : ''}</td>
                    <td>{r.regularUse ? 'yes' : 'no'}</td>
                    {r.status === 'ok' ? (
                      <>
                        <td class="num">{fmt(r.takeoffMass_kg, 'mass', units)}</td>
                        <td class="num">{fmt(r.requiredTakeoff_m, 'length', units)}</td>
                        <td class="num">{fmt(r.requiredLanding_m, 'length', units)}</td>
                        <td class="num"><strong>{fmt(r.required_m, 'length', units)}</strong></td>
                        <td>{r.governing}{r.governing === 'takeoff' && r.takeoff ? `: ${r.takeoff.governing}` : ''}{r.takeoff?.source ? <div class="muted small" data-testid="takeoff-source">Takeoff from: {r.takeoff.source}</div> : null}</td>
                      </>
                    ) : (
                      <td colspan={5} class="cannot">{r.plausibility && r.reason ? say(r.reason, units) : `Cannot operate: ${r.reason ? say(r.reason, units) : ''}`}</td>
                    )}
                    <td>{r.classification.runwayDesignCode} / {r.classification.aerodromeCode}</td>
                    <td><a href={url} hx-get={url} hx-target={`#${id}`} hx-swap="innerHTML" aria-controls={id}>Components<span class="sr-only"> of {r.aircraftName}</span></a></td>
                  </tr>
                  <tr class="components-row"><td colspan={10} id={id}></td></tr>
                </>
              );
            })}
          </tbody>
        </table>
      </div>
      {s.excluded.length > 0 ? <ul class="muted">{s.excluded.map((e) => <li>Not eligible: {e.aircraft}: {say(e.reason, units)}</li>)}</ul> : null}
      <Warnings items={s.warnings} title="Scenario warnings" />
    </section>
  );
}

/** One direction's verdict for one aircraft, in a few words. */
function ExistingCell(p: { e: RowResult['existing'][number]; designMass_kg: number }) {
  const { units } = useView();
  const e = p.e;
  const needed = `needs TORA ${fmt(e.takeoffRunNeeded_m, 'length', units)}, TODA ${fmt(e.takeoffDistanceNeeded_m, 'length', units)}${e.accelerateStopNeeded_m === undefined ? '' : `, ASDA ${fmt(e.accelerateStopNeeded_m, 'length', units)}`}, LDA ${fmt(e.landingNeeded_m, 'length', units)}`;
  if (e.takeoffOk && e.landingOk) return <td class="fits" title={needed}>fits</td>;
  const parts: string[] = [];
  if (!e.takeoffOk) {
    parts.push(e.maxTakeoffMass_kg === undefined ? `takeoff not possible (${e.limitedBy})` : `takeoff at most ${fmt(e.maxTakeoffMass_kg, 'mass', units)} (${e.limitedBy})`);
    if (e.payloadPenalty_kg !== undefined && e.payloadPenalty_kg > 0) parts.push(`payload −${fmt(e.payloadPenalty_kg, 'mass', units)}${e.passengersPenalty !== undefined ? ` (${Math.ceil(e.passengersPenalty)} pax)` : ''}`);
    if (e.rangePenalty_km !== undefined && e.rangePenalty_km > 0) parts.push(`or range −${fmt(e.rangePenalty_km * 1000, 'distance', units)}`);
  }
  if (!e.landingOk) parts.push(`landing short: needs ${fmt(e.landingNeeded_m, 'length', units)}, LDA ${fmt(e.lda_m, 'length', units)}`);
  return <td class="short" title={needed}>{parts.join('; ')}{e.note ? <span class="muted"> ({e.note.map((n) => say(n, units)).join(' ')})</span> : null}</td>;
}

function ExistingAssessment(p: { s: ScenarioResult; index: number }) {
  const rows = p.s.rows.filter((r) => r.status === 'ok' && r.existing.length > 0);
  if (rows.length === 0) return null;
  const dirs = rows[0]!.existing.map((e) => ({ key: `${e.runway}|${e.designator}`, label: `${e.designator}`, runway: e.runway }));
  return (
    <div class="scroll">
      <table class="results existing">
        <caption>{p.s.name}: whether each aircraft fits each existing runway direction at its design takeoff mass and design conditions (hover for the needed lengths; details under Components)</caption>
        <thead>
          <tr><th scope="col">Aircraft</th>{dirs.map((d) => <th scope="col">Runway {d.runway}, direction {d.label}</th>)}</tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr class={p.s.criticalAircraft === r.aircraft ? 'critical' : undefined}>
              <th scope="row">{r.aircraftName}</th>
              {dirs.map((d) => {
                const e = r.existing.find((x) => `${x.runway}|${x.designator}` === d.key);
                return e ? <ExistingCell e={e} designMass_kg={r.takeoffMass_kg} /> : <td>—</td>;
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The needed / declared lengths of one row against every existing runway direction (components view). */
function ExistingDetail(p: { row: RowResult }) {
  const { units } = useView();
  if (p.row.existing.length === 0) return null;
  const pair = (a: number | undefined, b: number) => `${fmt(a, 'length', units)} / ${fmt(b, 'length', units)}`;
  return (
    <table class="compact">
      <caption>Existing runways: needed / declared</caption>
      <thead><tr><th scope="col">Direction</th><th scope="col" class="num">TORA</th><th scope="col" class="num">TODA</th><th scope="col" class="num">ASDA</th><th scope="col" class="num">LDA</th><th scope="col" class="num">Greatest takeoff mass</th><th scope="col">Limited by</th></tr></thead>
      <tbody>
        {p.row.existing.map((e) => (
          <tr class={e.takeoffOk && e.landingOk ? undefined : 'short'}>
            <th scope="row">{e.runway} ({e.designator})</th>
            <td class="num">{pair(e.takeoffRunNeeded_m, e.tora_m)}</td>
            <td class="num">{pair(e.takeoffDistanceNeeded_m, e.toda_m)}</td>
            <td class="num">{e.accelerateStopNeeded_m === undefined ? '—' : pair(e.accelerateStopNeeded_m, e.asda_m)}</td>
            <td class="num">{pair(e.landingNeeded_m, e.lda_m)}</td>
            <td class="num">{fmt(e.maxTakeoffMass_kg, 'mass', units)}</td>
            <td>{e.limitedBy}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export interface ResultsPageProps {
  readonly result: StudyResult;
  readonly charts: readonly ChartModel[];
  readonly meta: ResultsMeta;
}

/** The results content (cacheable: it carries no per-user token). */
export function ResultsContent(p: ResultsPageProps) {
  const { units } = useView();
  const r = p.result;
  const site = r.site;
  const base = `/studies/${p.meta.studyId}`;
  return (
    <>
      <h1>Results: {r.name}</h1>
      <UnitsNote studyUnits={r.options.units} base={`${base}/results`} />
      <p class="muted">
        Computed {p.meta.createdAt.replace('T', ' ').slice(0, 19)} UTC · method {p.meta.methodVersion} · input digest <code title={p.meta.inputDigest}>{shortDigest(p.meta.inputDigest)}</code>
        {p.meta.current ? '' : ' · the inputs have changed since: recompute from the study page'}
      </p>
      <nav class="downloads" aria-label="Downloads">
        Download: <a href={`${base}/results.csv`} download>CSV</a> · <a href={`${base}/results.json`} download>JSON</a> · <ReportLink studyId={p.meta.studyId} />
        {' '}· <a href={base}>Back to the study</a>
      </nav>

      <h2>Design conditions</h2>
      <table class="facts">
        <tbody>
          <tr><th scope="row">Site</th><td>{site.name}</td></tr>
          <tr><th scope="row">Elevation (pressure altitude)</th><td>{fmt(site.elevation_m, 'altitude', units)}</td></tr>
          <tr><th scope="row">Design temperature</th><td>{fmt(site.designTemperature_c, 'temperature', units)} ({site.designTemperatureSource === 'climate' ? 'mean daily maximum of the hottest month' : 'entered for the site'}); {fmtIsaDeviation(site.isaDeviation_c, units)}</td></tr>
          <tr><th scope="row">Density altitude</th><td>{fmt(site.densityAltitude_m, 'altitude', units)}</td></tr>
          <tr><th scope="row">Design runway and slope</th><td>{site.designRunway}, effective gradient {fmtSlope(site.designSlope)}</td></tr>
          <tr><th scope="row">Surface</th><td>{SURFACE_LABELS[r.options.surface]}</td></tr>
        </tbody>
      </table>
      <Warnings items={site.warnings} title="Site notes" />

      <h2>Scenarios compared</h2>
      <table class="results comparison">
        <thead><tr><th scope="col">Scenario</th><th scope="col">Critical aircraft</th><th scope="col" class="num">Recommended length</th><th scope="col">Governs</th><th scope="col">Runway design code</th><th scope="col" class="num">Regular-use aircraft</th></tr></thead>
        <tbody>
          {r.comparison.map((c) => (
            <tr>
              <th scope="row">{c.scenario}</th>
              <td>{c.criticalAircraftName ?? '—'}</td>
              <td class="num"><strong>{fmtLengthBoth(c.recommendedLength_m, units)}</strong></td>
              <td>{c.governing ?? '—'}</td>
              <td>{c.runwayDesignCode ?? '—'}</td>
              <td class="num">{c.regularUseAircraft}</td>
            </tr>
          ))}
        </tbody>
      </table>

      <h2>Per scenario</h2>
      {r.scenarios.map((s, i) => <ScenarioTable s={s} index={i} studyId={p.meta.studyId} />)}

      <h2>Existing runways</h2>
      {r.scenarios.map((s, i) => <ExistingAssessment s={s} index={i} />)}

      <h2>Charts</h2>
      <div class="charts">
        {p.charts.map((c) => <ChartSvg model={c} units={units} />)}
      </div>

      <Warnings items={[...r.warnings, ...r.cautions]} title="Study warnings and cautions" />
    </>
  );
}

/**
 * The appendix link. The PDF appendix is served by /studies/:id/appendix.pdf (server/studies/report.tsx),
 * which the report module fills in.
 */
export function ReportLink(p: { studyId: number }) {
  return <a href={`/studies/${p.studyId}/appendix.pdf`} class="pdf-link">PDF appendix</a>;
}

/** Shown when there is no saved result for the current inputs: computes on load with htmx, or on click. */
export function ComputePanel(p: { studyId: number; name: string; state: 'never-saved' | 'changed'; methodChanged?: boolean; problems: readonly string[]; auto: boolean }) {
  return (
    <>
      <h1>Results: {p.name}</h1>
      {p.problems.length > 0 ? (
        <div class="error-summary" role="alert">
          <h2>The study cannot be computed yet</h2>
          <ul>{p.problems.map((x) => <li>{x}</li>)}</ul>
          <p><a href={`/studies/${p.studyId}`}>Back to the study</a></p>
        </div>
      ) : (
        <PostForm action={`/studies/${p.studyId}/run`} label="Compute the study">
          <p>{p.state === 'never-saved' ? 'This study has not been computed yet.' : p.methodChanged ? 'The last computation used an older version of the methods; the results are computed again.' : 'The inputs have changed since the last computation.'}</p>
          <p class="actions">
            <button type="submit" class="primary" id="compute-button">Compute results</button>
            <span class="computing htmx-indicator" role="status"><span class="spinner" aria-hidden="true"></span> Computing the study… large studies take a few seconds.</span>
          </p>
          {p.auto ? <span hidden hx-post={`/studies/${p.studyId}/run`} hx-trigger="load" hx-target={`#${IDS.main}`} hx-swap="outerHTML" hx-push-url="true" hx-indicator="closest form"></span> : null}
        </PostForm>
      )}
    </>
  );
}
