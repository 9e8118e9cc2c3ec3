import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = new URL('..', import.meta.url).pathname;

/**
 * Refusals that stay English sentences, and why. Each entry is a file and the count of such sites in
 * it, so a new English refusal in the same file fails too.
 */
const ENGLISH_ONLY: Record<string, { sites: number; why: string }> = {
  // Read by the payment provider's webhook delivery, never by a person using Broodsilk.
  'settlements/webhook.service.ts': { sites: 2, why: 'payment provider' },
};

const sourceFiles = (dir: string): string[] =>
  readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? sourceFiles(join(dir, e.name)) : e.name.endsWith('.ts') && !e.name.endsWith('.spec.ts') ? [join(dir, e.name)] : [],
  );

/** `new XxxException('…')`, `new XxxException({ message: '…' })` or `({ message, … })` with a sentence of its own, and `badRequest([{ …, message: '…' }])`. */
const ENGLISH_REFUSAL = [
  /new \w+Exception\(\s*(?:['"`]|\{\s*message\s*(?::\s*['"`]|[,}]))/g,
  /badRequest\(\[\s*\{[^}]*\bmessage:\s*['"`]/g,
  /fieldError\(\s*[^,]+,\s*['"`]/g,
  // A field's refusal gathered before it is thrown: `errors.push({ field, message: '…' })`.
  /\.push\(\s*\{\s*field\b[^;]*?\bmessage:\s*['"`]/g,
  // A class-validator decorator's own sentence takes `{ context: keyedBy('dto.…') }` (validation-exception.factory), never its own
  // `message`: in the decorator's options (`@IsInt({ message: '…' })`, a constant, a function), in options built
  // beside it (`(what) => ({ message: … })`), in a registered decorator's options or its default message.
  /(?<!new\s)\b[A-Z]\w*\(\s*(?:[^()]|\([^()]*\))*?\{\s*(?:[^{}]*,\s*)?message\s*[:,}]/g,
  /=>\s*\(\{\s*message:\s*(?:['"`]|[A-Z_]+\b)/g,
  /\boptions:\s*\{[^}]*\bmessage\s*[:,}]/g,
  /\bdefaultMessage:\s*\([^)]*\)\s*=>\s*['"`]/g,
];

function englishRefusals(text: string): number {
  return ENGLISH_REFUSAL.reduce((n, re) => n + [...text.matchAll(re)].length, 0);
}

describe('every refusal the server writes can be said in the reader’s language', () => {
  it('the patterns find the English refusals they are written for (and leave keyed ones alone)', () => {
    expect(englishRefusals(`throw new ConflictException('This sac was already pulled.');`)).toBe(1);
    expect(englishRefusals('throw new NotFoundException({ message: `No ${x}.` });')).toBe(1);
    expect(englishRefusals(`throw new BadRequestException({ message, details: [{ field: 'code', message }] });`)).toBe(1);
    expect(englishRefusals(`throw badRequest([{ field: 'at', message: 'Too early.' }]);`)).toBe(1);
    expect(englishRefusals(`throw fieldError('at', 'Too early.');`)).toBe(1);
    expect(englishRefusals('if (!a) errors.push({ field, message: `There is no ${sex} of that name.` });')).toBe(1);
    expect(englishRefusals("errors.push({ field: `lines.${i}.pickOrder`, message: 'Used twice.' });")).toBe(1);
    expect(englishRefusals(`@IsInt({ message: 'The roll interval must be a whole number of hours.' })`)).toBe(1);
    expect(englishRefusals("@IsIn(ROLES, { each: true, message: `The role must be one of: ${ROLES.join(', ')}.` })")).toBe(1);
    expect(englishRefusals(`const dayRule = (what: string) => ({ message: \`The \${what} must be a whole day.\` });`)).toBe(1);
    expect(englishRefusals(`@IsInstant({ message: INSTANT })`)).toBe(1);
    expect(englishRefusals(`options: { message: (args: ValidationArguments) => problem(args.value) },`)).toBe(1);
    expect(englishRefusals("defaultMessage: () => `Each kind must be one of ${KINDS.join(', ')}.`,")).toBe(1);
    expect(englishRefusals(`IsInt({ message })(target, key);`)).toBe(1);
    expect(englishRefusals(`defaultMessage: (a: ValidationArguments) => refusal('field.instant', { field: a.property }).message,`)).toBe(0);
    expect(englishRefusals(`errors.push({ field: 'at', message: sentence });`)).toBe(0);
    expect(englishRefusals(`const said = (key: RefusalKey) => ({ message: refusal(key).message, context: keyedBy(key) });`)).toBe(0);
    expect(englishRefusals(`@IsInt({ context: keyedBy('dto.sac.rollWhole') })`)).toBe(0);
    expect(englishRefusals(`@IsIn(ROLES, { each: true, context: keyedBy('dto.common.roleOneOf', { allowed }) })`)).toBe(0);
    expect(englishRefusals(`@Min(1, { context: keyedBy('field.limitMin') })`)).toBe(0);
    expect(englishRefusals(`throw new ConflictException(refusal('sac.alreadyPulled', { on }));`)).toBe(0);
    expect(englishRefusals(`throw new BadRequestException({ ...refusal('photo.attach'), details: [fieldRefusal('file', 'photo.attachField')] });`)).toBe(0);
  });

  it('every `throw new …Exception(` in server/src takes refusal(…), except the listed ones', () => {
    const found = Object.fromEntries(
      sourceFiles(SRC)
        .map((f) => [relative(SRC, f), englishRefusals(readFileSync(f, 'utf8'))] as const)
        .filter(([, n]) => n > 0),
    );
    const allowed = Object.fromEntries(Object.entries(ENGLISH_ONLY).map(([f, { sites }]) => [f, sites]));
    expect(found).toEqual(allowed);
  });
});
