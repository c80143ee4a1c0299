/**
 * The bench sheet as a self-contained, printable HTML document (A4, no scripts, no outside resources). The app
 * shows it in its Bench sheet view and prints it (PDF in the desktop app, the print dialog in a browser); the CLI
 * renders the same document to PDF, so every printout of a batch is the same sheet.
 */
import { pictogramSvg } from '../hazards/pictogram-svg';
import { formatFixed } from '../text/number-format';
import type { BenchSheet } from './sheet';

/** Escapes text for element content (the sheet puts user text only between tags, never in attributes). */
const escapeHtml = (text: string): string =>
  text.replace(/[&<>]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[c] ?? c);

/** Fixed digits for amounts (tiny ones as 1.65 × 10⁻⁵); "—" where a quantity does not apply. */
export const sheetNumber = formatFixed;

export const BENCH_SHEET_CSS = `
  .bench-sheet { font-family: "DejaVu Sans", Arial, sans-serif; color: #111; font-size: 10.5pt; line-height: 1.35; }
  .bench-sheet h1 { font-size: 16pt; margin: 0 0 2mm; }
  .bench-sheet h2 { font-size: 11.5pt; margin: 5mm 0 1.5mm; border-bottom: 1px solid #999; }
  .bench-sheet table { border-collapse: collapse; width: 100%; }
  .bench-sheet th, .bench-sheet td { border: 1px solid #999; padding: 1mm 1.5mm; text-align: left; vertical-align: top; }
  .bench-sheet td.num { text-align: right; font-variant-numeric: tabular-nums; }
  .bench-sheet .meta td { border: none; padding: 0.5mm 3mm 0.5mm 0; }
  .bench-sheet .pictograms { display: flex; gap: 3mm; align-items: center; flex-wrap: wrap; }
  .bench-sheet .signal { font-size: 14pt; font-weight: 700; margin-right: 4mm; }
  .bench-sheet .fill { height: 8mm; }
  .bench-sheet .reminder { border: 2px solid #b00; padding: 2mm 3mm; margin-top: 5mm; font-weight: 600; }
  .bench-sheet .source { color: #444; font-size: 9pt; }
  .bench-sheet ol { margin: 0; padding-left: 6mm; }
  @page { size: A4; margin: 14mm; }
`;

/** The sheet's body (a `<section class="bench-sheet">`), for embedding in the app's page. */
export function benchSheetSection(sheet: BenchSheet): string {
  const e = escapeHtml;
  const reagentRows = sheet.reagents
    .map(
      (r) =>
        `<tr><td>${e(r.name)}<br><span class="source">${e(r.formula)}</span></td><td>${e(r.role)}</td>` +
        `<td class="num">${sheetNumber(r.amountMmol, 4)}</td><td class="num">${sheetNumber(r.massMg, 2)}</td>` +
        `<td class="num">${sheetNumber(r.stockMm, 1)}</td><td class="num">${sheetNumber(r.volumeMl, 3)}</td>` +
        `<td>${e(r.lot)}</td><td class="fill"></td></tr>`,
    )
    .join('');
  const makeUp =
    sheet.makeUpVolumeMl !== null
      ? `<p>Make up with ${sheetNumber(sheet.makeUpVolumeMl, 2)} mL solvent to ${sheetNumber(sheet.batchVolumeMl, 1)} mL.</p>`
      : '';
  const pictograms = sheet.pictograms.map((p) => pictogramSvg(p.code, 60)).join('');
  const hazards = sheet.hazards.map((h) => `<li><b>${e(h.code)}</b> ${e(h.text)}</li>`).join('');
  const precautions = sheet.precautions.map((p) => `<li><b>${e(p.code)}</b> ${e(p.text)}</li>`).join('');
  const incompatibilities =
    sheet.incompatibilities.length === 0
      ? '<p>No incompatible reagents within this batch.</p>'
      : `<ul>${sheet.incompatibilities.map((w) => `<li>${e(w.message)}</li>`).join('')}</ul>`;
  const waste = sheet.wasteStreams.map((w) => `<li><b>${e(w.label)}</b>: ${e(w.instruction)}</li>`).join('');
  const steps = sheet.procedure.map((s) => `<li>${e(s.text)}</li>`).join('');
  return `<section class="bench-sheet" data-batch="${sheet.batchId}">
<h1>Bench sheet — ${e(sheet.batchName)}</h1>
<table class="meta"><tbody>
<tr><td>Campaign</td><td><b>${e(sheet.campaignName ?? 'no campaign')}</b></td><td>Batch</td><td>#${sheet.batchId}</td></tr>
<tr><td>Planned on</td><td>${e(sheet.plannedOn)}</td><td>Printed on</td><td>${e(sheet.printedOn)}</td></tr>
<tr><td>Pair</td><td>${e(sheet.pair)}</td><td>Target</td><td>${e(sheet.target)}</td></tr>
<tr><td>Route</td><td>${e(sheet.routeLabel)}</td><td>Particle</td><td>${e(sheet.particle)}</td></tr>
<tr><td>Volume</td><td>${sheetNumber(sheet.batchVolumeMl, 1)} mL</td><td>Temperature</td><td>${sheetNumber(sheet.temperatureC, 0)} °C</td></tr>
</tbody></table>
<h2>Hazards</h2>
<div class="pictograms">${sheet.signalWord ? `<span class="signal">${e(sheet.signalWord)}</span>` : ''}${pictograms}</div>
<ul>${hazards}</ul>
<h2>Reagents</h2>
<table><thead><tr><th>Reagent</th><th>Role</th><th>mmol</th><th>mg</th><th>stock mM</th><th>pipette mL</th><th>lot</th><th>lot used / initials</th></tr></thead>
<tbody>${reagentRows}</tbody></table>
${makeUp}
<h2>Order of addition and conditions</h2>
<ol>${steps}</ol>
<p class="source">Procedure: ${e(sheet.procedureSource)}.</p>
<h2>Precautions</h2>
<ul>${precautions}</ul>
<p class="source">Hazard and precautionary statements: UN GHS Annex 3 texts, typical classifications — verify with your supplier's SDS.</p>
<h2>Incompatibilities within this batch</h2>
${incompatibilities}
<h2>Waste</h2>
<ul>${waste}</ul>
<h2>Record</h2>
<table><tbody>
<tr><td>Operator (initials)</td><td class="fill"></td><td>Date / start time</td><td class="fill"></td></tr>
<tr><td colspan="4">Observations (colour changes, times, temperatures, deviations)</td></tr>
<tr><td colspan="4" class="fill"></td></tr><tr><td colspan="4" class="fill"></td></tr><tr><td colspan="4" class="fill"></td></tr>
</tbody></table>
<p class="reminder">${e(sheet.reminder)}</p>
</section>`;
}

/** The whole printable document. */
export function benchSheetHtml(sheet: BenchSheet): string {
  return (
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Bench sheet — ${escapeHtml(sheet.batchName)}</title>` +
    `<style>${BENCH_SHEET_CSS}</style></head><body>${benchSheetSection(sheet)}</body></html>`
  );
}
