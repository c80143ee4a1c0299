/**
 * App-wide selection: the campaign the user is working in (remembered between sessions), a revision
 * counter other views reload on, and hand-offs between views (a simulation requested from a pair's
 * detail, consumed once by the Simulation view; a batch planned from Next batches, consumed once by Batch design).
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

interface AppState {
  campaignId: number | null;
  selectCampaign: (id: number | null) => void;
  /** Bumped whenever data changes in a way other views should reload for. */
  revision: number;
  bumpRevision: () => void;
  /** Switches to another view by its id in navigation.tsx (through the #/<id> address the shell follows). */
  navigate: (viewId: string) => void;
  /** A simulation asked for by another view, waiting for the Simulation view to take it. */
  pendingSimulation: SimulationRequest | null;
  /** Stores the request and opens the Simulation view. */
  requestSimulation: (request: SimulationRequest) => void;
  /** Called by the Simulation view once it has copied the request into its form. */
  clearPendingSimulation: () => void;
  /** A batch asked for by another view, waiting for Batch design to take it. */
  pendingBatchPlan: BatchPlanRequest | null;
  /** Stores the request and opens Batch design. */
  requestBatchPlan: (request: BatchPlanRequest) => void;
  /** Called by Batch design once it has copied the request into its form. */
  clearPendingBatchPlan: () => void;
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
  const [pendingSimulation, setPendingSimulation] = useState<SimulationRequest | null>(null);
  const [pendingBatchPlan, setPendingBatchPlan] = useState<BatchPlanRequest | null>(null);
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
  const requestSimulation = useCallback(
    (request: SimulationRequest) => {
      setPendingSimulation(request);
      navigate('simulation');
    },
    [navigate],
  );
  const clearPendingSimulation = useCallback(() => setPendingSimulation(null), []);
  const requestBatchPlan = useCallback(
    (request: BatchPlanRequest) => {
      setPendingBatchPlan(request);
      navigate('batch-design');
    },
    [navigate],
  );
  const clearPendingBatchPlan = useCallback(() => setPendingBatchPlan(null), []);
  const value = useMemo(
    () => ({
      campaignId,
      selectCampaign,
      revision,
      bumpRevision,
      navigate,
      pendingSimulation,
      requestSimulation,
      clearPendingSimulation,
      pendingBatchPlan,
      requestBatchPlan,
      clearPendingBatchPlan,
    }),
    [
      campaignId,
      selectCampaign,
      revision,
      bumpRevision,
      navigate,
      pendingSimulation,
      requestSimulation,
      clearPendingSimulation,
      pendingBatchPlan,
      requestBatchPlan,
      clearPendingBatchPlan,
    ],
  );
  return <AppStateContext.Provider value={value}>{props.children}</AppStateContext.Provider>;
}

export function useAppState(): AppState {
  const state = useContext(AppStateContext);
  if (!state) throw new Error('useAppState must be used inside AppStateProvider');
  return state;
}
