import { IsEmail, IsIn, IsNotEmpty, IsString, Length, MaxLength } from 'class-validator';
import { IsAcceptablePassword } from './is-acceptable-password.validator';
import { Transform } from 'class-transformer';
import { LANGUAGES, type Language, type RegisterRequest } from '@broodsilk/shared';
import { IsTimeZone } from '../../common/validators/is-time-zone.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class RegisterDto implements RegisterRequest {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { context: keyedBy('dto.auth.email') })
  @MaxLength(254)
  email!: string;

  @IsAcceptablePassword()
  password!: string;

  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.auth.displayName') })
  @MaxLength(80)
  displayName!: string;

  @IsOptionalNonNull()
  @IsTimeZone()
  timeZone?: string;

  @IsOptionalNonNull()
  @IsIn(LANGUAGES, { context: keyedBy('dto.common.languageOneOf', { allowed: LANGUAGES.join(', ') }) })
  language?: Language;

  @IsOptionalNonNull()
  @IsString()
  @Length(20, 200, { context: keyedBy('invitation.invalidLink') })
  invitationToken?: string;
}
