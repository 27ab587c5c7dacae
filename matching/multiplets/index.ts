export * from './multipletToLines';
export * from './entryToLines';
