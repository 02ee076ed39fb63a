/** Shared by the single-file runners (chains, draw): load one source and pick one member. */
import type { CalcDocument, CalcError } from '../calc/types.js';
import { loadSource } from './check.js';
import type { Source } from './source.js';
import type { CalcMember } from '../engine/findings/types.js';

export type PickedMember =
  | { readonly ok: true; readonly file: string; readonly document: CalcDocument; readonly member: CalcMember }
  | {
      readonly ok: false;
      readonly file: string;
      readonly errors: readonly CalcError[];
      readonly usage?: string;
    };

/**
 * Loads a source and finds a member by id; with no id, the file's only member. A missing id in a
 * file of several members, or an id the file lacks, is a usage problem naming the ids there are.
 */
export function pickMember(source: Source, memberId: string | undefined): PickedMember {
  const loaded = loadSource(source);
  if (!loaded.ok) return { ok: false, file: loaded.file, errors: loaded.errors };
  const doc = loaded.document;
  const ids = doc.members.map((m) => m.input.id);
  if (memberId === undefined) {
    const only = doc.members[0];
    if (doc.members.length === 1 && only) return { ok: true, file: loaded.file, document: doc, member: only };
    return {
      ok: false,
      file: loaded.file,
      errors: [],
      usage: `${loaded.file} holds ${ids.length} members (${ids.join(', ')}): choose one with --member`,
    };
  }
  const member = doc.members.find((m) => m.input.id === memberId);
  if (!member) {
    return {
      ok: false,
      file: loaded.file,
      errors: [],
      usage: `no member "${memberId}" in ${loaded.file} (members: ${ids.join(', ')})`,
    };
  }
  return { ok: true, file: loaded.file, document: doc, member };
}

/**
 * The engine refused a member the loader accepted (a layout it cannot search, say): reported as an
 * input error at the member, so the single-file runners exit 2 with one line instead of a stack trace.
 */
export function engineFailure(file: string, member: CalcMember, err: unknown): CalcError {
  return {
    file,
    pointer: `/members/${member.index}`,
    line: 1,
    column: 1,
    rule: 'engine',
    message: err instanceof Error ? err.message : String(err),
  };
}
