/**
 * The Monte Carlo architecture beside the analytic prediction for the same pair, size and temperature, and
 * whether a synthesis of 1 h at that temperature reaches it (interdiffusion length against the radius).
 */
import { useMemo } from 'react';
import { describeArchitecture } from '../../../../shared-model/architecture/labels';
import type { SimulationResult } from '../../../../shared-model/montecarlo/simulate';
import { predictPair } from '../../../../shared-model/prediction/predict';
import { pct } from './format';

export function PredictionBeside(props: { result: SimulationResult; temperatureK: number }) {
  const { result } = props;
  const prediction = useMemo(() => {
    try {
      return {
        value: predictPair(result.elementA, result.elementB, {
          xB: result.xB,
          diameterNm: result.geometry.equivalentDiameterNm,
          shape: result.geometry.shape,
          temperatureK: props.temperatureK,
        }),
        error: null,
      };
    } catch (error) {
      return { value: null, error: error instanceof Error ? error.message : String(error) };
    }
  }, [result, props.temperatureK]);
  return (
    <div className="sim-compare" aria-label="Simulation beside the analytic prediction">
      <div>
        <div className="sim-stat__label">Monte Carlo</div>
        <div className="sim-stat__value" data-testid="sim-architecture">
          {result.architecture}
        </div>
        <div className="small">
          surface {result.elementB} {pct(result.surfaceXB)}; {describeArchitecture(result.architecture)}
        </div>
      </div>
      <div>
        <div className="sim-stat__label">Analytic prediction</div>
        {prediction.value ? (
          <>
            <div className="sim-stat__value" data-testid="sim-prediction-architecture">
              {prediction.value.architecture}
            </div>
            <div className="small">
              surface {result.elementB} {pct(prediction.value.surfaceXB)} (Langmuir–McLean with Wynblatt–Ku terms, same
              size and temperature)
            </div>
          </>
        ) : (
          <div className="small">no analytic prediction: {prediction.error}</div>
        )}
      </div>
      {prediction.value ? (
        <p className="small muted" data-testid="sim-kinetics" style={{ gridColumn: '1 / -1' }}>
          Both are equilibrium arrangements. In a synthesis of {prediction.value.timeH} h at {props.temperatureK} K:{' '}
          {prediction.value.verdicts.text}.
        </p>
      ) : null}
    </div>
  );
}
