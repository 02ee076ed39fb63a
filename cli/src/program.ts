/**
 * Builds the `ligament` command line. Commands live one per file in commands/; heavy modules (ajv,
 * the engine, formatters) load inside their actions, so `ligament --help` starts about as fast as
 * Node itself.
 */
import { Command, CommanderError } from './commands/commander.js';
import { CAUTION } from './engine/caution.js';
import { EXIT_CODES_HELP, UsageError, type CliContext } from './commands/context.js';
import { bundledSchemaVersion } from './node/paths.js';
import type { ExitCode } from './runner/types.js';

/**
 * A command as the top-level help lists it. Only the command being run is loaded (its file builds
 * its options, help and action); the others stay one-line entries, so `ligament --help` loads no
 * command module at all.
 */
export interface CommandEntry {
  readonly name: string;
  /** Its arguments as the top-level help shows them. */
  readonly args: string;
  /** The same words as the command's own description (a test keeps them equal). */
  readonly summary: string;
  readonly load: () => Promise<(ctx: CliContext) => Command>;
}

/** Every command, in the order `--help` lists them. Add a command by adding one entry here. */
export const COMMANDS: readonly CommandEntry[] = [
  {
    name: 'validate',
    args: '<path...>',
    summary: 'check calc files against the ligament-calc schema and its semantic rules',
    load: async () => (await import('./commands/validate.js')).validateCommand,
  },
  {
    name: 'check',
    args: '<path...>',
    summary: 'recompute the net section of every member and compare the claimed values',
    load: async () => (await import('./commands/check.js')).checkCommand,
  },
  {
    name: 'chains',
    args: '<file>',
    summary: "list a member's least chains per direction, with each leg's s, g and s²/4g",
    load: async () => (await import('./commands/chains.js')).chainsCommand,
  },
  {
    name: 'draw',
    args: '<file>',
    summary: 'draw a member to scale as SVG: holes, gauge and pitch, load, governing fracture lines',
    load: async () => (await import('./commands/draw.js')).drawCommand,
  },
  {
    name: 'init',
    args: '',
    summary: 'write a small valid calc file to start from',
    load: async () => (await import('./commands/init.js')).initCommand,
  },
  {
    name: 'schema',
    args: '',
    summary: 'print the bundled calc-file JSON Schema (or the result-document schema)',
    load: async () => (await import('./commands/schema.js')).schemaCommand,
  },
  {
    name: 'submit',
    args: '<path...>',
    summary: 'upload calc files as one submittal to a Ligament service and print its summary and web address',
    load: async () => (await import('./commands/submit.js')).submitCommand,
  },
];

/** The command a command line asks for: the first argument that is not an option (after `help`). */
export function requestedCommand(args: readonly string[]): string | undefined {
  const words = args.filter((a) => !a.startsWith('-'));
  return words[0] === 'help' ? words[1] : words[0];
}

/** `ligament 0.1.0 (calc schema 1.0, result schema 1.0)`. */
export function versionText(version: string): string {
  return `ligament ${version} (calc schema ${bundledSchemaVersion('calc.schema.json')}, result schema ${bundledSchemaVersion('result.schema.json')})`;
}

/**
 * The program, writing through the context's streams. Commander's own exits are turned into thrown
 * CommanderErrors (see {@link exitCodeOf}) so tests and the bin decide what happens.
 */
export async function buildProgram(ctx: CliContext, args: readonly string[] = []): Promise<Command> {
  const program = new Command('ligament')
    .description(
      'Validate and recompute ligament-calc files: net section of bolted steel plates with staggered holes.\n' +
        CAUTION,
    )
    .option('-V, --version', 'print the package and schema versions')
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
  // The version text reads the bundled schemas, so it is only built when asked for.
  program.on('option:version', () => {
    ctx.io.stdout(`${versionText(ctx.version)}\n`);
    throw new CommanderError(0, 'commander.version', versionText(ctx.version));
  });
  const wanted = requestedCommand(args);
  for (const entry of COMMANDS) {
    if (entry.name === wanted) {
      program.addCommand((await entry.load())(ctx));
    } else {
      const stub = new Command(entry.name).description(entry.summary);
      if (entry.args) stub.arguments(entry.args);
      program.addCommand(stub);
    }
  }
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
  try {
    const program = await buildProgram(ctx, args);
    await program.parseAsync([...args], { from: 'user' });
    return ctx.exitCode;
  } catch (err) {
    const code = exitCodeOf(err, ctx);
    return code > ctx.exitCode ? code : ctx.exitCode;
  }
}
