/**
 * A summary fit for a pull-request comment: verdict, one table row per member, then the findings
 * at or above `--fail-on` with their locations (others folded away), and the caution.
 */
import type { RunReport } from '../runner/types.js';
import { CAUTION } from '../engine/caution.js';
import { SEVERITIES, formatQuantity } from '../engine/index.js';
import { chainLabel, fileUnits, isFailing, plural, position, strengthSymbol, totalsLine } from './common.js';

/** Escapes text for a Markdown table cell or list item. */
function md(text: string): string {
  return text
    .replace(/\\/g, '\\\\')
    .replace(/\|/g, '\\|')
    .replace(/([*_`[\]<>])/g, '\\$1');
}

function code(text: string): string {
  return '`' + text.replace(/`/g, "'") + '`';
}

/**
 * The verdict in the heading, from the findings and `--fail-on` (never "passed" over a list of
 * errors): files that could not be checked; findings at or above `--fail-on`; errors let through
 * by `--fail-on none`; else passed, naming the warnings and notes that remain.
 *
 * @example
 * headline(report) // → 'passed with 2 warnings', '3 errors, not failing (--fail-on none)'
 */
export function headline(report: RunReport): string {
  const s = report.summary;
  if (report.exitCode === 2) return 'could not check every file';
  if (report.command === 'validate') return 'every file valid';
  if (report.exitCode === 1) {
    return `${plural(s.failing, 'finding')} to resolve (--fail-on ${report.settings.failOn})`;
  }
  const { error, warning, note } = s.findings;
  if (error > 0) {
    const also = warning > 0 ? ` and ${plural(warning, 'warning')}` : '';
    return `${plural(error, 'error')}${also}, not failing (--fail-on ${report.settings.failOn})`;
  }
  if (warning > 0) return `passed with ${plural(warning, 'warning')}`;
  if (note > 0) return `passed with ${plural(note, 'note')}`;
  return 'passed';
}

/** Formats a run as Markdown. */
export function formatMarkdown(report: RunReport): string {
  const lines: string[] = [];
  lines.push(`## Ligament ${report.command}: ${headline(report)}`, '');
  lines.push(`${totalsLine(report)} · fail on **${report.settings.failOn}** · exit ${report.exitCode}`, '');

  const rows: string[] = [];
  for (const file of report.files) {
    const units = fileUnits(file);
    if (file.status === 'invalid') {
      rows.push(
        `| ${code(file.file)} | — | invalid: ${file.errors.length} input error${file.errors.length === 1 ? '' : 's'} | | | |`,
      );
      continue;
    }
    if (file.status === 'valid') {
      rows.push(`| ${code(file.file)} | — | valid (${file.memberCount} members) | | | |`);
      continue;
    }
    for (const m of file.members) {
      const r = m.result;
      const chains = r.directions
        .map((d) => `${d.direction} ${d.governing ? md(chainLabel(d.governing.holes)) : 'none'}`)
        .join('<br>');
      const counts = SEVERITIES.map((s) => [s, m.findings.filter((f) => f.severity === s).length] as const)
        .filter(([, n]) => n > 0)
        .map(([s, n]) => `${n} ${s}${n === 1 ? '' : 's'}`)
        .join(', ');
      rows.push(
        `| ${code(file.file)} | ${md(m.memberId)} | ${chains} | ${formatQuantity(r.An, 'area', units)} | ${strengthSymbol(file.profile)} ${formatQuantity(r.governing.available, 'force', units)} (${r.governing.limitState}) | ${counts || 'none'} |`,
      );
    }
  }
  if (rows.length > 0) {
    lines.push('| File | Member | Governing chain | An | Available strength | Findings |');
    lines.push('| --- | --- | --- | ---: | ---: | --- |');
    lines.push(...rows, '');
  }

  const failing: string[] = [];
  const other: string[] = [];
  for (const file of report.files) {
    for (const e of file.errors) {
      failing.push(
        `- **${md(e.rule)}** ${code(position(e.file, e.line, e.column))} ${md(e.message)} (${code(e.pointer || '/')})`,
      );
    }
    for (const m of file.members) {
      for (const f of m.findings) {
        const line = `- **${f.code}** ${f.severity} ${code(position(file.file, f.line, f.column))} ${md(f.message)} (${code(f.pointer || '/')})`;
        (isFailing(report, f.severity) ? failing : other).push(line);
      }
    }
  }
  if (failing.length > 0) lines.push(`### To resolve (${failing.length})`, '', ...failing, '');
  if (other.length > 0) {
    lines.push(
      `<details><summary>Other findings (${other.length})</summary>`,
      '',
      ...other,
      '',
      '</details>',
      '',
    );
  }
  lines.push(`> ${CAUTION}`, '');
  return lines.join('\n');
}
