export * from './angle';
export * as vec from './vec';
export type { Vec } from './vec';
export * from './matrix';
export * from './bounds';
