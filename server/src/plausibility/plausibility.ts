import { BadRequestException, UnprocessableEntityException } from '@nestjs/common';
import { WARNINGS_FIELD, unacknowledged, type AcknowledgedWarnings, type PlausibilityWarning } from '@broodsilk/shared';
import { fieldRefusal, refusal } from '../common/refusal';

/**
 * Lets a write with plausibility warnings go ahead only once every warning is acknowledged with a
 * reason: otherwise 422 with one `details` row per warning (nothing is written). Returns the reason
 * to store with the record (null when nothing was unusual).
 */
export function acceptWarnings(found: readonly PlausibilityWarning[], request: AcknowledgedWarnings): string | null {
  if (!found.length) return null;
  const open = unacknowledged(found, request.acknowledgedWarnings);
  if (open.length) {
    const details = open.map((w) => ({ field: WARNINGS_FIELD, code: w.code, message: w.message, key: w.key, values: w.values }));
    // Several warnings: the summary counts them and the details say each, so no sentence is quoted into another.
    const summary = details.length === 1 ? details[0]! : refusal('plausibility.checkMany', { count: details.length });
    throw new UnprocessableEntityException({ message: summary.message, key: summary.key, values: summary.values, details });
  }
  const reason = request.warningReason?.trim();
  if (!reason) {
    throw new BadRequestException({ ...refusal('plausibility.reasonNeeded'), details: [fieldRefusal('warningReason', 'plausibility.reasonNeededField')] });
  }
  return reason;
}
