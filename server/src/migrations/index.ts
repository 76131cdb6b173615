import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201185536 } from './Migration20261201185536';
import { Migration20261201190750 } from './Migration20261201190750';
import { Migration20261201193518 } from './Migration20261201193518';
import { Migration20261201200734 } from './Migration20261201200734';
import { Migration20261201201010 } from './Migration20261201201010';
import { Migration20261201214631 } from './Migration20261201214631';
import { Migration20261201220000 } from './Migration20261201220000';
import { Migration20261204180000 } from './Migration20261204180000';
import { Migration20261204181500 } from './Migration20261204181500';

/**
 * Every migration, oldest first. Create one with `npm run migration:create -w server`
 * after `npm run build -w server`, then add it at the end here.
 */
export const migrationsList: MigrationObject[] = [
  // Accounts, research groups with roles, notebooks with per-person roles.
  { name: 'Migration20261201185536', class: Migration20261201185536 },
  // The series library: uploaded files, series with versions, gridded and zonal-mean fields.
  { name: 'Migration20261201190750', class: Migration20261201190750 },
  // Notebook documents (Yjs state and update log) and saved event sets.
  { name: 'Migration20261201193518', class: Migration20261201193518 },
  // Review threads with replies on notebooks, and in-app notifications of mentions.
  { name: 'Migration20261201200734', class: Migration20261201200734 },
  // Named checkpoints of notebook documents (version history).
  { name: 'Migration20261201201010', class: Migration20261201201010 },
  // Published snapshots of notebooks (frozen payload) and their share links.
  { name: 'Migration20261201214631', class: Migration20261201214631 },
  // Invitations by e-mail, and each person's notification-mail setting.
  { name: 'Migration20261201220000', class: Migration20261201220000 },
  // The CF calendar of each series version (noleap, 360_day … from model files).
  { name: 'Migration20261204180000', class: Migration20261204180000 },
  // Region sets on native model grids (masks, polygons, standard boxes) with versions.
  { name: 'Migration20261204181500', class: Migration20261204181500 },
];
