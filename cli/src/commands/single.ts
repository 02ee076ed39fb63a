/** Reading the one FILE of `chains` and `draw`. */
import type { Source } from '../runner/source.js';
import { UsageError, type CliContext } from './context.js';

export async function readOneSource(path: string, ctx: CliContext): Promise<Source> {
  const { readSources } = await import('../node/sources.js');
  const found: Source[] = [];
  for await (const s of readSources([path], { cwd: ctx.io.cwd, readStdin: ctx.io.readStdin })) {
    found.push(s);
    if (found.length > 1) throw new UsageError(`${path} names more than one file; give one calc file`);
  }
  const only = found[0];
  if (!only) throw new UsageError(`${path}: no calc file found`);
  return only;
}

/** Prints input errors of a single-file command to stderr. */
export async function reportInputErrors(
  result: { readonly errors: readonly import('../calc/types.js').CalcError[]; readonly usage?: string },
  ctx: CliContext,
): Promise<void> {
  if (result.usage) ctx.io.stderr(`ligament: error: ${result.usage}\n`);
  if (result.errors.length > 0) {
    const { errorLine } = await import('../formatters/text.js');
    for (const e of result.errors) ctx.io.stderr(`${errorLine(e)}\n`);
  }
}
