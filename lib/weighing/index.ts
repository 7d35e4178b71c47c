/** Public API of the counting core: pure, isomorphic, grams internally. */
export * from './units';
export * from './round';
export * from './uncertainty';
export * from './apw';
export * from './count';
export * from './exact-range';
export * from './grow-sample';
export * from './piece-spread';
export * from './tolerance';
export * from './stability';
export * from './warnings';
export * from './estimate-input';
export { estimateCount, type EstimateCountResult } from './estimate';
