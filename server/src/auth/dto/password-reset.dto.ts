import { IsEmail, IsString, Length } from 'class-validator';
import { IsAcceptablePassword } from './is-acceptable-password.validator';
import { Transform } from 'class-transformer';
import { type PasswordResetConfirmRequest, type PasswordResetRequest } from '@broodsilk/shared';

export class PasswordResetDto implements PasswordResetRequest {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  email!: string;
}

export class PasswordResetConfirmDto implements PasswordResetConfirmRequest {
  @IsString()
  @Length(20, 200, { message: 'This reset link is not valid.' })
  token!: string;

  @IsAcceptablePassword()
  password!: string;
}
