import { formatQuantity, unitSymbol, type Dimension } from 'ligament';

/**
 * What a discrepancy's claimed and recomputed numbers measure, read from the claim its pointer names
 * (the pointers are the engine's: cli/src/engine/findings/).
 */
const CLAIMS: Record<string, { quantity: string; dimension: Dimension }> = {
  Ag: { quantity: 'Ag', dimension: 'area' },
  An: { quantity: 'An', dimension: 'area' },
  Ae: { quantity: 'Ae', dimension: 'area' },
  U: { quantity: 'U', dimension: 'ratio' },
  yielding: { quantity: 'yielding strength', dimension: 'force' },
  rupture: { quantity: 'rupture strength', dimension: 'force' },
  available: { quantity: 'available strength', dimension: 'force' },
  Agv: { quantity: 'block shear Agv', dimension: 'area' },
  Anv: { quantity: 'block shear Anv', dimension: 'area' },
  Agt: { quantity: 'block shear Agt', dimension: 'area' },
  Ant: { quantity: 'block shear Ant', dimension: 'area' },
  blockShear: { quantity: 'block shear strength', dimension: 'force' },
  netWidth: { quantity: 'net width', dimension: 'length' },
};

/** Detailing findings compare a distance with a code limit (cli/src/engine/findings/detailingFindings.ts and kin). */
const DETAILING: Record<string, string> = {
  LG201: 'spacing',
  LG202: 'edge distance',
  LG203: 'distance to the fracture line',
  LG204: 'spacing or edge distance',
  LG205: 'spacing or edge distance',
  LG206: 'pitch',
};

/**
 * The quantity a finding's numbers measure: for a detailing finding a distance; else the claim its
 * pointer names, e.g. `/members/0/claims/An` → An (area); `/members/1/claims/chains/0` and
 * `…/controllingChain` → net width; `…/claims/chains` (a missed chain, compared as An) and
 * `…/holes` (equal share, An) → An; `…/load/shearLag` → U; `…/blockShear` → block shear strength;
 * `…/section/Ag` → Ag. null when it names none.
 */
export function quantityOf(finding: {
  pointer: string;
  code: string;
  class: string;
}): { quantity: string; dimension: Dimension } | null {
  if (finding.class === 'detailing')
    return { quantity: DETAILING[finding.code] ?? 'distance', dimension: 'length' };
  const parts = finding.pointer.split('/');
  const last = parts.at(-1) ?? '';
  if (last in CLAIMS) return CLAIMS[last] ?? null;
  const parent = parts.at(-2);
  if (parent === 'chains' && /^\d+$/.test(last)) return CLAIMS.netWidth ?? null;
  if (last === 'controllingChain') return CLAIMS.netWidth ?? null;
  if (last === 'chains' || last === 'holes') return CLAIMS.An ?? null;
  if (last === 'shearLag' || last === 'load') return CLAIMS.U ?? null;
  return null;
}

/**
 * The unit a quantity is given in, as the engine's unitSymbol writes it ("1" for a ratio, so the CSV
 * column is never blank for a number); "" when the unit system is unknown.
 */
export function unitOf(dimension: Dimension, units: string | null | undefined): string {
  return units === 'in' || units === 'mm' ? unitSymbol(dimension, units) || '1' : '';
}

/**
 * The CSV cells of a finding's numbers: quantity, claimed, recomputed and unit (blank quantity and
 * unit for a finding without numbers). The numbers stay numbers for a spreadsheet, rounded to the
 * file's precision as the engine's formatQuantity writes them (5.125 in², 2988 mm²). Both CSV exports
 * write them in this order.
 */
export function quantityCells(
  d: { pointer: string; code: string; class: string; claimed: number | null; recomputed: number | null },
  units: string | null | undefined,
): [string, number | null, number | null, string] {
  const q = d.claimed !== null || d.recomputed !== null ? quantityOf(d) : null;
  const rounded = (value: number | null): number | null =>
    value === null || !q || (units !== 'in' && units !== 'mm')
      ? value
      : Number(formatQuantity(value, q.dimension, units, { unit: false }));
  return [q?.quantity ?? '', rounded(d.claimed), rounded(d.recomputed), q ? unitOf(q.dimension, units) : ''];
}
