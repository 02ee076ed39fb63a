import js from '@eslint/js';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';

const features = [
  'account',
  'admin',
  'auth',
  'dashboard',
  'discrepancies',
  'mailbox',
  'notifications',
  'projects',
  'submittals',
  'upload',
];

export default tseslint.config(
  { ignores: ['dist/**', 'coverage/**', 'e2e/artifacts/**', 'src/lib/api-types.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // Colours come from the theme's tokens; the brand ramp is the one file with colour values.
      'no-restricted-syntax': [
        'error',
        {
          selector: 'Literal[value=/#[0-9a-fA-F]{3,8}\\b/]',
          message: 'Use Fluent tokens, not hex colours (only src/app/theme/brand.ts holds colour values).',
        },
      ],
    },
  },
  { files: ['src/app/theme/brand.ts'], rules: { 'no-restricted-syntax': 'off' } },
  // Boundaries: shared code never imports app/ or features/; a feature never imports another feature.
  {
    files: ['src/lib/**', 'src/components/**', 'src/config/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/app/*', '@/features/*'],
              message: 'Shared code does not depend on app/ or features/.',
            },
          ],
        },
      ],
    },
  },
  ...features.map((feature) => ({
    files: [`src/features/${feature}/**`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/app/*', ...features.filter((f) => f !== feature).map((f) => `@/features/${f}/*`)],
              message: 'Features do not import each other or the app layer.',
            },
          ],
        },
      ],
    },
  })),
  {
    files: ['e2e/**/*.mjs', 'bench/**/*.mjs', 'vite.config.ts', 'vite/**/*.ts', 'eslint.config.js'],
    languageOptions: { globals: { ...globals.node } },
  },
  // Browser tests pass functions to page.evaluate, which run in the page.
  { files: ['e2e/**/*.mjs'], languageOptions: { globals: { ...globals.node, ...globals.browser } } },
);
