import { BadRequestException, ParseUUIDPipe } from '@nestjs/common';

/**
 * A record id in a path: Nest's UUID check, with a sentence a person understands instead of
 * "Validation failed (uuid is expected)" (a hand-typed or cut-off address reaches this).
 */
export const RecordIdPipe = new ParseUUIDPipe({
  exceptionFactory: () =>
    new BadRequestException('This address does not name a record: its id is not complete or was changed. Open the record again from its list.'),
});
