export * from './api';
export * from './roles';
