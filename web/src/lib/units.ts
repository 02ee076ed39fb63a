import type { UnitSystem } from 'ligament/engine';

export interface UnitLabels {
  readonly length: string;
  readonly area: string;
  readonly force: string;
  readonly stress: string;
}

export const unitLabels: Record<UnitSystem, UnitLabels> = {
  in: { length: 'in', area: 'in²', force: 'kip', stress: 'ksi' },
  mm: { length: 'mm', area: 'mm²', force: 'kN', stress: 'MPa' },
};

/** Numbers as an engineer writes them: 3 decimals for inches, 1 for millimetres; thousands separated. */
export function formatQuantity(
  value: number | null | undefined,
  units: UnitSystem,
  kind: keyof UnitLabels | 'ratio',
): string {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  const digits =
    kind === 'ratio'
      ? 3
      : units === 'in'
        ? kind === 'force'
          ? 1
          : 3
        : kind === 'area' || kind === 'force'
          ? 0
          : 1;
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

export function chainLabel(holes: readonly string[]): string {
  return holes.length === 0 ? '(straight across, no holes)' : holes.join(' – ');
}

/** Stable key for a chain within a direction, used to tie table rows to drawn fracture lines. */
export function chainKey(direction: string, holes: readonly string[]): string {
  return `${direction}:${holes.join(',')}`;
}
