import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';
import { calcValidatorPlugin } from './vite/calc-validator-plugin.ts';

const here = (relative: string) => fileURLToPath(new URL(relative, import.meta.url));

// The web app imports the engine, the calc loader and the drawing model straight from the
// `ligament` workspace's TypeScript sources (cli/src), so dev, tests and the production build
// never depend on the CLI package having been built first, and there is only one copy of the code.
const ligamentSources = {
  'ligament/engine': here('../cli/src/engine/index.ts'),
  'ligament/calc': here('../cli/src/calc/index.ts'),
  'ligament/draw': here('../cli/src/draw/index.ts'),
};

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
    alias: { ...ligamentSources, '@': here('./src') },
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
