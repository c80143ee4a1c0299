/** Segregation prediction for bimetallic pairs: descriptors, Miedema mixing, Wynblatt–Ku terms, finite particles, ranking. */
export * from './descriptors';
export * from './isotherm';
export * from './miedema';
export * from './predict';
export * from './rank';
export * from './segregation';
export * from './surface-equilibrium';
