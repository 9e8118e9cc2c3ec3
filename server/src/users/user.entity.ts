import { Entity, Enum, Property, Unique } from '@mikro-orm/core';
import { LANGUAGES, STAGE_NUMBERINGS, type AccountRole, type Language, type StageNumbering, type TemperatureUnit } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';

@Entity({ tableName: 'users' })
export class User extends BaseEntity<
  | 'role'
  | 'timeZone'
  | 'temperatureUnit'
  | 'language'
  | 'stageNumbering'
  | 'tokenVersion'
  | 'totpSecret'
  | 'totpPendingSecret'
  | 'totpEnabledAt'
  | 'totpLastStep'
  | 'emailConfirmedAt'
> {
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

  /** When the owner of the address opened the confirmation link; an account without it cannot sign in yet. */
  @Property({ type: 'timestamptz', nullable: true })
  emailConfirmedAt?: Date | null = null;

  /** Bumped on logout and password change: every JWT carries it, so older tokens stop working. */
  @Property({ type: 'integer' })
  tokenVersion: number = 0;

  /** The TOTP secret once confirmed, AES-256-GCM-encrypted under TOTP_ENCRYPTION_KEY (see totp-secret-box.ts). */
  @Property({ type: 'text', nullable: true, hidden: true, lazy: true })
  totpSecret?: string | null = null;

  /** A secret shown for enrolment but not yet confirmed with a code; encrypted the same way. */
  @Property({ type: 'text', nullable: true, hidden: true, lazy: true })
  totpPendingSecret?: string | null = null;

  @Property({ type: 'timestamptz', nullable: true })
  totpEnabledAt?: Date | null = null;

  /** The last accepted 30-second step, so one code signs in once (OWASP ASVS 5.0 V6.5.1). */
  @Property({ type: 'integer', nullable: true, hidden: true })
  totpLastStep?: number | null = null;
}
