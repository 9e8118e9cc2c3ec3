import { IsEmail, IsIn, IsNotEmpty, IsString, Length, MaxLength } from 'class-validator';
import { IsAcceptablePassword } from './is-acceptable-password.validator';
import { Transform } from 'class-transformer';
import { LANGUAGES, type Language, type RegisterRequest } from '@broodsilk/shared';
import { IsTimeZone } from '../../common/validators/is-time-zone.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class RegisterDto implements RegisterRequest {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @MaxLength(254)
  email!: string;

  @IsAcceptablePassword()
  password!: string;

  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @IsNotEmpty({ message: 'Tell us the name to show to your partners.' })
  @MaxLength(80)
  displayName!: string;

  @IsOptionalNonNull()
  @IsTimeZone()
  timeZone?: string;

  @IsOptionalNonNull()
  @IsIn(LANGUAGES, { message: `Choose one of the languages ${LANGUAGES.join(', ')}.` })
  language?: Language;

  @IsOptionalNonNull()
  @IsString()
  @Length(20, 200, { message: 'This invitation link is not valid. Check that you copied all of it.' })
  invitationToken?: string;
}
