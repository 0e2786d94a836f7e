// ESLint 9 flat config: `npm run lint` (zero warnings allowed). The recommended sets of ESLint,
// typescript-eslint and React's hooks rules, and import-x's no-cycle over our own modules. Rules
// switched off are listed below with the reason; no type-aware rules (they would parse the whole
// project through tsc on every run, and `npm run typecheck` already does that).
import js from '@eslint/js';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  {
    ignores: ['node_modules/', 'dist/', '.data/', '.expo/', 'test-output/', 'coverage/'],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs,cjs}'],
    languageOptions: {
      ecmaVersion: 2023,
      sourceType: 'module',
      globals: { ...globals.node, ...globals.browser, ...globals.jest },
    },
    linterOptions: { reportUnusedDisableDirectives: 'warn' },
    rules: {
      // Unused names are errors, except the deliberate ones: `_`-prefixed arguments and the rest
      // siblings of a destructuring that drops a field (`const { password, ...safe } = row`).
      '@typescript-eslint/no-unused-vars': [
        'warn',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true },
      ],
      // Control characters in patterns are deliberate here: input checks refuse them by pattern.
      'no-control-regex': 'off',
    },
  },
  {
    // Only the two classic hooks rules: the recommended set of eslint-plugin-react-hooks 7 adds the
    // React Compiler's rules, and this app does not use the React Compiler.
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
    },
  },
  {
    // No import cycles among our own modules (type-only imports do not count: they vanish at build).
    files: ['**/*.{ts,tsx,mjs}'],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.web.ts', '.web.tsx', '.js', '.mjs', '.json'] })],
      'import-x/ignore': ['node_modules'],
      // Read our TypeScript dependencies with the TypeScript parser when following imports.
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/extensions': ['.ts', '.tsx', '.js', '.mjs'],
    },
    rules: {
      'import-x/no-cycle': ['warn', { ignoreExternal: true }],
    },
  },
  {
    // Services never import a route: the work runs below the HTTP layer. The parsed input types a
    // route's schema.ts declares may be named (type-only imports vanish at build, so no code of a
    // route is loaded by a service).
    files: ['server/services/**/*.ts', 'server/presenters/**/*.ts', 'server/mail/**/*.ts', 'server/search/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'warn',
        { patterns: [{ group: ['**/routes', '**/routes/**'], allowTypeImports: true, message: 'A service does not import a route: move what both need into shared/ or the service.' }] },
      ],
    },
  },
  {
    // require() is how Metro bundles assets (fonts, images), and how tests load a module inside a
    // jest.mock factory or after jest.resetModules(); neither has an import form.
    files: ['components/**/*.{ts,tsx}', 'app/**/*.{ts,tsx}', '**/*.test.{ts,tsx}', 'tests/**/*.{ts,tsx}', 'bench/**/*.ts'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // CommonJS files Babel, Jest and Metro load with require().
    files: ['**/*.{js,cjs}'],
    languageOptions: { sourceType: 'commonjs' },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
);
