import type { Section } from '../engine/sections/types.js';
import type { BlockShearSpec, HoleInput } from '../engine/types.js';
import type { CalcReaders, Len, Raw } from './normaliseTypes.js';

/**
 * A member's `blockShear` input as the engine sees it: the end distance read as a length, the
 * elements that tear out together, Ubs / Ut and the tension factors by outline kind. Rules the schema
 * cannot say: only a section member names elements (elements-without-section), and each element it
 * names holds holes (block-shear-element).
 *
 * @param raw - the schema-valid `blockShear` object
 * @param pointer - the member's JSON pointer
 * @param section - the member's section input and built section, for a section member
 * @param holes - the member's holes
 * @param read - the file's readers, which collect the issues
 * @returns the block shear input
 * @example
 * normaliseBlockShear({ endDistance: '1-1/2', Ubs: 1 }, '/members/0', undefined, holes, calcReaders('in'))
 * // → { endDistance: 1.5, Ubs: 1 }
 */
export function normaliseBlockShear(
  raw: Raw,
  pointer: string,
  section: { readonly built?: Section } | undefined,
  holes: readonly HoleInput[],
  read: CalcReaders,
): BlockShearSpec {
  const mp = pointer;
  const block: { -readonly [K in keyof BlockShearSpec]: BlockShearSpec[K] } = {
    endDistance: read.length(raw['endDistance'] as Len, `${mp}/blockShear/endDistance`),
  };
  if (raw['elements'] !== undefined) {
    const elements = raw['elements'] as string[];
    block.elements = elements;
    const built = section?.built;
    if (!section) {
      read.issues.push({
        pointer: `${mp}/blockShear/elements`,
        rule: 'elements-without-section',
        message: `${mp}/blockShear/elements: only section members have elements; a plate tears out as a whole (rule elements-without-section)`,
      });
    } else if (built) {
      elements.forEach((el, i) => {
        if (!built.elements.some((e) => e.id === el) || !holes.some((h) => h.element === el)) {
          read.issues.push({
            pointer: `${mp}/blockShear/elements/${i}`,
            rule: 'block-shear-element',
            message: `${mp}/blockShear/elements/${i}: ${built.designation} has no holes in an element "${el}" (rule block-shear-element)`,
          });
        }
      });
    }
  }
  if (raw['Ubs'] !== undefined) block.Ubs = raw['Ubs'] as 1 | 0.5;
  if (raw['Ut'] !== undefined) block.Ut = raw['Ut'] as number;
  if (raw['byOutline'] !== undefined) block.byOutline = { ...(raw['byOutline'] as Record<string, number>) };
  return block;
}
