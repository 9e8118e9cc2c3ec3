import { BadRequestException, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';

const NUL = '\u0000';
/** A UTF-16 surrogate without its partner: not a character, and UTF-8 (so PostgreSQL) has no way to hold it. */
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

const NUL_MESSAGE = 'Text cannot contain the NUL character (U+0000); remove it and try again.';
const SURROGATE_MESSAGE = 'Text contains a broken character (half of a UTF-16 pair); retype it and try again.';

function problem(text: string): string | null {
  if (text.includes(NUL)) return NUL_MESSAGE;
  if (LONE_SURROGATE.test(text)) return SURROGATE_MESSAGE;
  return null;
}

/** The dotted path and problem of the first string (or key) that cannot be stored, or null. Bodies are at most 32 levels deep (see body-parsers). */
function unstorable(value: unknown, path: string): { field: string; message: string } | null {
  if (typeof value === 'string') {
    const message = problem(value);
    return message ? { field: path || 'value', message } : null;
  }
  if (typeof value !== 'object' || value === null) return null;
  for (const [key, inner] of Object.entries(value)) {
    const at = path ? `${path}.${key}` : key;
    const message = problem(key);
    if (message) return { field: at, message };
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
    if (found) throw new BadRequestException({ message: found.message, details: [found] });
    return value;
  }
}
