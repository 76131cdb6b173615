import { Migration } from '@mikro-orm/migrations';

export class Migration20261201201010 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`notebook_checkpoints\` (\`id\` text not null, \`notebook_id\` text not null, \`name\` text not null, \`state\` blob not null, \`created_by_id\` text null, \`created_at\` datetime not null, constraint \`notebook_checkpoints_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`notebook_checkpoints_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`notebook_checkpoints_notebook_id_index\` on \`notebook_checkpoints\` (\`notebook_id\`);`);
    this.addSql(`create index \`notebook_checkpoints_created_by_id_index\` on \`notebook_checkpoints\` (\`created_by_id\`);`);
    this.addSql(`create index \`notebook_checkpoints_notebook_id_created_at_index\` on \`notebook_checkpoints\` (\`notebook_id\`, \`created_at\`);`);
  }

}
