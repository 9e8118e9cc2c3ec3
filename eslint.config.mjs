// Lint for every workspace. Beyond typescript-eslint's recommended rules it enforces
// the architecture: no import cycles anywhere; in the client one-way imports
// (shared code → features → app) with no feature importing another feature; in the
// server a ground floor (common/, config/, database/) that imports no feature.
import { readdirSync, existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';
import pluginQuery from '@tanstack/eslint-plugin-query';
import i18next from 'eslint-plugin-i18next';

/** Zones that keep client features apart and imports one-way (after bulletproof-react). */
function clientBoundaryZones(root) {
  const features = path.join(root, 'client/src/features');
  const names = existsSync(features)
    ? readdirSync(features, { withFileTypes: true })
        .filter((d) => d.isDirectory())
        .map((d) => d.name)
    : [];
  return [
    ...names.map((name) => ({
      target: path.join(features, name),
      from: features,
      except: [`./${name}`],
      message: 'A feature must not import another feature; compose them in client/src/app instead.',
    })),
    { target: features, from: path.join(root, 'client/src/app'), message: 'Features must not import the app layer.' },
    {
      target: [path.join(root, 'client/src/components'), path.join(root, 'client/src/lib'), path.join(root, 'client/src/config')],
      from: [features, path.join(root, 'client/src/app')],
      message: 'Shared client code must not import features or the app layer.',
    },
  ];
}

/**
 * Zones that keep the server's ground floor (common/, config/, database/) free of features,
 * as in NestJS's samples where common/ imports only Nest: features build on it, never the reverse.
 */
function serverBoundaryZones(root) {
  const src = path.join(root, 'server/src');
  const groundFloor = ['common', 'config', 'database'];
  const features = existsSync(src)
    ? readdirSync(src, { withFileTypes: true })
        .filter((d) => d.isDirectory() && !groundFloor.includes(d.name))
        .map((d) => path.join(src, d.name))
    : [];
  if (!features.length) return [];
  return groundFloor.map((floor) => ({
    target: path.join(src, floor),
    from: features,
    message: `server/src/${floor} knows no feature; move the shared piece down into common/ or invert the dependency (a registry the feature fills).`,
  }));
}

export function createConfig({ root }) {
  return tseslint.config(
    {
      ignores: [
        '**/dist/**',
        '**/node_modules/**',
        '**/coverage/**',
        '.data/**',
        'client/test/lint-fixture/**',
        'server/test/lint-fixture/**',
        '**/*.d.ts',
        '**/*.d.mts',
      ],
    },
    js.configs.recommended,
    ...tseslint.configs.recommended,
    {
      files: ['**/*.{ts,tsx,mts,cts,js,mjs}'],
      plugins: { 'import-x': importX },
      languageOptions: { globals: { ...globals.node } },
      settings: {
        // no-cycle reads the imported files itself, so it must know how to parse TypeScript.
        'import-x/extensions': ['.ts', '.tsx', '.mts', '.js', '.mjs'],
        'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx', '.mts', '.cts'] },
        'import-x/resolver-next': [
          createTypeScriptImportResolver({
            alwaysTryTypes: true,
            noWarnOnMultipleProjects: true,
            project: ['shared/tsconfig.json', 'server/tsconfig.json', 'client/tsconfig.json'].map((p) => path.join(root, p)).filter((p) => existsSync(p)),
          }),
        ],
      },
      rules: {
        'import-x/no-cycle': ['error', { ignoreExternal: true }],
        'import-x/no-restricted-paths': ['error', { zones: [...clientBoundaryZones(root), ...serverBoundaryZones(root)] }],
        '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
        '@typescript-eslint/consistent-type-imports': 'off',
      },
    },
    {
      // Bidirectional MikroORM relations import each other by design; they are resolved
      // lazily through `() => Entity` thunks, so entity-to-entity cycles are allowed.
      files: ['server/src/**/*.entity.ts'],
      rules: { 'import-x/no-cycle': 'off' },
    },
    {
      files: ['**/*.cjs'],
      languageOptions: { sourceType: 'commonjs', globals: { ...globals.node } },
    },
    {
      files: ['client/**/*.{ts,tsx}'],
      languageOptions: { globals: { ...globals.browser } },
    },
    // React's rules of hooks (with the compiler-based checks of 7.x) and TanStack Query's rules, for the client only.
    { files: ['client/**/*.{ts,tsx}'], ...reactHooks.configs.flat.recommended },
    ...pluginQuery.configs['flat/recommended'].map((config) => ({ ...config, files: ['client/**/*.{ts,tsx}'] })),
    {
      // Every word a person reads comes from the catalogue (shared/src/i18n): no text inside JSX,
      // and none in the props that reach a person (labels, hints, titles, alt and aria texts).
      files: ['client/src/**/*.tsx'],
      ignores: [
        'client/src/**/*.test.tsx',
        'client/src/**/*.fixtures.tsx',
        // Still to move into the catalogue; each line goes when its folder reads only from it.
      ],
      plugins: { i18next },
      rules: {
        'i18next/no-literal-string': [
          'error',
          {
            mode: 'jsx-only',
            words: { exclude: ['[0-9!-/:-@[-`{-~]+', '[A-Z_-]+', /^\p{Emoji}+$/u, '[☀☾✉×·•→←…–—]+'] },
            callees: {
              exclude: [
                't',
                'label',
                'i18n(ext)?',
                'require',
                '.*getInputProps',
                '.*\\.(has|get|set|append|delete)',
                'field',
                'select',
                'includes',
                'startsWith',
                'endsWith',
                'navigate',
                'useSearchParams',
                'setFieldValue',
                'setValues',
                'getByRole',
                'getByText',
              ],
            },
            'jsx-attributes': {
              include: [
                'label',
                'description',
                'placeholder',
                'title',
                'alt',
                'aria-label',
                'error',
                'message',
                'children',
                'confirmLabel',
                'cancelLabel',
                'emptyText',
                'hint',
              ],
            },
          },
        ],
      },
    },
  );
}

export default createConfig({ root: path.dirname(fileURLToPath(import.meta.url)) });
