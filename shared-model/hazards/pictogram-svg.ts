/**
 * The nine GHS pictograms drawn as SVG: a black symbol on a white ground inside a red square frame set on a point
 * (UN GHS Rev. 9, Annex 1 and section 1.4.10.5.2: "black symbol on a white background with a red frame"). The
 * symbols are simplified drawings of the standard ones, sized for a printed bench sheet; one function serves the
 * app's views and the PDF written by the CLI, so both show the same marks.
 */
import { pictogramName, type PictogramCode } from './ghs';

const FRAME_RED = '#e2001a';

const SYMBOLS: Readonly<Record<PictogramCode, string>> = {
  // Exploding bomb: a round body with a short fuse and flying fragments.
  GHS01:
    '<circle cx="46" cy="58" r="13"/><path d="M55 46 l6 -7" stroke="#000" stroke-width="3"/>' +
    '<path d="M64 30 l3 6 6 -2 -3 6 6 3 -6 2 2 6 -6 -3 -3 6 -2 -6 -6 2 3 -6 -6 -3 6 -2 -2 -6 6 3z"/>' +
    '<path d="M28 40 l5 4 M26 52 l6 1 M31 70 l5 -4 M46 78 l0 -6" stroke="#000" stroke-width="3"/>',
  // Flame over a base line.
  GHS02:
    '<path d="M50 24 C60 38 68 44 66 60 C65 70 58 76 50 76 C41 76 34 70 34 60 C34 50 40 46 42 38 ' +
    'C45 46 46 50 50 52 C52 44 50 34 50 24z"/><rect x="32" y="78" width="36" height="4"/>',
  // Flame over a circle (oxidiser).
  GHS03:
    '<circle cx="50" cy="64" r="11" fill="none" stroke="#000" stroke-width="5"/>' +
    '<path d="M50 22 C57 32 62 36 61 46 C60 52 56 55 50 55 C44 55 40 52 40 46 C40 40 44 37 45 32 ' +
    'C47 37 48 40 50 41 C51 36 50 29 50 22z"/><rect x="32" y="78" width="36" height="4"/>',
  // Gas cylinder lying on its side.
  GHS04:
    '<rect x="28" y="50" width="40" height="16" rx="8"/><rect x="66" y="54" width="8" height="8"/>' +
    '<rect x="30" y="68" width="40" height="3"/>',
  // Corrosion: liquid dripping from two tubes onto a surface and onto a hand.
  GHS05:
    '<path d="M30 28 l10 10 M58 28 l10 10" stroke="#000" stroke-width="4"/>' +
    '<path d="M40 42 q2 6 0 8 q-2 -2 0 -8z M66 42 q2 6 0 8 q-2 -2 0 -8z"/>' +
    '<rect x="26" y="58" width="22" height="6"/><path d="M56 58 h20 v6 h-8 l-4 6 h-8z"/>' +
    '<rect x="26" y="68" width="50" height="4"/>',
  // Skull and crossbones.
  GHS06:
    '<path d="M32 72 L68 52 M32 52 L68 72" stroke="#000" stroke-width="6" stroke-linecap="round"/>' +
    '<circle cx="50" cy="42" r="15"/><rect x="42" y="50" width="16" height="10" rx="2"/>' +
    '<circle cx="44" cy="41" r="4" fill="#fff"/><circle cx="56" cy="41" r="4" fill="#fff"/>',
  // Exclamation mark.
  GHS07: '<path d="M45 26 h10 l-2 34 h-6z"/><circle cx="50" cy="70" r="5.5"/>',
  // Health hazard: a bust with a star-shaped burst on the chest.
  GHS08:
    '<circle cx="50" cy="30" r="8"/><path d="M32 78 C32 52 40 42 50 42 C60 42 68 52 68 78z"/>' +
    '<path d="M50 52 l3 8 8 -3 -5 7 7 4 -8 1 1 8 -6 -6 -6 6 1 -8 -8 -1 7 -4 -5 -7 8 3z" fill="#fff"/>',
  // Environment: a bare tree and a fish on its back.
  GHS09:
    '<path d="M38 66 V40 M38 48 l-8 -8 M38 46 l8 -9 M38 56 l-7 -5" stroke="#000" stroke-width="3" fill="none"/>' +
    '<rect x="26" y="66" width="48" height="3"/>' +
    '<path d="M50 60 C56 52 66 52 70 58 L76 54 L75 62 L70 60 C66 64 56 66 50 60z"/>',
};

/** One pictogram as a standalone SVG element (`title` carries the pictogram's name for screen readers). */
export function pictogramSvg(code: PictogramCode, sizePx = 56): string {
  const name = pictogramName(code);
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 100" width="${sizePx}" height="${sizePx}" ` +
    `role="img" aria-label="${code} ${name}" data-pictogram="${code}">` +
    `<title>${code} ${name}</title>` +
    `<polygon points="50,4 96,50 50,96 4,50" fill="#fff" stroke="${FRAME_RED}" stroke-width="6"/>` +
    `<g fill="#000">${SYMBOLS[code]}</g></svg>`
  );
}
