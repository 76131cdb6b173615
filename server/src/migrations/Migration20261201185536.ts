import { Migration } from '@mikro-orm/migrations';

export class Migration20261201185536 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`groups\` (\`id\` text not null, \`name\` text not null, \`created_at\` datetime not null, primary key (\`id\`));`);

    this.addSql(`create table \`users\` (\`id\` text not null, \`email\` text not null, \`name\` text not null, \`password_hash\` text not null, \`token_version\` integer not null default 0, \`created_at\` datetime not null, primary key (\`id\`));`);
    this.addSql(`create unique index \`users_email_unique\` on \`users\` (\`email\`);`);

    this.addSql(`create table \`notebooks\` (\`id\` text not null, \`group_id\` text not null, \`title\` text not null, \`description\` text not null default '', \`owner_id\` text not null, \`archived_at\` datetime null, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`notebooks_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`notebooks_owner_id_foreign\` foreign key(\`owner_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`notebooks_group_id_index\` on \`notebooks\` (\`group_id\`);`);
    this.addSql(`create index \`notebooks_owner_id_index\` on \`notebooks\` (\`owner_id\`);`);

    this.addSql(`create table \`notebook_roles\` (\`id\` text not null, \`notebook_id\` text not null, \`user_id\` text not null, \`role\` text check (\`role\` in ('lead-author', 'co-author', 'reviewer', 'reader')) not null, constraint \`notebook_roles_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`notebook_roles_user_id_foreign\` foreign key(\`user_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`notebook_roles_notebook_id_index\` on \`notebook_roles\` (\`notebook_id\`);`);
    this.addSql(`create index \`notebook_roles_user_id_index\` on \`notebook_roles\` (\`user_id\`);`);
    this.addSql(`create unique index \`notebook_roles_notebook_id_user_id_unique\` on \`notebook_roles\` (\`notebook_id\`, \`user_id\`);`);

    this.addSql(`create table \`group_memberships\` (\`id\` text not null, \`group_id\` text not null, \`user_id\` text not null, \`role\` text check (\`role\` in ('admin', 'member')) not null, \`created_at\` datetime not null, constraint \`group_memberships_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`group_memberships_user_id_foreign\` foreign key(\`user_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`group_memberships_group_id_index\` on \`group_memberships\` (\`group_id\`);`);
    this.addSql(`create index \`group_memberships_user_id_index\` on \`group_memberships\` (\`user_id\`);`);
    this.addSql(`create unique index \`group_memberships_group_id_user_id_unique\` on \`group_memberships\` (\`group_id\`, \`user_id\`);`);
  }

}
