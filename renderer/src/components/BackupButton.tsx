/** "Back up now": a copy of the store into its backups folder (the folder keeps the newest N, a setting). */
import { useState } from 'react';
import { call } from '../api/client';
import { Banner } from './Banner';

export function BackupButton() {
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const backUp = async () => {
    setBusy(true);
    const result = await call('backups.create', {});
    setBusy(false);
    setMessage(
      result.ok
        ? { tone: 'info', text: `Backed up to ${result.value.path}` }
        : { tone: 'error', text: result.error.message },
    );
  };
  return (
    <div className="backup-button">
      <button type="button" onClick={backUp} disabled={busy}>
        {busy ? 'Backing up…' : 'Back up now'}
      </button>
      {message ? (
        <Banner tone={message.tone} testId="backup-result">
          {message.text}
        </Banner>
      ) : null}
    </div>
  );
}
