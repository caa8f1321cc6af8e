import js from '@eslint/js';
import ts from 'typescript-eslint';
import svelte from 'eslint-plugin-svelte';
import prettier from 'eslint-config-prettier';
import globals from 'globals';
import svelteConfig from './svelte.config.js';

export default ts.config(
  js.configs.recommended,
  ...ts.configs.recommended,
  ...svelte.configs.recommended,
  prettier,
  ...svelte.configs.prettier,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
    languageOptions: {
      parserOptions: {
        projectService: true,
        extraFileExtensions: ['.svelte'],
        parser: ts.parser,
        svelteConfig,
      },
    },
  },
  {
    // Core layers stay free of Svelte and the DOM (see DESIGN.md, "Layers").
    files: [
      'src/lib/physics/**',
      'src/lib/units/**',
      'src/lib/model/**',
      'src/lib/solver/**',
      'src/lib/chart/**',
      'src/lib/report/**',
    ],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: ['svelte', 'svelte/*', '$app/*', 'd3-selection', 'd3-zoom', 'd3-drag'] },
      ],
      'no-restricted-globals': ['error', 'document', 'window', 'navigator', 'localStorage'],
    },
  },
  {
    ignores: [
      'build/',
      'dist/',
      '.svelte-kit/',
      'node_modules/',
      'test-results/',
      'playwright-report/',
    ],
  },
);
