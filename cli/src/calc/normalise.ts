import { memberSection } from '../engine/member/memberSection.js';
import { SectionError } from '../engine/sections/sectionError.js';
import type { Section } from '../engine/sections/types.js';
import { EngineError } from '../engine/engineError.js';
import type {
  BlockShearSpec,
  CodeProfile,
  HoleInput,
  MemberSectionInput,
  ShearLagSpec,
  HoleType,
  LoadDirection,
  MemberInput,
  SlotOrientation,
  UnitSystem,
} from '../engine/types.js';
import { LengthError, parseLength, type ParseLengthOptions } from './parseLength.js';
import type { CalcDocument, CalcMember, CalcMeta, ClaimedChain, MemberClaims } from './types.js';

/** A semantic problem found while normalising a schema-valid calc file. */
export interface SemanticIssue {
  readonly pointer: string;
  readonly rule: string;
  readonly message: string;
}

// The raw, schema-valid file. Only the shapes the schema guarantees are relied on.
type Raw = Record<string, unknown>;
type Len = number | string;

const METRIC_BOLT = /^M(\d+)$/;

/**
 * Reads a schema-valid calc file into a CalcDocument: lengths to numbers, bolt sizes to diameters,
 * explicit hole sizes to {across, along}. Collects every rule the schema cannot express.
 */
export function normaliseDocument(raw: Raw): { document: CalcDocument; issues: SemanticIssue[] } {
  const issues: SemanticIssue[] = [];
  const units = raw['units'] as UnitSystem;

  const length = (value: Len, pointer: string, options: ParseLengthOptions = {}): number => {
    if (typeof value === 'string' && units === 'mm') {
      issues.push({
        pointer,
        rule: 'mm-plain-number',
        message: `${pointer}: ${JSON.stringify(value)} is a string; lengths in a "mm" file are plain numbers (rule mm-plain-number)`,
      });
      return Number.NaN;
    }
    try {
      return parseLength(value, options);
    } catch (err) {
      if (!(err instanceof LengthError)) throw err;
      issues.push({ pointer, rule: err.rule, message: `${pointer}: ${err.message} (rule ${err.rule})` });
      return Number.NaN;
    }
  };

  const bolt = (value: Len, pointer: string): number => {
    const metric = typeof value === 'string' ? METRIC_BOLT.exec(value) : null;
    if (metric) {
      if (units !== 'mm') {
        issues.push({
          pointer,
          rule: 'bolt-units',
          message: `${pointer}: metric bolt ${JSON.stringify(value)} in an "in" file; give the diameter in inches, e.g. "3/4" (rule bolt-units)`,
        });
      }
      return Number(metric[1]);
    }
    if (typeof value === 'string' && units === 'mm') {
      issues.push({
        pointer,
        rule: 'bolt-units',
        message: `${pointer}: ${JSON.stringify(value)} in a "mm" file; give a metric size such as "M20" or the diameter in mm (rule bolt-units)`,
      });
      return Number.NaN;
    }
    return length(value, pointer);
  };

  const seenMembers = new Map<string, number>();
  const members: CalcMember[] = (raw['members'] as Raw[]).map((m, index) => {
    const mp = `/members/${index}`;
    const id = m['id'] as string;
    const first = seenMembers.get(id);
    if (first !== undefined) {
      issues.push({
        pointer: `${mp}/id`,
        rule: 'duplicate-member-id',
        message: `${mp}/id: member id ${JSON.stringify(id)} is already used by /members/${first} (rule duplicate-member-id)`,
      });
    } else {
      seenMembers.set(id, index);
    }

    const holes: HoleInput[] = (m['holes'] as Raw[]).map((h, hi) => {
      const hp = `${mp}/holes/${hi}`;
      const type = (h['type'] as HoleType | undefined) ?? 'standard';
      const slotted = type === 'short-slotted' || type === 'long-slotted';
      const slot = h['slot'] as SlotOrientation | undefined;
      if (!slotted && slot !== undefined) {
        issues.push({
          pointer: `${hp}/slot`,
          rule: 'slot-on-round-hole',
          message: `${hp}/slot: a ${type} hole is round; "slot" applies only to short-slotted and long-slotted holes (rule slot-on-round-hole)`,
        });
      }
      const hole: { -readonly [K in keyof HoleInput]: HoleInput[K] } = {
        id: h['id'] as string,
        x: length(h['x'] as Len, `${hp}/x`, { allowNegative: true }),
        // A section hole's y is its unfolded position, set below from element and gauge.
        y: h['y'] !== undefined ? length(h['y'] as Len, `${hp}/y`, { allowZero: true }) : Number.NaN,
        type,
      };
      if (h['element'] !== undefined) hole.element = h['element'] as string;
      if (h['gauge'] !== undefined)
        hole.gauge = length(h['gauge'] as Len, `${hp}/gauge`, { allowNegative: true });
      if (h['bolt'] !== undefined) hole.boltDiameter = bolt(h['bolt'] as Len, `${hp}/bolt`);
      if (slotted && slot !== undefined) hole.slot = slot;
      const size = h['size'];
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
    });

    const load = m['load'] as Raw;
    const material = m['material'] as Raw;
    const rawSection = m['section'] as Raw | undefined;
    let spec: MemberSectionInput | undefined;
    let built: Section | undefined;
    if (rawSection) {
      const sp: { -readonly [K in keyof MemberSectionInput]: MemberSectionInput[K] } = {
        shape: rawSection['shape'] as MemberSectionInput['shape'],
      };
      for (const k of ['a', 'b', 't', 'd', 'bf', 'tf', 'tw'] as const) {
        if (rawSection[k] !== undefined) sp[k] = length(rawSection[k] as Len, `${mp}/section/${k}`);
      }
      if (rawSection['pieces'] !== undefined) sp.pieces = rawSection['pieces'] as number;
      if (rawSection['Ag'] !== undefined) sp.tabulatedAg = rawSection['Ag'] as number;
      spec = sp;
      const kind = m['kind'] as string;
      const expected = sp.shape === 'angle' ? ((sp.pieces ?? 1) > 1 ? 'double-angle' : 'angle') : sp.shape;
      if (kind !== expected && !(sp.shape === 'angle' && kind === 'double-angle' && (sp.pieces ?? 1) > 1)) {
        issues.push({
          pointer: `${mp}/kind`,
          rule: 'section-kind',
          message: `${mp}/kind: a ${sp.shape} section${sp.shape === 'angle' ? ` with ${sp.pieces ?? 1} piece(s)` : ''} is kind "${expected}", not "${kind}" (rule section-kind)`,
        });
      }
      const dims = [sp.a, sp.b, sp.t, sp.d, sp.bf, sp.tf, sp.tw];
      if (dims.every((v) => v === undefined || Number.isFinite(v))) {
        try {
          built = memberSection(sp);
        } catch (err) {
          if (!(err instanceof SectionError || err instanceof EngineError)) throw err;
          issues.push({
            pointer: `${mp}/section`,
            rule: 'section-dimensions',
            message: `${mp}/section: ${err.message.replace(/^ligament\/engine[^:]*: /, '')} (rule section-dimensions)`,
          });
        }
      }
    }
    let width = m['width'] !== undefined ? length(m['width'] as Len, `${mp}/width`) : Number.NaN;
    let thickness =
      m['thickness'] !== undefined ? length(m['thickness'] as Len, `${mp}/thickness`) : Number.NaN;
    if (built) {
      // Unfolded placement (cli/src/engine/sections/README.md §7): y = unfoldOffset ± u, u = datum + gauge.
      let lo = Number.POSITIVE_INFINITY;
      let hi = Number.NEGATIVE_INFINITY;
      for (const e of built.elements) {
        for (const y of [e.unfoldOffset, e.unfoldOffset + e.unfoldSense * e.span]) {
          lo = Math.min(lo, y);
          hi = Math.max(hi, y);
        }
      }
      width = hi - lo;
      thickness = built.elements[0]!.thickness;
      holes.forEach((hole, hi2) => {
        const hp = `${mp}/holes/${hi2}`;
        const e = built.elements.find((el) => el.id === hole.element);
        if (!e) {
          issues.push({
            pointer: `${hp}/element`,
            rule: 'hole-outside-element',
            message: `${hp}/element: ${built.designation} has no element "${hole.element}"; its elements are ${built.elements.map((el) => el.id).join(', ')} (rule hole-outside-element)`,
          });
          return;
        }
        const u = e.datum + (hole.gauge ?? Number.NaN);
        if (!Number.isFinite(u)) return;
        if (!(u > 0 && u < e.span)) {
          issues.push({
            pointer: `${hp}/gauge`,
            rule: 'hole-outside-element',
            message: `${hp}/gauge: gauge ${hole.gauge} from the ${e.gaugeFrom} puts hole ${hole.id} outside ${e.id} of ${built.designation} (rule hole-outside-element)`,
          });
          return;
        }
        (hole as { y: number }).y = e.unfoldOffset + e.unfoldSense * u - lo;
      });
    }
    const input: { -readonly [K in keyof MemberInput]: MemberInput[K] } = {
      id,
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
    if (spec) input.section = spec;
    const rawLag = load['shearLag'] as Raw | undefined;
    if (rawLag) {
      const lag: { -readonly [K in keyof ShearLagSpec]: ShearLagSpec[K] } = {
        connected: rawLag['connected'] as ShearLagSpec['connected'],
      };
      if (rawLag['length'] !== undefined)
        lag.length = length(rawLag['length'] as Len, `${mp}/load/shearLag/length`);
      if (rawLag['xbar'] !== undefined) lag.xbar = length(rawLag['xbar'] as Len, `${mp}/load/shearLag/xbar`);
      if (rawLag['fastenersPerLine'] !== undefined)
        lag.fastenersPerLine = rawLag['fastenersPerLine'] as number;
      input.shearLag = lag;
    }
    const rawBlock = m['blockShear'] as Raw | undefined;
    if (rawBlock) {
      const block: { -readonly [K in keyof BlockShearSpec]: BlockShearSpec[K] } = {
        endDistance: length(rawBlock['endDistance'] as Len, `${mp}/blockShear/endDistance`),
      };
      if (rawBlock['elements'] !== undefined) {
        const elements = rawBlock['elements'] as string[];
        block.elements = elements;
        if (!spec) {
          issues.push({
            pointer: `${mp}/blockShear/elements`,
            rule: 'elements-without-section',
            message: `${mp}/blockShear/elements: only section members have elements; a plate tears out as a whole (rule elements-without-section)`,
          });
        } else if (built) {
          elements.forEach((el, i) => {
            if (!built.elements.some((e) => e.id === el) || !holes.some((h) => h.element === el)) {
              issues.push({
                pointer: `${mp}/blockShear/elements/${i}`,
                rule: 'block-shear-element',
                message: `${mp}/blockShear/elements/${i}: ${built.designation} has no holes in an element "${el}" (rule block-shear-element)`,
              });
            }
          });
        }
      }
      if (rawBlock['Ubs'] !== undefined) block.Ubs = rawBlock['Ubs'] as 1 | 0.5;
      if (rawBlock['Ut'] !== undefined) block.Ut = rawBlock['Ut'] as number;
      if (rawBlock['byOutline'] !== undefined)
        block.byOutline = { ...(rawBlock['byOutline'] as Record<string, number>) };
      input.blockShear = block;
    }

    const member: { -readonly [K in keyof CalcMember]: CalcMember[K] } = { index, input };
    if (m['description'] !== undefined) member.description = m['description'] as string;
    if (m['claims'] !== undefined) member.claims = claims(m['claims'] as Raw, `${mp}/claims`, length);
    return member;
  });

  const rawMeta = raw['meta'] as Raw;
  const notes = rawMeta['notes'];
  const meta: CalcMeta = {
    project: rawMeta['project'] as string,
    preparedBy: rawMeta['preparedBy'] as string,
    ...(rawMeta['firm'] !== undefined ? { firm: rawMeta['firm'] as string } : {}),
    date: rawMeta['date'] as string,
    ...(rawMeta['tool'] !== undefined ? { tool: rawMeta['tool'] as CalcMeta['tool'] & object } : {}),
    ...(rawMeta['reference'] !== undefined ? { reference: rawMeta['reference'] as string } : {}),
    ...(notes !== undefined
      ? { notes: Array.isArray(notes) ? (notes as string[]).join('\n') : (notes as string) }
      : {}),
  };
  const code = raw['code'] as Raw;
  const profile: { -readonly [K in keyof CodeProfile]: CodeProfile[K] } = {
    standard: code['standard'] as CodeProfile['standard'],
    method: code['method'] as CodeProfile['method'],
    units,
  };
  const si = profile.standard === 'EN 1993-1-1' || profile.standard === 'CSA S16-19';
  if (si && units !== 'mm') {
    issues.push({
      pointer: '/code/standard',
      rule: 'code-units',
      message: `/code/standard: ${profile.standard} files are in SI; give "units": "mm" (rule code-units)`,
    });
  }
  if (si && profile.method !== 'LRFD') {
    issues.push({
      pointer: '/code/method',
      rule: 'code-method',
      message: `/code/method: ${profile.standard} is limit states design; give "method": "LRFD" (rule code-method)`,
    });
  }
  const annex = code['nationalAnnex'] as Raw | undefined;
  if (annex) {
    if (profile.standard !== 'EN 1993-1-1') {
      issues.push({
        pointer: '/code/nationalAnnex',
        rule: 'national-annex-standard',
        message: `/code/nationalAnnex: partial factors of a National Annex apply to EN 1993-1-1 only, not ${profile.standard} (rule national-annex-standard)`,
      });
    }
    profile.nationalAnnex = {
      ...(annex['gammaM0'] !== undefined ? { gammaM0: annex['gammaM0'] as number } : {}),
      ...(annex['gammaM2'] !== undefined ? { gammaM2: annex['gammaM2'] as number } : {}),
    };
  }
  const document: CalcDocument = {
    format: 'ligament-calc',
    formatVersion: raw['formatVersion'] as string,
    meta,
    profile,
    members,
  };
  return { document, issues };
}

function claims(raw: Raw, pointer: string, length: (value: Len, pointer: string) => number): MemberClaims {
  const chain = (c: Raw, p: string): ClaimedChain => ({
    holes: c['holes'] as string[],
    ...(c['netWidth'] !== undefined ? { netWidth: length(c['netWidth'] as Len, `${p}/netWidth`) } : {}),
    ...(c['direction'] !== undefined ? { direction: c['direction'] as LoadDirection } : {}),
  });
  const out: { -readonly [K in keyof MemberClaims]: MemberClaims[K] } = {};
  if (raw['chains'] !== undefined)
    out.chains = (raw['chains'] as Raw[]).map((c, i) => chain(c, `${pointer}/chains/${i}`));
  if (raw['controllingChain'] !== undefined)
    out.controllingChain = chain(raw['controllingChain'] as Raw, `${pointer}/controllingChain`);
  for (const k of [
    'Ag',
    'An',
    'U',
    'Ae',
    'yielding',
    'rupture',
    'available',
    'Agv',
    'Anv',
    'Agt',
    'Ant',
    'blockShear',
  ] as const) {
    if (raw[k] !== undefined) out[k] = raw[k] as number;
  }
  return out;
}
