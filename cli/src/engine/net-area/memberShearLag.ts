import { holeSpacings } from '../profiles/holeSpacings.js';
import { csaS16EffectiveNetArea } from '../profiles/csaS16EffectiveNetArea.js';
import { en1993AngleOneLeg } from '../profiles/en1993AngleOneLeg.js';
import { ProfileError } from '../profiles/profileError.js';
import type { SectionLayout } from '../sections/types.js';
import { shearLagFactor } from './shear-lag/shearLagFactor.js';
import { ShearLagError } from './shear-lag/shearLagError.js';
import type { ShearLagShape } from './shear-lag/types.js';
import type { MemberInput, MemberModel, MemberShearLag } from '../types.js';

const r3 = (v: number): string => String(Math.round(v * 1000) / 1000);

function aiscShape(member: MemberInput): ShearLagShape {
  switch (member.section?.shape) {
    case 'angle':
      return (member.section.pieces ?? 1) > 1 || member.kind === 'double-angle'
        ? 'double-angle'
        : 'single-angle';
    case 'tee':
      return 'tee';
    case 'w-shape':
      return 'W';
    default:
      return 'other';
  }
}

/**
 * Gross area of the elements holding holes (all pieces), for the AISC 360-16/-22 D3 floor: each
 * element at its full width × thickness (an angle leg a·t or b·t, a flange bf·tf, a W web
 * (d − 2tf)·tw, a tee stem (d − tf)·tw, a channel web d·tw), at most Ag. Undefined when no hole lies
 * in a known element.
 */
function connectedGrossArea(member: MemberInput, layout: SectionLayout): number | undefined {
  const spec = member.section;
  if (!spec) return undefined;
  const ids = new Set(layout.holes.map((h) => h.element));
  let area = 0;
  for (const e of layout.section.elements) {
    if (!ids.has(e.id)) continue;
    // An angle's second leg and a channel's flanges give their overlap to the other element in Ag;
    // as a connected element each counts at its full width.
    const full =
      spec.shape === 'angle' && e.id === 'leg-b' && spec.b !== undefined
        ? spec.b
        : spec.shape === 'channel' && e.role === 'flange' && spec.bf !== undefined
          ? spec.bf
          : e.areaWidth;
    area += full * e.thickness;
  }
  return area > 0 ? area * layout.section.pieces : undefined;
}

function notApplicable(why: string): MemberShearLag {
  return { U: 1, rule: 'none', basis: `U taken as 1.0: ${why}`, notApplicable: why };
}

/**
 * Shear lag factor of a member under the file's code:
 * - a U given in the file is used as is;
 * - AISC 360: Table D3.1 cases 2, 7 and 8 from the connection data (the larger of case 2 and 7 or 8),
 *   and under 360-16/-22 not less than the connected elements' gross area over Ag (D3, open sections;
 *   the elements holding holes are the connected ones), reported in `basis`;
 * - CSA S16-19 12.3.3.2: Ane = factor · An, the factor reported as U (angles 0.80 with 4 or more
 *   transverse lines, 0.60 with fewer; W flanges 0.90/0.85; others 0.85/0.75);
 * - EN 1993-1-8 3.10.3: an angle connected by one leg takes β2 or β3 (interpolated on p1) as U, so
 *   Nu,Rd = β·Anet·fu/γM2; for one bolt U = 2.0(e2 − 0.5 d0)t / Anet. An unequal-leg angle bolted
 *   through its smaller leg (2 or more bolts, every hole in that leg) takes Anet of the equivalent
 *   equal-leg angle of the smaller leg's size (3.10.3(2)), reported in `netArea`: Ae = netArea·β.
 *   Other EN members: U = 1 (6.2.3 (6.7) has its own 0.9).
 * A plate without connection data takes U = 1.0 (Table D3.1 case 1) and reports nothing; a section
 * without either U or connection data, or with data no rule applies to, takes U = 1.0 and says why
 * (finding LG142).
 *
 * @param model - the member model (its input's U, shearLag, section and material; the unfolded
 *   section gives EN angles d0, pitch and e2 and the AISC 360-16/-22 floor its connected elements)
 * @param An - the member's net area (all pieces)
 * @returns the factor and its basis, or undefined for a plate with nothing to report
 * @example
 * // R6 2L6x6x5/8: x̄ 1.72, l 24 → case 2 U = 0.928
 * memberShearLag(memberModel(twoL6x6Member, aisc), 13.01)?.U // → 0.92833
 */
export function memberShearLag(model: MemberModel, An: number): MemberShearLag | undefined {
  const { input: member, profile, unfolded: layout } = model;
  if (member.U !== undefined) return { U: member.U, rule: 'given', basis: `U = ${member.U} as given` };
  const spec = member.shearLag;
  if (!spec) {
    return member.section ? notApplicable('no U and no shear lag connection data are given') : undefined;
  }
  const section = member.section;
  const n = spec.fastenersPerLine;
  if (profile.standard === 'CSA S16-19') {
    if (n === undefined) return notApplicable('CSA S16 12.3.3.2 needs the number of transverse lines');
    const shape =
      section?.shape === 'angle'
        ? 'angle'
        : (section?.shape === 'w-shape' || section?.shape === 'tee') && spec.connected === 'flange'
          ? 'w-flange'
          : 'other';
    try {
      const { factor } = csaS16EffectiveNetArea({
        An,
        shape,
        transverseLines: n,
        ...(section?.bf !== undefined ? { bf: section.bf } : {}),
        ...(section?.d !== undefined ? { d: section.d } : {}),
      });
      return {
        U: factor,
        rule: 'CSA S16 12.3.3.2',
        basis: `Ane = ${factor} An (${shape}, ${n} transverse lines)`,
      };
    } catch (err) {
      if (err instanceof ProfileError) return notApplicable(err.message.replace(/^[^:]*: /, ''));
      throw err;
    }
  }
  if (profile.standard === 'EN 1993-1-1') {
    if (section?.shape !== 'angle' || spec.connected !== 'leg' || !layout) {
      return { U: 1, rule: 'EN 1993-1-1 6.2.3', basis: 'no shear lag factor: Nu,Rd = 0.9 Anet fu / γM2' };
    }
    const connected = layout.holes;
    const first = connected[0];
    if (n === undefined || !first)
      return notApplicable('EN 1993-1-8 3.10.3 needs the number of bolts in the row');
    const pieces = layout.section.pieces;
    const element = layout.section.elements.find((e) => e.id === first.element)!;
    // EN 1993-1-8 3.10.3(2) needs the leg sizes when every hole is in one leg: the connected one and
    // the outstanding one.
    const oneLeg = connected.every((h) => h.element === first.element);
    const legs =
      oneLeg && section.a !== undefined && section.b !== undefined
        ? first.element === 'leg-a'
          ? { connected: section.a, outstanding: section.b }
          : { connected: section.b, outstanding: section.a }
        : undefined;
    const p1 = holeSpacings(
      connected.map((h) => ({ x: h.x, y: h.u })),
      element.span,
    ).p1;
    try {
      const gammaM2 = profile.nationalAnnex?.gammaM2 ?? 1.25;
      const perPiece = An / pieces;
      const r = en1993AngleOneLeg({
        bolts: n,
        d0: first.deducted,
        t: first.thickness,
        fu: member.material.Fu,
        Anet: perPiece,
        ...(p1 !== undefined ? { p1 } : {}),
        e2: element.span - first.u,
        gammaM2,
        ...(legs ? { legs } : {}),
      });
      const used = r.Anet ?? perPiece;
      const U = (r.NuRd * 1000 * gammaM2) / (used * member.material.Fu);
      const basis =
        r.beta === null
          ? `one bolt: Nu,Rd = 2.0(e2 − 0.5 d0) t fu / γM2, U = ${r3(U)}`
          : `${n} bolts at p1 = ${r3(p1 ?? 0)}: β = ${r3(r.beta)}`;
      if (r.equivalentLeg === undefined || !legs) return { U, rule: 'EN 1993-1-8 3.10.3', basis };
      const t = first.thickness;
      const each = pieces > 1 ? ' per angle' : '';
      const equivalent = `Anet of the equivalent equal-leg angle ${r3(legs.connected)} × ${r3(legs.connected)} × ${r3(t)}: ${r3(perPiece)} − (${r3(legs.outstanding)} − ${r3(legs.connected)}) × ${r3(t)} = ${r3(used)}${each}`;
      return {
        U,
        rule: 'EN 1993-1-8 3.10.3',
        basis: `${basis}, on the ${equivalent} (unequal-leg angle connected by its smaller leg, 3.10.3(2))`,
        netArea: { area: used * pieces, clause: 'EN 1993-1-8 3.10.3(2)', basis: equivalent },
      };
    } catch (err) {
      if (err instanceof ProfileError) return notApplicable(err.message.replace(/^[^:]*: /, ''));
      throw err;
    }
  }
  // AISC 360-16 and 360-22 D3 (not 360-10): open sections' U need not be below Agc/Ag.
  const connectedArea =
    profile.standard !== 'AISC 360-10' && layout ? connectedGrossArea(member, layout) : undefined;
  try {
    const r = shearLagFactor({
      ...(connectedArea !== undefined && layout ? { floor: { connectedArea, grossArea: layout.Ag } } : {}),
      shape: aiscShape(member),
      connected: spec.connected,
      ...(spec.length !== undefined ? { length: spec.length } : {}),
      ...(spec.xbar !== undefined ? { eccentricity: spec.xbar } : {}),
      ...(n !== undefined ? { fastenersPerLine: n } : {}),
      ...(section?.bf !== undefined ? { bf: section.bf } : {}),
      ...(section?.d !== undefined ? { d: section.d } : {}),
    });
    const chosen = r.candidates.find((c) => c.case === r.case)!;
    const cases = r.candidates.filter((c) => c.case !== 'D3 floor');
    const floor = r.floor ? `; D3 floor${r.case === 'D3 floor' ? ' (governs)' : ''}: ${r.floor.basis}` : '';
    return {
      U: r.U,
      rule:
        r.case === 'given'
          ? 'given'
          : r.case === 'D3 floor'
            ? `${profile.standard} D3 (connected elements' share of Ag)`
            : `AISC 360 Table D3.1 case ${r.case}`,
      basis: (cases.map((c) => `case ${c.case}: ${c.basis}`).join('; ') || chosen.basis) + floor,
    };
  } catch (err) {
    if (err instanceof ShearLagError) return notApplicable(err.message.replace(/^[^:]*: /, ''));
    throw err;
  }
}
