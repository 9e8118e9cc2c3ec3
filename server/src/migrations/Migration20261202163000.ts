import { Migration } from '@mikro-orm/migrations';

/**
 * Each user's language (interface, e-mails, statements, calendar) and stage-numbering set; and
 * B. annitha moved from B. hamorii's former names to B. smithi's (Mendoza & Francke 2017).
 */
export class Migration20261202163000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "users" add column "language" text check ("language" in ('en', 'de')) not null default 'en', add column "stage_numbering" text check ("stage_numbering" in ('us', 'de')) not null default 'us';`,
    );
    this.addSql(`update "species" set "former_names" = array_remove("former_names", 'Brachypelma annitha') where "scientific_name" = 'Brachypelma hamorii';`);
    this.addSql(
      `update "species" set "former_names" = array_append("former_names", 'Brachypelma annitha') where "scientific_name" = 'Brachypelma smithi' and not ('Brachypelma annitha' = any("former_names"));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "users" drop column "language", drop column "stage_numbering";`);
    this.addSql(`update "species" set "former_names" = array_remove("former_names", 'Brachypelma annitha') where "scientific_name" = 'Brachypelma smithi';`);
    this.addSql(`update "species" set "former_names" = array_append("former_names", 'Brachypelma annitha') where "scientific_name" = 'Brachypelma hamorii';`);
  }
}
