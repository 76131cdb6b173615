export * from './api';
export * from './roles';
export * from './engine';
export * from './time';
