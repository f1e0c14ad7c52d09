/** Sweeps: one or two scenario inputs varied over a range, each point an ordinary run. */
// @ts-nocheck

export * from './inputs';
export * from './expand';
export * from './apply';
export * from './schema';
export * from './prepare';
export * from './zero-point';
export * from './series';
export * from './envelope-check';
