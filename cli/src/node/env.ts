/** The one place the command line reads the real process: streams, environment, working directory. */
import type { CliIO } from '../commands/context.js';

export function processIO(): CliIO {
  return {
    stdout: (text) => void process.stdout.write(text),
    stderr: (text) => void process.stderr.write(text),
    readStdin: async (maxBytes) => (await import('./sources.js')).readStream(process.stdin, maxBytes),
    cwd: process.cwd(),
    env: process.env,
    stdoutIsTTY: process.stdout.isTTY === true,
  };
}
