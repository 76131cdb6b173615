import { Migration } from '@mikro-orm/migrations';

/** Published snapshots of notebooks and their public share links. */
export class Migration20261201214631 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`notebook_snapshots\` (\`id\` text not null, \`notebook_id\` text not null, \`number\` integer not null, \`title\` text not null, \`release_note\` text not null default '', \`published_by_id\` text null, \`published_at\` datetime not null, \`engine_version\` text not null, \`editor_schema_version\` integer not null, \`figure_count\` integer not null, \`number_count\` integer not null, \`payload\` text not null, \`content_sha256\` text not null, constraint \`notebook_snapshots_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`notebook_snapshots_published_by_id_foreign\` foreign key(\`published_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`notebook_snapshots_notebook_id_index\` on \`notebook_snapshots\` (\`notebook_id\`);`);
    this.addSql(`create index \`notebook_snapshots_published_by_id_index\` on \`notebook_snapshots\` (\`published_by_id\`);`);
    this.addSql(`create unique index \`notebook_snapshots_notebook_id_number_unique\` on \`notebook_snapshots\` (\`notebook_id\`, \`number\`);`);

    this.addSql(`create table \`snapshot_share_links\` (\`id\` text not null, \`snapshot_id\` text not null, \`token_sha256\` text not null, \`token_hint\` text not null, \`created_by_id\` text null, \`created_at\` datetime not null, \`expires_at\` datetime null, \`revoked_at\` datetime null, constraint \`snapshot_share_links_snapshot_id_foreign\` foreign key(\`snapshot_id\`) references \`notebook_snapshots\`(\`id\`) on delete cascade on update cascade, constraint \`snapshot_share_links_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`snapshot_share_links_snapshot_id_index\` on \`snapshot_share_links\` (\`snapshot_id\`);`);
    this.addSql(`create unique index \`snapshot_share_links_token_sha256_unique\` on \`snapshot_share_links\` (\`token_sha256\`);`);
    this.addSql(`create index \`snapshot_share_links_created_by_id_index\` on \`snapshot_share_links\` (\`created_by_id\`);`);
    this.addSql(`create index \`snapshot_share_links_snapshot_id_created_at_index\` on \`snapshot_share_links\` (\`snapshot_id\`, \`created_at\`);`);
  }

}
