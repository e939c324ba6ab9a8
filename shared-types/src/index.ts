export * from './items';
export * from './api';
