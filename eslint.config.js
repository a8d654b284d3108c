import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import { importX } from 'eslint-plugin-import-x';
import globals from 'globals';
import { readdirSync } from 'node:fs';
import reactHooks from 'eslint-plugin-react-hooks';
import reactRefresh from 'eslint-plugin-react-refresh';
import tseslint from 'typescript-eslint';

const WEB = './apps/web/src';
const FEATURES = readdirSync(new URL('./apps/web/src/features', import.meta.url), {
  withFileTypes: true,
})
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/**
 * The layering rules of the style guide, as lint errors: shared web code never reaches up into features or the app
 * shell, a feature never imports another feature (a route combines them; shared bits move down), the web app never
 * imports the API, packages never import apps, and apps never import the repo's orchestration scripts.
 * tests/lint-boundaries.test.ts proves each zone fails on a deliberate violation.
 */
export const BOUNDARY_ZONES = [
  ...FEATURES.map((name) => ({
    target: `${WEB}/features/${name}`,
    from: `${WEB}/features`,
    except: [`./${name}`],
    message:
      'A feature never imports another feature: combine them in a route, or move the shared bit to components/ or lib/.',
  })),
  {
    target: [`${WEB}/components`, `${WEB}/lib`, `${WEB}/config`],
    from: [`${WEB}/features`, `${WEB}/app`],
    message:
      'Shared web code (components/, lib/, config/) never imports features or the app shell.',
  },
  {
    target: `${WEB}/features`,
    from: `${WEB}/app`,
    message: 'Features never import the app shell (routes, layout, home).',
  },
  {
    target: './apps/web',
    from: './apps/api',
    message: 'The web app never imports the API: share through @app/shared.',
  },
  { target: './packages', from: './apps', message: 'Packages never import apps.' },
  { target: './apps', from: './scripts', message: 'Apps never import the orchestration scripts.' },
  {
    target: './apps/api/seeders',
    from: './apps/api/migrations',
    message: 'A seeder never imports a migration: share the data from src/ instead.',
  },
];

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '.data/**',
      'tests/artifacts/**',
      'coverage/**',
      '**/*.d.mts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      globals: { ...globals.node },
      parserOptions: {
        projectService: {
          allowDefaultProject: [
            '*.js',
            'vite.config.ts',
            'vitest.config.ts',
            'scripts/*.mjs',
            'scripts/lib/*.mjs',
            'packages/devkit/src/*.mjs',
            'apps/api/src/modules/auth/*.mjs',
          ],
        },
        tsconfigRootDir: import.meta.dirname,
      },
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-non-null-assertion': 'error',
      '@typescript-eslint/consistent-type-imports': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['**/*.{ts,tsx,mts}'],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/extensions': importX.flatConfigs.typescript.settings['import-x/extensions'],
      'import-x/parsers': importX.flatConfigs.typescript.settings['import-x/parsers'],
      'import-x/resolver-next': [
        createTypeScriptImportResolver({
          project: ['apps/*/tsconfig.json', 'packages/*/tsconfig.json', 'tests/tsconfig.json'],
        }),
      ],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones: BOUNDARY_ZONES }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks, 'react-refresh': reactRefresh },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'react-refresh/only-export-components': ['error', { allowConstantExport: true }],
    },
  },
  {
    // Schemas (and zod with them) stay out of every first load: screens import vocabulary from
    // '@app/shared/values' and check forms through lib/lazy-schema.ts, which loads lib/form-schemas.ts.
    files: ['apps/web/src/**/*.{ts,tsx}'],
    ignores: ['apps/web/src/lib/form-schemas.ts', '**/*.test.{ts,tsx}', 'apps/web/src/testing/**'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          paths: [
            {
              name: '@app/shared',
              allowTypeImports: true,
              message:
                "Import values from '@app/shared/values' or '@app/shared/locale'; check forms with lazyResolver / loadFormSchemas (lib/lazy-schema.ts).",
            },
            {
              name: 'zod',
              allowTypeImports: true,
              message:
                'zod loads with the form schemas: use lazyResolver / loadFormSchemas (lib/lazy-schema.ts).',
            },
            {
              name: '@hookform/resolvers/zod',
              message: 'Use lazyResolver from lib/lazy-schema.ts.',
            },
          ],
        },
      ],
    },
  },
  {
    // Tests read untyped HTTP bodies (supertest's `res.body` is `any`); `no-explicit-any` still applies.
    files: ['**/*.test.ts', '**/*.test.tsx', 'tests/**/*.ts', '**/testing/**/*.ts'],
    rules: {
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  {
    // Plain JS build and orchestration scripts are not type-checked; keep the basic rules.
    files: ['**/*.mjs', '**/*.js', '**/*.cjs'],
    ...tseslint.configs.disableTypeChecked,
  },
);
