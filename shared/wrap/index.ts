export * from './cylinder';
export * from './wrap-views';
export * from './column-map';
export * from './mug-look';
