import { useEffect, useRef, useState } from 'react';
import { GLOSSARY } from '../../../shared-model/glossary/terms';

/** The help panel: the glossary of terms and symbols, opened from the sidebar in every view; Escape closes it. */
export function GlossaryPanel(props: { onClose: () => void }) {
  const closeRef = useRef<HTMLButtonElement>(null);
  const [filter, setFilter] = useState('');
  useEffect(() => {
    closeRef.current?.focus();
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') props.onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [props]);
  const needle = filter.trim().toLowerCase();
  const shown = GLOSSARY.filter((t) => needle === '' || `${t.term} ${t.meaning}`.toLowerCase().includes(needle));
  return (
    <aside
      className="glossary"
      role="dialog"
      aria-modal="false"
      aria-labelledby="glossary-title"
      data-testid="glossary"
    >
      <div className="glossary__head">
        <h2 id="glossary-title">Terms and symbols</h2>
        <button type="button" ref={closeRef} onClick={props.onClose}>
          Close
        </button>
      </div>
      <input
        type="search"
        aria-label="Find a term"
        placeholder="Find a term"
        value={filter}
        onChange={(event) => setFilter(event.target.value)}
      />
      <dl className="glossary__list">
        {shown.map((t) => (
          <div key={t.id} className="glossary__item" data-term={t.id}>
            <dt>{t.term}</dt>
            <dd>
              {t.meaning}
              <span className="glossary__source">Source: {t.source}</span>
            </dd>
          </div>
        ))}
        {shown.length === 0 ? <p className="muted">No term matches “{filter}”.</p> : null}
      </dl>
    </aside>
  );
}
