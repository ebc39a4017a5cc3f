export * from './dhash';
export * from './gray-thumbnail';
