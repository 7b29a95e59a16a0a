import { readdirSync, existsSync } from 'node:fs';
import js from '@eslint/js';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// Feature boundaries in the React apps: shared code → features → app routes, one way only,
// and features never import each other (compose them in src/app instead).
function boundaryZones(appDir) {
  const src = `./${appDir}/src`;
  const featuresDir = `${src}/features`;
  const features = existsSync(featuresDir)
    ? readdirSync(featuresDir, { withFileTypes: true })
        .filter((d) => d.isDirectory())
        .map((d) => d.name)
    : [];
  return [
    ...features.map((feature) => ({
      target: `${featuresDir}/${feature}`,
      from: featuresDir,
      except: [`./${feature}`],
      message: 'Features never import each other; compose them in a route module under src/app.',
    })),
    { target: featuresDir, from: `${src}/app`, message: 'Features must not import from src/app.' },
    ...['components', 'lib', 'hooks'].map((shared) => ({
      target: `${src}/${shared}`,
      from: [featuresDir, `${src}/app`],
      message: 'Shared code must not depend on features or routes.',
    })),
  ];
}

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '**/dist-server/**',
      '.local/**',
      'packages/db/migrations/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: [
      'apps/console/src/**/*.{ts,tsx}',
      'apps/viewer/src/**/*.{ts,tsx}',
      'packages/ui/src/**/*.{ts,tsx}',
    ],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks, 'import-x': importX },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'import-x/no-restricted-paths': [
        'error',
        { zones: [...boundaryZones('apps/console'), ...boundaryZones('apps/viewer')] },
      ],
    },
  },
  {
    // dye-kit is pure computation: no I/O, no framework.
    files: ['packages/dye-kit/src/**/*.ts'],
    ignores: ['packages/dye-kit/src/**/*.test.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: ['node:*', 'fs', 'path', 'react', 'react-dom', 'express', '@vatside/db*'] },
      ],
    },
  },
);
