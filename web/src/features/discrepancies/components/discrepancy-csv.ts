import type { UnitSystem } from 'ligament/engine';
import type { Schema } from '@/lib/api-schemas';
import { unitLabels, type UnitLabels } from '@/lib/units';

type Row = Schema<'DiscrepancyDto'>;

/** What a claimed or recomputed number measures, from the claim its pointer names (…/claims/An). */
const QUANTITY_OF: Record<string, keyof UnitLabels | 'ratio'> = {
  Ag: 'area',
  An: 'area',
  Ae: 'area',
  Agv: 'area',
  Anv: 'area',
  Agt: 'area',
  Ant: 'area',
  netWidth: 'length',
  chains: 'area',
  controllingChain: 'area',
  U: 'ratio',
  yielding: 'force',
  rupture: 'force',
  available: 'force',
  blockShear: 'force',
};

/**
 * The quantity a pointer names: its last segment that is a known quantity, e.g.
 * `/members/0/claims/An` → `An`, `/members/1/claims/chains/0/netWidth` → `netWidth`.
 */
export function quantityOf(pointer: string): string | null {
  const parts = pointer.split('/').map((p) => p.replace(/~1/g, '/').replace(/~0/g, '~'));
  for (let i = parts.length - 1; i >= 0; i -= 1) if (parts[i]! in QUANTITY_OF) return parts[i]!;
  return null;
}

/** The quantity and unit of a row's numbers; blank when the row has none or its file's units are unknown. */
export function unitOf(row: Row, units: UnitSystem | undefined): { quantity: string; unit: string } {
  if (row.claimed === null && row.recomputed === null) return { quantity: '', unit: '' };
  const quantity = quantityOf(row.pointer);
  const kind = quantity ? QUANTITY_OF[quantity] : undefined;
  if (!quantity || !kind) return { quantity: '', unit: '' };
  if (kind === 'ratio') return { quantity, unit: '1' };
  return { quantity, unit: units ? unitLabels[units][kind] : '' };
}

function cell(value: unknown): string {
  const text = value === null || value === undefined ? '' : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export const CSV_HEADER = [
  'id',
  'submittal',
  'file',
  'member',
  'code',
  'name',
  'class',
  'severity',
  'status',
  'load from',
  'holes',
  'quantity',
  'claimed',
  'recomputed',
  'unit',
  'unit system',
  'pointer',
  'message',
  'updated',
] as const;

/**
 * The discrepancy list as CSV (RFC 4180, CRLF line ends) behind a UTF-8 byte-order mark, so a
 * spreadsheet opens the units (in², mm²) and the dashes in the messages as written. Numbers are
 * the raw values, with the unit in its own column.
 */
export function discrepanciesCsv(rows: readonly Row[], unitsByFile: ReadonlyMap<number, UnitSystem>): string {
  const lines = rows.map((r) => {
    const units = unitsByFile.get(r.calcFileId);
    const { quantity, unit } = unitOf(r, units);
    return [
      r.id,
      r.submittalId,
      r.fileName,
      r.memberId,
      r.code,
      r.name,
      r.class,
      r.severity,
      r.status,
      r.direction,
      r.chain.join(' '),
      quantity,
      r.claimed,
      r.recomputed,
      unit,
      units ?? '',
      r.pointer,
      r.message,
      r.updatedAt,
    ]
      .map(cell)
      .join(',');
  });
  return `\uFEFF${[CSV_HEADER.map(cell).join(','), ...lines].join('\r\n')}\r\n`;
}
