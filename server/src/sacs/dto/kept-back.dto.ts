import { IsIn, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { KEPT_BACK_LOG_KINDS, type KeptBackEndRequest, type KeptBackLogKind, type KeptBackLogRequest, TEXT_LIMITS } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { IsCount } from './opening.dto';
import { keyedBy } from '../../common/filters/validation-exception.factory';

const INSTANT = { context: keyedBy('dto.keptBack.at') };
const REASON = { context: keyedBy('dto.common.reasonUnder', { max: TEXT_LIMITS.correctionReason }) };
const WHY_ENDED = { context: keyedBy('dto.keptBack.whyEnded') };

export class KeptBackLogDto implements KeptBackLogRequest {
  @IsIn(KEPT_BACK_LOG_KINDS, { context: keyedBy('dto.common.entryKindOneOf', { allowed: KEPT_BACK_LOG_KINDS.join(', ') }) })
  kind!: KeptBackLogKind;

  @IsOptionalNonNull()
  @IsInstant(INSTANT)
  at?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.keptBack.noteUnder', { max: TEXT_LIMITS.note }) })
  note?: string | null;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.common.strikesId') })
  strikes?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, REASON)
  reason?: string;
}

export class KeptBackEndDto implements KeptBackEndRequest {
  @IsIn(['joined', 'written-off'], { context: keyedBy('dto.keptBack.outcome') })
  outcome!: 'joined' | 'written-off';

  @IsOptionalNonNull()
  @IsInstant(INSTANT)
  at?: string;

  @IsOptionalNonNull()
  @IsCount('joined')
  joined?: number;

  @IsString(WHY_ENDED)
  @IsNotEmpty(WHY_ENDED)
  @MaxLength(TEXT_LIMITS.correctionReason, REASON)
  reason!: string;
}
