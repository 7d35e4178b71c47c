/** Public API of the counting core: pure, isomorphic, grams internally. */
export * from './units';
export * from './round';
export * from './uncertainty';
export * from './rounding-covariance';
export * from './spread-belief';
export * from './count-variance';
export * from './count-judgement';
export * from './exact-reach';
export * from './grow-sample';
export * from './tolerance';
export * from './stability';
export * from './warnings';
export * from './estimate-input';
export { assessCount, estimateCount, type CountShare, type EstimateCountResult, type SpreadUsed } from './estimate';
export * from './kit-line';
export * from './sample-plausibility';
