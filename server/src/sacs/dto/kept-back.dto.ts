import { IsIn, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { KEPT_BACK_LOG_KINDS, type KeptBackEndRequest, type KeptBackLogKind, type KeptBackLogRequest, TEXT_LIMITS } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { IsCount } from './opening.dto';
import { sentence } from '../../common/filters/validation-exception.factory';

const INSTANT = sentence('dto.keptBack.at');
const REASON = sentence('dto.common.reasonUnder', { max: TEXT_LIMITS.correctionReason });
const WHY_ENDED = sentence('dto.keptBack.whyEnded');

export class KeptBackLogDto implements KeptBackLogRequest {
  @IsIn(KEPT_BACK_LOG_KINDS, sentence('dto.common.entryKindOneOf', { allowed: KEPT_BACK_LOG_KINDS.join(', ') }))
  kind!: KeptBackLogKind;

  @IsOptionalNonNull()
  @IsInstant(INSTANT)
  at?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, sentence('dto.keptBack.noteUnder', { max: TEXT_LIMITS.note }))
  note?: string | null;

  @IsOptionalNonNull()
  @IsUUID('all', sentence('dto.common.strikesId'))
  strikes?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, REASON)
  reason?: string;
}

export class KeptBackEndDto implements KeptBackEndRequest {
  @IsIn(['joined', 'written-off'], sentence('dto.keptBack.outcome'))
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
