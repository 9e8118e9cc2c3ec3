import { IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { AcceptTermsRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class AcceptTermsDto implements AcceptTermsRequest {
  /** Only the owner, for an outside party without an account. */
  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.common.memberOfProject') })
  memberId?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.common.noteMax', { max: TEXT_LIMITS.note }) })
  note?: string | null;
}
