import { Command, Option } from './commander.js';
import type { LoadDirection } from '../engine/types.js';
import { EXIT_CODES_HELP, setExitCode, type CliContext } from './context.js';
import { directionOption, parsePositiveInt } from './options.js';
import { readOneSource, reportInputErrors } from './single.js';

interface ChainsFlags {
  member?: string;
  direction?: LoadDirection[];
  top: number;
  explain?: boolean;
  format: 'text' | 'json';
}

/** `ligament chains FILE --member ID`: the k least chains with their legs. */
export function chainsCommand(ctx: CliContext): Command {
  return new Command('chains')
    .description("list a member's least chains per direction, with each leg's s, g and s²/4g")
    .argument('<file>', 'a calc file, or - for standard input')
    .option('-m, --member <id>', 'the member (needed when the file holds more than one)')
    .addOption(directionOption())
    .option('--top <n>', 'how many chains per direction', parsePositiveInt(100), 10)
    .option('--explain', 'also list the least chains that cannot form, with the hole that blocks each')
    .addOption(new Option('-f, --format <format>', 'output format').choices(['text', 'json']).default('text'))
    .addHelpText(
      'after',
      `
Examples:
  $ ligament chains splice.json --member SP-1
  $ ligament chains splice.json --member SP-1 --direction +x --top 3 --explain
${EXIT_CODES_HELP}`,
    )
    .action(async (file: string, flags: ChainsFlags) => {
      const source = await readOneSource(file, ctx);
      const [{ runChains }, fmt] = await Promise.all([
        import('../runner/chains.js'),
        import('../formatters/chains.js'),
      ]);
      const outcome = runChains(source, {
        ...(flags.member !== undefined ? { member: flags.member } : {}),
        ...(flags.direction ? { directions: flags.direction } : {}),
        top: flags.top,
        explain: flags.explain === true,
      });
      if (outcome.exitCode === 0) {
        ctx.io.stdout(
          flags.format === 'json'
            ? fmt.formatChainsJson(outcome.result)
            : fmt.formatChainsText(outcome.result),
        );
      } else {
        await reportInputErrors(outcome.result, ctx);
      }
      setExitCode(ctx, outcome.exitCode);
    });
}
