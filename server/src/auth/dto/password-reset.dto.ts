import { IsEmail, IsString, Length, MaxLength, MinLength } from 'class-validator';
import { Transform } from 'class-transformer';
import { MIN_PASSWORD_LENGTH, type PasswordResetConfirmRequest, type PasswordResetRequest } from '@broodsilk/shared';

export class PasswordResetDto implements PasswordResetRequest {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  email!: string;
}

export class PasswordResetConfirmDto implements PasswordResetConfirmRequest {
  @IsString()
  @Length(20, 200, { message: 'This reset link is not valid.' })
  token!: string;

  @IsString()
  @MinLength(MIN_PASSWORD_LENGTH, { message: `Use a password of at least ${MIN_PASSWORD_LENGTH} characters.` })
  @MaxLength(200)
  password!: string;
}
