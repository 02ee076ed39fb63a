/**
 * Builds the `ligament` command line. Commands live one per file in commands/; heavy modules (ajv,
 * the engine, formatters) load inside their actions, so `ligament --help` starts about as fast as
 * Node itself.
 */
import { Command, CommanderError } from 'commander';
import { chainsCommand } from './commands/chains.js';
import { checkCommand } from './commands/check.js';
import { EXIT_CODES_HELP, UsageError, type CliContext } from './commands/context.js';
import { drawCommand } from './commands/draw.js';
import { initCommand } from './commands/init.js';
import { schemaCommand } from './commands/schema.js';
import { validateCommand } from './commands/validate.js';
import { bundledSchemaVersion } from './node/paths.js';
import type { ExitCode } from './runner/types.js';

/** Every command, in the order `--help` lists them. Add a command by adding its factory here. */
export const COMMANDS: readonly ((ctx: CliContext) => Command)[] = [
  validateCommand,
  checkCommand,
  chainsCommand,
  drawCommand,
  initCommand,
  schemaCommand,
];

/** `ligament 0.1.0 (calc schema 1.0, result schema 1.0)`. */
export function versionText(version: string): string {
  return `ligament ${version} (calc schema ${bundledSchemaVersion('calc.schema.json')}, result schema ${bundledSchemaVersion('result.schema.json')})`;
}

/**
 * The program, writing through the context's streams. Commander's own exits are turned into thrown
 * CommanderErrors (see {@link exitCodeOf}) so tests and the bin decide what happens.
 */
export function buildProgram(ctx: CliContext): Command {
  const program = new Command('ligament')
    .description(
      'Validate and recompute ligament-calc files: net section of bolted steel plates with staggered holes.\n' +
        'Ligament is a checking aid. The engineer of record decides; the governing code and local requirements apply.',
    )
    .version(versionText(ctx.version), '-V, --version', 'print the package and schema versions')
    .helpOption('-h, --help', 'show help')
    .showSuggestionAfterError(true)
    .configureOutput({
      writeOut: (s) => ctx.io.stdout(s),
      writeErr: (s) => ctx.io.stderr(s),
      outputError: (s, write) => write(s.startsWith('error:') ? `ligament: ${s}` : s),
    })
    .addHelpText(
      'after',
      `
Examples:
  $ ligament init -o splice.json
  $ ligament check splice.json
  $ ligament check calcs/ --format sarif --output ligament.sarif
  $ ligament chains splice.json --member SP-1 --explain
  $ ligament draw splice.json --member SP-1 -o sp-1.svg
${EXIT_CODES_HELP}`,
    );
  for (const make of COMMANDS) program.addCommand(make(ctx));
  program.exitOverride();
  for (const command of program.commands) {
    command.exitOverride();
    command.configureOutput({
      writeOut: (s) => ctx.io.stdout(s),
      writeErr: (s) => ctx.io.stderr(s),
      outputError: (s, write) => write(s.startsWith('error:') ? `ligament ${command.name()}: ${s}` : s),
    });
  }
  return program;
}

/**
 * The exit code for an error that reached the top: commander's help and version exits are 0, its
 * usage errors 2, our usage errors 2, anything else 2 with one line on stderr (never a stack trace).
 */
export function exitCodeOf(err: unknown, ctx: CliContext): ExitCode {
  if (err instanceof CommanderError) {
    if (
      err.code === 'commander.helpDisplayed' ||
      err.code === 'commander.version' ||
      err.code === 'commander.help'
    ) {
      return 0;
    }
    if (err.code === 'commander.executeSubCommandAsync') return 0;
    return 2;
  }
  if (err instanceof UsageError) {
    ctx.io.stderr(`ligament: error: ${err.message}\n`);
    return 2;
  }
  const message = err instanceof Error ? err.message : String(err);
  ctx.io.stderr(`ligament: error: ${message.split('\n')[0]}\n`);
  return 2;
}

/** Runs the program over arguments (without `node` and the script) and returns the exit code. */
export async function runProgram(ctx: CliContext, args: readonly string[]): Promise<ExitCode> {
  const program = buildProgram(ctx);
  try {
    await program.parseAsync([...args], { from: 'user' });
    return ctx.exitCode;
  } catch (err) {
    const code = exitCodeOf(err, ctx);
    return code > ctx.exitCode ? code : ctx.exitCode;
  }
}
