import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = new URL('.', import.meta.url).pathname;
/** Limits that are not a form field's text: search boxes, the species catalogue's admin values, sign-in (its own rules). */
// Search boxes, the admin's species values and sign-in (its tokens and codes are not typed text a form counts) keep their own limits.
const OWN_LIMITS = [
  'animals/dto/animal-list-query.dto.ts',
  'species/dto/species-list-query.dto.ts',
  'species/dto/update-species.dto.ts',
  'auth/dto/',
  'auth/second-factor/dto/',
];

const dtoFiles = (dir: string): string[] =>
  readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? dtoFiles(join(dir, e.name)) : e.name.endsWith('.ts') && !e.name.endsWith('.spec.ts') ? [join(dir, e.name)] : [],
  );

describe('text limits have one source', () => {
  it('every request text limit a form shows comes from TEXT_LIMITS (shared/src/forms/text-limits.ts), never a number of its own', () => {
    const literal = dtoFiles(SRC)
      .map((f) => relative(SRC, f))
      .filter((f) => !OWN_LIMITS.some((own) => f.startsWith(own)))
      .flatMap((f) =>
        readFileSync(join(SRC, f), 'utf8')
          .split('\n')
          .flatMap((line, i) => (/@MaxLength\(\s*\d/.test(line) ? [`${f}:${i + 1}`] : [])),
      );
    expect(literal).toEqual([]);
  });
});
