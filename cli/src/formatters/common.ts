/** Small pure helpers shared by the formatters: labels, layout, totals (numbers: engine formatQuantity). */
import type { CodeProfile, UnitSystem } from '../engine/types.js';
import type { FileReport, RunReport } from '../runner/types.js';

/** A chain as text: hole ids joined by en dashes (hole ids may hold hyphens). */
export function chainLabel(holes: readonly string[] | undefined): string {
  if (!holes || holes.length === 0) return '—';
  return holes.join('–');
}

/**
 * The symbol of a design or allowable strength for a code profile: φPn (AISC LRFD), Pn/Ω (AISC
 * ASD), N,Rd (EN 1993-1-1), Tr (CSA S16).
 */
export function strengthSymbol(profile: Pick<CodeProfile, 'standard' | 'method'> | undefined): string {
  if (profile?.standard.startsWith('EN')) return 'N,Rd';
  if (profile?.standard.startsWith('CSA')) return 'Tr';
  return profile?.method === 'ASD' ? 'Pn/Ω' : 'φPn';
}

/** Pads to a width, counting code points (so `²` and `–` count as one). */
export function pad(text: string, width: number, align: 'left' | 'right' = 'left'): string {
  const len = [...text].length;
  if (len >= width) return text;
  const fill = ' '.repeat(width - len);
  return align === 'left' ? text + fill : fill + text;
}

/** Lays out rows of cells in aligned columns, two spaces apart. */
export function columns(
  rows: readonly (readonly string[])[],
  align: readonly ('left' | 'right')[] = [],
): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, [...cell].length)));
  return rows.map((row) =>
    row
      .map((cell, i) =>
        i === row.length - 1 && align[i] !== 'right' ? cell : pad(cell, widths[i] ?? 0, align[i]),
      )
      .join('  ')
      .trimEnd(),
  );
}

export function plural(n: number, word: string, many = `${word}s`): string {
  return `${n} ${n === 1 ? word : many}`;
}

/** One line of totals, e.g. `3 files (1 invalid), 5 members: 2 errors, 1 warning, 0 notes`. */
export function totalsLine(report: RunReport): string {
  const s = report.summary;
  const files = plural(s.files, 'file') + (s.invalidFiles > 0 ? ` (${s.invalidFiles} invalid)` : '');
  if (report.command === 'validate') {
    return `${files}: ${s.files - s.invalidFiles} valid, ${plural(s.inputErrors, 'input error')}`;
  }
  const f = s.findings;
  return `${files}, ${plural(s.members, 'member')}: ${plural(f.error, 'error')}, ${plural(f.warning, 'warning')}, ${plural(f.note, 'note')}`;
}

/** Why the run exits as it does, in words. */
export function verdictLine(report: RunReport): string {
  if (report.exitCode === 2) {
    return report.summary.invalidFiles > 0
      ? `exit 2: ${plural(report.summary.invalidFiles, 'file')} could not be checked`
      : 'exit 2: nothing was checked';
  }
  if (report.exitCode === 1) {
    return `exit 1: ${plural(report.summary.failing, 'finding')} at or above --fail-on ${report.settings.failOn}`;
  }
  return report.settings.failOn === 'none'
    ? 'exit 0: --fail-on none'
    : `exit 0: nothing at or above --fail-on ${report.settings.failOn}`;
}

/** `file:line:col`. */
export function position(file: string, line: number, column: number): string {
  return `${file}:${line}:${column}`;
}

export function isFailing(report: RunReport, severity: 'error' | 'warning' | 'note'): boolean {
  if (report.settings.failOn === 'none') return false;
  if (report.settings.failOn === 'any') return severity !== 'note';
  return severity === 'error';
}

export function fileUnits(file: FileReport): UnitSystem {
  return file.units ?? 'in';
}

/** Escapes text for XML attribute values and text nodes; drops characters XML 1.0 cannot hold. */
export function xmlEscape(text: string): string {
  return text
    .replace(/[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}
