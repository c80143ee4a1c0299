/** A finished run: headline numbers, the prediction beside it, radial profile, picture, traces, XYZ export. */
import { useState } from 'react';
import type { SimulationRun } from '../../../../shared-model/api/simulation';
import type { SimulationResult } from '../../../../shared-model/montecarlo/simulate';
import { CLOSED_SHELL_RULE } from '../../../../shared-model/geometry/closed-shells';
import { shapeLabel } from '../../../../shared-model/geometry/shapes';
import { call } from '../../api/client';
import { plusMinus } from '../../charts/chart-numbers';
import { Banner } from '../../components/Banner';
import { num, pct } from './format';
import { ParticlePicture } from './ParticlePicture';
import { PredictionBeside } from './PredictionBeside';
import { RadialProfile } from './RadialProfile';
import { Traces } from './Traces';
import { resultPoints } from './traces';

/** How the cluster's size was chosen, in words: the one closed-shell rule when a diameter was asked. */
function sizeRuleText(diameterNm: number | null, geometry: SimulationResult['geometry']): string {
  const shells =
    geometry.shape === 'truncated-octahedron' ? `${geometry.shells + 1} atoms per edge` : `${geometry.shells} shells`;
  const built = `${geometry.atoms} atoms: ${shapeLabel(geometry.shape)}, ${shells}, volume-equivalent diameter ${geometry.equivalentDiameterNm.toFixed(2)} nm`;
  if (geometry.shape === 'sphere')
    return `${geometry.atoms} atoms: the fcc sites within half the diameter of a central atom.`;
  return diameterNm === null
    ? `${built} (size given as shells).`
    : `${built}: for ${diameterNm} nm, ${CLOSED_SHELL_RULE} (the same rule as the prediction's atom count).`;
}

function Stat(props: { label: string; value: string; testId?: string }) {
  return (
    <div className="sim-stat">
      <span className="sim-stat__label">{props.label}</span>
      <span className="sim-stat__value" data-testid={props.testId}>
        {props.value}
      </span>
    </div>
  );
}

async function downloadXyz(id: number, onError: (message: string) => void): Promise<void> {
  const result = await call('simulation.exportXyz', { id });
  if (!result.ok) {
    onError(result.error.message);
    return;
  }
  const url = URL.createObjectURL(new Blob([result.value.content], { type: 'chemical/x-xyz' }));
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = result.value.fileName;
  anchor.dataset.testid = 'xyz-download';
  document.body.appendChild(anchor);
  anchor.click();
  anchor.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function ResultPanel(props: { run: SimulationRun; result: SimulationResult }) {
  const { run, result } = props;
  const [error, setError] = useState<string | null>(null);
  const eq = result.equilibration;
  // the standard error to its second significant digit (a 0.0004 error is not "± 0.0")
  const surfaceB = `${plusMinus(100 * result.surfaceXB, 100 * result.surfaceXBStandardError, 1)} %`;
  // Runs stored before relaxation and separation were added carry neither.
  const stored = result as Partial<SimulationResult>;
  const relaxation = stored.relaxation;
  const separation = stored.separation;
  const stopping = stored.stopping;
  return (
    <div className="stack" data-testid="sim-result">
      <PredictionBeside result={result} temperatureK={run.spec.temperatureK} />
      <div className="sim-stats">
        <Stat
          label={`surface ${result.elementA}`}
          value={pct(result.surfaceFraction[result.elementA] ?? 0)}
          testId="sim-surface-a"
        />
        <Stat label={`surface ${result.elementB}`} value={surfaceB} testId="sim-surface-b" />
        <Stat label="Warren–Cowley order, 1st shell" value={num(result.warrenCowley, 3)} testId="sim-warren-cowley" />
        <Stat label="energy per atom" value={`${result.energyPerAtomEv.toFixed(4)} eV`} />
        <Stat label="mixing energy" value={`${(1000 * result.mixingEnergyPerAtomEv).toFixed(1)} meV/atom`} />
        <Stat label="atoms / surface sites" value={`${result.atoms} / ${result.surfaceSites}`} testId="sim-atoms" />
        <Stat label="acceptance" value={pct(result.acceptance)} />
        <Stat label="speed" value={`${Math.round(result.attemptsPerSecond).toLocaleString('en-US')} /s`} />
        {stopping ? (
          <Stat
            label="sweeps taken"
            value={`${stopping.sweepsTaken}${stopping.stoppedAtAnswer ? ' (stopped at the answer)' : ''}`}
            testId="sim-sweeps-taken"
          />
        ) : null}
        {separation ? (
          <>
            <Stat
              label="centres of mass apart"
              value={`${separation.centreOfMassDistanceAngstrom.toFixed(2)} Å (${num(separation.centreOfMassOffset, 2)} R)`}
              testId="sim-com-offset"
            />
            <Stat
              label="A–B interface"
              value={`${separation.interfaceAtoms} atoms, ≈${separation.interfaceAreaNm2.toFixed(1)} nm²`}
              testId="sim-interface"
            />
            <Stat
              label="connected domains"
              value={Object.entries(separation.domains)
                .map(([symbol, d]) => `${symbol} ${d.domains}`)
                .join(', ')}
              testId="sim-domains"
            />
          </>
        ) : null}
      </div>
      {relaxation ? (
        <p className="small" data-testid="sim-relaxation">
          <strong>{relaxation.mode === 'relaxed' ? 'Relaxed run' : 'Rigid lattice'}</strong> ({relaxation.reason}):{' '}
          {relaxation.design}
          {relaxation.displacementStepAngstrom !== null
            ? `; displacement step ${relaxation.displacementStepAngstrom.toFixed(3)} Å, acceptance ${pct(relaxation.displacementAcceptance ?? 0)}`
            : ''}
          ; swap acceptance {pct(relaxation.swapAcceptance)}.
        </p>
      ) : null}
      <p className="small muted" data-testid="sim-size-rule">
        {sizeRuleText(run.spec.diameterNm ?? null, result.geometry)}
      </p>
      <p className="small muted" data-testid="sim-kinetic-note">
        {result.kineticNote ?? ''}
      </p>
      <p className="small muted">
        {eq.equilibrated ? 'Equilibrated' : 'Not equilibrated (energy still drifting in the last quarters: run longer)'}
        ; averages from sweep {eq.equilibratedFromSample + (run.spec.anneal?.sweeps ?? 0) + 1}. Unlike pairs:{' '}
        {result.pairRule.description}. Sites at the Vegard spacing {result.geometry.nearestNeighbourAngstrom.toFixed(3)}{' '}
        Å; engine {result.engineVersion}.
      </p>
      <div className="sim-charts">
        <RadialProfile result={result} />
        <ParticlePicture
          spec={run.spec}
          occupation={result.finalOccupation}
          elementA={result.elementA}
          elementB={result.elementB}
          positions={stored.finalPositionsAngstrom ?? null}
        />
      </div>
      <Traces
        points={resultPoints(result)}
        elementB={result.elementB}
        xB={result.xB}
        averages={{
          fromSweep: eq.equilibratedFromSample + (run.spec.anneal?.sweeps ?? 0) + 1,
          energyPerAtomEv: result.meanEnergyEv / result.atoms,
          surfaceXB: result.surfaceXB,
        }}
      />
      <div className="form-actions">
        <button type="button" onClick={() => downloadXyz(run.id, setError)}>
          Export extended XYZ
        </button>
      </div>
      {error ? <Banner tone="error">{error}</Banner> : null}
    </div>
  );
}
