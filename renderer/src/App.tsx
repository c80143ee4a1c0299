import { useEffect, useState } from 'react';
import { transport } from './api/client';
import { useQuery } from './api/hooks';
import { AppStateProvider, useAppState } from './app-state';
import { GlossaryPanel } from './components/GlossaryPanel';
import { VIEWS } from './navigation';

const VIEW_KEY = 'pairwright.view';

function initialView(): string {
  const fromHash = window.location.hash.replace(/^#\/?/, '');
  if (VIEWS.some((view) => view.id === fromHash)) return fromHash;
  const remembered = window.localStorage.getItem(VIEW_KEY);
  return VIEWS.some((view) => view.id === remembered) ? (remembered as string) : 'campaigns';
}

function CampaignBadge() {
  const { campaignId, selectCampaign, revision } = useAppState();
  const key = `badge:${revision}`;
  const campaigns = useQuery('campaigns.list', { includeArchived: true }, key);
  const current = campaigns.data?.find((campaign) => campaign.id === campaignId);
  // Whatever view opens first, work in the most recently used active campaign until the user picks another.
  const fallbackId = campaigns.data?.find((campaign) => !campaign.archived)?.id ?? null;
  // Only a list loaded after the last change may overrule the choice: a campaign just created (selected and
  // the revision bumped together) is not yet in the list loaded before it.
  const fresh = campaigns.loadedKey === key;
  useEffect(() => {
    if (fresh && campaigns.data && !current && fallbackId !== null) selectCampaign(fallbackId);
  }, [fresh, campaigns.data, current, fallbackId, selectCampaign]);
  return (
    <div className="sidebar__campaign" data-testid="current-campaign">
      <span className="sidebar__caption">Campaign</span>
      <span className="sidebar__campaign-name">{current ? current.name : 'none chosen'}</span>
      {current?.isDemo ? <span className="tag tag--demo">demo data</span> : null}
    </div>
  );
}

function Shell() {
  const [viewId, setViewId] = useState(initialView);
  const [glossaryOpen, setGlossaryOpen] = useState(false);
  useEffect(() => {
    window.localStorage.setItem(VIEW_KEY, viewId);
    if (window.location.hash !== `#/${viewId}`) window.history.replaceState(null, '', `#/${viewId}`);
  }, [viewId]);
  useEffect(() => {
    const onHash = () => {
      const id = window.location.hash.replace(/^#\/?/, '');
      if (VIEWS.some((view) => view.id === id)) setViewId(id);
    };
    window.addEventListener('hashchange', onHash);
    return () => window.removeEventListener('hashchange', onHash);
  }, []);
  const active = VIEWS.find((view) => view.id === viewId) ?? VIEWS[0];
  const groups = [...new Set(VIEWS.map((view) => view.group))];
  const ActiveView = active?.component;
  return (
    <div className="app">
      <nav className="sidebar" aria-label="Views">
        <div className="brand">
          <span className="brand__mark" aria-hidden="true">
            <svg viewBox="0 0 32 32" width="28" height="28">
              <circle cx="12" cy="16" r="9" fill="#c9a227" />
              <circle cx="20" cy="16" r="9" fill="#3f7f8c" fillOpacity="0.85" />
            </svg>
          </span>
          <span className="brand__name">Pairwright</span>
        </div>
        <CampaignBadge />
        {groups.map((group) => (
          <div className="sidebar__group" key={group}>
            <span className="sidebar__caption">{group}</span>
            {VIEWS.filter((view) => view.group === group).map((view) => (
              <button
                type="button"
                key={view.id}
                className={`nav-item${view.id === viewId ? ' nav-item--active' : ''}`}
                aria-current={view.id === viewId ? 'page' : undefined}
                onClick={() => setViewId(view.id)}
                data-view={view.id}
              >
                {view.label}
                {!view.ready ? <span className="nav-item__soon">coming</span> : null}
              </button>
            ))}
          </div>
        ))}
        <button
          type="button"
          className="nav-item nav-item--help"
          onClick={() => setGlossaryOpen(true)}
          data-testid="open-glossary"
        >
          Terms and symbols
        </button>
        <p className="sidebar__footnote">
          {transport() === 'desktop' ? 'Desktop app' : 'Browser host on this computer'}. Recipes and hazard notes assist
          you; they never replace the supplier's SDS or your institution's rules.
        </p>
      </nav>
      <main className="content">{ActiveView ? <ActiveView /> : null}</main>
      {glossaryOpen ? <GlossaryPanel onClose={() => setGlossaryOpen(false)} /> : null}
    </div>
  );
}

export function App() {
  return (
    <AppStateProvider>
      <Shell />
    </AppStateProvider>
  );
}
