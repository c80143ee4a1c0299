/** Observed architecture (confirm the suggestion or override it), prediction vs outcome, notes and file paths. */
import { useState, type FormEvent } from 'react';
import {
  OUTCOME_FILE_KINDS,
  type BatchOutcome,
  type OutcomeFileKind,
  type RecordedOutcome,
} from '../../../../shared-model/api/outcomes';
import { describeArchitecture } from '../../../../shared-model/architecture/labels';
import { labelAgreement } from '../../../../shared-model/characterization/confusion';
import { call } from '../../api/client';
import { useFieldErrors } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { partError } from './part-error';

export function observedChoices(a: string, b: string): string[] {
  return [
    'alloy',
    'surface-enriched alloy',
    `${a}@${b}`,
    `${b}@${a}`,
    'Janus',
    'intermetallic',
    'hollow',
    'other',
    'unknown',
  ];
}

const AGREEMENT_TEXT = {
  agree: 'agrees',
  'same kind': 'same kind, elements the other way round',
  disagree: 'differs',
} as const;

export function ObservedPanel(props: { outcome: BatchOutcome; onChanged: (recorded?: RecordedOutcome) => void }) {
  const { outcome } = props;
  const choices = observedChoices(outcome.elementA, outcome.elementB);
  const [override, setOverride] = useState(outcome.observed?.label ?? outcome.suggestion?.label ?? 'alloy');
  const [reason, setReason] = useState('');
  const [notes, setNotes] = useState(outcome.notes);
  const [path, setPath] = useState('');
  const [kind, setKind] = useState<OutcomeFileKind>('image');
  const [fileNote, setFileNote] = useState('');
  const observedErrors = useFieldErrors();
  const notesErrors = useFieldErrors();
  const fileErrors = useFieldErrors();

  const setObserved = async (label: string, decision: 'confirmed' | 'override') => {
    const result = await call('outcomes.record', { batchId: outcome.batchId, observed: { label, decision, reason } });
    if (!result.ok) {
      observedErrors.show(partError(result.error, 'observed'));
      return;
    }
    observedErrors.clear();
    setReason('');
    props.onChanged(result.value);
  };
  const saveNotes = async (event: FormEvent) => {
    event.preventDefault();
    const result = await call('outcomes.record', { batchId: outcome.batchId, notes });
    if (!result.ok) notesErrors.show(result.error);
    else {
      notesErrors.clear();
      props.onChanged(result.value);
    }
  };
  const addFile = async (event: FormEvent) => {
    event.preventDefault();
    const result = await call('outcomes.record', { batchId: outcome.batchId, files: [{ path, kind, note: fileNote }] });
    if (!result.ok) {
      // One file per submit: its fields are files.0.path, files.0.kind, files.0.note.
      fileErrors.show(partError(result.error, 'files'), { '0.path': 'path', '0.kind': 'kind', '0.note': 'note' });
      return;
    }
    fileErrors.clear();
    setPath('');
    setFileNote('');
    props.onChanged(result.value);
  };

  const observed = outcome.observed;
  return (
    <section className="card" aria-label="Observed architecture">
      <h2 className="card__title">Observed architecture</h2>
      <dl className="stat-list">
        <dt>target</dt>
        <dd>{outcome.targetLabel ?? '–'}</dd>
        <dt>predicted when planned</dt>
        <dd data-testid="predicted-label">
          {outcome.predictions.length === 0
            ? 'no prediction stored before this batch was planned'
            : outcome.predictions
                .map((p) => `${p.label} (${p.source}${p.modelVersion ? `, ${p.modelVersion}` : ''})`)
                .join('; ')}
        </dd>
        <dt>suggested from the line scan</dt>
        <dd data-testid="suggested-label">
          {outcome.suggestion
            ? `${outcome.suggestion.label} — ${outcome.suggestion.reason}`
            : 'import a line scan for a suggestion'}
        </dd>
        <dt>observed</dt>
        <dd data-testid="observed-label">
          {observed ? (
            <>
              <strong>{observed.label}</strong> (
              {observed.decision === 'confirmed'
                ? 'confirmed suggestion'
                : `override${observed.suggestedLabel ? ` of ${observed.suggestedLabel}` : ''}`}
              ){observed.reason ? ` — ${observed.reason}` : ''}
              <span className="muted small"> · {describeArchitecture(observed.label)}</span>
            </>
          ) : (
            'not recorded'
          )}
        </dd>
        {observed && outcome.predictions[0] ? (
          <>
            <dt>prediction vs outcome</dt>
            <dd
              className={`agreement--${labelAgreement(outcome.predictions[0].label, observed.label).replace(' ', '-')}`}
              data-testid="agreement"
            >
              {AGREEMENT_TEXT[labelAgreement(outcome.predictions[0].label, observed.label)]}
            </dd>
          </>
        ) : null}
      </dl>
      <div className="inline-form" aria-label="Set observed architecture">
        <button
          type="button"
          className="button--primary"
          disabled={!outcome.suggestion}
          onClick={() => outcome.suggestion && setObserved(outcome.suggestion.label, 'confirmed')}
        >
          Confirm suggestion
        </button>
        <Field label="Or record" name="label" error={observedErrors.errors.label ?? observedErrors.errors.decision}>
          <select name="overrideLabel" value={override} onChange={(event) => setOverride(event.target.value)}>
            {choices.map((c) => (
              <option key={c}>{c}</option>
            ))}
          </select>
        </Field>
        <Field label="Reason" name="reason" error={observedErrors.errors.reason}>
          <input
            name="reason"
            value={reason}
            onChange={(event) => setReason(event.target.value)}
            placeholder="e.g. HAADF contrast shows a shell"
          />
        </Field>
        <button type="button" onClick={() => setObserved(override, 'override')}>
          Save override
        </button>
      </div>
      {observedErrors.general ? <Banner tone="error">{observedErrors.general}</Banner> : null}

      <form onSubmit={saveNotes} aria-label="Outcome notes" noValidate>
        <Field label="Notes" name="notes" error={notesErrors.errors.notes} wide>
          <textarea name="notes" value={notes} onChange={(event) => setNotes(event.target.value)} rows={3} />
        </Field>
        <button type="submit">Save notes</button>
      </form>

      <h3>Original images and spectra</h3>
      <p className="muted small">Paths only; the files stay where they are.</p>
      <ul aria-label="Recorded files">
        {outcome.files.map((file) => (
          <li key={file.id}>
            <code>{file.path}</code> <span className="tag tag--muted">{file.kind}</span> {file.note}{' '}
            <button
              type="button"
              className="button--quiet"
              onClick={async () => {
                const result = await call('outcomes.removeFile', { id: file.id });
                if (!result.ok) fileErrors.show(result.error);
                props.onChanged();
              }}
            >
              Forget
            </button>
          </li>
        ))}
      </ul>
      <form className="inline-form" onSubmit={addFile} aria-label="Add file path" noValidate>
        <Field label="Path" name="path" error={fileErrors.errors.path}>
          <input
            name="path"
            value={path}
            onChange={(event) => setPath(event.target.value)}
            placeholder="/data/TEM/2024-05-02/batch7_012.dm4"
          />
        </Field>
        <Field label="Kind" name="kind" error={fileErrors.errors.kind}>
          <select name="kind" value={kind} onChange={(event) => setKind(event.target.value as OutcomeFileKind)}>
            {OUTCOME_FILE_KINDS.map((k) => (
              <option key={k}>{k}</option>
            ))}
          </select>
        </Field>
        <Field label="Note" name="note" error={fileErrors.errors.note}>
          <input name="fileNote" value={fileNote} onChange={(event) => setFileNote(event.target.value)} />
        </Field>
        <button type="submit">Add path</button>
      </form>
      {fileErrors.general ? <Banner tone="error">{fileErrors.general}</Banner> : null}
    </section>
  );
}
