export * from './nnlsSolve';
export * from './nnlsSolveDense';
export * from './nnlsSolveColumns';
export * from './spdSolve';
export * from './intensityNoiseLevel';
export * from './fitMixture';
