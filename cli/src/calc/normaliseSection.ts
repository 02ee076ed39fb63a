import { EngineError } from '../engine/engineError.js';
import { memberSection } from '../engine/member/memberSection.js';
import { SectionError } from '../engine/sections/sectionError.js';
import type { Section } from '../engine/sections/types.js';
import type { MemberSectionInput } from '../engine/types.js';
import type { CalcReaders, Len, Raw } from './normaliseTypes.js';

/**
 * A member's `section` as the engine sees it, and the flat-element section it builds
 * (cli/src/engine/sections/README.md): dimensions read as lengths, `Ag` as the tabulated gross area.
 * Rules the schema cannot say: the member's `kind` matches the shape (section-kind: an angle of two
 * pieces is a double-angle), and the dimensions make a section (section-dimensions).
 *
 * @param raw - the member's schema-valid `section`
 * @param kind - the member's `kind`
 * @param pointer - the member's JSON pointer
 * @param read - the file's readers, which collect the issues
 * @returns the section input, and the section when its dimensions build one
 * @example
 * normaliseSection({ shape: 'angle', a: 4, b: 4, t: '3/8' }, 'angle', '/members/0', calcReaders('in')).built?.designation
 * // → 'L4x4x3/8 (4 × 4 × 0.375)'
 */
export function normaliseSection(
  raw: Raw,
  kind: string,
  pointer: string,
  read: CalcReaders,
): { readonly spec: MemberSectionInput; readonly built?: Section } {
  const { length, issues } = read;
  const mp = pointer;
  const sp: { -readonly [K in keyof MemberSectionInput]: MemberSectionInput[K] } = {
    shape: raw['shape'] as MemberSectionInput['shape'],
  };
  for (const k of ['a', 'b', 't', 'd', 'bf', 'tf', 'tw'] as const) {
    if (raw[k] !== undefined) sp[k] = length(raw[k] as Len, `${mp}/section/${k}`);
  }
  if (raw['pieces'] !== undefined) sp.pieces = raw['pieces'] as number;
  if (raw['Ag'] !== undefined) sp.tabulatedAg = raw['Ag'] as number;
  const expected = sp.shape === 'angle' ? ((sp.pieces ?? 1) > 1 ? 'double-angle' : 'angle') : sp.shape;
  if (kind !== expected && !(sp.shape === 'angle' && kind === 'double-angle' && (sp.pieces ?? 1) > 1)) {
    issues.push({
      pointer: `${mp}/kind`,
      rule: 'section-kind',
      message: `${mp}/kind: a ${sp.shape} section${sp.shape === 'angle' ? ` with ${sp.pieces ?? 1} piece(s)` : ''} is kind "${expected}", not "${kind}" (rule section-kind)`,
    });
  }
  const dims = [sp.a, sp.b, sp.t, sp.d, sp.bf, sp.tf, sp.tw];
  if (!dims.every((v) => v === undefined || Number.isFinite(v))) return { spec: sp };
  try {
    return { spec: sp, built: memberSection(sp) };
  } catch (err) {
    if (!(err instanceof SectionError || err instanceof EngineError)) throw err;
    issues.push({
      pointer: `${mp}/section`,
      rule: 'section-dimensions',
      message: `${mp}/section: ${err.message.replace(/^ligament\/engine[^:]*: /, '')} (rule section-dimensions)`,
    });
    return { spec: sp };
  }
}
