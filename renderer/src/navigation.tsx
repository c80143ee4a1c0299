/**
 * The views of the app, in the order of the sidebar. An area replaces its "coming" entry with its view
 * (one line). `ready: false` marks a view whose capability has not landed yet.
 */
import type { ComponentType } from 'react';
import { ComingView } from './components/ComingView';
import { BatchDesignView } from './views/BatchDesignView';
import { BenchSheetView } from './views/BenchSheetView';
import { CampaignsView } from './views/CampaignsView';
import { ResultsView } from './views/ResultsView';
import { ModelReviewView } from './views/ModelReviewView';
import { NextBatchesView } from './views/NextBatchesView';
import { ReagentsView } from './views/ReagentsView';
import { CandidatesView } from './views/CandidatesView';
import { DescriptorMapView } from './views/DescriptorMapView';
import { SimulationView } from './views/SimulationView';

export interface ViewEntry {
  id: string;
  label: string;
  group: 'Workspace' | 'Predict' | 'Plan' | 'Learn';
  component: ComponentType;
  ready: boolean;
}

/** Placeholder for a view whose capability has not landed (exported so it stays available when every view is ready). */
export const coming = (title: string, description: string): ComponentType =>
  function Coming() {
    return <ComingView title={title} description={description} />;
  };

export const VIEWS: ViewEntry[] = [
  { id: 'campaigns', label: 'Campaigns', group: 'Workspace', component: CampaignsView, ready: true },
  { id: 'candidates', label: 'Candidates', group: 'Predict', component: CandidatesView, ready: true },
  { id: 'descriptor-map', label: 'Descriptor map', group: 'Predict', component: DescriptorMapView, ready: true },
  { id: 'simulation', label: 'Simulation', group: 'Predict', component: SimulationView, ready: true },
  { id: 'batch-design', label: 'Batch design', group: 'Plan', component: BatchDesignView, ready: true },
  { id: 'reagents', label: 'Reagents', group: 'Plan', component: ReagentsView, ready: true },
  { id: 'bench-sheet', label: 'Bench sheet', group: 'Plan', component: BenchSheetView, ready: true },
  { id: 'results', label: 'Results', group: 'Learn', component: ResultsView, ready: true },
  { id: 'model-review', label: 'Model review', group: 'Learn', component: ModelReviewView, ready: true },
  { id: 'next-batches', label: 'Next batches', group: 'Learn', component: NextBatchesView, ready: true },
];
