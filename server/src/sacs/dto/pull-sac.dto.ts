import type { PullSacRequest } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class PullSacDto implements PullSacRequest {
  @IsOptionalNonNull()
  @IsInstant({ context: keyedBy('dto.sac.pullTime') })
  pulledAt?: string;
}
