import { describe, expect, it } from 'vitest';
import { moveInputSchema } from './move-discrepancy';

describe('moveInputSchema', () => {
  it('accepts an answer that links a revision without a note', () => {
    expect(moveInputSchema.safeParse({ to: 'answered', revisionSubmittalId: 4 }).success).toBe(true);
  });

  it('refuses an answer with neither a note nor a revision, and says what it needs', () => {
    const parsed = moveInputSchema.safeParse({ to: 'answered' });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.message).toBe('An answer needs a note or a linked revision.');
  });

  it('refuses a waiver without a reason but accepts an acceptance without one', () => {
    expect(moveInputSchema.safeParse({ to: 'waived' }).error?.issues[0]?.message).toBe(
      'This move needs a note.',
    );
    expect(moveInputSchema.safeParse({ to: 'accepted' }).success).toBe(true);
  });
});
