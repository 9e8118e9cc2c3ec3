import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import type { SecondFactorRemovalRequest, SecondFactorSignInRequest, TotpConfirmRequest } from '@broodsilk/shared';
import { MAX_PASSWORD_LENGTH } from '../../password-policy';

/** Six digits or a recovery code (24 letters and digits, with its dashes): never longer than this. */
const MAX_CODE_LENGTH = 40;

export class TotpConfirmDto implements TotpConfirmRequest {
  @IsString()
  @IsNotEmpty({ message: 'Enter the six digits your app shows.' })
  @MaxLength(MAX_CODE_LENGTH)
  code!: string;

  @IsString()
  @IsNotEmpty({ message: 'Enter your password.' })
  @MaxLength(MAX_PASSWORD_LENGTH)
  password!: string;
}

export class SecondFactorRemovalDto implements SecondFactorRemovalRequest {
  @IsString()
  @IsNotEmpty({ message: 'Enter your password.' })
  @MaxLength(MAX_PASSWORD_LENGTH)
  password!: string;

  @IsString()
  @IsNotEmpty({ message: 'Enter a code from your app or a recovery code.' })
  @MaxLength(MAX_CODE_LENGTH)
  code!: string;
}

export class SecondFactorSignInDto implements SecondFactorSignInRequest {
  @IsString()
  @IsNotEmpty()
  @MaxLength(2000)
  pendingToken!: string;

  @IsString()
  @IsNotEmpty({ message: 'Enter a code from your app or a recovery code.' })
  @MaxLength(MAX_CODE_LENGTH)
  code!: string;
}
