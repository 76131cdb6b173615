import { Migration } from '@mikro-orm/migrations';

export class Migration20261201193518 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`notebook_updates\` (\`id\` integer not null primary key autoincrement, \`notebook_id\` text not null, \`update\` blob not null, \`author_id\` text null, \`created_at\` datetime not null, constraint \`notebook_updates_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`notebook_updates_author_id_foreign\` foreign key(\`author_id\`) references \`users\`(\`id\`) on delete set null on update cascade);`);
    this.addSql(`create index \`notebook_updates_notebook_id_index\` on \`notebook_updates\` (\`notebook_id\`);`);
    this.addSql(`create index \`notebook_updates_author_id_index\` on \`notebook_updates\` (\`author_id\`);`);

    this.addSql(`create table \`notebook_documents\` (\`notebook_id\` text not null, \`state\` blob not null, \`compacted_through\` integer not null default 0, \`json\` json null, \`text\` text not null default '', \`updated_at\` datetime not null, constraint \`notebook_documents_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, primary key (\`notebook_id\`));`);

    this.addSql(`create table \`event_sets\` (\`id\` text not null, \`notebook_id\` text not null, \`name\` text not null, \`derived_from\` json null, \`events\` json not null, \`created_by_id\` text not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`event_sets_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`event_sets_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`event_sets_notebook_id_index\` on \`event_sets\` (\`notebook_id\`);`);
    this.addSql(`create index \`event_sets_created_by_id_index\` on \`event_sets\` (\`created_by_id\`);`);

    this.addSql(`create table \`series__temp_alter\` (\`id\` text not null, \`group_id\` text not null, \`name\` text not null, \`kind\` text check (\`kind\` in ('climate-index', 'carbon-inventory', 'budget-term', 'flux', 'other')) not null, \`variable\` text not null default '', \`units\` text not null default '', \`region\` text not null default '', \`depth_layer\` text not null default '', \`source\` text not null default '', \`origin\` text check (\`origin\` in ('model-output', 'observation', 'reanalysis', 'derived', 'unspecified')) not null default 'unspecified', \`notes\` text not null default '', \`latest_version\` integer not null default 0, \`created_by_id\` text not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`series_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`series_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`insert into \`series__temp_alter\` select \`id\`, \`group_id\`, \`name\`, \`kind\`, \`variable\`, \`units\`, \`region\`, \`depth_layer\`, \`source\`, \`origin\`, \`notes\`, \`latest_version\`, \`created_by_id\`, \`created_at\`, \`updated_at\` from \`series\`;`);
    this.addSql(`drop table \`series\`;`);
    this.addSql(`alter table \`series__temp_alter\` rename to \`series\`;`);
    this.addSql(`create index \`series_group_id_index\` on \`series\` (\`group_id\`);`);
    this.addSql(`create index \`series_created_by_id_index\` on \`series\` (\`created_by_id\`);`);
    this.addSql(`create table \`notebook_roles__temp_alter\` (\`id\` text not null, \`notebook_id\` text not null, \`user_id\` text not null, \`role\` text check (\`role\` in ('lead-author', 'co-author', 'reviewer', 'reader')) not null, constraint \`notebook_roles_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`notebook_roles_user_id_foreign\` foreign key(\`user_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, primary key (\`id\`));`);
    this.addSql(`insert into \`notebook_roles__temp_alter\` select \`id\`, \`notebook_id\`, \`user_id\`, \`role\` from \`notebook_roles\`;`);
    this.addSql(`drop table \`notebook_roles\`;`);
    this.addSql(`alter table \`notebook_roles__temp_alter\` rename to \`notebook_roles\`;`);
    this.addSql(`create index \`notebook_roles_notebook_id_index\` on \`notebook_roles\` (\`notebook_id\`);`);
    this.addSql(`create index \`notebook_roles_user_id_index\` on \`notebook_roles\` (\`user_id\`);`);
    this.addSql(`create unique index \`notebook_roles_notebook_id_user_id_unique\` on \`notebook_roles\` (\`notebook_id\`, \`user_id\`);`);
    this.addSql(`pragma foreign_keys = on;`);
  }

}
