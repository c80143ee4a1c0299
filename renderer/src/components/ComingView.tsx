/** Placeholder for a view whose capability has not landed yet; says so honestly. */
export function ComingView(props: { title: string; description: string }) {
  return (
    <section className="view view--coming">
      <header className="view__header">
        <h1>{props.title}</h1>
        <span className="tag tag--muted">coming</span>
      </header>
      <p className="muted">This view is not built yet. When it lands it will: {props.description}</p>
    </section>
  );
}
