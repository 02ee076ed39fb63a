import { Command } from './commander.js';
import type { LoadDirection } from '../engine/types.js';
import { EXIT_CODES_HELP, setExitCode, type CliContext } from './context.js';
import { directionOption } from './options.js';
import { readOneSource, reportInputErrors } from './single.js';

interface DrawFlags {
  member?: string;
  direction?: LoadDirection[];
  output?: string;
}

/** `ligament draw FILE --member ID -o plate.svg`: a to-scale sketch of the member. */
export function drawCommand(ctx: CliContext): Command {
  return new Command('draw')
    .description('draw a member to scale as SVG: holes, gauge and pitch, load, governing fracture lines')
    .argument('<file>', 'a calc file, or - for standard input')
    .option('-m, --member <id>', 'the member (needed when the file holds more than one)')
    .addOption(directionOption())
    .option('-o, --output <file>', 'write the SVG to this file (default: standard output)')
    .addHelpText(
      'after',
      `
Examples:
  $ ligament draw splice.json --member SP-1 -o sp-1.svg
  $ ligament draw gusset.json --direction +x > gusset.svg
${EXIT_CODES_HELP}`,
    )
    .action(async (file: string, flags: DrawFlags) => {
      const source = await readOneSource(file, ctx);
      const { runDraw } = await import('../runner/draw.js');
      const outcome = runDraw(source, {
        ...(flags.member !== undefined ? { member: flags.member } : {}),
        ...(flags.direction ? { directions: flags.direction } : {}),
      });
      const svg = outcome.result.svg;
      if (outcome.exitCode !== 0 || svg === undefined) {
        await reportInputErrors(outcome.result, ctx);
        setExitCode(ctx, 2);
        return;
      }
      if (flags.output !== undefined) {
        const { writeFileAtomic } = await import('../node/files.js');
        const written = await writeFileAtomic(ctx.io.cwd, flags.output, svg);
        ctx.io.stderr(`ligament: wrote ${written}\n`);
      } else {
        ctx.io.stdout(svg);
      }
    });
}
