import { IsString, Length } from 'class-validator';
import type { EmailConfirmationRequest, EmailConfirmationResendRequest } from '@broodsilk/shared';
import { PasswordResetDto } from './password-reset.dto';

export class EmailConfirmationDto implements EmailConfirmationRequest {
  @IsString()
  @Length(20, 200, { message: 'This confirmation link is not valid. Check that you copied all of it.' })
  token!: string;
}

/** One e-mail address, read as a reset request reads it. */
export class EmailConfirmationResendDto extends PasswordResetDto implements EmailConfirmationResendRequest {}
