export * from './live-figure';
export * from './live-number';
export * from './extensions';
export * from './live-nodes';
