import js from '@eslint/js';
import checkFile from 'eslint-plugin-check-file';
import importPlugin from 'eslint-plugin-import';
import jsxA11y from 'eslint-plugin-jsx-a11y';
import reactHooks from 'eslint-plugin-react-hooks';
import { readdirSync } from 'node:fs';
import tseslint from 'typescript-eslint';

const features = readdirSync('./src/features');
// The server's rooms by what they may import; see DEVELOPERS.md ("Folders").
const server = (...names) => names.map((name) => `./server/${name}`);
const httpSide = server(
  'routes',
  'middleware',
  'security',
  'workers',
  'dev',
  'app.ts',
  'index.ts',
  'context-factory.ts',
);
const notDev = readdirSync('./server')
  .filter((name) => name !== 'dev')
  .map((name) => `./server/${name}`);

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-artifacts/**', 'drizzle/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  // The hooks rules (including the compiler's checks of refs, state and effects) and the JSX accessibility rules.
  { files: ['src/**/*.{ts,tsx}'], ...reactHooks.configs.flat['recommended-latest'] },
  { files: ['src/**/*.{ts,tsx}'], ...jsxA11y.flatConfigs.recommended },
  // Only says which components the React Compiler would skip (react-hook-form's watch, TanStack Table); we do not run it.
  { files: ['src/**/*.{ts,tsx}'], rules: { 'react-hooks/incompatible-library': 'off' } },
  {
    languageOptions: {
      ecmaVersion: 2023,
      sourceType: 'module',
      globals: {
        console: 'readonly',
        process: 'readonly',
        window: 'readonly',
        document: 'readonly',
        fetch: 'readonly',
        URL: 'readonly',
        URLSearchParams: 'readonly',
        setTimeout: 'readonly',
        clearTimeout: 'readonly',
      },
    },
    plugins: { import: importPlugin, 'check-file': checkFile },
    settings: { 'import/resolver': { typescript: { project: './tsconfig.json' }, node: true } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'check-file/filename-naming-convention': [
        'error',
        { '**/*.{ts,tsx,js,mjs}': 'KEBAB_CASE' },
        { ignoreMiddleExtensions: true },
      ],
      'check-file/folder-naming-convention': ['error', { '{src,server,shared,fakes,tests}/**/': 'KEBAB_CASE' }],
      // Code flows one way: app -> features -> shared components/lib; features never import each other.
      'import/no-restricted-paths': [
        'error',
        {
          zones: [
            ...features.map((feature) => ({
              target: `./src/features/${feature}`,
              from: './src/features',
              except: [`./${feature}`],
              message: 'Features do not import each other; lift shared code to src/components, src/lib or shared/.',
            })),
            { target: './src/features', from: './src/app', message: 'Features must not import from the app layer.' },
            {
              target: ['./src/components', './src/lib', './src/hooks'],
              from: ['./src/features', './src/app'],
              message: 'Shared client code must not import features or the app.',
            },
            {
              target: './shared',
              from: ['./src', './server', './fakes'],
              message: 'shared/ is pure and imports neither client nor server.',
            },
            { target: './src', from: ['./server', './fakes'], message: 'The client never imports server code.' },
            {
              target: './server/services',
              from: httpSide,
              message:
                'Services do domain work and know nothing of HTTP, sign-in, workers or the dev start-up; routes call services, not the other way.',
            },
            {
              target: server('infra', 'lib', 'db', 'config'),
              from: [...server('services'), ...httpSide],
              message: 'infra, lib, db and config sit below services and routes and import neither.',
            },
            {
              target: './server/db',
              from: './server/config',
              message: 'db is below config: config may name the Db type, db never reads the environment.',
            },
            {
              target: notDev,
              from: './server/dev',
              message: 'Only dev (local start-up and the demo seed) imports dev.',
            },
          ],
        },
      ],
    },
  },
);
