export * from './analyseMixture';
export * from './componentsFindIndistinguishable';
