/**
 * What every command gets from the program: where to write, how to read standard input, the
 * working directory and environment, and a place to leave its exit code. The bin fills it from the
 * real process; tests fill it with strings.
 */
import type { ExitCode } from '../runner/types.js';

export interface CliIO {
  /** Results. */
  readonly stdout: (text: string) => void;
  /** Diagnostics. */
  readonly stderr: (text: string) => void;
  /** Reads standard input as UTF-8, stopping once more than `maxBytes` bytes have come. */
  readonly readStdin: (maxBytes: number) => Promise<string>;
  readonly cwd: string;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly stdoutIsTTY: boolean;
}

export interface CliContext {
  readonly io: CliIO;
  /** Package version. */
  readonly version: string;
  /** The worst exit code any action asked for; the bin sets `process.exitCode` from it. */
  exitCode: ExitCode;
}

export function createContext(io: CliIO, version: string): CliContext {
  return { io, version, exitCode: 0 };
}

/** Raises the run's exit code (never lowers it: 2 beats 1 beats 0). */
export function setExitCode(ctx: CliContext, code: ExitCode): void {
  if (code > ctx.exitCode) ctx.exitCode = code;
}

/** A problem with the command line itself: printed as one line, exit 2. */
export class UsageError extends Error {
  override readonly name = 'UsageError';
}

/** Shown after every command's help. */
export const EXIT_CODES_HELP = `
Exit codes:
  0  nothing at or above --fail-on (or the command succeeded)
  1  findings at or above --fail-on
  2  invalid input (unreadable, malformed or invalid calc file) or usage error`;

/** How colour is decided: --color wins, then NO_COLOR / FORCE_COLOR, then whether stdout is a terminal. */
export function colorEnabled(choice: 'auto' | 'always' | 'never', io: CliIO, toFile: boolean): boolean {
  if (choice === 'always') return true;
  if (choice === 'never' || toFile) return false;
  const noColor = io.env['NO_COLOR'];
  if (noColor !== undefined && noColor !== '') return false;
  const force = io.env['FORCE_COLOR'];
  if (force !== undefined && force !== '' && force !== '0') return true;
  if (io.env['TERM'] === 'dumb') return false;
  return io.stdoutIsTTY;
}
