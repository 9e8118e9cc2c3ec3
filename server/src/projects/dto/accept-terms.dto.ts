import { IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
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
  @MaxLength(2000, { message: 'The note can be at most 2000 characters.' })
  note?: string | null;
}
