// Jest runs the ESM NestJS app in CommonJS mode: @swc/jest turns our TypeScript and the ESM-only
// packages in node_modules (NestJS 12 and its file-type chain) into CJS. `ligament` (the workspace
// engine + loader) resolves through its package exports with the `ligament-source` condition, which
// names its TypeScript sources (cli/src), so tests need no cli build and always exercise the current
// engine; the `.js` suffixes of relative ESM imports are stripped for resolution.
const esmPkgs = [
  '@nestjs',
  'file-type',
  'strtok3',
  'token-types',
  '@tokenizer',
  'uint8array-extras',
  '@borewit',
];
const swc = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true, useDefineForClassFields: false },
      target: 'es2022',
    },
    module: { type: 'commonjs' },
  },
];
module.exports = {
  testEnvironment: 'node',
  // jest-environment-node's own conditions are node and node-addons.
  testEnvironmentOptions: { customExportConditions: ['ligament-source', 'node', 'node-addons'] },
  rootDir: __dirname,
  testMatch: ['<rootDir>/src/**/*.spec.ts', '<rootDir>/test/**/*.e2e-spec.ts'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transformIgnorePatterns: [`/node_modules/(?!(${esmPkgs.join('|')})/)`],
  transform: { '^.+\\.(t|j)s$': swc },
  testTimeout: 30000,
};
