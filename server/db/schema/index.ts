export * from './auth';
export * from './originals';
