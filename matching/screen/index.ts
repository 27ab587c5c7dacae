export * from './libraryIndexBuild';
export * from './libraryIndexCached';
export * from './libraryIndexEntryMatch';
export * from './candidatesRelate';
export * from './screenPrepare';
export * from './screenResultAssemble';
export * from './screenMixture';
