import { Migration } from '@mikro-orm/migrations';

/** Each series version keeps the CF calendar of its months (issue 14 item 3); older versions are standard. */
export class Migration20261204180000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table \`series_versions\` add column \`calendar\` text not null default 'standard';`);
  }

}
