// @ts-check
// The lint rules of the house (DEVELOPERS.md, "Habits"): ESLint's and
// typescript-eslint's recommended sets, the type-aware rules that catch real
// defects (promises left floating or passed where a callback is expected,
// objects written into text, non-errors thrown, switches that miss a kind),
// React's rules of hooks, no import cycles, and the layer rules below.
import js from '@eslint/js';
import { defineConfig } from 'eslint/config';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import { importX, createNodeResolver } from 'eslint-plugin-import-x';
import globals from 'globals';

/**
 * Globals only a browser has (window, document, HTMLElement,
 * requestAnimationFrame …), and the browser's storage and navigator, which
 * newer Node versions also define. The core, io and scenario layers run in
 * Node as well as the page: storage and the like come in as arguments.
 */
const BROWSER_ONLY = [
  ...new Set([
    ...Object.keys(globals.browser).filter((name) => !(name in globals.node) && !(name in globals.es2022)),
    'navigator',
    'localStorage',
    'sessionStorage',
  ]),
].map((name) => ({ name, message: 'This layer runs in Node too: no browser globals (pass what it needs in).' }));

/** Packages a layer may import: none for the core, papaparse for io, valibot and fflate for scenario. */
const onlyPackages = (allowed, layer) => ({
  'no-restricted-imports': [
    'error',
    {
      patterns: [
        {
          regex: allowed.length ? `^(?!\\.|(?:${allowed.join('|')})(?:/|$))` : '^(?!\\.)',
          message: `${layer} imports ${allowed.length ? `no package but ${allowed.join(' and ')}` : 'no package'}.`,
        },
      ],
    },
  ],
});

/**
 * The core's computations over a storm, a record or an event set: called by
 * the store's derive layer, never by the UI. (Drawing samples the capacity
 * curve at the chart's own pixel times, and a design storm form builds its
 * storm at the edge: neither is here.)
 */
const CORE_COMPUTATIONS = [
  'computeLosses',
  'computeLossesUnchecked',
  'calibrate',
  'calibrateUnchecked',
  'separateBaseflow',
  'runoffHydrograph',
  'fitTransform',
  'fitEvents',
  'fitEventTransforms',
  'summariseTransformFits',
  'splitEvents',
  'massCurve',
  'calibrationInterval',
  'runoffCurve',
  'compareHydrographs',
];

/** No JSX outside the UI: a .tsx file there would pull in React's runtime. */
const NO_JSX = {
  'no-restricted-syntax': [
    'error',
    { selector: 'JSXElement, JSXFragment', message: 'No JSX outside src/ui and src/main.tsx.' },
  ],
};

/**
 * src/ui, from the top down: each entry imports only entries below it, so no
 * folder imports one that imports it back. Panels stand above the shared
 * pieces they use (import kit, results, layout with the modal and the view
 * tabs, chart, fields, drag handle and frame throttle, services). A new
 * import that goes up this list is either a cycle or a sign that a piece
 * belongs lower down: move the piece, or this entry, rather than turn the
 * rule off.
 */
export const UI_ORDER = [
  'App.tsx',
  // views and the scenario bar, which hold panels
  'design-storm',
  'share',
  // panels
  'compare',
  'export',
  'matching',
  'record',
  'hydrograph',
  'observed',
  'storm-input',
  'rainfall',
  'events',
  'method',
  'catchment',
  // pieces the panels share
  'import-kit',
  'results',
  // the chart loads its mass-curve layer on first use through layout's lazyPart
  'chart',
  'layout',
  'fields',
  'interaction',
  'services',
  'keyboard',
  'format.ts',
  'parse-number.ts',
  'number-format',
  'units.ts',
];

const ui = (entry) => `./src/ui/${entry}`;
const UI_ZONES = UI_ORDER.slice(1).map((entry, i) => ({
  target: ui(entry),
  from: UI_ORDER.slice(0, i + 1).map(ui),
  message: `src/ui/${entry} stands below it in UI_ORDER (eslint.config.js): a shared piece imports no panel above it.`,
}));

/** The layers: ui → store → scenario, io → core; the core imports nothing outside itself. */
const LAYER_ZONES = [
  { target: './src/core', from: './src', except: ['./core'], message: 'The core imports nothing outside src/core.' },
  {
    target: './src/core/baseflow',
    from: './src/core',
    except: ['./baseflow', './errors.ts', './units.ts', './time-limits.ts', './kind-table.ts'],
    message: 'Baseflow separation uses only its own folder, errors, units, time limits and the kind-table factory.',
  },
  { target: './src/io', from: './src', except: ['./io', './core'], message: 'io imports only itself and the core.' },
  {
    target: './src/scenario',
    from: './src',
    except: ['./scenario', './core'],
    message: 'scenario imports only itself and the core.',
  },
  { target: './src/store', from: ['./src/ui', './src/main.tsx'], message: 'The store never imports the UI.' },
];

export default defineConfig(
  { ignores: ['dist/', 'node_modules/', 'test/browser/out/', 'public/', 'docs/'] },
  js.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    extends: [tseslint.configs.recommended],
    languageOptions: { parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname } },
    rules: {
      // tsc reports unused locals and parameters (noUnusedLocals, noUnusedParameters): one report, not two.
      '@typescript-eslint/no-unused-vars': 'off',
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': 'error',
      '@typescript-eslint/await-thenable': 'error',
      '@typescript-eslint/prefer-promise-reject-errors': 'error',
      '@typescript-eslint/only-throw-error': 'error',
      '@typescript-eslint/no-base-to-string': 'error',
      // `${kind}` of a kind narrowed to never is how an impossible branch names what it got.
      '@typescript-eslint/restrict-template-expressions': ['error', { allowNever: true }],
      '@typescript-eslint/no-implied-eval': 'error',
      '@typescript-eslint/switch-exhaustiveness-check': ['error', { considerDefaultExhaustiveForUnions: true }],
    },
  },
  {
    files: ['**/*.{js,mjs}'],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    // Browser specs run in Node and hand functions to the page.
    files: ['test/browser/**/*.mjs'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
  },
  {
    files: ['**/*.tsx', 'src/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'] })],
      // Without these the import rules read no TypeScript file they reach, and no-cycle sees no cycle through one.
      'import-x/extensions': ['.ts', '.tsx', '.js', '.mjs'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
    },
    rules: {
      // `let [a, b] = …` where only a changes stays one statement.
      'prefer-const': ['error', { destructuring: 'all' }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'no-eval': 'error',
      'no-new-func': 'error',
    },
  },
  {
    files: ['src/**'],
    rules: { 'import-x/no-restricted-paths': ['error', { zones: [...LAYER_ZONES, ...UI_ZONES] }] },
  },
  {
    files: ['src/core/**', 'src/io/**', 'src/scenario/**'],
    rules: { 'no-restricted-globals': ['error', ...BROWSER_ONLY], ...NO_JSX },
  },
  {
    // Components read derived values (src/store/derive*.ts); the core's computations are called there, once.
    files: ['src/ui/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '(^|/)core(/|$)',
              importNames: CORE_COMPUTATIONS,
              message:
                'The UI reads derived values from the store (src/store/derive*.ts); it does not call the core’s computations.',
            },
          ],
        },
      ],
    },
  },
  { files: ['src/core/**'], rules: onlyPackages([], 'The core') },
  { files: ['src/io/**'], rules: onlyPackages(['papaparse'], 'io') },
  { files: ['src/scenario/**'], rules: onlyPackages(['valibot', 'fflate'], 'scenario') },
);
