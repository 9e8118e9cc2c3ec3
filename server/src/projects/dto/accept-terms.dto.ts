import { IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { AcceptTermsRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class AcceptTermsDto implements AcceptTermsRequest {
  /** Only the owner, for an outside party without an account. */
  @IsOptionalNonNull()
  @IsUUID('all', { message: 'memberId must name a party of the project.' })
  memberId?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { message: `The note can be at most ${TEXT_LIMITS.note} characters.` })
  note?: string | null;
}
