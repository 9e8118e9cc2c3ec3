import { Migration } from '@mikro-orm/migrations';

/** The end state of a sac whose young are out is "emerged" (eggs hatch inside the sac long before); renaming the enum value rewrites every stored row. */
export class Migration20261202130000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter type "sac_outcome" rename value 'hatched' to 'emerged';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter type "sac_outcome" rename value 'emerged' to 'hatched';`);
  }
}
