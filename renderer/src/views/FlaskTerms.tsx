/**
 * The flask-condition parts of a prediction in the pair detail: the two verdicts (as made, after
 * annealing), the adsorbate term with its coverage, the wetting criterion for demixing pairs, the
 * interdiffusion length, the oxidation outlook in air or water, and both surface-energy sources.
 */
import type { Prediction } from '../../../shared-model/prediction/predict';
import { ENVIRONMENT_LABELS } from '../../../shared-model/prediction/environment';

const signed = (x: number, digits: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(digits)}`;
const jm2 = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(2)} J/m²`;

function nm(x: number): string {
  return x >= 0.01 ? `${x.toPrecision(2)} nm` : `${x.toExponential(1)} nm`;
}

export function FlaskVerdicts(props: { prediction: Prediction }) {
  const p = props.prediction;
  return (
    <div className="flask-verdicts" aria-label="Verdicts">
      <p>
        <strong>As made</strong>: <span data-testid="verdict-as-made">{p.verdicts.asMade}</span> ·{' '}
        <strong>after annealing</strong>: <span data-testid="verdict-after-annealing">{p.verdicts.afterAnnealing}</span>
        {p.certainty.uncertain ? (
          <>
            {' '}
            · <strong data-testid="verdict-uncertain">uncertain</strong>
          </>
        ) : null}
      </p>
      <p className="small muted" data-testid="verdict-kinetics">
        {p.verdicts.text}
      </p>
    </div>
  );
}

export function FlaskTerms(props: { prediction: Prediction }) {
  const p = props.prediction;
  const a = p.adsorbate;
  const w = p.wetting;
  return (
    <div className="flask-terms small" aria-label="Conditions terms">
      <p data-testid="term-adsorbate">
        <strong>Adsorbate</strong> ({ENVIRONMENT_LABELS[p.environment]}):{' '}
        {a.adsorbate === null
          ? 'none in vacuum'
          : a.missing !== null
            ? a.missing
            : `${a.adsorbate} on ${p.elementA} ${signed(a.energyAEv ?? 0, 1)} eV, on ${p.elementB} ${signed(a.energyBEv ?? 0, 1)} eV; coverage ${a.coverage.toFixed(2)} per surface atom at ${p.pressureBar} bar → ${signed(a.termBEv, 2)} eV for ${p.elementB} at the surface${a.drawnOut ? ` (draws ${a.drawnOut} out)` : ''}; ${a.source}`}
      </p>
      <p data-testid="term-wetting">
        <strong>Wetting</strong>:{' '}
        {w === null
          ? 'the pair mixes at this temperature (no miscibility gap): no interface, no Janus question'
          : `S = γ(${w.core}) − γ(${w.shell}) − γ_AB = ${w.gammaCoreJPerM2.toFixed(2)} − ${w.gammaShellJPerM2.toFixed(2)} − ${w.interfaceJPerM2.toFixed(2)} = ${jm2(w.spreadingJPerM2)} (γ_AB: chemical ${w.interfaceChemicalJPerM2.toFixed(2)}, misfit ${w.interfaceMisfitJPerM2.toFixed(2)} of at most ${w.interfaceMisfitCapJPerM2.toFixed(2)}) → ${w.verdict}${w.flipDiameterNm !== null ? `; core@shell below ${w.flipDiameterNm.toFixed(1)} nm, Janus above` : '; the answer does not flip with size'}`}
      </p>
      <p data-testid="term-kinetics">
        <strong>Kinetics</strong>: L = √(D̃t) = {nm(p.kinetics.lengthNm)} in {p.timeH} h at {p.temperatureK} K against a
        radius of {p.kinetics.radiusNm.toFixed(1)} nm (L/r = {p.kinetics.ratio.toPrecision(2)}: {p.kinetics.regime}); L
        = r at ≈ {p.kinetics.annealingTemperatureK.toFixed(0)} K.{' '}
        {p.kinetic
          ? `Reduction order: ${p.kinetic.text} (${p.kinetic.couples.join(', ')}).`
          : 'No reduction potentials tabulated for this pair.'}
      </p>
      <p data-testid="term-oxidation">
        <strong>In air or water</strong>:{' '}
        {p.oxidation.summary !== ''
          ? p.oxidation.summary
          : `both stay metallic (${p.oxidation.elements.map((e) => `${e.oxide} ${e.formationKjPerMolO.toFixed(0)} kJ per mol O`).join(', ')})`}
      </p>
      <p data-testid="term-sources">
        <strong>Surface energies</strong>: {p.certainty.sources.note}
        {p.certainty.uncertain ? ` — within the scatter (±${p.certainty.scatterEv.toFixed(3)} eV): uncertain` : ''}.
        Terms ×{p.calibrationScale} (calibrated against EAM slab energies).
      </p>
    </div>
  );
}
