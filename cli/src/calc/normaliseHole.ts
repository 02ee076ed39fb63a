import type { HoleInput, HoleType, SlotOrientation } from '../engine/types.js';
import type { CalcReaders, Len, Raw } from './normaliseTypes.js';

/**
 * One hole of a calc file as the engine sees it: lengths read, the bolt size as a diameter, an
 * explicit size as `{ across, along }` the load (a slot's length runs across when `slot` is
 * `across`). Rules the schema cannot say: `slot` only on slotted holes (slot-on-round-hole), a slot
 * no shorter than it is wide (slot-size). A section hole's `y` is left NaN: its unfolded position
 * follows from its element and gauge ({@link placeSectionHoles}).
 *
 * @param raw - the schema-valid hole
 * @param pointer - its JSON pointer, e.g. `/members/0/holes/3`
 * @param read - the file's readers, which collect the issues
 * @returns the hole
 * @example
 * normaliseHole({ id: 'A', x: 0, y: '2-1/2', bolt: '3/4' }, '/members/0/holes/0', calcReaders('in'))
 * // → { id: 'A', x: 0, y: 2.5, type: 'standard', boltDiameter: 0.75 }
 */
export function normaliseHole(raw: Raw, pointer: string, read: CalcReaders): HoleInput {
  const { length, bolt, issues } = read;
  const hp = pointer;
  const type = (raw['type'] as HoleType | undefined) ?? 'standard';
  const slotted = type === 'short-slotted' || type === 'long-slotted';
  const slot = raw['slot'] as SlotOrientation | undefined;
  if (!slotted && slot !== undefined) {
    issues.push({
      pointer: `${hp}/slot`,
      rule: 'slot-on-round-hole',
      message: `${hp}/slot: a ${type} hole is round; "slot" applies only to short-slotted and long-slotted holes (rule slot-on-round-hole)`,
    });
  }
  const hole: { -readonly [K in keyof HoleInput]: HoleInput[K] } = {
    id: raw['id'] as string,
    x: length(raw['x'] as Len, `${hp}/x`, { allowNegative: true }),
    // A section hole's y is its unfolded position, set by placeSectionHoles from element and gauge.
    y: raw['y'] !== undefined ? length(raw['y'] as Len, `${hp}/y`, { allowZero: true }) : Number.NaN,
    type,
  };
  if (raw['element'] !== undefined) hole.element = raw['element'] as string;
  if (raw['gauge'] !== undefined)
    hole.gauge = length(raw['gauge'] as Len, `${hp}/gauge`, { allowNegative: true });
  if (raw['bolt'] !== undefined) hole.boltDiameter = bolt(raw['bolt'] as Len, `${hp}/bolt`);
  if (slotted && slot !== undefined) hole.slot = slot;
  const size = raw['size'];
  if (size !== undefined) {
    if (typeof size === 'object' && size !== null) {
      const s = size as Raw;
      const w = length(s['width'] as Len, `${hp}/size/width`);
      const l = length(s['length'] as Len, `${hp}/size/length`);
      if (l < w) {
        issues.push({
          pointer: `${hp}/size/length`,
          rule: 'slot-size',
          message: `${hp}/size/length: a slot's length (${l}) must not be less than its width (${w}) (rule slot-size)`,
        });
      }
      hole.dimension = slot === 'across' ? { across: l, along: w } : { across: w, along: l };
    } else {
      const d = length(size as Len, `${hp}/size`);
      hole.dimension = { across: d, along: d };
    }
  }
  return hole;
}
