import type { Schema } from '@/lib/api-schemas';

export type DocumentChange = Schema<'DocumentChangeDto'>;

/** A change as three parts: what it is about, what happened, and old → new values if any. */
export interface ChangeWords {
  /** `SP-1 · hole B1 · position`, `SP-3`, `design method`. */
  readonly subject: string;
  /** `moved`, `added`, `removed`, `changed`. */
  readonly verb: string;
  readonly before?: string;
  readonly after?: string;
}

/**
 * How a change reads in the revision view: the member, hole or claim it is about, the verb, and the
 * old and new values with their units.
 */
export function describeChange(c: DocumentChange): ChangeWords {
  const parts: string[] = [];
  if (c.scope === 'member' && !c.field) parts.push(`member ${c.memberId ?? ''}`.trim());
  else if (c.memberId) parts.push(c.memberId);
  if (c.holeId) parts.push(`hole ${c.holeId}`);
  if (c.label && !(c.scope === 'hole' && c.field === 'position')) parts.push(c.label);
  return {
    subject: parts.join(' · '),
    verb: c.change,
    ...(c.before !== undefined ? { before: c.before } : {}),
    ...(c.after !== undefined ? { after: c.after } : {}),
  };
}
