import { IsString, MaxLength, MinLength } from 'class-validator';
import { MIN_PASSWORD_LENGTH, type ChangePasswordRequest } from '@broodsilk/shared';

export class ChangePasswordDto implements ChangePasswordRequest {
  @IsString()
  @MaxLength(200)
  currentPassword!: string;

  @IsString()
  @MinLength(MIN_PASSWORD_LENGTH, { message: `Use a password of at least ${MIN_PASSWORD_LENGTH} characters.` })
  @MaxLength(200)
  newPassword!: string;
}
