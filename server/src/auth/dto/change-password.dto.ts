import { IsString, MaxLength } from 'class-validator';
import { IsAcceptablePassword } from '../../auth/dto/is-acceptable-password.validator';
import { type ChangePasswordRequest } from '@broodsilk/shared';

export class ChangePasswordDto implements ChangePasswordRequest {
  @IsString()
  @MaxLength(200)
  currentPassword!: string;

  @IsAcceptablePassword()
  newPassword!: string;
}
