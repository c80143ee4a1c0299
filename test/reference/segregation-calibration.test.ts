/**
 * Reference tier: the calibration of the segregation magnitudes (shared-model/prediction/calibration.ts)
 * recomputed. Independent reference: dilute segregation energies of one solute atom between the centre
 * layer and the top layer of a relaxed 9-layer, 6×6 (111) slab, from LAMMPS (`lmp`, pair_style eam) with
 * the Foiles–Baskes–Daw embedded-atom potentials Debian ships (/usr/share/lammps/potentials/*_u3.eam;
 * Foiles, Baskes & Daw, Phys. Rev. B 33, 7983 (1986)); slabs built by ASE (Debian python3-ase). Lattice
 * constants: the experimental values the potentials were fitted to (from memory).
 * Prints the correlation and mean absolute error of the uncalibrated and calibrated model.
 */
import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SEGREGATION_CALIBRATION } from '../../shared-model/prediction/calibration';
import { predictPair } from '../../shared-model/prediction/predict';
import { inCi, referenceAvailable, runPythonJson } from '../support/reference-tools';

const POTENTIALS = '/usr/share/lammps/potentials';
const METALS = ['Ag', 'Au', 'Cu', 'Ni', 'Pd', 'Pt'];

function potentialsPresent(): boolean {
  if (METALS.every((m) => existsSync(`${POTENTIALS}/${m}_u3.eam`))) return true;
  const reason = `reference tier needs the *_u3.eam files in ${POTENTIALS} (Debian lammps-data)`;
  if (inCi) throw new Error(`CI=true but ${reason}`);
  console.warn(`[skipped] ${reason}`);
  return false;
}

const available = referenceAvailable({ python: 'ase', command: 'lmp' }) && potentialsPresent();

const SCRIPT = String.raw`
import json, os, subprocess, sys, tempfile
from ase.build import fcc111
from ase.io import write
job = json.load(sys.stdin)
lattice = job['lattice']; potentials = job['potentials']
def energy(work, host, solute, layer):
    slab = fcc111(host, size=(6, 6, 9), a=lattice[host], vacuum=10.0, orthogonal=True)
    z = slab.positions[:, 2]
    levels = sorted({round(v, 3) for v in z}, reverse=True)
    index = [i for i, v in enumerate(z) if abs(v - levels[layer]) < 1e-2][0]
    slab[index].symbol = solute
    write(os.path.join(work, 'slab.data'), slab, format='lammps-data', specorder=[host, solute], atom_style='atomic')
    script = '\n'.join([
        'units metal', 'atom_style atomic', 'boundary p p f', 'read_data slab.data', 'mass * 100',
        'pair_style eam',
        'pair_coeff 1 1 %s/%s_u3.eam' % (potentials, host), 'pair_coeff 2 2 %s/%s_u3.eam' % (potentials, solute),
        'thermo_style custom pe', 'minimize 1e-12 1e-8 2000 20000', 'print "EFINAL $(pe:%.8f)"'])
    with open(os.path.join(work, 'in.seg'), 'w') as f: f.write(script)
    run = subprocess.run(['lmp', '-in', 'in.seg', '-log', 'none'], cwd=work, capture_output=True, text=True, check=True)
    return float([l for l in run.stdout.splitlines() if l.startswith('EFINAL')][0].split()[1])
out = []
with tempfile.TemporaryDirectory() as work:
    for host, solute in job['pairs']:
        out.append(energy(work, host, solute, 0) - energy(work, host, solute, 4))
print(json.dumps(out))
`;

const pearson = (x: number[], y: number[]) => {
  const n = x.length;
  const mx = x.reduce((s, v) => s + v, 0) / n;
  const my = y.reduce((s, v) => s + v, 0) / n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxy += ((x[i] as number) - mx) * ((y[i] as number) - my);
    sxx += ((x[i] as number) - mx) ** 2;
    syy += ((y[i] as number) - my) ** 2;
  }
  return sxy / Math.sqrt(sxx * syy);
};
const mae = (x: number[], y: number[]) => x.reduce((s, v, i) => s + Math.abs(v - (y[i] as number)), 0) / x.length;

describe.skipIf(!available)('segregation magnitudes vs Foiles–Baskes–Daw EAM slabs (LAMMPS)', () => {
  it(
    'calibrated model: lower MAE, same correlation, and the stored factor is the least-squares one',
    { timeout: 600_000 },
    () => {
      const pairs: Array<[string, string]> = [];
      for (const host of METALS) for (const solute of METALS) if (host !== solute) pairs.push([host, solute]);
      const lattice = { Ag: 4.09, Au: 4.08, Cu: 3.615, Ni: 3.52, Pd: 3.89, Pt: 3.92 };
      const reference = runPythonJson<number[]>(SCRIPT, { pairs, lattice, potentials: POTENTIALS });
      const conditions = { xB: 0.5, diameterNm: 4, shape: 'cuboctahedron' as const, temperatureK: 600 };
      const calibrated = pairs.map(([host, solute]) => predictPair(host, solute, conditions).segregation.bInA.total);
      const old = calibrated.map((e) => e / SEGREGATION_CALIBRATION.scale);
      const fitted = old.reduce((s, e, i) => s + e * (reference[i] as number), 0) / old.reduce((s, e) => s + e * e, 0);
      const agree = calibrated.filter((e, i) => Math.sign(e) === Math.sign(reference[i] as number)).length;
      console.log(
        `dilute (111) segregation energies, ${pairs.length} pairs of ${METALS.join(' ')} vs FBD EAM (LAMMPS, relaxed slabs):\n` +
          `  uncalibrated: correlation ${pearson(old, reference).toFixed(3)}, MAE ${mae(old, reference).toFixed(3)} eV\n` +
          `  calibrated ×${SEGREGATION_CALIBRATION.scale}: correlation ${pearson(calibrated, reference).toFixed(3)}, MAE ${mae(calibrated, reference).toFixed(3)} eV\n` +
          `  least-squares factor of this run ${fitted.toFixed(3)}; signs agree in ${agree}/${pairs.length}`,
      );
      expect(Math.abs(fitted - SEGREGATION_CALIBRATION.scale)).toBeLessThan(0.01);
      expect(mae(calibrated, reference)).toBeLessThan(mae(old, reference));
      expect(pearson(calibrated, reference)).toBeGreaterThan(0.9);
    },
  );
});
