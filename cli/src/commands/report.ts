/** Shared by validate and check: turns a run report into the chosen format and writes it. */
import type { RunReport } from '../runner/types.js';
import { colorEnabled, type CliContext } from './context.js';
import type { Format } from './options.js';

export interface OutputOptions {
  readonly format: Format;
  readonly output?: string;
  readonly quiet?: boolean;
  readonly color: 'auto' | 'always' | 'never';
}

/** Renders a report in the chosen format; formatters load only when used. */
export async function renderReport(
  report: RunReport,
  options: OutputOptions,
  ctx: CliContext,
): Promise<string> {
  switch (options.format) {
    case 'json':
      return (await import('../formatters/json.js')).formatJson(report);
    case 'junit':
      return (await import('../formatters/junit.js')).formatJunit(report);
    case 'markdown':
      return (await import('../formatters/markdown.js')).formatMarkdown(report);
    case 'sarif': {
      const [{ formatSarif }, { FINDING_CATALOGUE }] = await Promise.all([
        import('../formatters/sarif.js'),
        import('../engine/index.js'),
      ]);
      return formatSarif(report, { catalogue: FINDING_CATALOGUE });
    }
    case 'text': {
      const { formatText } = await import('../formatters/text.js');
      const useColor = colorEnabled(options.color, ctx.io, options.output !== undefined);
      const paint = useColor ? (await import('picocolors')).default.createColors(true) : undefined;
      return formatText(report, { ...(paint ? { paint } : {}), quiet: options.quiet === true });
    }
  }
}

/** Writes the rendered report to --output (atomically) or stdout, and input errors to stderr for non-text formats. */
export async function emitReport(report: RunReport, options: OutputOptions, ctx: CliContext): Promise<void> {
  const text = await renderReport(report, options, ctx);
  if (options.output !== undefined) {
    const { writeFileAtomic } = await import('../node/files.js');
    const written = await writeFileAtomic(ctx.io.cwd, options.output, text);
    ctx.io.stderr(`ligament: wrote ${options.format} report to ${written}\n`);
  } else {
    ctx.io.stdout(text);
  }
  if (options.format !== 'text' || options.output !== undefined) {
    const { errorLine } = await import('../formatters/text.js');
    for (const file of report.files) for (const e of file.errors) ctx.io.stderr(`${errorLine(e)}\n`);
  }
  const { runDiagnostics } = await import('../runner/check.js');
  for (const d of runDiagnostics(report)) ctx.io.stderr(`ligament: ${d}\n`);
}
