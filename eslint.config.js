// ESLint for the whole workspace (flat config). `npm run lint` runs it; `npm test` runs it as the
// suite `lint`. Formatting is Prettier's job: eslint-config-prettier comes last and turns off every
// rule that would argue with it. Rules are the recommended sets; each rule turned off or relaxed
// below says why. Turn a rule off for one line only, with the reason on the same line:
//   // eslint-disable-next-line <rule> -- <why>
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import { defineConfig, globalIgnores } from 'eslint/config';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const here = (path) => fileURLToPath(new URL(path, import.meta.url));

// The web's features, read from disk so that a new feature is fenced in without editing this file.
const webFeatures = readdirSync(here('./packages/web/src/features/'), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

// Resolves imports the way the packages do: `.js` on relative imports names the `.ts` source
// (nodenext), `@/` is the web's src, and @tacet/vibration is read from source (no build needed).
const resolver = createNodeResolver({
  extensions: ['.ts', '.tsx', '.mjs', '.js', '.json'],
  extensionAlias: { '.js': ['.ts', '.tsx', '.js'], '.mjs': ['.mts', '.mjs'] },
  conditionNames: ['types', 'import', 'default'],
  alias: {
    '@tacet/vibration': [here('./packages/vibration/src/index.ts')],
    '@': [here('./packages/web/src')],
  },
});

// The web's layering (CONVENTIONS): a feature never imports another feature, routes (src/app)
// compose them, and imports flow app → features → shared (components, hooks, lib, api, types).
const webSrc = here('./packages/web/src');
const featureFence = webFeatures.map((feature) => ({
  target: `./features/${feature}`,
  from: './features',
  except: [`./${feature}`],
  message: 'Features never import each other: compose them in a route under src/app.',
}));
const oneWay = [
  { target: './features', from: './app', message: 'Imports flow app → features → shared: a feature imports nothing of src/app.' },
  {
    target: ['./components', './hooks', './lib', './api', './types'],
    from: ['./features', './app'],
    message: 'Shared code (components, hooks, lib, api, types) imports no feature and nothing of src/app.',
  },
];

export default defineConfig([
  globalIgnores([
    '**/node_modules/',
    '**/dist/',
    '**/coverage/',
    '**/test-results/',
    '**/data/',
    // Generated from the server's OpenAPI document by tools/api-types.
    'packages/web/src/api/schema.gen.ts',
  ]),

  // Every JavaScript and TypeScript file.
  {
    files: ['**/*.{js,mjs,cjs,ts,tsx,mts}'],
    extends: [js.configs.recommended, tseslint.configs.recommended],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [resolver],
      // Read our own TypeScript when following imports (no-cycle); never parse installed packages.
      'import-x/extensions': ['.ts', '.tsx', '.mts', '.js', '.mjs', '.cjs'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx', '.mts'] },
      'import-x/ignore': ['node_modules'],
    },
    // A disable comment that no longer silences anything is an error: it would hide the next finding.
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // CONVENTIONS: no import cycles. The rule skips type-only imports (erased at build time,
      // they cannot form a cycle at run time).
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-self-import': 'error',
      // Relaxed: an argument kept for its position (a callback's signature, a key left out of a
      // rest object) is marked unused with a leading underscore, as TypeScript's own
      // noUnusedParameters allows.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
    },
  },

  // Node: the server, tools, browser and fault tests, reference checks and config files.
  {
    files: ['packages/server/**', 'tools/**', 'tests/**', '*.{js,mjs}', 'packages/*/*.{js,ts}'],
    languageOptions: { globals: { ...globals.node } },
  },

  // The calculation package is pure: no Node, no I/O, nothing from the server or the web. It runs
  // in the server and in the browser alike.
  {
    files: ['packages/vibration/src/**'],
    languageOptions: { globals: { ...globals['shared-node-browser'] } },
    rules: {
      'import-x/no-nodejs-modules': 'error',
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@tacet/*', '**/server/**', '**/web/**'],
              message: 'packages/vibration depends on nothing of the server or the web.',
            },
          ],
        },
      ],
      'no-restricted-globals': [
        'error',
        ...['process', 'Buffer', 'require', '__dirname', '__filename', 'global', 'setImmediate'].map((name) => ({
          name,
          message: 'packages/vibration is pure: no Node globals.',
        })),
      ],
    },
  },

  // The web: browser globals, the rules of hooks, the feature fence.
  {
    files: ['packages/web/src/**/*.{ts,tsx}'],
    extends: [reactHooks.configs.flat.recommended],
    languageOptions: { globals: { ...globals.browser } },
    rules: {
      'import-x/no-restricted-paths': ['error', { basePath: webSrc, zones: [...featureFence, ...oneWay] }],
    },
  },
  // Tests and test support may compose the whole app (render with the real providers and router),
  // but a feature's tests still import no other feature.
  {
    files: ['packages/web/src/**/*.test.{ts,tsx}', 'packages/web/src/testing/**'],
    rules: {
      'import-x/no-restricted-paths': ['error', { basePath: webSrc, zones: featureFence }],
    },
  },

  prettier,
]);
