export * from './analyseMixture';
