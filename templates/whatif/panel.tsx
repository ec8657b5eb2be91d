/**
 * The live what-if panel: conditions in the user's units, and the requirement they give. With htmx the
 * form sends a debounced GET as the user types and swaps only the result region (so the field being
 * typed in is never replaced); field errors travel as out-of-band swaps. Without JavaScript the
 * "Update" button submits the same GET and the whole page comes back.
 */
import { LANDING_RULE_LABELS, SURFACES, SURFACE_LABELS, TAKEOFF_GOVERNING_LABELS } from '../../core/index.js';
import type { DisplayKind, WhatIfOutcome } from '../../core/index.js';
import { fmt, fmtIsaDeviation, fmtLengthBoth, say, unitSymbol } from '../format.js';
import { fieldId, type Errors, type Values } from '../forms.js';
import { IDS } from '../ids.js';
import { useView } from '../view.js';

/** What the panel shows: core's what-if outcome (core/whatif.ts). */
export type WhatIfOutcomeView = WhatIfOutcome;

export interface WhatIfProps {
  /** GET URL of the panel (whole page without htmx, the result region with it). */
  readonly action: string;
  readonly values: Values;
  readonly errors: Errors;
  /** Aircraft to choose from (study page). */
  readonly aircraftChoices?: readonly { readonly value: string; readonly label: string }[];
  readonly outcome?: WhatIfOutcomeView;
  /** Requirement at the reference conditions, for the difference shown. */
  readonly baseline?: { readonly required_m?: number; readonly label: string };
  /** Problem that is not tied to one field. */
  readonly problem?: string;
  readonly intro?: string;
}

export const WHATIF_FIELDS: readonly { name: string; label: string; kind: DisplayKind; hint: string }[] = [
  { name: 'temperature', label: 'Temperature', kind: 'temperature', hint: 'Outside air temperature.' },
  { name: 'elevation', label: 'Elevation', kind: 'altitude', hint: 'Field elevation (pressure altitude).' },
  { name: 'mass', label: 'Takeoff mass', kind: 'mass', hint: 'From OEW to MTOW.' },
  { name: 'slope', label: 'Runway slope', kind: 'slopePct', hint: '+ uphill in the takeoff direction.' },
  { name: 'wind', label: 'Wind', kind: 'speed', hint: '+ headwind, − tailwind.' },
];

const errId = (name: string): string => `e-wi-${name}`;

const CASE_LABELS: Readonly<Record<string, string>> = { ...TAKEOFF_GOVERNING_LABELS, ...LANDING_RULE_LABELS };
const caseLabel = (c: string | undefined): string => (c === undefined ? '' : CASE_LABELS[c] ?? c);

function FieldError(p: { name: string; message?: string; oob?: boolean }) {
  return (
    <p class="error" id={errId(p.name)} hx-swap-oob={p.oob ? 'true' : undefined}>{p.message ?? ''}</p>
  );
}

function NumberInput(p: { name: string; value: string; error?: string; oob?: boolean }) {
  return (
    <input id={fieldId(`wi-${p.name}`)} name={p.name} type="text" inputmode="decimal" value={p.value}
      aria-describedby={`${errId(p.name)} ${fieldId(`wi-${p.name}`)}-hint`} aria-invalid={p.error ? 'true' : undefined} autocomplete="off"
      hx-swap-oob={p.oob ? 'true' : undefined} />
  );
}

const PREV_ID = 'wi-prev';

/**
 * The result region (what htmx swaps). `oob` adds the field errors as out-of-band swaps; `replaceMass`
 * (another aircraft was chosen) replaces the mass field with that aircraft's design mass; `prev`
 * records the aircraft the fields now belong to.
 */
export function WhatIfResult(p: { outcome?: WhatIfOutcomeView; baseline?: WhatIfProps['baseline']; errors: Errors; problem?: string; oob?: boolean; replaceMass?: string; prev?: string | undefined }) {
  const { units } = useView();
  const o = p.outcome;
  const hasErrors = Object.keys(p.errors).length > 0 || p.problem !== undefined;
  const rawDelta = o?.required_m !== undefined && p.baseline?.required_m !== undefined ? o.required_m - p.baseline.required_m : undefined;
  // Differences below half a metre are display noise: shown as "same as".
  const delta = rawDelta === undefined ? undefined : Math.abs(rawDelta) < 0.5 ? 0 : rawDelta;
  return (
    <>
      <div id={IDS.whatifResult} class="whatif-result" aria-live="polite" aria-atomic="true">
        {hasErrors ? (
          <div class="error-summary" role="alert">
            <p>Correct the conditions to see the requirement:</p>
            <ul>
              {p.problem ? <li>{p.problem}</li> : null}
              {Object.entries(p.errors).map(([k, m]) => <li><a href={`#${fieldId(`wi-${k}`)}`}>{WHATIF_FIELDS.find((f) => f.name === k)?.label ?? k}</a>: {m}</li>)}
            </ul>
          </div>
        ) : o === undefined ? null : (
          <>
            <p class="headline">
              Required length: <strong data-testid="whatif-required">{o.required_m !== undefined ? fmtLengthBoth(o.required_m, units) : o.impractical ? 'cannot practically operate here' : 'not possible here'}</strong>
              {o.governing ? <span class="muted"> ({o.governing} governs)</span> : null}
            </p>
            {o.impractical ? <p class="cannot" data-testid="whatif-impractical">{say(o.impractical, units)}</p> : null}
            {delta !== undefined ? (
              <p class="delta">
                {delta === 0 ? 'Same as' : `${delta > 0 ? '+' : '−'}${fmt(Math.abs(delta), 'length', units)} against`} {p.baseline!.label}
                {' '}({fmt(p.baseline!.required_m, 'length', units)}).
              </p>
            ) : null}
            <table class="compact">
              <tbody>
                <tr><th scope="row">Takeoff</th><td class="num">{o.takeoff.ok ? fmt(o.takeoff.required_m, 'length', units) : '—'}</td><td>{o.takeoff.ok ? <>{caseLabel(o.takeoff.governing)}{o.takeoff.note ? <div class="muted" data-testid="whatif-takeoff-note">{o.takeoff.note.map((n) => say(n, units)).join(' ')}</div> : null}</> : o.takeoff.impractical ? `Beyond the plausibility bound${o.plausibilityBound_m === undefined ? '' : ` (${fmt(o.plausibilityBound_m, 'length', units)})`}: cannot practically operate here.` : o.takeoff.reason ? say(o.takeoff.reason, units) : '—'}</td></tr>
                <tr><th scope="row">Landing at MLW</th><td class="num">{o.landing.ok ? fmt(o.landing.required_m, 'length', units) : '—'}</td><td>{o.landing.ok ? <>{caseLabel(o.landing.governing)}{o.landing.note ? <div class="muted">{o.landing.note.map((n) => say(n, units)).join(' ')}</div> : null}</> : o.landing.impractical ? `Beyond the plausibility bound${o.plausibilityBound_m === undefined ? '' : ` (${fmt(o.plausibilityBound_m, 'length', units)})`}: cannot practically operate here.` : o.landing.reason ? say(o.landing.reason, units) : '—'}</td></tr>
                <tr><th scope="row">Density altitude</th><td class="num">{fmt(o.densityAltitude_m, 'altitude', units)}</td><td>{fmtIsaDeviation(o.isaDeviation_c, units)}</td></tr>
                <tr><th scope="row">Speeds</th><td colspan={2}>
                  {o.v1_mps !== undefined ? `V1 ${fmt(o.v1_mps, 'speed', units)}, ` : ''}VR {fmt(o.vr_mps, 'speed', units)}, V2 {fmt(o.v2_mps, 'speed', units)}
                  {o.vref_mps !== undefined ? `, VREF ${fmt(o.vref_mps, 'speed', units)}` : ''} (true airspeed)
                </td></tr>
              </tbody>
            </table>
            {o.warnings.length > 0 ? <ul class="warnings-inline">{o.warnings.map((w) => <li>{say(w, units)}</li>)}</ul> : null}
          </>
        )}
      </div>
      {p.oob ? WHATIF_FIELDS.map((f) => <FieldError name={f.name} message={p.errors[f.name]} oob />) : null}
      {p.oob && p.replaceMass !== undefined ? <NumberInput name="mass" value={p.replaceMass} oob /> : null}
      {p.oob && p.prev !== undefined ? <input type="hidden" id={PREV_ID} name="prev" value={p.prev} hx-swap-oob="true" /> : null}
    </>
  );
}

export function WhatIfPanel(p: WhatIfProps) {
  const { units } = useView();
  return (
    <section class="whatif" aria-labelledby="whatif-title">
      <h2 id="whatif-title">What if…</h2>
      {p.intro ? <p class="muted">{p.intro}</p> : null}
      <form
        id={IDS.whatif}
        method="get"
        action={p.action}
        hx-get={p.action}
        hx-trigger="input delay:300ms, change delay:50ms"
        hx-target={`#${IDS.whatifResult}`}
        hx-swap="outerHTML"
        hx-sync="this:replace"
        hx-indicator={`#${IDS.whatif}`}
        hx-push-url="false"
      >
        <input type="hidden" name="units" value={units} />
        {p.aircraftChoices ? <input type="hidden" id={PREV_ID} name="prev" value={p.values.aircraft ?? ''} /> : null}
        <div class="whatif-grid">
          {p.aircraftChoices ? (
            <div class="field">
              <label for={fieldId('wi-aircraft')}>Aircraft</label>
              <select id={fieldId('wi-aircraft')} name="aircraft">
                {p.aircraftChoices.map((c) => <option value={c.value} selected={p.values.aircraft === c.value}>{c.label}</option>)}
              </select>
            </div>
          ) : null}
          {WHATIF_FIELDS.map((f) => {
            const err = p.errors[f.name];
            const sym = unitSymbol(f.kind, units);
            return (
              <div class={`field${err ? ' has-error' : ''}`}>
                <label for={fieldId(`wi-${f.name}`)}>{f.label}{sym ? <span class="unit"> ({sym})</span> : null}</label>
                <NumberInput name={f.name} value={p.values[f.name] ?? ''} error={err} />
                <p class="hint" id={`${fieldId(`wi-${f.name}`)}-hint`}>{f.hint}</p>
                <FieldError name={f.name} message={err} />
              </div>
            );
          })}
          <div class="field">
            <label for={fieldId('wi-surface')}>Surface</label>
            <select id={fieldId('wi-surface')} name="surface">
              {SURFACES.map((s) => <option value={s} selected={p.values.surface === s}>{SURFACE_LABELS[s]}</option>)}
            </select>
          </div>
        </div>
        <p class="actions"><button type="submit">Update</button> <span class="muted live-note">Updates as you type.</span></p>
      </form>
      <WhatIfResult outcome={p.outcome} baseline={p.baseline} errors={p.errors} problem={p.problem} />
    </section>
  );
}
