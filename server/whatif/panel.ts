/**
 * The what-if panel's one presenter, for the study page and the aircraft page: starting conditions
 * (rounded as a planner types them and read back), the baseline there, the submitted conditions read
 * in the user's units, and core's what-if (core/whatif.ts) on them. Each keystroke computes once: the
 * baseline, the same for every keystroke of a panel, is kept in a small cache (core's what-if is pure).
 */
import { InputDomainError, whatIf, type AircraftProfile, type UnitSystem, type WhatIfConditions, type WhatIfInput, type WhatIfOutcome } from '../../core/index.js';
import type { WhatIfProps } from '../../templates/whatif/index.js';
import type { FormValues } from '../common/formFields.js';
import { hasWhatIfFields, readWhatIfForm, startingConditions } from './form.js';
import { Lru } from '../web/lru.js';

export interface WhatIfPanelSpec {
  /** GET URL of the panel. */
  readonly action: string;
  readonly intro: string;
  /** Words for the starting point, e.g. "the design conditions". */
  readonly baselineLabel: string;
  /** The aircraft the panel computes for. */
  readonly aircraft: AircraftProfile;
  /** Its starting conditions (exact; the panel rounds them as typed). */
  readonly start: WhatIfConditions;
  /** Aircraft to choose from (study page); choosing another resets the mass to its start. */
  readonly choices?: readonly { readonly value: string; readonly label: string }[];
  /** Study options the what-if follows (landing temperature, operating rules). */
  readonly options?: Pick<WhatIfInput, 'landingTemperature' | 'operatingRules'>;
}

export interface WhatIfPanelState {
  readonly props: WhatIfProps;
  /** The submitted conditions were refused (fields or a core range). */
  readonly invalid: boolean;
  /** The mass field's new value when another aircraft was chosen (sent out of band). */
  readonly replaceMass?: string;
}

type Run = { outcome?: WhatIfOutcome; problem?: string };

const baselines = new Lru<string, Run>(256);

function run(input: WhatIfInput): Run {
  try {
    return { outcome: whatIf(input) };
  } catch (e) {
    if (e instanceof InputDomainError) return { problem: e.message };
    throw e;
  }
}

function baselineRun(input: WhatIfInput): Run {
  // Built the same way for every keystroke of a panel, so the text is a stable key.
  const key = JSON.stringify(input);
  let r = baselines.get(key);
  if (r === undefined) baselines.set(key, (r = run(input)));
  return r;
}

/** The panel for `spec` and the request's query (a submitted panel or none). */
export function whatIfPanel(spec: WhatIfPanelSpec, query: FormValues, units: UnitSystem): WhatIfPanelState {
  const a = spec.aircraft;
  const start = startingConditions(spec.start, units, a);
  const inputAt = (c: WhatIfConditions): WhatIfInput => ({ aircraft: a, ...c, ...spec.options });
  const base = baselineRun(inputAt(start.conditions));
  const common = {
    action: spec.action,
    intro: spec.intro,
    ...(spec.choices ? { aircraftChoices: spec.choices } : {}),
    baseline: { required_m: base.outcome?.required_m, label: spec.baselineLabel },
  };
  const withChoice = (v: Record<string, string>): Record<string, string> => (spec.choices ? { ...v, aircraft: a.id } : v);
  if (!hasWhatIfFields(query)) {
    return { props: { ...common, values: withChoice(start.values), errors: {}, ...base }, invalid: base.problem !== undefined };
  }
  // Another aircraft chosen (study page): its own starting mass replaces the mass field.
  const changed = spec.choices !== undefined && query.prev !== undefined && query.prev !== a.id;
  const values: Record<string, string> = withChoice({ ...query });
  if (changed) values.mass = start.values.mass!;
  const replace = changed ? { replaceMass: start.values.mass! } : {};
  const read = readWhatIfForm(values, units, a);
  if (!read.ok) return { props: { ...common, values, errors: read.errors }, invalid: true, ...replace };
  const r = run(inputAt(read.value));
  return { props: { ...common, values, errors: {}, ...r }, invalid: r.problem !== undefined, ...replace };
}
