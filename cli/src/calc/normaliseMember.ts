import type { LoadDirection, MemberInput } from '../engine/types.js';
import { normaliseBlockShear } from './normaliseBlockShear.js';
import { normaliseClaims } from './normaliseClaims.js';
import { normaliseHole } from './normaliseHole.js';
import { normaliseSection } from './normaliseSection.js';
import { normaliseShearLag } from './normaliseShearLag.js';
import type { CalcReaders, Len, Raw } from './normaliseTypes.js';
import { placeSectionHoles } from './placeSectionHoles.js';
import type { CalcMember } from './types.js';

/**
 * One member of a calc file as the engine sees it, with its claims: holes ({@link normaliseHole}), a
 * rolled shape's section ({@link normaliseSection}) with its holes placed in the unfolded drawing
 * and its width and thickness taken from it ({@link placeSectionHoles}), material, load directions,
 * U and required strength, shear lag connection data ({@link normaliseShearLag}), block shear input
 * ({@link normaliseBlockShear}) and claims ({@link normaliseClaims}).
 *
 * @param raw - the schema-valid member
 * @param index - its index in the file's `members` array
 * @param read - the file's readers, which collect the issues
 * @returns the member with its index, description and claims
 * @example
 * normaliseMember(rawSplicePlate, 0, calcReaders('in')).input.holes[0]?.boltDiameter // → 0.75
 */
export function normaliseMember(raw: Raw, index: number, read: CalcReaders): CalcMember {
  const mp = `/members/${index}`;
  const m = raw;
  let holes = (m['holes'] as Raw[]).map((h, hi) => normaliseHole(h, `${mp}/holes/${hi}`, read));
  const load = m['load'] as Raw;
  const material = m['material'] as Raw;
  const rawSection = m['section'] as Raw | undefined;
  const section = rawSection ? normaliseSection(rawSection, m['kind'] as string, mp, read) : undefined;
  let width = m['width'] !== undefined ? read.length(m['width'] as Len, `${mp}/width`) : Number.NaN;
  let thickness =
    m['thickness'] !== undefined ? read.length(m['thickness'] as Len, `${mp}/thickness`) : Number.NaN;
  if (section?.built) {
    ({ holes, width, thickness } = placeSectionHoles(section.built, holes, mp, read.issues));
  }
  const input: { -readonly [K in keyof MemberInput]: MemberInput[K] } = {
    id: m['id'] as string,
    kind: m['kind'] as MemberInput['kind'],
    width,
    thickness,
    material: {
      ...(material['grade'] !== undefined ? { grade: material['grade'] as string } : {}),
      Fy: material['Fy'] as number,
      Fu: material['Fu'] as number,
    },
    holes,
    directions: load['directions'] as LoadDirection[],
  };
  if (load['U'] !== undefined) input.U = load['U'] as number;
  if (load['required'] !== undefined) input.requiredStrength = load['required'] as number;
  if (section) input.section = section.spec;
  const rawLag = load['shearLag'] as Raw | undefined;
  if (rawLag) input.shearLag = normaliseShearLag(rawLag, mp, read);
  const rawBlock = m['blockShear'] as Raw | undefined;
  if (rawBlock) input.blockShear = normaliseBlockShear(rawBlock, mp, section, holes, read);

  const member: { -readonly [K in keyof CalcMember]: CalcMember[K] } = { index, input };
  if (m['description'] !== undefined) member.description = m['description'] as string;
  if (m['claims'] !== undefined) member.claims = normaliseClaims(m['claims'] as Raw, `${mp}/claims`, read);
  return member;
}
