export * from './auth';
export * from './originals';
export * from './library';
export * from './products';
export * from './exports';
export * from './product-life';
