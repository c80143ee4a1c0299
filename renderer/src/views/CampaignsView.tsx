/** Campaigns: create, rename, archive; the empty state offers the demo campaign. */
import { useState, type FormEvent } from 'react';
import type { Campaign } from '../../../shared-model/api/campaigns';
import { call } from '../api/client';
import { useFieldErrors, useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { BackupButton } from '../components/BackupButton';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import { PairsPanel } from './PairsPanel';

function CreateCampaignForm(props: { onCreated: (campaign: Campaign) => void }) {
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const { errors, general, show, clear } = useFieldErrors();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const result = await call('campaigns.create', { name, description });
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    setName('');
    setDescription('');
    props.onCreated(result.value);
  };
  return (
    <form className="card form-grid" onSubmit={submit} aria-label="New campaign" noValidate>
      <h2 className="card__title">New campaign</h2>
      <Field label="Name" name="name" error={errors.name} hint="e.g. Fuel-cell cathode screen">
        <input name="name" value={name} onChange={(event) => setName(event.target.value)} autoComplete="off" />
      </Field>
      <Field label="Description" name="description" error={errors.description} wide>
        <input
          name="description"
          value={description}
          onChange={(event) => setDescription(event.target.value)}
          autoComplete="off"
        />
      </Field>
      <div className="form-actions">
        <button type="submit" className="button--primary">
          Create campaign
        </button>
      </div>
      {general ? <Banner tone="error">{general}</Banner> : null}
    </form>
  );
}

function CampaignRow(props: { campaign: Campaign; selected: boolean; onSelect: () => void; onChanged: () => void }) {
  const { campaign } = props;
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(campaign.name);
  const { errors, general, show, clear } = useFieldErrors();
  const rename = async (event: FormEvent) => {
    event.preventDefault();
    const result = await call('campaigns.rename', { id: campaign.id, name });
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    setEditing(false);
    props.onChanged();
  };
  const toggleArchive = async () => {
    const result = await call('campaigns.archive', { id: campaign.id, archived: !campaign.archived });
    if (!result.ok) show(result.error);
    else props.onChanged();
  };
  return (
    <li
      className={`campaign-row${props.selected ? ' campaign-row--selected' : ''}${campaign.archived ? ' campaign-row--archived' : ''}`}
      data-campaign={campaign.name}
    >
      {editing ? (
        <form className="inline-form" onSubmit={rename} aria-label={`Rename ${campaign.name}`}>
          <Field label="New name" name="name" error={errors.name}>
            <input name="rename" value={name} onChange={(event) => setName(event.target.value)} autoFocus />
          </Field>
          <button type="submit">Save</button>
          <button type="button" onClick={() => setEditing(false)}>
            Cancel
          </button>
        </form>
      ) : (
        <button type="button" className="campaign-row__main" onClick={props.onSelect} aria-pressed={props.selected}>
          <span className="campaign-row__name">{campaign.name}</span>
          <span className="campaign-row__meta">
            {campaign.pairCount} {campaign.pairCount === 1 ? 'pair' : 'pairs'}
            {campaign.isDemo ? <span className="tag tag--demo">demo data</span> : null}
            {campaign.archived ? <span className="tag tag--muted">archived</span> : null}
          </span>
        </button>
      )}
      {!editing ? (
        <span className="campaign-row__actions">
          <button type="button" className="button--quiet" onClick={() => setEditing(true)}>
            Rename
          </button>
          <button type="button" className="button--quiet" onClick={toggleArchive}>
            {campaign.archived ? 'Restore' : 'Archive'}
          </button>
        </span>
      ) : null}
      {general ? <Banner tone="error">{general}</Banner> : null}
    </li>
  );
}

export function CampaignsView() {
  const { campaignId, selectCampaign, revision, bumpRevision } = useAppState();
  const [showArchived, setShowArchived] = useState(false);
  const campaigns = useQuery('campaigns.list', { includeArchived: showArchived }, `${showArchived}:${revision}`);
  const [demoError, setDemoError] = useState<string | null>(null);
  const list = campaigns.data ?? [];
  const selected = list.find((campaign) => campaign.id === campaignId) ?? null;

  const loadDemo = async () => {
    const result = await call('campaigns.loadDemo', {});
    if (!result.ok) {
      setDemoError(result.error.message);
      return;
    }
    setDemoError(null);
    selectCampaign(result.value.id);
    bumpRevision();
  };
  const changed = () => {
    bumpRevision();
  };

  return (
    <section className="view" aria-labelledby="campaigns-title">
      <header className="view__header">
        <h1 id="campaigns-title">Campaigns</h1>
        <label className="toggle">
          <input type="checkbox" checked={showArchived} onChange={(event) => setShowArchived(event.target.checked)} />{' '}
          show archived
        </label>
        <BackupButton />
      </header>
      {campaigns.error ? <Banner tone="error">{campaigns.error.message}</Banner> : null}
      {campaigns.data && list.length === 0 && !showArchived ? (
        <div className="empty-state card" data-testid="empty-state">
          <h2>No campaigns yet</h2>
          <p>
            A campaign gathers the metal pairs you are screening, the batches you plan for them and what TEM and EDX
            showed. Create your first one below, or look around in a populated example first.
          </p>
          <button type="button" className="button--primary" onClick={loadDemo}>
            Load demo campaign
          </button>
          <p className="muted small">The demo campaign holds invented data, labelled as demo everywhere it appears.</p>
          {demoError ? <Banner tone="error">{demoError}</Banner> : null}
        </div>
      ) : null}
      <div className="split">
        <div className="split__side">
          <ul className="campaign-list" aria-label="Campaigns">
            {list.map((campaign) => (
              <CampaignRow
                key={`${campaign.id}:${campaign.updatedAt}`}
                campaign={campaign}
                selected={campaign.id === campaignId}
                onSelect={() => selectCampaign(campaign.id)}
                onChanged={changed}
              />
            ))}
          </ul>
          <CreateCampaignForm
            onCreated={(campaign) => {
              selectCampaign(campaign.id);
              bumpRevision();
            }}
          />
        </div>
        <div className="split__main">
          {selected ? (
            <PairsPanel campaign={selected} onChanged={changed} />
          ) : (
            <div className="card muted">
              {list.length > 0
                ? 'Choose a campaign on the left to see its candidate pairs.'
                : 'Create a campaign to start adding metal pairs.'}
            </div>
          )}
        </div>
      </div>
    </section>
  );
}
