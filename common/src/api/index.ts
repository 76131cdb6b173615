export * from './limits';
export * from './auth';
export * from './groups';
export * from './notebooks';
export * from './series';
export * from './series-import';
export * from './uploads';
export * from './analysis';
