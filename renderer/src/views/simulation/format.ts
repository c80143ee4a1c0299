/** Number formats shared by the simulation panels. */
export const pct = (x: number): string => `${(100 * x).toFixed(1)} %`;
export const num = (x: number, digits = 4): string => (Number.isFinite(x) ? x.toPrecision(digits) : '–');
