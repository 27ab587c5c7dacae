export * from './entryScore';
