export * from './api';
export * from './roles';
export * from './collab';
export * from './engine';
export * from './time';
export * from './editor';
export * from './figures';
export * from './figure-kinds';
