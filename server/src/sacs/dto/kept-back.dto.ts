import { IsIn, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { KEPT_BACK_LOG_KINDS, type KeptBackEndRequest, type KeptBackLogKind, type KeptBackLogRequest } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { IsCount } from './opening.dto';

const INSTANT = 'The time must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.';

export class KeptBackLogDto implements KeptBackLogRequest {
  @IsIn(KEPT_BACK_LOG_KINDS, { message: `The kind of entry must be one of: ${KEPT_BACK_LOG_KINDS.join(', ')}.` })
  kind!: KeptBackLogKind;

  @IsOptionalNonNull()
  @IsInstant({ message: INSTANT })
  at?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(2000, { message: 'Keep the note under 2000 characters.' })
  note?: string | null;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'strikes must be the id of the entry to strike.' })
  strikes?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(500, { message: 'Keep the reason under 500 characters.' })
  reason?: string;
}

export class KeptBackEndDto implements KeptBackEndRequest {
  @IsIn(['joined', 'written-off'], { message: 'The outcome must be joined (into the brood) or written-off.' })
  outcome!: 'joined' | 'written-off';

  @IsOptionalNonNull()
  @IsInstant({ message: INSTANT })
  at?: string;

  @IsOptionalNonNull()
  @IsCount('kept-back young that joined the brood')
  joined?: number;

  @IsString({ message: 'Say briefly why the batch ended so.' })
  @IsNotEmpty({ message: 'Say briefly why the batch ended so.' })
  @MaxLength(500, { message: 'Keep the reason under 500 characters.' })
  reason!: string;
}
