import type { ReactNode } from 'react';

/** A labelled input with its error message right below it (errors are shown where the user typed). */
export function Field(props: {
  label: string;
  name: string;
  error?: string | undefined;
  hint?: string;
  children: ReactNode;
  wide?: boolean;
}) {
  const errorId = `${props.name}-error`;
  return (
    <label
      className={`field${props.error ? ' field--invalid' : ''}${props.wide ? ' field--wide' : ''}`}
      data-field={props.name}
    >
      <span className="field__label">{props.label}</span>
      {props.children}
      {props.hint && !props.error ? <span className="field__hint">{props.hint}</span> : null}
      {props.error ? (
        <span className="field__error" id={errorId} role="alert" data-error-for={props.name}>
          {props.error}
        </span>
      ) : null}
    </label>
  );
}
