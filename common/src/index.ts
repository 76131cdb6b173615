/** Public surface of @upwell/common: request schemas, the role model and the anomaly engine. */
export * from './api';
export * from './roles';
export * from './engine';
