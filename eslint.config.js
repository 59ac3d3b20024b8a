// ESLint keeps the code's layout honest: type-aware TypeScript rules, React's hook rules, and the import
// boundaries of shared/STYLE.md (who may import whom, no cycles). Prettier owns formatting; nothing here does.
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

const features = readdirSync('src/features', { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/** Where a file may not import from. Paths are from the repository root. */
const boundaries = [
  {
    target: './shared',
    from: ['./src', './server'],
    message: 'shared/ runs on both sides: it imports nothing from src/ or server/.',
  },
  {
    target: './server',
    from: './src',
    message: 'The server never imports the client.',
  },
  {
    target: './server/routes',
    from: './server/models',
    message: 'Routes stay thin: model access belongs in a service (server/services).',
  },
  // A feature's internals are its own. What two features both need moves to src/lib or src/components.
  ...features.map((feature) => ({
    target: `./src/features/${feature}`,
    from: './src/features',
    except: [`./${feature}`],
    message: `src/features/${feature} may not import another feature: move what both need to src/lib or src/components.`,
  })),
  {
    target: ['./src/lib', './src/components'],
    from: ['./src/features', './src/app'],
    message: 'src/lib and src/components are shared by every feature, so they import no feature and no route.',
  },
];

export default tseslint.config(
  {
    ignores: ['dist/', 'public/', 'test-results/', 'backups/', '.tsbuild/', '.data*/', 'src/sw.js'],
  },
  js.configs.recommended,
  // Type-aware rules: recommendedTypeChecked as a whole. It is what catches the bugs a type check alone lets
  // through here, above all a promise nobody awaits (no-floating-promises: an unawaited write loses its error)
  // and a promise handed where a plain callback is expected (no-misused-promises: an async handler on an
  // Express route or a React event whose rejection nobody sees).
  tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      // An async function without an await still keeps its promise contract (a store's get(), a test callback);
      // adding or removing `async` for this rule's sake changes nothing a reader or the runtime cares about.
      '@typescript-eslint/require-await': 'off',
      // `_name` marks a parameter a signature requires but the body does not use.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // React's onClick and friends may take a function that returns a promise the handler deliberately lets run
      // (e.g. `onClick={() => void save()}` is still the clearer form); attributes stay checked for everything else.
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { attributes: false } }],
    },
  },
  {
    // The config files are plain JavaScript outside every TypeScript project.
    files: ['**/*.js'],
    extends: [tseslint.configs.disableTypeChecked],
    languageOptions: { globals: globals.node },
  },
  {
    // Tests read response bodies and parsed JSON, which are `any`, and check them with expect(): typing each body
    // first would add casts, not safety. Everything else about promises and types stays checked in tests too.
    files: ['tests/**/*.{ts,tsx}', '**/*.test.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: globals.browser },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: 'tsconfig.json' })],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones: boundaries }],
      'import-x/no-cycle': 'error',
    },
  },
  {
    // The client's own code never reaches into the server (test files may read its seed data).
    files: ['src/**/*.{ts,tsx}'],
    ignores: ['**/*.test.{ts,tsx}'],
    plugins: { 'import-x': importX },
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            ...boundaries,
            { target: './src', from: './server', message: 'The client never imports server code.' },
          ],
        },
      ],
    },
  },
);
