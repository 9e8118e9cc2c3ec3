import { Entity, Enum, Property, Unique } from '@mikro-orm/core';
import { LANGUAGES, STAGE_NUMBERINGS, type AccountRole, type Language, type StageNumbering, type TemperatureUnit } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';

@Entity({ tableName: 'users' })
export class User extends BaseEntity<'role' | 'timeZone' | 'temperatureUnit' | 'language' | 'stageNumbering' | 'tokenVersion'> {
  @Property({ type: 'text' })
  @Unique()
  email!: string;

  @Property({ type: 'text', hidden: true, lazy: true })
  passwordHash!: string;

  @Property({ type: 'text' })
  displayName!: string;

  @Enum({ items: ['keeper', 'admin'], nativeEnumName: 'account_role' })
  role: AccountRole = 'keeper';

  @Property({ type: 'text' })
  timeZone: string = 'UTC';

  @Enum({ items: ['C', 'F'] })
  temperatureUnit: TemperatureUnit = 'C';

  /** The language of the interface, e-mails, statements and the calendar feed. */
  @Enum({ items: [...LANGUAGES] })
  language: Language = 'en';

  /** The stage-numbering set the user reads brood stages in (docs/rules.md, Stage numbering). */
  @Enum({ items: [...STAGE_NUMBERINGS] })
  stageNumbering: StageNumbering = 'us';

  /** Bumped on logout and password change: every JWT carries it, so older tokens stop working. */
  @Property({ type: 'integer' })
  tokenVersion: number = 0;
}
