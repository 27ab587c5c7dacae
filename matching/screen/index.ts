export * from './libraryIndexBuild';
export * from './libraryIndexCached';
export * from './libraryIndexEntryMatch';
export * from './candidatesRelate';
export * from './screenMixture';
