import { IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { PAIRING_OUTCOMES, type CreatePairingRequest, type PairingOutcome, TEXT_LIMITS } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class CreatePairingDto extends AcknowledgedWarningsDto implements CreatePairingRequest {
  @IsInstant({ context: keyedBy('dto.pairing.startedAt') })
  startedAt!: string;

  @IsInt({ context: keyedBy('dto.pairing.durationWhole') })
  @Min(1, { context: keyedBy('dto.pairing.durationMin') })
  @Max(20_160, { context: keyedBy('dto.pairing.durationMax') })
  durationMinutes!: number;

  @IsIn(PAIRING_OUTCOMES, { context: keyedBy('dto.common.outcomeOneOf', { allowed: PAIRING_OUTCOMES.join(', ') }) })
  outcome!: PairingOutcome;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.common.notesMax', { max: TEXT_LIMITS.note }) })
  notes?: string | null;

  @IsOptional()
  @IsUUID('all', { context: keyedBy('dto.pairing.maleId') })
  maleId?: string;

  @IsOptional()
  @IsUUID('all', { context: keyedBy('dto.pairing.correctsId') })
  corrects?: string;

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { context: keyedBy('dto.common.reasonUnder', { max: TEXT_LIMITS.correctionReason }) })
  reason?: string;
}
