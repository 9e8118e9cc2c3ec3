import { IsEmail, IsString, Length } from 'class-validator';
import { IsAcceptablePassword } from './is-acceptable-password.validator';
import { Transform } from 'class-transformer';
import { type PasswordResetConfirmRequest, type PasswordResetRequest } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class PasswordResetDto implements PasswordResetRequest {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { context: keyedBy('dto.auth.email') })
  email!: string;
}

export class PasswordResetConfirmDto implements PasswordResetConfirmRequest {
  @IsString()
  @Length(20, 200, { context: keyedBy('dto.auth.resetLink') })
  token!: string;

  @IsAcceptablePassword()
  password!: string;
}
