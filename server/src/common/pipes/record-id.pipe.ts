import { BadRequestException, ParseUUIDPipe } from '@nestjs/common';
import { refusal } from '../refusal';

/**
 * A record id in a path: Nest's UUID check, with a sentence a person understands instead of
 * "Validation failed (uuid is expected)" (a hand-typed or cut-off address reaches this).
 */
export const RecordIdPipe = new ParseUUIDPipe({
  exceptionFactory: () => new BadRequestException(refusal('common.recordId')),
});
