import { type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import type { FieldError } from '@broodsilk/shared';
import { badRequest } from '../field-errors';
import { fieldRefusal, type RefusalKey } from '../refusal';

const NUL = '\u0000';
/** A UTF-16 surrogate without its partner: not a character, and UTF-8 (so PostgreSQL) has no way to hold it. */
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

function problem(text: string): RefusalKey | null {
  if (text.includes(NUL)) return 'common.nulCharacter';
  if (LONE_SURROGATE.test(text)) return 'common.brokenCharacter';
  return null;
}

/** The dotted path and problem of the first string (or key) that cannot be stored, or null. Bodies are at most 32 levels deep (see body-parsers). */
function unstorable(value: unknown, path: string): FieldError | null {
  if (typeof value === 'string') {
    const key = problem(value);
    return key ? fieldRefusal(path || 'value', key) : null;
  }
  if (typeof value !== 'object' || value === null) return null;
  for (const [key, inner] of Object.entries(value)) {
    const at = path ? `${path}.${key}` : key;
    const refused = problem(key);
    if (refused) return fieldRefusal(at, refused);
    const found = unstorable(inner, at);
    if (found) return found;
  }
  return null;
}

/**
 * PostgreSQL text cannot hold U+0000, and a lone surrogate would be rewritten as U+FFFD on the way
 * to UTF-8 (and makes validator.js throw); either would come back as a 500 or a changed value.
 * Refused up front, for every route's body, query and path, naming the field.
 */
export class RefuseUnstorableTextPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'custom') return value;
    const found = unstorable(value, metadata.type === 'param' ? (metadata.data ?? '') : '');
    if (found) throw badRequest([found]);
    return value;
  }
}
