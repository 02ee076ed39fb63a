import { EngineError } from '../engineError.js';
import { angle } from '../sections/angle.js';
import { channel } from '../sections/channel.js';
import { tee } from '../sections/tee.js';
import type { Section } from '../sections/types.js';
import { wShape } from '../sections/wShape.js';
import type { MemberSectionInput } from '../types.js';

function need(section: MemberSectionInput, names: readonly ('a' | 'b' | 't' | 'd' | 'bf' | 'tf' | 'tw')[]) {
  const values = names.map((n) => section[n]);
  const missing = names.filter((_, i) => values[i] === undefined);
  if (missing.length > 0) {
    throw new EngineError('invalid-argument', `a ${section.shape} section needs ${missing.join(', ')}`);
  }
  return values as number[];
}

/**
 * The flat-element section a member's `section` input describes (cli/src/engine/sections/README.md):
 * an angle from a, b, t (with `pieces` for a double angle), a tee from bf, tf, d, tw, a W-shape or
 * channel from d, bf, tf, tw.
 *
 * @param section - shape and dimensions
 * @returns the section
 * @throws EngineError when a dimension the shape needs is missing; SectionError when one is invalid
 * @example
 * memberSection({ shape: 'angle', a: 6, b: 6, t: 0.625, pieces: 2 }).elements.map((e) => e.id) // → ['leg-a', 'leg-b']
 */
export function memberSection(section: MemberSectionInput): Section {
  const built = build(section);
  const pieces = section.pieces ?? 1;
  if (section.shape === 'angle' || pieces === 1) return built;
  if (!(Number.isInteger(pieces) && pieces >= 1)) {
    throw new EngineError('invalid-argument', `pieces must be a whole number ≥ 1, got ${pieces}`);
  }
  return { ...built, pieces, designation: `${pieces} × ${built.designation}` };
}

function build(section: MemberSectionInput): Section {
  switch (section.shape) {
    case 'angle': {
      const [a, b, t] = need(section, ['a', 'b', 't']);
      return angle(a!, b!, t!, section.pieces !== undefined ? { pieces: section.pieces } : {});
    }
    case 'tee': {
      const [bf, tf, d, tw] = need(section, ['bf', 'tf', 'd', 'tw']);
      return tee(bf!, tf!, d!, tw!);
    }
    case 'w-shape': {
      const [d, bf, tf, tw] = need(section, ['d', 'bf', 'tf', 'tw']);
      return wShape(d!, bf!, tf!, tw!);
    }
    case 'channel': {
      const [d, bf, tf, tw] = need(section, ['d', 'bf', 'tf', 'tw']);
      return channel(d!, bf!, tf!, tw!);
    }
  }
}
