import { Command } from './commander.js';
import { EXIT_CODES_HELP, type CliContext } from './context.js';

interface SchemaFlags {
  path?: boolean;
  result?: boolean;
}

/** `ligament schema`: the bundled JSON Schema, for editors and other tools. */
export function schemaCommand(ctx: CliContext): Command {
  return new Command('schema')
    .description('print the bundled calc-file JSON Schema (or the result-document schema)')
    .option('--path', 'print the path of the schema file instead of its contents')
    .option('--result', 'the schema of the JSON result document (check --format json) instead')
    .addHelpText(
      'after',
      `
Examples:
  $ ligament schema > calc.schema.json
  $ ligament schema --path
  $ ligament schema --result
${EXIT_CODES_HELP}`,
    )
    .action(async (flags: SchemaFlags) => {
      const [{ schemaPath }, { readFile }] = await Promise.all([
        import('../node/paths.js'),
        import('node:fs/promises'),
      ]);
      const path = schemaPath(flags.result ? 'result.schema.json' : 'calc.schema.json');
      ctx.io.stdout(flags.path ? `${path}\n` : await readFile(path, 'utf8'));
    });
}
