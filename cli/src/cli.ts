#!/usr/bin/env node
/** The `ligament` bin: real streams in, exit code out. */
import { createContext } from './commands/context.js';
import { processIO } from './node/env.js';
import { packageVersion } from './node/paths.js';
import { runProgram } from './program.js';

// A closed pipe (`ligament check … | head`) is not an error of ours.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EPIPE') process.exit(process.exitCode ?? 0);
});

const ctx = createContext(processIO(), packageVersion());
runProgram(ctx, process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`ligament: error: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exitCode = 2;
  },
);
