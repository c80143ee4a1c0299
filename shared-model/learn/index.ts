/** Learning from outcomes: features, logistic regression, LDA, validation, physics prior, proposals (pure, seeded). */
export * from './candidates';
export * from './classes';
export * from './conditions';
export * from './cross-validation';
export * from './demo-history';
export * from './features';
export * from './history-table';
export * from './lda';
export * from './ledoit-wolf';
export * from './logistic';
export * from './metrics';
export * from './outcome-model';
export * from './physics';
export * from './proposals';
export * from './review';
export * from './standardise';
