import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const nodeBuiltins = {
  group: ['node:*', 'fs', 'path', 'os', 'child_process'],
  message: 'The engine, the calc loader and the drawing model are pure and isomorphic.',
};
const outsideEngine = {
  group: ['**/calc/*', '**/draw/*', '**/runner/*', '**/formatters/*', '**/commands/*', '**/node/*'],
  message:
    'The engine imports nothing outside cli/src/engine (the calc loader, the drawing and the CLI build on it).',
};

export default tseslint.config(
  { ignores: ['dist/**', 'schema/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  { languageOptions: { globals: { ...globals.node } } },
  {
    // The engine, the calc loader and the drawing model are isomorphic: no Node built-ins, no
    // process, no I/O.
    files: ['src/engine/**/*.ts', 'src/calc/**/*.ts', 'src/draw/**/*.ts'],
    languageOptions: { globals: { ...globals['shared-node-browser'] } },
    rules: {
      'no-restricted-imports': ['error', { patterns: [nodeBuiltins] }],
      'no-restricted-globals': ['error', 'process', 'Buffer', '__dirname', 'require'],
    },
  },
  {
    // The engine depends on nothing of the file format, the drawing or the command line.
    files: ['src/engine/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: [nodeBuiltins, outsideEngine] }] },
  },
);
