import type { DiscrepancyStatus } from './discrepancy-status.js';

/**
 * How a discrepancy is recognised across revisions of a submittal. Defined here and nowhere else;
 * api/README.md ("Revisions") says the same in words.
 *
 * Identity = the file (as paired across the revision) + the member id + the code + the load
 * direction + the JSON pointer with every array position replaced by what sits there: a member or
 * hole by its id, a claimed chain by its holes. So:
 * - a file renamed in the revision keeps its items (files pair by name, then by shared member ids);
 * - a member whose id changes is another member: its old items are resolved, its new ones raised;
 * - a hole added before another does not move the other's items (`/holes/3` is `/holes/@B2`);
 * - two items of one identity in one submittal pair in the order they were raised.
 */

/** A calc file as the pairing sees it. */
export interface FileRef {
  readonly fileName: string;
  readonly memberIds: readonly string[];
}

/**
 * Pairs each current file with a previous one: the same file name first, then the previous file
 * sharing the most member ids (the first such in order on a tie). Returns each paired current file
 * with its previous file; a current file missing from the map is new.
 */
export function matchFiles<P extends FileRef, C extends FileRef>(
  previous: readonly P[],
  current: readonly C[],
): Map<C, P> {
  const left = new Set(previous);
  const pairs = new Map<C, P>();
  const pending: C[] = [];
  for (const file of current) {
    const same = previous.find((p) => left.has(p) && p.fileName === file.fileName);
    if (same) {
      left.delete(same);
      pairs.set(file, same);
    } else pending.push(file);
  }
  for (const file of pending) {
    let best: P | undefined;
    let bestShared = 0;
    for (const p of left) {
      const shared = p.memberIds.filter((id) => file.memberIds.includes(id)).length;
      if (shared > bestShared) [best, bestShared] = [p, shared];
    }
    if (best) {
      left.delete(best);
      pairs.set(file, best);
    }
  }
  return pairs;
}

const unescape = (segment: string) => segment.replace(/~1/g, '/').replace(/~0/g, '~');
const escape = (segment: string) => segment.replace(/~/g, '~0').replace(/\//g, '~1');

/** What an array element is called in a stable pointer: its id, its holes, or (a hole id) itself. */
function elementName(element: unknown): string | undefined {
  if (typeof element === 'string') return `@${element}`;
  if (typeof element !== 'object' || element === null) return undefined;
  const e = element as Record<string, unknown>;
  if (typeof e.id === 'string') return `@${e.id}`;
  if (Array.isArray(e.holes) && e.holes.every((h) => typeof h === 'string')) return `@${e.holes.join('-')}`;
  return undefined;
}

/**
 * A JSON pointer into a calc file with array positions replaced by names, e.g.
 * `/members/0/holes/3/y` → `/members/@SP-1/holes/@B2/y`,
 * `/members/1/claims/chains/0/netWidth` → `/members/@G-2/claims/chains/@A1-B1-A2/netWidth`.
 * A position the document does not explain (no id, no holes, or not there) stays a number.
 */
export function stablePointer(pointer: string, document: unknown): string {
  if (pointer === '') return '';
  let node: unknown = document;
  const out: string[] = [];
  for (const raw of pointer.split('/').slice(1)) {
    const segment = unescape(raw);
    if (Array.isArray(node) && /^(0|[1-9]\d*)$/.test(segment)) {
      const element: unknown = node[Number(segment)];
      out.push(elementName(element) ?? segment);
      node = element;
    } else {
      out.push(segment);
      node =
        typeof node === 'object' && node !== null ? (node as Record<string, unknown>)[segment] : undefined;
    }
  }
  return `/${out.map(escape).join('/')}`;
}

/** What identity is made of; `fileKey` is the previous file's name for a file paired across the revision. */
export interface IdentityParts {
  readonly fileKey: string;
  readonly memberId: string | null;
  readonly code: string;
  readonly direction: string | null;
  readonly stablePointer: string;
}

export function discrepancyIdentity(p: IdentityParts): string {
  return JSON.stringify([p.fileKey, p.memberId ?? '', p.code, p.direction ?? '', p.stablePointer]);
}

/** Claimed and recomputed agree to this relative difference: the same numbers, engine noise aside. */
const SAME_NUMBER = 1e-6;

function sameNumber(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= SAME_NUMBER * Math.max(1, Math.abs(a), Math.abs(b));
}

export interface CarriedStatus {
  readonly status: DiscrepancyStatus;
  /** Why an accepted or waived item comes back raised; null when the status carries as it was. */
  readonly reRaised: string | null;
}

/**
 * The status an item takes into the revision that still raises it. Open items keep their status:
 * the conversation goes on where it was (an answered item stays in the checker's queue; the
 * checker returns it if the revision did not do what the answer said). Accepted and waived items
 * keep their status while the claimed and recomputed numbers are the same, because the checker's
 * decision was about those numbers; when they changed, the item comes back raised.
 */
export function carriedStatus(
  previous: { status: DiscrepancyStatus; claimed: number | null; recomputed: number | null },
  next: { claimed: number | null; recomputed: number | null },
): CarriedStatus {
  if (previous.status !== 'accepted' && previous.status !== 'waived')
    return { status: previous.status, reRaised: null };
  if (sameNumber(previous.claimed, next.claimed) && sameNumber(previous.recomputed, next.recomputed))
    return { status: previous.status, reRaised: null };
  return {
    status: 'raised',
    reRaised: `was ${previous.status} at claimed ${previous.claimed ?? '—'} / recomputed ${previous.recomputed ?? '—'}; the revision has ${next.claimed ?? '—'} / ${next.recomputed ?? '—'}`,
  };
}

/** An item of the lineage that is still current, with its identity. */
export interface PreviousItem {
  readonly id: number;
  readonly calcFileId: number;
  readonly identity: string;
}

/** A finding of the revision, with its identity. */
export interface CurrentItem {
  readonly identity: string;
}

export interface Reconciliation {
  /** [index of the revision's finding, id of the item it carries on]. */
  readonly carried: readonly (readonly [number, number])[];
  /** Items whose file the revision re-checked and that it no longer raises. */
  readonly resolved: readonly number[];
  /** Items whose file is not in the revision: they stay current where they are. */
  readonly untouched: readonly number[];
}

/**
 * Pairs the revision's findings with the current items of the submittals it revises. Only items
 * of a file the revision holds (`revisedFiles`: calc file ids paired by `matchFiles`) are re-checked by it; the others are left
 * alone. Items and findings of one identity pair in order (items by id, findings as raised).
 */
export function reconcile(
  previous: readonly PreviousItem[],
  current: readonly CurrentItem[],
  revisedFiles: ReadonlySet<number>,
): Reconciliation {
  const queues = new Map<string, number[]>();
  const inScope = [...previous].filter((p) => revisedFiles.has(p.calcFileId)).sort((a, b) => a.id - b.id);
  for (const p of inScope) {
    const queue = queues.get(p.identity);
    if (queue) queue.push(p.id);
    else queues.set(p.identity, [p.id]);
  }
  const carried: [number, number][] = [];
  current.forEach((c, index) => {
    const id = queues.get(c.identity)?.shift();
    if (id !== undefined) carried.push([index, id]);
  });
  const taken = new Set(carried.map(([, id]) => id));
  return {
    carried,
    resolved: inScope.filter((p) => !taken.has(p.id)).map((p) => p.id),
    untouched: previous
      .filter((p) => !revisedFiles.has(p.calcFileId))
      .map((p) => p.id)
      .sort((a, b) => a - b),
  };
}
