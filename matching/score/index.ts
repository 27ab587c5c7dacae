export * from './entryScore';
export * from './multipletsMatchPeaks';
export * from './signalToMultipletLines';
export * from './multipletOffsetBetter';
