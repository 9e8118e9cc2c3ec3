import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import {
  TEXT_LIMITS,
  type RecoveryCodesRenewalRequest,
  type SecondFactorRemovalRequest,
  type SecondFactorSignInRequest,
  type TotpConfirmRequest,
} from '@broodsilk/shared';
import { MAX_PASSWORD_LENGTH } from '../../password-policy';
import { IsOptionalNonNull } from '../../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../../common/filters/validation-exception.factory';

const MAX_CODE_LENGTH = TEXT_LIMITS.secondFactorCode;

export class TotpConfirmDto implements TotpConfirmRequest {
  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.auth.appCode') })
  @MaxLength(MAX_CODE_LENGTH)
  code!: string;

  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.auth.password') })
  @MaxLength(MAX_PASSWORD_LENGTH)
  password!: string;
}

export class SecondFactorRemovalDto implements SecondFactorRemovalRequest {
  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.auth.password') })
  @MaxLength(MAX_PASSWORD_LENGTH)
  password!: string;

  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.auth.codeOrRecovery') })
  @MaxLength(MAX_CODE_LENGTH)
  code!: string;
}

export class SecondFactorSignInDto implements SecondFactorSignInRequest {
  @IsString()
  @IsNotEmpty()
  @MaxLength(2000)
  pendingToken!: string;

  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.auth.codeOrRecovery') })
  @MaxLength(MAX_CODE_LENGTH)
  code!: string;
}

/** Either the password or an app code; the service says which is missing when neither comes. */
export class RecoveryCodesRenewalDto implements RecoveryCodesRenewalRequest {
  @IsOptionalNonNull()
  @IsString()
  @MaxLength(MAX_PASSWORD_LENGTH)
  password?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(MAX_CODE_LENGTH)
  code?: string;
}
