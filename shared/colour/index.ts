export * from './srgb';
export * from './lab';
export * from './oklab';
export * from './ciede2000';
export * from './contrast';
export * from './palette';
export * from './pixel-map';
export * from './recolour';
