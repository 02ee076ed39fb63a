import { Command, Option } from './commander.js';
import { EXIT_CODES_HELP, setExitCode, UsageError, type CliContext } from './context.js';

interface InitFlags {
  units: 'in' | 'mm';
  output?: string;
  force?: boolean;
}

/** `ligament init`: a small valid calc file to start from. */
export function initCommand(ctx: CliContext): Command {
  return new Command('init')
    .description('write a small valid calc file to start from')
    .addOption(new Option('-u, --units <units>', 'unit system').choices(['in', 'mm']).default('in'))
    .option('-o, --output <file>', 'write to this file (default: standard output)')
    .option('--force', 'overwrite the output file if it exists')
    .addHelpText(
      'after',
      `
Examples:
  $ ligament init -o splice.json
  $ ligament init --units mm -o gusset.json
${EXIT_CODES_HELP}`,
    )
    .action(async (flags: InitFlags) => {
      const { starterCalcText } = await import('../runner/init.js');
      const text = starterCalcText({
        units: flags.units,
        date: new Date().toISOString().slice(0, 10),
        version: ctx.version,
      });
      if (flags.output === undefined) {
        ctx.io.stdout(text);
        return;
      }
      const [{ existsSync }, { resolve }, { writeFileAtomic }] = await Promise.all([
        import('node:fs'),
        import('node:path'),
        import('../node/files.js'),
      ]);
      if (!flags.force && existsSync(resolve(ctx.io.cwd, flags.output))) {
        throw new UsageError(`${flags.output} exists; pass --force to overwrite it`);
      }
      const written = await writeFileAtomic(ctx.io.cwd, flags.output, text);
      ctx.io.stderr(`ligament: wrote ${written}\n`);
      setExitCode(ctx, 0);
    });
}
