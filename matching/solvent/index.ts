export * from './solventResidualSignals';
export * from './solventExclusionRegions';
