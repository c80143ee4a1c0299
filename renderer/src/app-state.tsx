/**
 * App-wide selection: the campaign the user is working in (remembered between sessions), a revision
 * counter other views reload on, and hand-offs between views: one pending request per target view, typed by
 * HandOffRequests (a simulation requested from a pair's detail, taken once by the Simulation view; a batch planned
 * from Next batches, taken once by Batch design). A view sends with useHandOffTo(target) and takes with
 * usePendingHandOff(target).
 */
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import type { ParticleShape } from '../../shared-model/geometry/shapes';
import type { SynthesisRoute } from '../../shared-model/recipes/design-input';

/** A lattice Monte Carlo run asked for from another view: the Simulation form opens with these values. */
export interface SimulationRequest {
  elementA: string;
  elementB: string;
  /** Atomic fraction of elementB. */
  xB: number;
  diameterNm: number;
  shape: ParticleShape;
  temperatureK: number;
  /** Where the request came from, in words ("pair detail of Pt-Ni"). */
  source: string;
}

/** A batch asked for from another view (Next batches → Plan this): Batch design opens with these values. */
export interface BatchPlanRequest {
  elementA: string;
  elementB: string;
  /** Atomic fraction of elementB. */
  xB: number;
  diameterNm: number;
  temperatureK: number;
  route: SynthesisRoute;
  /** The architecture aimed at, as Batch design's target ("alloy", "Ni@Pt"). */
  targetLabel: string;
  totalMetalMmol: number;
  /** Where the request came from, in words. */
  source: string;
}

/** What each view that takes a hand-off opens with, by its view id in navigation.tsx. */
export interface HandOffRequests {
  simulation: SimulationRequest;
  'batch-design': BatchPlanRequest;
}
export type HandOffTarget = keyof HandOffRequests;
type PendingHandOffs = { [K in HandOffTarget]?: HandOffRequests[K] };

interface AppState {
  campaignId: number | null;
  selectCampaign: (id: number | null) => void;
  /** Bumped whenever data changes in a way other views should reload for. */
  revision: number;
  bumpRevision: () => void;
  /** Switches to another view by its id in navigation.tsx (through the #/<id> address the shell follows). */
  navigate: (viewId: string) => void;
  /** Requests asked for by other views, each waiting for its target view to take it. */
  pendingHandOffs: PendingHandOffs;
  /** Stores the request for the target view and opens it. */
  handOff: <K extends HandOffTarget>(target: K, request: HandOffRequests[K]) => void;
  /** Called by the target view once it has copied the request into its form. */
  clearHandOff: (target: HandOffTarget) => void;
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
  const [pendingHandOffs, setPendingHandOffs] = useState<PendingHandOffs>({});
  const selectCampaign = useCallback((id: number | null) => {
    setCampaignId(id);
    if (id === null) window.localStorage.removeItem(STORAGE_KEY);
    else window.localStorage.setItem(STORAGE_KEY, String(id));
  }, []);
  const bumpRevision = useCallback(() => setRevision((value) => value + 1), []);
  const navigate = useCallback((viewId: string) => {
    // The shell listens to hashchange and switches views; it ignores ids it does not know.
    window.location.hash = `#/${viewId}`;
  }, []);
  const handOff = useCallback(
    <K extends HandOffTarget>(target: K, request: HandOffRequests[K]) => {
      setPendingHandOffs((current) => ({ ...current, [target]: request }));
      navigate(target);
    },
    [navigate],
  );
  const clearHandOff = useCallback(
    (target: HandOffTarget) =>
      setPendingHandOffs((current) => {
        if (current[target] === undefined) return current;
        const next = { ...current };
        delete next[target];
        return next;
      }),
    [],
  );
  const value = useMemo(
    () => ({
      campaignId,
      selectCampaign,
      revision,
      bumpRevision,
      navigate,
      pendingHandOffs,
      handOff,
      clearHandOff,
    }),
    [campaignId, selectCampaign, revision, bumpRevision, navigate, pendingHandOffs, handOff, clearHandOff],
  );
  return <AppStateContext.Provider value={value}>{props.children}</AppStateContext.Provider>;
}

export function useAppState(): AppState {
  const state = useContext(AppStateContext);
  if (!state) throw new Error('useAppState must be used inside AppStateProvider');
  return state;
}

/** The sender's side of a hand-off: stores a request for the target view and opens it. */
export function useHandOffTo<K extends HandOffTarget>(target: K): (request: HandOffRequests[K]) => void {
  const { handOff } = useAppState();
  return useCallback((request: HandOffRequests[K]) => handOff(target, request), [handOff, target]);
}

/** The target view's side: the request waiting for it (null when none), and `clear` once it is taken. */
export function usePendingHandOff<K extends HandOffTarget>(
  target: K,
): { pending: HandOffRequests[K] | null; clear: () => void } {
  const { pendingHandOffs, clearHandOff } = useAppState();
  const pending: HandOffRequests[K] | null = pendingHandOffs[target] ?? null;
  const clear = useCallback(() => clearHandOff(target), [clearHandOff, target]);
  return { pending, clear };
}
