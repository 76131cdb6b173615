import { Migration } from '@mikro-orm/migrations';

export class Migration20261201190750 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`uploaded_files\` (\`id\` text not null, \`group_id\` text not null, \`original_name\` text not null, \`sha256\` text not null, \`size\` integer not null, \`format\` text check (\`format\` in ('csv', 'netcdf-classic', 'netcdf4')) not null, \`stored_path\` text not null, \`options\` json null, \`uploaded_by_id\` text not null, \`created_at\` datetime not null, \`imported_at\` datetime null, constraint \`uploaded_files_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`uploaded_files_uploaded_by_id_foreign\` foreign key(\`uploaded_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`uploaded_files_group_id_index\` on \`uploaded_files\` (\`group_id\`);`);
    this.addSql(`create index \`uploaded_files_uploaded_by_id_index\` on \`uploaded_files\` (\`uploaded_by_id\`);`);

    this.addSql(`create table \`series\` (\`id\` text not null, \`group_id\` text not null, \`name\` text not null, \`kind\` text check (\`kind\` in ('climate-index', 'carbon-inventory', 'budget-term', 'flux', 'other')) not null, \`variable\` text not null default '', \`units\` text not null default '', \`region\` text not null default '', \`depth_layer\` text not null default '', \`source\` text not null default '', \`origin\` text check (\`origin\` in ('model-output', 'observation', 'reanalysis', 'derived', 'unspecified')) not null default 'unspecified', \`notes\` text not null default '', \`latest_version\` integer not null default 0, \`created_by_id\` text not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`series_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`series_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`series_group_id_index\` on \`series\` (\`group_id\`);`);
    this.addSql(`create index \`series_created_by_id_index\` on \`series\` (\`created_by_id\`);`);

    this.addSql(`create table \`series_versions\` (\`id\` text not null, \`series_id\` text not null, \`number\` integer not null, \`start\` text not null, \`length\` integer not null, \`missing\` integer not null, \`values\` blob not null, \`values_sha256\` text not null, \`file_id\` text null, \`transform\` json null, \`note\` text not null default '', \`created_by_id\` text not null, \`created_at\` datetime not null, constraint \`series_versions_series_id_foreign\` foreign key(\`series_id\`) references \`series\`(\`id\`) on delete cascade on update cascade, constraint \`series_versions_file_id_foreign\` foreign key(\`file_id\`) references \`uploaded_files\`(\`id\`) on delete set null on update cascade, constraint \`series_versions_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`series_versions_series_id_index\` on \`series_versions\` (\`series_id\`);`);
    this.addSql(`create index \`series_versions_file_id_index\` on \`series_versions\` (\`file_id\`);`);
    this.addSql(`create index \`series_versions_created_by_id_index\` on \`series_versions\` (\`created_by_id\`);`);
    this.addSql(`create unique index \`series_versions_series_id_number_unique\` on \`series_versions\` (\`series_id\`, \`number\`);`);

    this.addSql(`create table \`gridded_fields\` (\`id\` text not null, \`group_id\` text not null, \`file_id\` text not null, \`variable\` text not null, \`long_name\` text not null default '', \`units\` text not null default '', \`dims\` json not null, \`shape\` json not null, \`start\` text not null, \`extent\` json not null, \`created_by_id\` text not null, \`created_at\` datetime not null, constraint \`gridded_fields_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`gridded_fields_file_id_foreign\` foreign key(\`file_id\`) references \`uploaded_files\`(\`id\`) on update cascade, constraint \`gridded_fields_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`gridded_fields_group_id_index\` on \`gridded_fields\` (\`group_id\`);`);
    this.addSql(`create index \`gridded_fields_file_id_index\` on \`gridded_fields\` (\`file_id\`);`);
    this.addSql(`create index \`gridded_fields_created_by_id_index\` on \`gridded_fields\` (\`created_by_id\`);`);

    this.addSql(`create table \`zonal_mean_fields\` (\`id\` text not null, \`group_id\` text not null, \`source_id\` text not null, \`name\` text not null, \`start\` text not null, \`months\` integer not null, \`latitudes\` json not null, \`values\` blob not null, \`units\` text not null, \`provenance\` json not null, \`created_by_id\` text not null, \`created_at\` datetime not null, constraint \`zonal_mean_fields_group_id_foreign\` foreign key(\`group_id\`) references \`groups\`(\`id\`) on delete cascade on update cascade, constraint \`zonal_mean_fields_source_id_foreign\` foreign key(\`source_id\`) references \`gridded_fields\`(\`id\`) on delete cascade on update cascade, constraint \`zonal_mean_fields_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`);
    this.addSql(`create index \`zonal_mean_fields_group_id_index\` on \`zonal_mean_fields\` (\`group_id\`);`);
    this.addSql(`create index \`zonal_mean_fields_source_id_index\` on \`zonal_mean_fields\` (\`source_id\`);`);
    this.addSql(`create index \`zonal_mean_fields_created_by_id_index\` on \`zonal_mean_fields\` (\`created_by_id\`);`);
  }

}
