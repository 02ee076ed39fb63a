import { shearLagCase2 } from './shearLagCase2.js';
import { shearLagCase7 } from './shearLagCase7.js';
import { shearLagCase8 } from './shearLagCase8.js';
import { shearLagFloor } from './shearLagFloor.js';
import { ShearLagError } from './shearLagError.js';
import type { ShearLagCandidate, ShearLagInput, ShearLagResult } from './types.js';

const round = (v: number): string => String(Math.round(v * 1000) / 1000);

/**
 * The shear lag factor U for a bolted member (AISC 360 Table D3.1): a U given in the file as is;
 * otherwise every case that applies — case 2 (1 − x̄/l) when x̄ and l are given, case 7 for W, M, S,
 * HP and tees, case 8 for single and double angles — and the largest of them, since the table permits
 * the larger of case 2 and case 7 or 8 — and, when `floor` is given (AISC 360-16/-22 D3, open sections),
 * not less than the connected elements' gross area over Ag ({@link shearLagFloor}).
 *
 * @param input - shape class, connected element, l, x̄, fasteners per line, bf and d, or a given U
 * @returns U with the case chosen and every candidate
 * @throws ShearLagError when no case applies (e.g. an angle with 2 fasteners per line and no x̄, l)
 * @example
 * // WT8x25 flange bolted, l = 6, ȳ = 1.89, 3 per line (AISC teaching calc to 360-16): case 7 over case 2
 * shearLagFactor({ shape: 'tee', connected: 'flange', length: 6, eccentricity: 1.89, fastenersPerLine: 3, bf: 7.07, d: 8.13 })
 * // → { U: 0.9, case: 7, candidates: [{ case: 2, U: 0.685, … }, { case: 7, U: 0.9, … }] }
 */
export function shearLagFactor(input: ShearLagInput): ShearLagResult {
  if (input.given !== undefined) {
    if (!(Number.isFinite(input.given) && input.given > 0 && input.given <= 1)) {
      throw new ShearLagError(`a given U must lie in (0, 1], got ${input.given}`);
    }
    const given: ShearLagCandidate = { case: 'given', U: input.given, basis: `U = ${input.given} as given` };
    return { U: input.given, case: 'given', candidates: [given] };
  }
  const candidates: ShearLagCandidate[] = [];
  if (input.length !== undefined && input.eccentricity !== undefined) {
    const U = shearLagCase2(input.eccentricity, input.length);
    candidates.push({
      case: 2,
      U,
      basis: `1 − x̄/l = 1 − ${input.eccentricity}/${input.length} = ${round(U)}`,
    });
  }
  const n = input.fastenersPerLine;
  if (n !== undefined && ['W', 'M', 'S', 'HP', 'tee'].includes(input.shape)) {
    if (input.connected === 'flange' || input.connected === 'web') {
      const U = shearLagCase7({ connected: input.connected, fastenersPerLine: n, bf: input.bf, d: input.d });
      if (U !== null) {
        const basis =
          input.connected === 'web'
            ? `web connected with ${n} ≥ 4 fasteners per line`
            : `flange connected with ${n} ≥ 3 per line, bf ${input.bf} ${U === 0.9 ? '≥' : '<'} 2/3 d = ${round((2 / 3) * input.d!)}`;
        candidates.push({ case: 7, U, basis });
      }
    }
  }
  if (n !== undefined && (input.shape === 'single-angle' || input.shape === 'double-angle')) {
    const U = shearLagCase8(n);
    if (U !== null) candidates.push({ case: 8, U, basis: `angle with ${n} fasteners per line` });
  }
  if (candidates.length === 0) {
    throw new ShearLagError(
      `no Table D3.1 case applies to a ${input.shape} connected by its ${input.connected}: give x̄ and l, or U`,
    );
  }
  let best = candidates[0]!;
  for (const c of candidates) if (c.U > best.U) best = c;
  if (!input.floor) return { U: best.U, case: best.case, candidates };
  // AISC 360-16/-22 D3: U of an open section need not be less than the connected elements' share of Ag.
  const { connectedArea, grossArea } = input.floor;
  const ratio = shearLagFloor(connectedArea, grossArea);
  const floor: ShearLagCandidate = {
    case: 'D3 floor',
    U: ratio,
    basis: `connected elements' gross area / Ag = ${round(connectedArea)}/${round(grossArea)} = ${round(ratio)}`,
  };
  if (ratio <= best.U) return { U: best.U, case: best.case, candidates, floor };
  return { U: ratio, case: 'D3 floor', candidates: [...candidates, floor], floor };
}
