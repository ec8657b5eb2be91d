/**
 * Form building blocks: labelled inputs with an error element beside each, an error summary linking to
 * the fields, and select boxes. Number inputs are text inputs with a decimal keypad: the server checks
 * them (and answers 422 with the raw values), so the browser never silently refuses what was typed.
 */
import type { Child } from 'hono/jsx';
import type { DisplayKind, InputFieldSpec } from '../core/index.js';
import { unitSymbol } from './format.js';
import { useView } from './view.js';

export type Values = Readonly<Record<string, string>>;
export type Errors = Readonly<Record<string, string>>;

export const fieldId = (name: string): string => `f-${name.replace(/[^A-Za-z0-9_-]/g, '-')}`;
const errorId = (name: string): string => `e-${name.replace(/[^A-Za-z0-9_-]/g, '-')}`;

export interface FieldProps {
  readonly name: string;
  readonly label: string;
  readonly values: Values;
  readonly errors: Errors;
  /** Quantity shown: adds the unit to the label; numbers get a decimal keypad. */
  readonly kind?: DisplayKind;
  readonly hint?: string;
  readonly required?: boolean;
  readonly type?: 'text' | 'number' | 'search' | 'password';
  readonly autocomplete?: string;
  /** Extra attributes (e.g. hx-* for live panels). */
  readonly attrs?: Record<string, string>;
  readonly class?: string;
}

export function Field(p: FieldProps) {
  const { units } = useView();
  const sym = p.kind === undefined ? '' : unitSymbol(p.kind, units);
  const err = p.errors[p.name];
  const describedBy = [err ? errorId(p.name) : '', p.hint ? `${fieldId(p.name)}-hint` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div class={`field${err ? ' has-error' : ''}${p.class ? ` ${p.class}` : ''}`}>
      <label for={fieldId(p.name)}>
        {p.label}
        {sym ? <span class="unit"> ({sym})</span> : null}
        {p.required ? <span class="req" aria-hidden="true"> *</span> : null}
      </label>
      <input
        id={fieldId(p.name)}
        name={p.name}
        type={p.type === 'number' || p.type === undefined ? 'text' : p.type}
        inputmode={p.kind !== undefined || p.type === 'number' ? 'decimal' : undefined}
        value={p.values[p.name] ?? ''}
        aria-invalid={err ? 'true' : undefined}
        aria-describedby={describedBy}
        aria-required={p.required ? 'true' : undefined}
        autocomplete={p.autocomplete ?? 'off'}
        {...(p.attrs ?? {})}
      />
      {p.hint ? <p class="hint" id={`${fieldId(p.name)}-hint`}>{p.hint}</p> : null}
      {err ? <p class="error" id={errorId(p.name)}>{err}</p> : null}
    </div>
  );
}

/**
 * The input of a row of a field table (core/studyFields.ts): label, unit, hint and required mark come
 * from the row. `name` overrides the field name in repeated groups; `required` overrides the row's.
 */
export function SpecField(p: { spec: InputFieldSpec; name?: string; label?: string; values: Values; errors: Errors; required?: boolean }) {
  return (
    <Field name={p.name ?? p.spec.form} label={p.label ?? p.spec.label} kind={p.spec.kind} hint={p.spec.help}
      required={p.required ?? !p.spec.optional} values={p.values} errors={p.errors} />
  );
}

export interface SelectProps {
  readonly name: string;
  readonly label: string;
  readonly values: Values;
  readonly errors: Errors;
  readonly options: readonly { readonly value: string; readonly label: string }[];
  readonly hint?: string;
  readonly attrs?: Record<string, string>;
}

export function SelectField(p: SelectProps) {
  const err = p.errors[p.name];
  const current = p.values[p.name] ?? '';
  return (
    <div class={`field${err ? ' has-error' : ''}`}>
      <label for={fieldId(p.name)}>{p.label}</label>
      <select id={fieldId(p.name)} name={p.name} aria-invalid={err ? 'true' : undefined} aria-describedby={err ? errorId(p.name) : undefined} {...(p.attrs ?? {})}>
        {p.options.map((o) => <option value={o.value} selected={o.value === current}>{o.label}</option>)}
      </select>
      {p.hint ? <p class="hint">{p.hint}</p> : null}
      {err ? <p class="error" id={errorId(p.name)}>{err}</p> : null}
    </div>
  );
}

/** A summary of every field error at the top of a form, each linking to its field. */
export function ErrorSummary(p: { errors: Errors; labels?: Readonly<Record<string, string>>; general?: readonly string[] }) {
  const entries = Object.entries(p.errors);
  const general = p.general ?? [];
  if (entries.length === 0 && general.length === 0) return null;
  const n = entries.length + general.length;
  return (
    <div class="error-summary" role="alert" tabindex={-1}>
      <h2>{n === 1 ? 'There is a problem' : `There are ${n} problems`}; nothing was saved</h2>
      <ul>
        {general.map((g) => <li>{g}</li>)}
        {entries.map(([name, msg]) => (
          <li><a href={`#${fieldId(name)}`}>{p.labels?.[name] ?? name}</a>: {msg}</li>
        ))}
      </ul>
    </div>
  );
}

/** A fieldset with a legend. */
export function Section(p: { legend: string; children?: Child; class?: string; id?: string }) {
  return (
    <fieldset class={`section${p.class ? ` ${p.class}` : ''}`} id={p.id}>
      <legend>{p.legend}</legend>
      {p.children}
    </fieldset>
  );
}
