import { blockOutlines } from './blockOutlines.js';
import { blockShearAisc, type BlockShearAiscInput } from './blockShearAisc.js';
import { blockShearCsa, type BlockShearCsaInput } from './blockShearCsa.js';
import { blockShearEn, type BlockShearEnInput } from './blockShearEn.js';
import type {
  BlockOutline,
  BlockShearAreas,
  BlockShearCase,
  BlockShearLayout,
  BlockShearResult,
  BlockShearStrength,
} from './types.js';

/** Which code's block shear form to use, with its inputs. */
export type BlockShearCode =
  | ({ readonly standard: 'AISC 360' } & BlockShearAiscInput)
  | ({ readonly standard: 'EN 1993-1-8' } & BlockShearEnInput)
  | ({ readonly standard: 'CSA S16' } & BlockShearCsaInput);

/**
 * Tension-term factor per outline kind (AISC Ubs, CSA Ut; EN 1 concentric, 0.5 eccentric): keyed by
 * the full kind (`to-edge+root`) or its base (`to-edge`); kinds not named take the code's own value.
 */
export type TensionFactorByKind = Readonly<Record<string, number>>;

/** The factor an outline takes from a per-kind table, or undefined when the table does not name it. */
export function tensionFactorOf(outline: BlockOutline, byKind?: TensionFactorByKind): number | undefined {
  if (!byKind) return undefined;
  return byKind[outline.kind] ?? byKind[outline.kind.replace(/\+root$/, '')];
}

/**
 * Block shear of a bolt group: every outline {@link blockOutlines} finds, its strength under the
 * chosen code (AISC 360 J4.3, EN 1993-1-8 3.10.2 or CSA S16 13.11) with that outline's own tension
 * factor, and the governing (least) one.
 *
 * @param layout - cross-section, holes, direction, free end
 * @param code - the code's form and inputs (its Ubs / Ut / loading is the default factor)
 * @param byKind - tension factors of particular outline kinds
 * @returns every case and the governing one (null with no holes)
 * @example
 * // 2L6x6x5/8, A36, LRFD (R6): φRn ≈ 706 kips by the block to the toe
 * blockShear(twoAngles, { standard: 'AISC 360', Fy: 36, Fu: 58, Ubs: 1, method: 'LRFD', units: 'in' }).governing?.strength.available
 * // → 705.8
 */
export function blockShear(
  layout: BlockShearLayout,
  code: BlockShearCode,
  byKind?: TensionFactorByKind,
): BlockShearResult {
  const strength = (areas: BlockShearAreas, factor: number | undefined): BlockShearStrength => {
    switch (code.standard) {
      case 'AISC 360':
        return blockShearAisc(areas, factor === undefined ? code : { ...code, Ubs: factor });
      case 'EN 1993-1-8':
        return blockShearEn(
          areas,
          factor === undefined ? code : { ...code, loading: factor < 1 ? 'eccentric' : 'concentric' },
        );
      case 'CSA S16':
        return blockShearCsa(areas, factor === undefined ? code : { ...code, Ut: factor });
    }
  };
  const cases: BlockShearCase[] = blockOutlines(layout).map((o) => ({
    ...o,
    strength: strength(o, tensionFactorOf(o, byKind)),
  }));
  let governing = cases[0] ?? null;
  for (const c of cases) if (governing && c.strength.available < governing.strength.available) governing = c;
  return { cases, governing };
}
