import { BadRequestException, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';

const NUL = '\u0000';
const MESSAGE = 'Text cannot contain the NUL character (U+0000); remove it and try again.';

/** The dotted path of the first string (or key) holding a NUL, or null. Bodies are at most 32 levels deep (see body-parsers). */
function nulAt(value: unknown, path: string): string | null {
  if (typeof value === 'string') return value.includes(NUL) ? path || 'value' : null;
  if (typeof value !== 'object' || value === null) return null;
  for (const [key, inner] of Object.entries(value)) {
    const at = path ? `${path}.${key}` : key;
    if (key.includes(NUL)) return at;
    const found = nulAt(inner, at);
    if (found) return found;
  }
  return null;
}

/**
 * PostgreSQL text cannot hold U+0000, so a NUL in a body, query or path would fail at the
 * database as a 500. Refused up front, for every route, naming the field.
 */
export class RefuseNulPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'custom') return value;
    const field = nulAt(value, metadata.type === 'param' ? (metadata.data ?? '') : '');
    if (field) throw new BadRequestException({ message: MESSAGE, details: [{ field, message: MESSAGE }] });
    return value;
  }
}
