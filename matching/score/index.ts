export * from './entryScore';
export * from './multipletsMatchPeaks';
