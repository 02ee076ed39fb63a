import { refreshDecision } from './refresh-decision.js';

const LIVE = { expiresAt: 100_000, endedAt: null };
const GRACE = 30_000;

describe('refreshDecision', () => {
  it('rotates an unused, unexpired token of a live session', () => {
    expect(
      refreshDecision({ expiresAt: 50_000, usedAt: null, successorUsed: false }, LIVE, 10_000, GRACE),
    ).toEqual({ kind: 'rotate' });
  });

  it('refuses an unknown token, or one whose session has ended', () => {
    expect(refreshDecision(null, null, 10_000, GRACE)).toEqual({ kind: 'refuse', why: 'unknown' });
    const unused = { expiresAt: 50_000, usedAt: null, successorUsed: false };
    expect(refreshDecision(unused, { expiresAt: 100_000, endedAt: 5_000 }, 10_000, GRACE)).toEqual({
      kind: 'refuse',
      why: 'ended',
    });
  });

  it('refuses and ends the session when the token or the session has run out', () => {
    const stale = { expiresAt: 9_000, usedAt: null, successorUsed: false };
    expect(refreshDecision(stale, LIVE, 10_000, GRACE)).toEqual({
      kind: 'refuse',
      why: 'expired',
      endAs: 'expired',
    });
    const fresh = { expiresAt: 50_000, usedAt: null, successorUsed: false };
    expect(refreshDecision(fresh, { expiresAt: 10_000, endedAt: null }, 10_000, GRACE)).toEqual({
      kind: 'refuse',
      why: 'expired',
      endAs: 'expired',
    });
  });

  it('treats a token used moments ago, whose successor is still unused, as a race between tabs', () => {
    const justUsed = { expiresAt: 50_000, usedAt: 9_990, successorUsed: false };
    expect(refreshDecision(justUsed, LIVE, 10_000, GRACE)).toEqual({ kind: 'race' });
  });

  it('calls it reuse once the successor has been used, however recent', () => {
    const replayed = { expiresAt: 50_000, usedAt: 9_990, successorUsed: true };
    expect(refreshDecision(replayed, LIVE, 10_000, GRACE)).toEqual({ kind: 'reuse' });
  });

  it('calls it reuse after the grace period even when the successor is unused', () => {
    const old = { expiresAt: 90_000, usedAt: 10_000, successorUsed: false };
    expect(refreshDecision(old, LIVE, 10_000 + GRACE, GRACE)).toEqual({ kind: 'race' });
    expect(refreshDecision(old, LIVE, 10_001 + GRACE, GRACE)).toEqual({ kind: 'reuse' });
  });
});
