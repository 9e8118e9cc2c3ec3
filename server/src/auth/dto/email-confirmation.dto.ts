import { IsString, Length } from 'class-validator';
import type { EmailConfirmationRequest, EmailConfirmationResendRequest } from '@broodsilk/shared';
import { PasswordResetDto } from './password-reset.dto';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class EmailConfirmationDto implements EmailConfirmationRequest {
  @IsString()
  @Length(20, 200, { context: keyedBy('dto.auth.confirmationLink') })
  token!: string;
}

/** One e-mail address, read as a reset request reads it. */
export class EmailConfirmationResendDto extends PasswordResetDto implements EmailConfirmationResendRequest {}
