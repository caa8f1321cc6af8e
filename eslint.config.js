import js from '@eslint/js';
import ts from 'typescript-eslint';
import svelte from 'eslint-plugin-svelte';
import prettier from 'eslint-config-prettier';
import globals from 'globals';
import svelteConfig from './svelte.config.js';

/**
 * The layers, lowest first: units ← physics ← model ← solver ← chart ← report ← ui, with the
 * command line (src/cli) beside ui. `core` layers run in Node and in a worker: no Svelte, no DOM.
 */
const LAYERS = [
  { name: 'units', dir: 'src/lib/units', core: true },
  { name: 'physics', dir: 'src/lib/physics', core: true },
  { name: 'model', dir: 'src/lib/model', core: true },
  { name: 'solver', dir: 'src/lib/solver', core: true },
  { name: 'chart', dir: 'src/lib/chart', core: true },
  { name: 'report', dir: 'src/lib/report', core: true },
  { name: 'ui', dir: 'src/lib/ui', core: false },
];
/** Above ui: the page, and the command line, which sits beside ui and imports no ui. */
const TOP = ['routes', 'cli'];
const UI_ONLY = ['svelte', 'svelte/*', '$app/*', 'd3-selection', 'd3-zoom', 'd3-drag'];
const DOM_GLOBALS = ['document', 'window', 'navigator', 'localStorage'];

/** One config block per layer, forbidding imports of every layer above it. */
function layerRules() {
  return LAYERS.map((layer, i) => {
    const forbidden = [...LAYERS.slice(i + 1).map((l) => l.name), ...TOP];
    const names = forbidden.join('|');
    const message = `${layer.name} must not import ${forbidden.join(', ')} (layers run one way: DEVELOPERS.md, "Layers").`;
    const patterns = [
      { regex: `^(?:\\.\\./)+(?:lib/)?(?:${names})(?:/|$)`, message },
      { regex: `^\\$lib/(?:${names})(?:/|$)`, message },
    ];
    if (layer.core) {
      patterns.push({ group: UI_ONLY, message: 'Core layers stay free of Svelte and the DOM.' });
    }
    return {
      files: [`${layer.dir}/**`],
      rules: {
        'no-restricted-imports': ['error', { patterns }],
        ...(layer.core ? { 'no-restricted-globals': ['error', ...DOM_GLOBALS] } : {}),
      },
    };
  });
}

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
  // Layers, one direction only (DEVELOPERS.md, "Layers"): each folder may import its own layer
  // and the ones below it, never one above. The core layers also stay free of Svelte and the DOM.
  ...layerRules(),
  {
    // The command line sits beside ui: it may import every core layer, but no ui and no page.
    files: ['src/cli/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(?:\\.\\./)+(?:lib/)?(?:ui|routes)(?:/|$)',
              message: 'cli must not import ui or routes.',
            },
            { group: UI_ONLY, message: 'The command line runs in Node: no Svelte, no DOM.' },
          ],
        },
      ],
    },
  },
  {
    ignores: [
      'build/',
      'build-test/',
      'dist/',
      '.svelte-kit/',
      '.svelte-kit-test/',
      'node_modules/',
      'test-results/',
      'playwright-report/',
      'reports/',
      '.stryker-tmp/',
    ],
  },
);
