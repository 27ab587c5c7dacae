export * from './randomSeeded';
export * from './entryToDecoy';
export * from './libraryToDecoys';
export * from './componentEvidenceScore';
export * from './scoresToQValues';
