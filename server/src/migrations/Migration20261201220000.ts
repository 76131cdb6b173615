import { Migration } from '@mikro-orm/migrations';

export class Migration20261201220000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table \`users\` add column \`email_notifications\` integer not null default true;`);
    this.addSql(`create table \`invitations\` (\`id\` text not null, \`kind\` text check (\`kind\` in ('group', 'notebook')) not null, \`group_id\` text not null, \`notebook_id\` text null, \`email\` text not null, \`role\` text not null, \`token_sha256\` text not null, \`invited_by_id\` text null, \`created_at\` datetime not null, \`expires_at\` datetime not null, \`accepted_at\` datetime null, \`accepted_by_id\` text null, \`revoked_at\` datetime null, constraint \`invitations_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`invitations_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`invitations_invited_by_id_foreign\` foreign key(\`invited_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade, constraint \`invitations_accepted_by_id_foreign\` foreign key(\`accepted_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`invitations_group_id_index\` on \`invitations\` (\`group_id\`);`);
    this.addSql(`create index \`invitations_notebook_id_index\` on \`invitations\` (\`notebook_id\`);`);
    this.addSql(`create unique index \`invitations_token_sha256_unique\` on \`invitations\` (\`token_sha256\`);`);
    this.addSql(`create index \`invitations_invited_by_id_index\` on \`invitations\` (\`invited_by_id\`);`);
    this.addSql(`create index \`invitations_accepted_by_id_index\` on \`invitations\` (\`accepted_by_id\`);`);
    this.addSql(`create index \`invitations_group_id_email_index\` on \`invitations\` (\`group_id\`, \`email\`);`);
  }

}
