/**
 * The one list of particle shapes, used by the analytic prediction (site counts), the lattice Monte Carlo
 * (cluster builders), the contracts, the CLI and the UI. Names are written with a hyphen
 * ("truncated-octahedron") so they can be typed on a command line without quotes; `shapeLabel` gives the
 * words to show. Older inputs and stored records wrote "truncated octahedron": `normaliseShapeName`
 * reads that spelling too.
 */
export const PARTICLE_SHAPES = ['cuboctahedron', 'icosahedron', 'truncated-octahedron', 'sphere'] as const;
export type ParticleShape = (typeof PARTICLE_SHAPES)[number];

export function isParticleShape(value: string): value is ParticleShape {
  return (PARTICLE_SHAPES as readonly string[]).includes(value);
}

/** The shape in words for the screen: "truncated octahedron". */
export function shapeLabel(shape: ParticleShape): string {
  return shape.replace('-', ' ');
}

/** A typed or stored shape name in the one spelling: case, surrounding spaces and " "/"_" for "-" forgiven. */
export function normaliseShapeName(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, '-');
}
