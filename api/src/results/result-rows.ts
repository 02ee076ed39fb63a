import {
  findingQuantity,
  type CalcAudit,
  type CalcDocument,
  type Chain,
  type Finding,
  type MemberAudit,
  type UnitSystem,
} from 'ligament';
import { canonicalJson, sha256Hex } from '../common/hash.js';
import type { StoredDirection } from './models/member-result.model.js';

function chainSummary(c: Chain): { holes: string[]; netWidth: number; netArea: number } {
  return { holes: [...c.holes], netWidth: c.netWidth, netArea: c.netArea };
}

/** sha256 of the canonical engine input of a member under its profile: same hash, same inputs. */
export function inputsHash(document: CalcDocument, memberId: string): string {
  const member = document.members.find((m) => m.input.id === memberId);
  return sha256Hex(canonicalJson({ profile: document.profile, input: member?.input ?? null }));
}

export function memberResultRow(
  ids: { submittalId: number; calcFileId: number },
  document: CalcDocument,
  audit: CalcAudit,
  member: MemberAudit,
) {
  const r = member.result;
  const directions: StoredDirection[] = r.directions.map((d) => ({
    direction: d.direction,
    governing: d.governing ? chainSummary(d.governing) : null,
    leastChains: d.leastChains.map(chainSummary),
    An: d.An,
  }));
  return {
    ...ids,
    memberId: member.memberId,
    engineVersion: audit.engineVersion,
    profile: audit.profile,
    inputsHash: inputsHash(document, member.memberId),
    Ag: r.Ag,
    An: r.An,
    Ae: r.Ae,
    U: r.U,
    yielding: r.yielding.available,
    rupture: r.rupture.available,
    available: r.governing.available,
    governingDirection: r.governingDirection,
    directions,
    result: r,
  };
}

/** The chain (or holes) a finding is about, as stored: hole ids joined by commas. */
export function findingChain(f: Finding): string | null {
  const holes = f.chain ?? f.holes;
  return holes && holes.length > 0 ? holes.join(',') : null;
}

/** code + member + chain: how a finding is recognised across revisions and rechecks. */
export function findingKey(f: { code: string; memberId?: string | null; chain?: string | null }): string {
  return `${f.code}|${f.memberId ?? ''}|${f.chain ?? ''}`;
}

export function discrepancyRow(
  ids: { projectId: number; submittalId: number; calcFileId: number; fileName: string },
  f: Finding,
  units: UnitSystem,
) {
  const numbers = f.claimed !== undefined || f.recomputed !== undefined;
  return {
    ...ids,
    memberId: f.memberId ?? null,
    code: f.code,
    name: f.name,
    class: f.class,
    severity: f.severity,
    direction: f.direction ?? null,
    chain: findingChain(f),
    claimed: f.claimed ?? null,
    recomputed: f.recomputed ?? null,
    units,
    quantity: numbers ? findingQuantity(f.code) : null,
    message: f.message,
    pointer: f.pointer,
    status: 'raised' as const,
  };
}
