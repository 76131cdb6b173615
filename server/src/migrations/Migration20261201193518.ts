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

  }

}
