export * from './units';
export * from './template-schema';
export * from './template-geometry';
export * from './built-in-templates';
