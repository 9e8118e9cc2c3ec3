import { IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { PAIRING_OUTCOMES, type CreatePairingRequest, type PairingOutcome, TEXT_LIMITS } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';

export class CreatePairingDto extends AcknowledgedWarningsDto implements CreatePairingRequest {
  @IsInstant({ message: 'The start must be a date and time with its offset, such as 2026-05-03T19:30:00+02:00.' })
  startedAt!: string;

  @IsInt({ message: 'The duration is a whole number of minutes.' })
  @Min(1, { message: 'The duration must be at least 1 minute.' })
  @Max(20_160, { message: 'The duration can be at most 14 days (20160 minutes).' })
  durationMinutes!: number;

  @IsIn(PAIRING_OUTCOMES, { message: `The outcome must be one of: ${PAIRING_OUTCOMES.join(', ')}.` })
  outcome!: PairingOutcome;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { message: `The notes can be at most ${TEXT_LIMITS.note} characters.` })
  notes?: string | null;

  @IsOptional()
  @IsUUID('all', { message: 'maleId must be the id of a male in your collection.' })
  maleId?: string;

  @IsOptional()
  @IsUUID('all', { message: 'corrects must be the id of the pairing to correct.' })
  corrects?: string;

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { message: `Keep the reason under ${TEXT_LIMITS.correctionReason} characters.` })
  reason?: string;
}
