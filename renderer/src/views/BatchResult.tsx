/** A computed batch: particle numbers, reagent amounts, kinetic checks and the hazard block. */
import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { BatchDesign } from '../../../shared-model/recipes/design';
import { formatNumber } from '../../../shared-model/text/number-format';
import { seriesColour } from '../charts/palette';
import { HazardBlock } from './HazardBlock';

function Stat(props: { label: string; value: string; testId?: string }) {
  return (
    <div className="stat" data-testid={props.testId}>
      <span className="stat__label">{props.label}</span>
      <span className="stat__value">{props.value}</span>
    </div>
  );
}

export function BatchResult(props: { design: BatchDesign }) {
  const d = props.design;
  const atomsData = [
    { part: d.architecture === 'core@shell' ? `core (${d.coreElement})` : 'particle', atoms: d.coreAtoms },
    ...(d.architecture === 'core@shell' ? [{ part: `shell (${d.shellElement})`, atoms: d.shellAtoms }] : []),
  ];
  return (
    <div className="stack batch-result" data-testid="batch-result">
      <section className="card" aria-label="Particles">
        <h2 className="card__title">
          {d.elementA}–{d.elementB}, {d.target} <span className="muted small">· {d.routeLabel}</span>
        </h2>
        <div className="stat-grid">
          <Stat label="Atoms per particle" value={formatNumber(d.atomsPerParticle)} testId="atoms-per-particle" />
          <Stat label="Core atoms" value={formatNumber(d.coreAtoms)} />
          <Stat label="Shell atoms" value={formatNumber(d.shellAtoms)} />
          <Stat label="Diameter" value={`${formatNumber(d.diameterNm)} nm`} />
          {d.shellMonolayers !== null ? (
            <Stat
              label="Shell"
              value={`${formatNumber(d.shellThicknessNm)} nm = ${formatNumber(d.shellMonolayers, 3)} ML`}
            />
          ) : null}
          <Stat label={`Composition`} value={`${formatNumber(d.xB * 100, 3)} at.% ${d.elementB}`} />
          <Stat label="Particles" value={formatNumber(d.particles)} testId="particles" />
          <Stat
            label="Concentration"
            value={`${formatNumber(d.particlesPerMl)} /mL (${formatNumber(d.particleNanomolar, 3)} nM)`}
          />
          <Stat label="Electrons needed" value={`${formatNumber(d.electronsMmol)} mmol`} />
        </div>
        <div className="chart" aria-label="Atoms in core and shell">
          <ResponsiveContainer width="100%" height={110}>
            <BarChart data={atomsData} layout="vertical" margin={{ left: 40, right: 72, top: 4, bottom: 4 }}>
              <CartesianGrid strokeDasharray="3 3" horizontal={false} />
              <XAxis type="number" tickFormatter={(v: number) => formatNumber(v, 2)} />
              <YAxis type="category" dataKey="part" width={90} interval={0} />
              <Tooltip formatter={(v) => formatNumber(Number(v))} />
              <Bar dataKey="atoms" name="atoms" fill={seriesColour(4)} isAnimationActive={false}>
                {/* every bar carries its value */}
                <LabelList
                  dataKey="atoms"
                  position="right"
                  fontSize={12}
                  formatter={(v: unknown) => formatNumber(Number(v))}
                />
              </Bar>
            </BarChart>
          </ResponsiveContainer>
        </div>
      </section>

      <section className="card" aria-label="Reagents of this batch">
        <h2 className="card__title">Reagents</h2>
        <table className="data-table" aria-label="Batch reagents">
          <thead>
            <tr>
              <th>Reagent</th>
              <th>Formula</th>
              <th>Role</th>
              <th className="num">mmol</th>
              <th className="num">mg</th>
              <th className="num">mL</th>
              <th className="num">stock mM</th>
            </tr>
          </thead>
          <tbody>
            {d.reagents.map((r) => (
              <tr key={`${r.key}-${r.role}`} data-reagent={r.key}>
                <td>
                  {r.name}
                  {r.note ? <div className="muted small">{r.note}</div> : null}
                </td>
                <td>{r.formula}</td>
                <td>{r.role}</td>
                <td className="num">{formatNumber(r.amountMmol)}</td>
                <td className="num">{formatNumber(r.massMg)}</td>
                <td className="num">{formatNumber(r.volumeMl)}</td>
                <td className="num">{formatNumber(r.stockMm)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {d.reducer ? (
          <p className="muted small">
            Reducer: {d.reducer.halfReaction} ({d.reducer.electronsPerUnit} e⁻ per formula unit), stoichiometric{' '}
            {formatNumber(d.reducer.stoichiometricMmol)} mmol × {formatNumber(d.reducer.excess, 3)}
            {d.reducer.excessAssumed ? (
              <span data-testid="reducer-excess-assumed"> (excess assumed, none given: {d.reducer.excessBasis})</span>
            ) : null}
            .
          </p>
        ) : null}
      </section>

      {d.asMade ? (
        <section className="card" aria-label="Expected as made">
          <h2 className="card__title">Expected as made</h2>
          <p>
            As made: <strong data-testid="batch-as-made">{d.asMade.label}</strong> (
            {d.asMade.basis === 'kinetic' ? 'kinetics decide' : 'equilibrium reached'}) · after annealing:{' '}
            <strong>{d.asMade.afterAnnealing}</strong>
          </p>
          <p className="small muted" data-testid="batch-as-made-text">
            {d.asMade.text}
          </p>
          {d.asMade.oxidation !== '' ? (
            <p className="small" data-testid="batch-oxidation">
              {d.asMade.oxidation}
            </p>
          ) : null}
        </section>
      ) : null}
      <section className="card" aria-label="Checks">
        <h2 className="card__title">Kinetic and practical checks</h2>
        <p className="muted small">Safety warnings are in the hazard block below.</p>
        <ul className="check-list">
          {d.checks
            .filter((c) => c.kind !== 'hazard')
            .map((c, index) => (
              <li key={index} className={`check check--${c.severity}`} data-check={c.kind} data-severity={c.severity}>
                <span className="check__kind">{c.kind.replace(/-/g, ' ')}</span> {c.message}
              </li>
            ))}
        </ul>
      </section>

      <HazardBlock summary={d.hazardSummary} perReagent />
    </div>
  );
}
