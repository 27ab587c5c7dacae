export * from './spectrumNoiseEstimate';
export * from './spectrumPickPeaks';
