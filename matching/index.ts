// The engine's public surface. Each folder re-exports its functions from its own index.ts.
// Add one line per folder; the export snapshot test keeps changes deliberate.
export {};
export * from './peaks';
export * from './spectrum';
export * from './io';
export * from './score';
export * from './screen';
export * from './solvent';
export * from './reference';
export * from './multiplets';
export * from './lineshape';
export * from './fit';
export * from './library';
export * from './quant';
export * from './confidence';
export * from './analyse';
