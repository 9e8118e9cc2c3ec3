import { BadRequestException } from '@nestjs/common';
import { Type } from 'class-transformer';
import { IsInt, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { KEYSET_DEFAULT_LIMIT, KEYSET_MAX_LIMIT, TEXT_LIMITS, type KeysetQuery } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../validators/is-optional-non-null.validator';
import { keyedBy } from '../filters/validation-exception.factory';
import { refusal } from '../refusal';

/** `?after=&limit=` of a keyset-paged list. The cursor's content is checked by the list that reads it. */
export class KeysetQueryDto implements KeysetQuery {
  @IsOptionalNonNull()
  @IsString({ context: keyedBy('field.cursor') })
  @MaxLength(TEXT_LIMITS.pageCursor, { context: keyedBy('field.cursor') })
  @Matches(/^[A-Za-z0-9_-]+$/, { context: keyedBy('field.cursor') })
  after?: string;

  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt({ context: keyedBy('field.limitWhole') })
  @Min(1, { context: keyedBy('field.limitMin') })
  @Max(KEYSET_MAX_LIMIT, { context: keyedBy('field.limitMax', { max: KEYSET_MAX_LIMIT }) })
  limit?: number;
}

export const pageSize = (q: KeysetQuery): number => q.limit ?? KEYSET_DEFAULT_LIMIT;

/** The opaque cursor: base64url of a small JSON object naming the last item of a page. */
export function encodeCursor(key: Record<string, string | number>): string {
  return Buffer.from(JSON.stringify(key), 'utf8').toString('base64url');
}

const refused = () => new BadRequestException(refusal('common.cursor'));

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Reads `{ [field]: value }` back; anything else is a 400 with a message, never a 500. */
export function decodeCursor(cursor: string, field: string, kind: 'uuid' | 'integer'): string | number {
  let key: unknown;
  try {
    key = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
  } catch {
    throw refused();
  }
  if (!key || typeof key !== 'object' || Array.isArray(key) || Object.keys(key).length !== 1) throw refused();
  const value = (key as Record<string, unknown>)[field];
  if (kind === 'uuid' && typeof value === 'string' && UUID.test(value)) return value;
  if (kind === 'integer' && typeof value === 'number' && Number.isSafeInteger(value) && value > 0) return value;
  throw refused();
}
