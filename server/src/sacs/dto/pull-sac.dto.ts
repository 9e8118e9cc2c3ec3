import type { PullSacRequest } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class PullSacDto implements PullSacRequest {
  @IsOptionalNonNull()
  @IsInstant({ message: 'The pull time must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.' })
  pulledAt?: string;
}
