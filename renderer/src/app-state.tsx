/** App-wide selection: the campaign the user is working in (remembered between sessions). */
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';

interface AppState {
  campaignId: number | null;
  selectCampaign: (id: number | null) => void;
  /** Bumped whenever data changes in a way other views should reload for. */
  revision: number;
  bumpRevision: () => void;
}

const AppStateContext = createContext<AppState | null>(null);
const STORAGE_KEY = 'pairwright.campaignId';

function rememberedCampaign(): number | null {
  const text = window.localStorage.getItem(STORAGE_KEY);
  const id = text === null ? NaN : Number(text);
  return Number.isInteger(id) && id > 0 ? id : null;
}

export function AppStateProvider(props: { children: ReactNode }) {
  const [campaignId, setCampaignId] = useState<number | null>(rememberedCampaign);
  const [revision, setRevision] = useState(0);
  const selectCampaign = useCallback((id: number | null) => {
    setCampaignId(id);
    if (id === null) window.localStorage.removeItem(STORAGE_KEY);
    else window.localStorage.setItem(STORAGE_KEY, String(id));
  }, []);
  const bumpRevision = useCallback(() => setRevision((value) => value + 1), []);
  const value = useMemo(() => ({ campaignId, selectCampaign, revision, bumpRevision }), [campaignId, selectCampaign, revision, bumpRevision]);
  return <AppStateContext.Provider value={value}>{props.children}</AppStateContext.Provider>;
}

export function useAppState(): AppState {
  const state = useContext(AppStateContext);
  if (!state) throw new Error('useAppState must be used inside AppStateProvider');
  return state;
}
