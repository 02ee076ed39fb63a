import { blockOutlines } from './blockOutlines.js';
import { blockShearAisc, type BlockShearAiscInput } from './blockShearAisc.js';
import { blockShearCsa, type BlockShearCsaInput } from './blockShearCsa.js';
import { blockShearEn, type BlockShearEnInput } from './blockShearEn.js';
import type { BlockShearAreas, BlockShearLayout, BlockShearResult, BlockShearStrength } from './types.js';

/** Which code's block shear form to use, with its inputs. */
export type BlockShearCode =
  | ({ readonly standard: 'AISC 360' } & BlockShearAiscInput)
  | ({ readonly standard: 'EN 1993-1-8' } & BlockShearEnInput)
  | ({ readonly standard: 'CSA S16' } & BlockShearCsaInput);

/**
 * Block shear of a bolt group: every outline {@link blockOutlines} proposes, its strength under the
 * chosen code (AISC 360 J4.3, EN 1993-1-8 3.10.2 or CSA S16 13.11), and the governing (least) one.
 *
 * @param layout - connected element, holes, direction, loaded end, free edges
 * @param code - the code's form and inputs
 * @returns every case and the governing one (null with no holes)
 * @example
 * // 2L6x6x5/8, A36, LRFD (R6): one outline, φRn ≈ 706 kips
 * blockShear(twoAngles, { standard: 'AISC 360', Fy: 36, Fu: 58, Ubs: 1, method: 'LRFD', units: 'in' }).governing?.strength.available
 * // → 705.8
 */
export function blockShear(layout: BlockShearLayout, code: BlockShearCode): BlockShearResult {
  const strength = (areas: BlockShearAreas): BlockShearStrength => {
    switch (code.standard) {
      case 'AISC 360':
        return blockShearAisc(areas, code);
      case 'EN 1993-1-8':
        return blockShearEn(areas, code);
      case 'CSA S16':
        return blockShearCsa(areas, code);
    }
  };
  const cases = blockOutlines(layout).map((o) => ({ ...o, strength: strength(o) }));
  let governing = cases[0] ?? null;
  for (const c of cases) if (governing && c.strength.available < governing.strength.available) governing = c;
  return { cases, governing };
}
