export * from './parse-date';
export * from './parse-money';
export * from './validate-row';
export * from './motif-shares';
export * from './roll-up';
export * from './time-buckets';
export * from './suggest-mapping';
