/** The UTF-8 byte-order mark: spreadsheets then read in², mm² and the dashes in messages as written. */
export const BOM = '\uFEFF';

/**
 * One CSV cell (RFC 4180): always quoted; text that a spreadsheet would run as a formula (= + - @,
 * tab, CR) gets a leading apostrophe. Numbers are written as they are.
 */
export function csvCell(value: unknown): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = value === null || value === undefined ? '' : String(value);
  const safe = /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return `"${safe.replace(/"/g, '""')}"`;
}

/** A whole CSV document: BOM, header, rows, CRLF after every line. */
export function csvDocument(header: readonly string[], rows: readonly (readonly unknown[])[]): string {
  const lines = [header, ...rows].map((r) => r.map(csvCell).join(','));
  return `${BOM}${lines.join('\r\n')}\r\n`;
}
