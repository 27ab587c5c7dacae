export * from './lorentzianUnitArea';
export * from './lorentzianOverlap';
export * from './lorentzianReach';
export * from './t2ToFwhm';
export * from './nucleusFrequency';
export * from './mixtureEstimateLinewidth';
