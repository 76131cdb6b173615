export * from './events';
export * from './document-protocol';
