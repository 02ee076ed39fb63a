import { Command, Option } from './commander.js';
import { DEFAULT_COMMAND_LINE_TOLERANCE } from '../runner/tolerance.js';
import type { CheckSettings, FailOn, CommandLineTolerance } from '../runner/types.js';
import type { LoadDirection } from '../engine/types.js';
import { EXIT_CODES_HELP, setExitCode, type CliContext } from './context.js';
import {
  FORMATS,
  colorOption,
  directionOption,
  parsePositiveInt,
  toleranceArg,
  type Format,
} from './options.js';
import { emitReport } from './report.js';

interface CheckFlags {
  format: Format;
  output?: string;
  tolerance?: CommandLineTolerance;
  failOn: FailOn;
  direction?: LoadDirection[];
  member?: string;
  quiet?: boolean;
  color: 'auto' | 'always' | 'never';
  k: number;
}

/** Typed settings from the parsed flags. */
export function checkSettings(flags: CheckFlags): CheckSettings {
  return {
    tolerance: flags.tolerance ?? DEFAULT_COMMAND_LINE_TOLERANCE,
    failOn: flags.failOn,
    k: flags.k,
    ...(flags.direction ? { directions: flags.direction } : {}),
    ...(flags.member !== undefined ? { member: flags.member } : {}),
  };
}

/** `ligament check PATH…`: recompute every member and compare the claims. */
export function checkCommand(ctx: CliContext): Command {
  return new Command('check')
    .description('recompute the net section of every member and compare the claimed values')
    .argument('<path...>', 'calc files, directories (searched for *.json), globs, or - for standard input')
    .addOption(new Option('-f, --format <format>', 'report format').choices(FORMATS).default('text'))
    .option('-o, --output <file>', 'write the report to a file instead of standard output')
    .option(
      '-t, --tolerance <tol>',
      'tolerance for claimed values: a percentage (0.5%) or an absolute value with a unit (0.02in, 0.5mm, 0.01in2, 5mm2, 1kip, 2kN); repeatable',
      toleranceArg,
    )
    .addOption(
      new Option(
        '--fail-on <level>',
        'exit 1 on: overstated = any error finding, any = any warning or error, none = never',
      )
        .choices(['overstated', 'any', 'none'])
        .default('overstated'),
    )
    .addOption(directionOption())
    .option('-m, --member <id>', 'only the member with this id')
    .option('-q, --quiet', 'text format: only failing findings, input errors and the totals')
    .addOption(colorOption())
    .option('-k, --k <n>', 'how many least chains to report per direction', parsePositiveInt(100), 10)
    .addHelpText(
      'after',
      `
Examples:
  $ ligament check calcs/
  $ ligament check 'calcs/**/*.json' --format sarif --output ligament.sarif
  $ ligament check splice.json --member SP-1 --tolerance 0.02in --fail-on any
  $ cat splice.json | ligament check - --format json
${EXIT_CODES_HELP}`,
    )
    .action(async (paths: string[], flags: CheckFlags) => {
      const [{ runCheck }, { readSources }] = await Promise.all([
        import('../runner/check.js'),
        import('../node/sources.js'),
      ]);
      const sources = readSources(paths, { cwd: ctx.io.cwd, readStdin: ctx.io.readStdin });
      const outcome = await runCheck(sources, {
        command: 'check',
        settings: checkSettings(flags),
        version: ctx.version,
      });
      await emitReport(outcome.result, flags, ctx);
      setExitCode(ctx, outcome.exitCode);
    });
}
