export * from './ppmToHz';
export * from './hzToPpm';
export * from './mixtureReferenceFind';
export * from './mixtureReference';
