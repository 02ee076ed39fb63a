import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';
import { calcValidatorPlugin } from './vite/calc-validator-plugin.ts';

const here = (relative: string) => fileURLToPath(new URL(relative, import.meta.url));

// The web app imports the engine, the calc loader and the drawing model through the `ligament`
// package's exports like every other consumer. The package's `ligament-source` condition points each
// entry at its TypeScript sources (cli/src), so dev, the tests (jsdom, resolved as a browser) and the
// production build never wait for the CLI package to be built; Node, without the condition, takes
// the built `default`.
const ligamentSource = 'ligament-source';

// Vite reads its own settings here (the app's settings go through src/config/env.ts).
const apiTarget = 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [
    react(),
    calcValidatorPlugin({
      cliPackageJson: here('../cli/package.json'),
      schemaJson: here('../cli/schema/calc.schema.json'),
      schemaModule: here('../cli/src/calc/schema.ts'),
      validateSchemaModule: here('../cli/src/calc/validateSchema.ts'),
    }),
  ],
  resolve: {
    alias: { '@': here('./src') },
    conditions: [ligamentSource, ...defaultClientConditions],
  },
  server: {
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    manifest: true,
    sourcemap: false,
    chunkSizeWarningLimit: 700,
  },
  test: {
    environment: 'jsdom',
    globals: true,
    setupFiles: ['./src/testing/setup.ts'],
    include: ['src/**/*.test.{ts,tsx}'],
    css: false,
  },
});
