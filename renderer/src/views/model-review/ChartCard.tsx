/**
 * One card of the Model review: a section named for screen readers (`label`), its title, its figure or table,
 * and an optional note in small print under it.
 */
import type { ReactNode } from 'react';

export function ChartCard(props: { label: string; title: ReactNode; note?: ReactNode; children: ReactNode }) {
  return (
    <section className="card" aria-label={props.label}>
      <h2 className="card__title">{props.title}</h2>
      {props.children}
      {props.note ? <p className="muted small">{props.note}</p> : null}
    </section>
  );
}
