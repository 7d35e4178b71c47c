/** Public API of the scale connections: reading sources, line formats, raw converter maths, simulator. */
export * from './reading';
export * from './prng';
export * from './virtual-parts';
export * from './first-order-lag';
export * from './simulator';
export * from './simulator-source';
export * from './line-format';
export * from './parse-line';
export * from './line-framer';
export * from './serial-port';
export * from './serial-source';
export * from './raw-adc';
export * from './keyed-source';
