export * from './limits';
export * from './auth';
export * from './groups';
export * from './notebooks';
export * from './series';
export * from './series-import';
export * from './uploads';
export * from './analysis';
export * from './fields';
export * from './figures';
export * from './documents';
export * from './checkpoints';
export * from './comments';
export * from './notifications';
export * from './snapshots';
// Notebook files and the demo (issue 8)
export * from './notebook-file';
export * from './demo';
// E-mail and invitations.
export * from './invitations';
export * from './mail';
// The one rule for request text (issue 23).
export * from './text';
export * from './maps';
// Regions on native grids and regional budgets.
export * from './regions';
