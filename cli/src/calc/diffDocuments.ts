import { formatDirection } from '../engine/index.js';
import type { HoleInput, MemberInput, UnitSystem } from '../engine/types.js';
import type { CalcDocument, CalcMember, ClaimedChain, MemberClaims } from './types.js';

/** What a change is about: the file's code profile, a member, one of its holes, or one of its claims. */
export type ChangeScope = 'profile' | 'member' | 'hole' | 'claim';

/** One difference between two calc files, by meaning rather than by text. */
export interface DocumentChange {
  readonly scope: ChangeScope;
  readonly change: 'added' | 'removed' | 'changed' | 'moved';
  readonly memberId?: string;
  readonly holeId?: string;
  /** The field's path in the normalised document, e.g. `material.Fy`, `boltDiameter`, `claims.An`. */
  readonly field?: string;
  /** The field in words, e.g. `Fy`, `bolt diameter`, `claimed An`. */
  readonly label?: string;
  /** The old and new value as text with their units (each in its own file's unit system). */
  readonly before?: string;
  readonly after?: string;
}

type Quantity = 'length' | 'area' | 'force' | 'stress' | 'ratio' | 'text';

const UNIT: Record<UnitSystem, Record<Exclude<Quantity, 'text' | 'ratio'>, string>> = {
  in: { length: 'in', area: 'in²', force: 'kip', stress: 'ksi' },
  mm: { length: 'mm', area: 'mm²', force: 'kN', stress: 'MPa' },
};

/**
 * A value as text with its unit. Numbers keep up to four decimals (trailing zeros dropped), so two
 * values that differ never read the same.
 */
function show(value: unknown, quantity: Quantity, units: UnitSystem): string | undefined {
  if (value === undefined || value === null) return undefined;
  if (typeof value === 'number') {
    const text = String(Number(value.toFixed(4)));
    return quantity === 'text' || quantity === 'ratio' ? text : `${text} ${UNIT[units][quantity]}`;
  }
  if (Array.isArray(value)) return value.map(String).join(', ');
  return typeof value === 'string' ? value : JSON.stringify(value);
}

/** Equal as the files mean them: numbers exactly, objects and lists by their JSON. */
function same(a: unknown, b: unknown): boolean {
  return a === b || JSON.stringify(a) === JSON.stringify(b);
}

/** A scalar field compared between two versions of something. */
interface Field<T> {
  readonly field: string;
  readonly label: string;
  readonly quantity: Quantity;
  readonly get: (t: T) => unknown;
}

const MEMBER_FIELDS: readonly Field<MemberInput>[] = [
  { field: 'kind', label: 'kind', quantity: 'text', get: (m) => m.kind },
  { field: 'width', label: 'width', quantity: 'length', get: (m) => m.width },
  { field: 'thickness', label: 'thickness', quantity: 'length', get: (m) => m.thickness },
  { field: 'material.grade', label: 'steel grade', quantity: 'text', get: (m) => m.material.grade },
  { field: 'material.Fy', label: 'Fy', quantity: 'stress', get: (m) => m.material.Fy },
  { field: 'material.Fu', label: 'Fu', quantity: 'stress', get: (m) => m.material.Fu },
  {
    field: 'directions',
    label: 'load directions',
    quantity: 'text',
    get: (m) => m.directions.map(formatDirection),
  },
  { field: 'U', label: 'shear lag factor U', quantity: 'ratio', get: (m) => m.U },
  {
    field: 'requiredStrength',
    label: 'required strength',
    quantity: 'force',
    get: (m) => m.requiredStrength,
  },
  ...(['a', 'b', 't', 'd', 'bf', 'tf', 'tw'] as const).map((k): Field<MemberInput> => ({
    field: `section.${k}`,
    label: `section ${k}`,
    quantity: 'length',
    get: (m) => m.section?.[k],
  })),
  { field: 'section.shape', label: 'section shape', quantity: 'text', get: (m) => m.section?.shape },
  { field: 'section.pieces', label: 'pieces', quantity: 'ratio', get: (m) => m.section?.pieces },
  {
    field: 'section.tabulatedAg',
    label: 'tabulated Ag',
    quantity: 'area',
    get: (m) => m.section?.tabulatedAg,
  },
  {
    field: 'shearLag.connected',
    label: 'connected element',
    quantity: 'text',
    get: (m) => m.shearLag?.connected,
  },
  {
    field: 'shearLag.length',
    label: 'connection length',
    quantity: 'length',
    get: (m) => m.shearLag?.length,
  },
  {
    field: 'shearLag.xbar',
    label: 'connection eccentricity x̄',
    quantity: 'length',
    get: (m) => m.shearLag?.xbar,
  },
  {
    field: 'shearLag.fastenersPerLine',
    label: 'fasteners per line',
    quantity: 'ratio',
    get: (m) => m.shearLag?.fastenersPerLine,
  },
  {
    field: 'blockShear.endDistance',
    label: 'block shear end distance',
    quantity: 'length',
    get: (m) => m.blockShear?.endDistance,
  },
  { field: 'blockShear.Ubs', label: 'block shear Ubs', quantity: 'ratio', get: (m) => m.blockShear?.Ubs },
  { field: 'blockShear.Ut', label: 'block shear Ut', quantity: 'ratio', get: (m) => m.blockShear?.Ut },
  {
    field: 'blockShear.elements',
    label: 'block shear elements',
    quantity: 'text',
    get: (m) => m.blockShear?.elements,
  },
];

const HOLE_FIELDS: readonly Field<HoleInput>[] = [
  { field: 'boltDiameter', label: 'bolt diameter', quantity: 'length', get: (h) => h.boltDiameter },
  { field: 'type', label: 'hole type', quantity: 'text', get: (h) => h.type },
  { field: 'slot', label: 'slot direction', quantity: 'text', get: (h) => h.slot },
  {
    field: 'dimension.across',
    label: 'hole size across the load',
    quantity: 'length',
    get: (h) => h.dimension?.across,
  },
  {
    field: 'dimension.along',
    label: 'hole size along the load',
    quantity: 'length',
    get: (h) => h.dimension?.along,
  },
  { field: 'element', label: 'element', quantity: 'text', get: (h) => h.element },
  { field: 'gauge', label: 'gauge', quantity: 'length', get: (h) => h.gauge },
];

const CLAIM_FIELDS: readonly Field<MemberClaims>[] = (
  [
    ['Ag', 'area'],
    ['An', 'area'],
    ['U', 'ratio'],
    ['Ae', 'area'],
    ['yielding', 'force'],
    ['rupture', 'force'],
    ['available', 'force'],
    ['Agv', 'area'],
    ['Anv', 'area'],
    ['Agt', 'area'],
    ['Ant', 'area'],
    ['blockShear', 'force'],
  ] as const
).map(([key, quantity]) => ({
  field: `claims.${key}`,
  label: key === 'available' ? 'claimed available strength' : `claimed ${key}`,
  quantity,
  get: (c: MemberClaims) => c[key],
}));

/** `A1–B1–A2 (−x, 11.5 in)`: a claimed chain as the checker reads it. */
function chainText(chain: ClaimedChain | undefined, units: UnitSystem): string | undefined {
  if (!chain) return undefined;
  const extra = [
    chain.direction ? formatDirection(chain.direction) : undefined,
    chain.netWidth !== undefined ? `wn ${show(chain.netWidth, 'length', units)}` : undefined,
  ].filter(Boolean);
  return `${chain.holes.join('–') || '(no holes)'}${extra.length > 0 ? ` (${extra.join(', ')})` : ''}`;
}

const chainKey = (c: ClaimedChain) => `${c.direction ?? ''}:${c.holes.join(',')}`;

function compareFields<T>(
  fields: readonly Field<T>[],
  a: T,
  b: T,
  unitsA: UnitSystem,
  unitsB: UnitSystem,
  base: Omit<DocumentChange, 'change' | 'field' | 'label' | 'before' | 'after'>,
): DocumentChange[] {
  const out: DocumentChange[] = [];
  for (const f of fields) {
    const va = f.get(a);
    const vb = f.get(b);
    if (same(va, vb) && unitsA === unitsB) continue;
    const before = show(va, f.quantity, unitsA);
    const after = show(vb, f.quantity, unitsB);
    if (before === after) continue;
    out.push({
      ...base,
      change: before === undefined ? 'added' : after === undefined ? 'removed' : 'changed',
      field: f.field,
      label: f.label,
      ...(before !== undefined ? { before } : {}),
      ...(after !== undefined ? { after } : {}),
    });
  }
  return out;
}

const holeCount = (m: MemberInput) => `${m.holes.length} hole${m.holes.length === 1 ? '' : 's'}`;

const at = (h: HoleInput, units: UnitSystem) =>
  `(${show(h.x, 'text', units)}, ${show(h.y, 'text', units)}) ${UNIT[units].length}`;

function diffHoles(memberId: string, a: MemberInput, b: MemberInput, ua: UnitSystem, ub: UnitSystem) {
  const out: DocumentChange[] = [];
  const before = new Map(a.holes.map((h) => [h.id, h]));
  const after = new Map(b.holes.map((h) => [h.id, h]));
  for (const h of b.holes) {
    const old = before.get(h.id);
    if (!old) {
      out.push({ scope: 'hole', change: 'added', memberId, holeId: h.id, after: at(h, ub) });
      continue;
    }
    if (old.x !== h.x || old.y !== h.y || ua !== ub) {
      const from = at(old, ua);
      const to = at(h, ub);
      if (from !== to)
        out.push({
          scope: 'hole',
          // Across a change of units every position reads differently without the hole having moved.
          change: ua === ub ? 'moved' : 'changed',
          memberId,
          holeId: h.id,
          field: 'position',
          label: 'position',
          before: from,
          after: to,
        });
    }
    out.push(...compareFields(HOLE_FIELDS, old, h, ua, ub, { scope: 'hole', memberId, holeId: h.id }));
  }
  for (const h of a.holes)
    if (!after.has(h.id))
      out.push({ scope: 'hole', change: 'removed', memberId, holeId: h.id, before: at(h, ua) });
  return out;
}

function diffClaims(memberId: string, a: CalcMember, b: CalcMember, ua: UnitSystem, ub: UnitSystem) {
  const ca = a.claims ?? {};
  const cb = b.claims ?? {};
  const out = compareFields(CLAIM_FIELDS, ca, cb, ua, ub, { scope: 'claim', memberId });
  const controllingBefore = chainText(ca.controllingChain, ua);
  const controllingAfter = chainText(cb.controllingChain, ub);
  if (controllingBefore !== controllingAfter) {
    out.push({
      scope: 'claim',
      change: !controllingBefore ? 'added' : !controllingAfter ? 'removed' : 'changed',
      memberId,
      field: 'claims.controllingChain',
      label: 'claimed controlling chain',
      ...(controllingBefore ? { before: controllingBefore } : {}),
      ...(controllingAfter ? { after: controllingAfter } : {}),
    });
  }
  // Claimed chains are matched by their holes and direction; a chain whose net width changed is one change.
  const chainsBefore = new Map((ca.chains ?? []).map((c) => [chainKey(c), c]));
  const chainsAfter = new Map((cb.chains ?? []).map((c) => [chainKey(c), c]));
  for (const [key, chain] of chainsAfter) {
    const old = chainsBefore.get(key);
    const textBefore = chainText(old, ua);
    const textAfter = chainText(chain, ub);
    if (textBefore === textAfter) continue;
    out.push({
      scope: 'claim',
      change: old ? 'changed' : 'added',
      memberId,
      field: 'claims.chains',
      label: 'claimed chain',
      ...(textBefore ? { before: textBefore } : {}),
      after: textAfter!,
    });
  }
  for (const [key, chain] of chainsBefore) {
    if (!chainsAfter.has(key))
      out.push({
        scope: 'claim',
        change: 'removed',
        memberId,
        field: 'claims.chains',
        label: 'claimed chain',
        before: chainText(chain, ua)!,
      });
  }
  return out;
}

/**
 * What changed between two versions of a calc file, by meaning: the code profile (standard, method,
 * units), members added or removed, a member's dimensions, material and load data, holes added,
 * removed, moved or resized, and every claim (old → new, with units). Both documents are the
 * loader's normalised form, so `3/4` and `0.75` are the same bolt and key order does not matter.
 * Members are matched by id and holes by id within their member. Values carry their own file's
 * units; when the unit system itself changed, every quantity is listed in both.
 *
 * @param before - the earlier file
 * @param after - the later file
 * @returns the changes, profile first, then members in the later file's order, then removed members
 * @example
 * diffDocuments(a, b) // a's SP-1 claims An 5.75, b's 5.125 →
 * // [{ scope: 'claim', change: 'changed', memberId: 'SP-1', field: 'claims.An', label: 'claimed An',
 * //    before: '5.75 in²', after: '5.125 in²' }]
 */
export function diffDocuments(before: CalcDocument, after: CalcDocument): DocumentChange[] {
  const ua = before.profile.units;
  const ub = after.profile.units;
  const out: DocumentChange[] = [];
  const profileFields: Field<CalcDocument>[] = [
    { field: 'code.standard', label: 'design standard', quantity: 'text', get: (d) => d.profile.standard },
    { field: 'code.method', label: 'design method', quantity: 'text', get: (d) => d.profile.method },
    { field: 'units', label: 'units', quantity: 'text', get: (d) => d.profile.units },
    {
      field: 'code.nationalAnnex.gammaM0',
      label: 'γM0',
      quantity: 'ratio',
      get: (d) => d.profile.nationalAnnex?.gammaM0,
    },
    {
      field: 'code.nationalAnnex.gammaM2',
      label: 'γM2',
      quantity: 'ratio',
      get: (d) => d.profile.nationalAnnex?.gammaM2,
    },
  ];
  out.push(...compareFields(profileFields, before, after, ua, ua, { scope: 'profile' }));

  const old = new Map(before.members.map((m) => [m.input.id, m]));
  const now = new Set(after.members.map((m) => m.input.id));
  for (const member of after.members) {
    const memberId = member.input.id;
    const previous = old.get(memberId);
    if (!previous) {
      out.push({ scope: 'member', change: 'added', memberId, after: holeCount(member.input) });
      continue;
    }
    out.push(
      ...compareFields(MEMBER_FIELDS, previous.input, member.input, ua, ub, { scope: 'member', memberId }),
    );
    out.push(...diffHoles(memberId, previous.input, member.input, ua, ub));
    out.push(...diffClaims(memberId, previous, member, ua, ub));
  }
  for (const member of before.members) {
    if (!now.has(member.input.id))
      out.push({
        scope: 'member',
        change: 'removed',
        memberId: member.input.id,
        before: holeCount(member.input),
      });
  }
  return out;
}
