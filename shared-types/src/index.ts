export * from './items';
export * from './api';
export * from './authoring';
export * from './protocol';
export * from './debrief';
export * from './catchup';
