import { Command, Option } from './commander.js';
import { DEFAULT_COMMAND_LINE_TOLERANCE } from '../runner/tolerance.js';
import { EXIT_CODES_HELP, setExitCode, type CliContext } from './context.js';
import { FORMATS, colorOption, type Format } from './options.js';
import { emitReport } from './report.js';

interface ValidateFlags {
  format: Format;
  output?: string;
  quiet?: boolean;
  color: 'auto' | 'always' | 'never';
}

/** `ligament validate PATH…`: syntax, schema and semantic checks only, nothing recomputed. */
export function validateCommand(ctx: CliContext): Command {
  return new Command('validate')
    .description('check calc files against the ligament-calc schema and its semantic rules')
    .argument('<path...>', 'calc files, directories (searched for *.json), globs, or - for standard input')
    .addOption(new Option('-f, --format <format>', 'report format').choices(FORMATS).default('text'))
    .option('-o, --output <file>', 'write the report to a file instead of standard output')
    .option('-q, --quiet', 'text format: only input errors and the totals')
    .addOption(colorOption())
    .addHelpText(
      'after',
      `
Every error names the file, line and column, the JSON pointer of the value and the rule broken.

Examples:
  $ ligament validate calcs/
  $ ligament validate splice.json gusset.json
  $ ligament validate - < splice.json
${EXIT_CODES_HELP}`,
    )
    .action(async (paths: string[], flags: ValidateFlags) => {
      const [{ runCheck }, { readSources }] = await Promise.all([
        import('../runner/check.js'),
        import('../node/sources.js'),
      ]);
      const sources = readSources(paths, { cwd: ctx.io.cwd, readStdin: ctx.io.readStdin });
      const outcome = await runCheck(sources, {
        command: 'validate',
        settings: { tolerance: DEFAULT_COMMAND_LINE_TOLERANCE, failOn: 'overstated', k: 10 },
        version: ctx.version,
      });
      await emitReport(outcome.result, flags, ctx);
      setExitCode(ctx, outcome.exitCode);
    });
}
