/** Building blocks of the batch-design form: a titled section, a catalog select, the props sections share. */
import type { ReactNode } from 'react';
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import type { BatchFormState } from './batch-form';

export type SetField = <K extends keyof BatchFormState>(key: K) => (value: BatchFormState[K]) => void;

export interface SectionProps {
  form: BatchFormState;
  set: SetField;
  /** Error message by input name. */
  errors: Record<string, string>;
}

export function Section(props: { title: string; children: ReactNode }) {
  return (
    <fieldset className="form-section">
      <legend>{props.title}</legend>
      <div className="form-grid">{props.children}</div>
    </fieldset>
  );
}

export function ReagentSelect(props: {
  name: string;
  value: string;
  onChange: (value: string) => void;
  options: CatalogReagent[];
  allowNone?: string;
}) {
  return (
    <select name={props.name} value={props.value} onChange={(event) => props.onChange(event.target.value)}>
      {props.allowNone !== undefined ? <option value="">{props.allowNone}</option> : null}
      {props.options.map((r) => (
        <option key={r.key} value={r.key}>
          {r.name} ({r.formula})
        </option>
      ))}
    </select>
  );
}

/** A select of the pair's two elements. */
export function ElementSelect(props: {
  name: string;
  value: string;
  elements: string[];
  onChange: (value: string) => void;
}) {
  return (
    <select name={props.name} value={props.value} onChange={(e) => props.onChange(e.target.value)}>
      {props.elements.map((el) => (
        <option key={el} value={el}>
          {el}
        </option>
      ))}
    </select>
  );
}

/** A text input for a typed number (the form model reads it: decimal comma, exponent). */
export function DecimalInput(props: { name: string; value: string; onChange: (value: string) => void }) {
  return (
    <input name={props.name} inputMode="decimal" value={props.value} onChange={(e) => props.onChange(e.target.value)} />
  );
}
