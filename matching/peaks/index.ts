export * from './peaksLowerBound';
export * from './peaksFindInWindow';
export * from './mixturePeaks';
export * from './peaksNearestInWindow';
