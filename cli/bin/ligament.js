#!/usr/bin/env node
// The `ligament` command. Committed, so `npm install` links it in a fresh clone before anything is
// built; it loads the compiled bundle (dist/cli.js), or says how to build it.
const { existsSync } = process.getBuiltinModule('node:fs');

const bundle = new URL('../dist/cli.js', import.meta.url);
if (existsSync(bundle)) {
  await import(bundle.href);
} else {
  process.stderr.write(
    'ligament: the command line is not built yet (cli/dist/cli.js is missing); run npm run build\n',
  );
  process.exitCode = 2;
}
