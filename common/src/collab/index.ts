export * from './events';
export * from './document-protocol';
export * from './presence';
