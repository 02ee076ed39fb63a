import type {
  HoleInput,
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
        y: length(h['y'] as Len, `${hp}/y`, { allowZero: true }),
        type,
      };
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
    const input: { -readonly [K in keyof MemberInput]: MemberInput[K] } = {
      id,
      kind: m['kind'] as MemberInput['kind'],
      width: length(m['width'] as Len, `${mp}/width`),
      thickness: length(m['thickness'] as Len, `${mp}/thickness`),
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
  const document: CalcDocument = {
    format: 'ligament-calc',
    formatVersion: raw['formatVersion'] as string,
    meta,
    profile: {
      standard: code['standard'] as CalcDocument['profile']['standard'],
      method: code['method'] as CalcDocument['profile']['method'],
      units,
    },
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
  for (const k of ['Ag', 'An', 'U', 'Ae', 'yielding', 'rupture', 'available'] as const) {
    if (raw[k] !== undefined) out[k] = raw[k] as number;
  }
  return out;
}
