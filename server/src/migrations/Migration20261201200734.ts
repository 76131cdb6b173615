import { Migration } from '@mikro-orm/migrations';

export class Migration20261201200734 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`comment_threads\` (\`id\` text not null, \`notebook_id\` text not null, \`anchor\` json not null, \`author_id\` text not null, \`body\` text not null, \`created_at\` datetime not null, \`resolved_by_id\` text null, \`resolved_at\` datetime null, constraint \`comment_threads_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`comment_threads_author_id_foreign\` foreign key(\`author_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, constraint \`comment_threads_resolved_by_id_foreign\` foreign key(\`resolved_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`comment_threads_notebook_id_index\` on \`comment_threads\` (\`notebook_id\`);`);
    this.addSql(`create index \`comment_threads_author_id_index\` on \`comment_threads\` (\`author_id\`);`);
    this.addSql(`create index \`comment_threads_resolved_by_id_index\` on \`comment_threads\` (\`resolved_by_id\`);`);

    this.addSql(`create table \`notifications\` (\`id\` text not null, \`recipient_id\` text not null, \`type\` text not null default 'mention', \`notebook_id\` text not null, \`thread_id\` text not null, \`by_id\` text not null, \`excerpt\` text not null, \`read_at\` datetime null, \`created_at\` datetime not null, constraint \`notifications_recipient_id_foreign\` foreign key(\`recipient_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, constraint \`notifications_notebook_id_foreign\` foreign key(\`notebook_id\`) references \`notebooks\`(\`id\`) on delete cascade on update cascade, constraint \`notifications_thread_id_foreign\` foreign key(\`thread_id\`) references \`comment_threads\`(\`id\`) on delete cascade on update cascade, constraint \`notifications_by_id_foreign\` foreign key(\`by_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`notifications_recipient_id_index\` on \`notifications\` (\`recipient_id\`);`);
    this.addSql(`create index \`notifications_notebook_id_index\` on \`notifications\` (\`notebook_id\`);`);
    this.addSql(`create index \`notifications_thread_id_index\` on \`notifications\` (\`thread_id\`);`);
    this.addSql(`create index \`notifications_by_id_index\` on \`notifications\` (\`by_id\`);`);
    this.addSql(`create index \`notifications_recipient_id_created_at_index\` on \`notifications\` (\`recipient_id\`, \`created_at\`);`);

    this.addSql(`create table \`comment_replies\` (\`id\` text not null, \`thread_id\` text not null, \`author_id\` text not null, \`body\` text not null, \`created_at\` datetime not null, constraint \`comment_replies_thread_id_foreign\` foreign key(\`thread_id\`) references \`comment_threads\`(\`id\`) on delete cascade on update cascade, constraint \`comment_replies_author_id_foreign\` foreign key(\`author_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`comment_replies_thread_id_index\` on \`comment_replies\` (\`thread_id\`);`);
    this.addSql(`create index \`comment_replies_author_id_index\` on \`comment_replies\` (\`author_id\`);`);
  }

}
