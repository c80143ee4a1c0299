/**
 * Simulation: a lattice Monte Carlo run of one bimetallic particle (Gupta potential, canonical swap
 * moves) computed in a worker thread. Choose the pair, composition, shape and size, temperature (or an
 * annealing schedule), seed and length; Run queues it; a progress bar with live energy and surface
 * composition traces follows it; Cancel stops it. The result: surface composition, radial profile,
 * Warren–Cowley order, the architecture label beside the analytic prediction, a picture of the
 * particle and an extended XYZ export. Stored runs can be re-opened from the list. A pair's detail in
 * the prediction views can hand its pair and conditions over (app state `pendingHandOffs.simulation`): the form
 * takes them once and says where they came from. The parts live in ./simulation/ (the form's model in
 * run-form.ts, testable without a browser).
 */
import { useEffect, useMemo, useState } from 'react';
import { useQuery } from '../api/hooks';
import { Banner } from '../components/Banner';
import { RunForm } from './simulation/RunForm';
import { RunPanel } from './simulation/RunPanel';
import { ScreenPanel } from './simulation/ScreenPanel';
import { StoredRuns } from './simulation/StoredRuns';
import './simulation/simulation.css';

export function SimulationView() {
  const options = useQuery('simulation.options', {}, 'options');
  const [tick, setTick] = useState(0);
  const runs = useQuery('simulation.list', { limit: 50 }, `runs-${tick}`);
  const [selected, setSelected] = useState<number | null>(null);
  const reload = useMemo(() => () => setTick((t) => t + 1), []);
  const list = runs.data ?? [];
  const anyActive = list.some((r) => r.status === 'queued' || r.status === 'running');
  useEffect(() => {
    if (!anyActive) return;
    const timer = setInterval(reload, 1000);
    return () => clearInterval(timer);
  }, [anyActive, reload]);

  return (
    <div className="view">
      <div className="view__header">
        <h1>Simulation</h1>
        <span className="muted">lattice Monte Carlo of one particle, computed off the window in a worker</span>
      </div>
      {options.error ? <Banner tone="error">{options.error.message}</Banner> : null}
      <div className="sim-layout">
        <div className="stack">
          {options.data ? (
            <RunForm
              elements={options.data.elements}
              mixingRule={options.data.mixingRule}
              onStarted={(run) => {
                setSelected(run.id);
                reload();
              }}
            />
          ) : null}
          <StoredRuns runs={list} selected={selected} onSelect={setSelected} />
          <ScreenPanel
            onOpen={(runId) => {
              setSelected(runId);
              reload();
            }}
          />
        </div>
        <div>
          {selected !== null ? (
            <RunPanel id={selected} onChanged={reload} />
          ) : (
            <p className="muted">Start a run or open a stored one.</p>
          )}
        </div>
      </div>
    </div>
  );
}
