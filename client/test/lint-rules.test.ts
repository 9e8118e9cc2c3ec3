// @vitest-environment node
import { ESLint, type Linter } from 'eslint';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const fixture = fileURLToPath(new URL('./lint-fixture', import.meta.url));

// The repository's own configuration, built for the fixture's root, so the real rules are tested.
const configUrl = new URL('../../eslint.config.mjs', import.meta.url).href;

async function lint(file: string) {
  const { createConfig } = (await import(/* @vite-ignore */ configUrl)) as { createConfig: (o: { root: string }) => Linter.Config[] };
  const eslint = new ESLint({ cwd: fixture, overrideConfigFile: true, overrideConfig: createConfig({ root: fixture }) });
  const [result] = await eslint.lintFiles([path.join(fixture, file)]);
  return result.messages.map((m) => m.ruleId);
}

describe('architecture and client lint rules are on', { timeout: 30_000 }, () => {
  it('an import across client features is an error', async () => {
    expect(await lint('client/src/features/alpha/alpha-card.ts')).toContain('import-x/no-restricted-paths');
  });

  it('an import cycle is an error', async () => {
    expect(await lint('client/src/lib/ping.ts')).toContain('import-x/no-cycle');
  });

  it('a hook after an early return is an error (eslint-plugin-react-hooks)', async () => {
    expect(await lint('client/src/lib/conditional-hook.tsx')).toContain('react-hooks/rules-of-hooks');
  });

  it('a query key that leaves out what the query function reads is an error (@tanstack/eslint-plugin-query)', async () => {
    expect(await lint('client/src/lib/unkeyed-query.ts')).toContain('@tanstack/query/exhaustive-deps');
  });

  it('words typed into the markup instead of read from the catalogue are an error (eslint-plugin-i18next)', async () => {
    expect(await lint('client/src/components/inline-words.tsx')).toEqual(['i18next/no-literal-string', 'i18next/no-literal-string']);
  });

  it('words from the catalogue, codes and symbols pass', async () => {
    expect(await lint('client/src/components/catalogue-words.tsx')).toEqual([]);
  });

  it('a clean file passes', async () => {
    expect(await lint('client/src/lib/clean.ts')).toEqual([]);
  });
});

// The root configuration also guards the server's ground floor; its fixture sits beside the client's.
describe('server architecture lint rules are on', () => {
  it('common/ importing a server feature is an error', async () => {
    expect(await lint('server/src/common/reads-feature.ts')).toContain('import-x/no-restricted-paths');
  });

  it('a server feature importing the ground floor passes', async () => {
    expect(await lint('server/src/sacs/uses-ground-floor.ts')).toEqual([]);
  });
});
