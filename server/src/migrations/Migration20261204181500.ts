import { Migration } from '@mikro-orm/migrations';

/** Region sets on native model grids (issue 16): sets and their immutable versions. */
export class Migration20261204181500 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`region_sets\` (\`id\` text not null, \`group_id\` text not null, \`name\` text not null, \`latest_version\` integer not null default 0, \`created_by_id\` text not null, \`created_at\` datetime not null, constraint \`region_sets_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`region_sets_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`region_sets_group_id_index\` on \`region_sets\` (\`group_id\`);`);
    this.addSql(`create index \`region_sets_created_by_id_index\` on \`region_sets\` (\`created_by_id\`);`);

    this.addSql(`create table \`region_set_versions\` (\`id\` text not null, \`region_set_id\` text not null, \`number\` integer not null, \`kind\` text not null, \`regions\` json not null, \`definition\` json not null, \`grid\` json null, \`codes\` blob null, \`file_id\` text null, \`created_by_id\` text not null, \`created_at\` datetime not null, constraint \`region_set_versions_region_set_id_foreign\` foreign key(\`region_set_id\`) references \`region_sets\`(\`id\`) on delete cascade on update cascade, constraint \`region_set_versions_file_id_foreign\` foreign key(\`file_id\`) references \`uploaded_files\`(\`id\`) on delete set null on update cascade, constraint \`region_set_versions_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`region_set_versions_region_set_id_index\` on \`region_set_versions\` (\`region_set_id\`);`);
    this.addSql(`create index \`region_set_versions_file_id_index\` on \`region_set_versions\` (\`file_id\`);`);
    this.addSql(`create index \`region_set_versions_created_by_id_index\` on \`region_set_versions\` (\`created_by_id\`);`);
    this.addSql(`create unique index \`region_set_versions_region_set_id_number_unique\` on \`region_set_versions\` (\`region_set_id\`, \`number\`);`);
  }

}
