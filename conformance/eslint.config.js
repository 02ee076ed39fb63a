import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// The conformance runner is a Node script; vectors are data.
export default tseslint.config(
  { ignores: ['vectors/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  { languageOptions: { globals: { ...globals.node } } },
);
