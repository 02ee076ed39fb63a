import { describe, expect, it } from 'vitest';
import { describeEvent, groupEvents } from './describe-event';

describe('describeEvent', () => {
  it('names a revision upload, its origin and its findings by severity', () => {
    expect(
      describeEvent({
        type: 'submittal.revised',
        submittalId: 5,
        discrepancyId: null,
        data: { title: 'Issue D', revisionOf: 3, viaApiToken: true, error: 2, warning: 1, note: 0 },
      }),
    ).toBe('submitted submittal #5 “Issue D” as a revision of #3 from CI: 2 errors, 1 warning, 0 notes');
  });

  it('says which revision an answer links and quotes its note', () => {
    expect(
      describeEvent({
        type: 'discrepancy.answered',
        submittalId: 3,
        discrepancyId: 12,
        data: { from: 'raised', to: 'answered', note: 'see issue D', revisionSubmittalId: 5 },
      }),
    ).toBe('answered discrepancy #12 with revision #5 — “see issue D”');
  });

  it('reports a recheck with nothing changed, and one with changes counted', () => {
    const base = { type: 'submittal.rechecked', submittalId: 3, discrepancyId: null };
    expect(describeEvent({ ...base, data: { currentEngineVersion: '0.2.0', changed: false } })).toBe(
      'rechecked submittal #3 with engine 0.2.0: nothing changed',
    );
    expect(
      describeEvent({
        ...base,
        data: {
          currentEngineVersion: '0.2.0',
          changed: true,
          valueChanges: 1,
          newFindings: 2,
          goneFindings: 0,
        },
      }),
    ).toBe('rechecked submittal #3 with engine 0.2.0: 1 value changed, 2 new findings, 0 findings gone');
  });

  it('quotes the stamp action and counts the open errors it was stamped with', () => {
    expect(
      describeEvent({
        type: 'submittal.stamped',
        submittalId: 3,
        discrepancyId: null,
        data: { action: 'revise-and-resubmit', comment: 'revise', openErrors: 3 },
      }),
    ).toBe('stamped submittal #3 “revise and resubmit” with 3 open errors');
  });

  it('falls back to the event type in words for a type it does not know', () => {
    expect(
      describeEvent({ type: 'submittal.re-opened', submittalId: null, discrepancyId: null, data: {} }),
    ).toBe('submittal re opened');
  });

  it('says what a revision closed and carried on, and why an item came back raised', () => {
    const resolved = {
      type: 'discrepancy.resolved',
      submittalId: 1,
      discrepancyId: 7,
      data: { from: 'raised', to: 'resolved', reason: 'resolved by #2', revisionSubmittalId: 2 },
    };
    expect(describeEvent(resolved)).toBe('closed discrepancy #7: resolved by #2');
    expect(describeEvent(resolved, 5)).toBe('closed 5 discrepancies: resolved by #2');
    const carried = {
      type: 'discrepancy.carried',
      submittalId: 2,
      discrepancyId: 30,
      data: {
        revisionSubmittalId: 2,
        reason: 'was accepted at claimed 4 / recomputed 5.125; the revision has 4.5 / 5.125',
      },
    };
    expect(describeEvent(carried)).toBe(
      'carried discrepancy #30 into submittal #2 and raised it again (was accepted at claimed 4 / recomputed 5.125; the revision has 4.5 / 5.125)',
    );
    expect(describeEvent(carried, 3)).toBe('carried 3 discrepancies into submittal #2');
  });

  it('names reopening, assigning and the counts of a revision', () => {
    expect(
      describeEvent({
        type: 'discrepancy.reopened',
        submittalId: 2,
        discrepancyId: 28,
        data: { from: 'accepted', to: 'returned', note: 'check Ae again' },
      }),
    ).toBe('reopened discrepancy #28 (back to the consultant) — “check Ae again”');
    expect(
      describeEvent({
        type: 'discrepancy.assigned',
        submittalId: 2,
        discrepancyId: 24,
        data: { assigneeName: 'Priya Halvorsen', dueDate: '2026-12-18' },
      }),
    ).toBe('assigned discrepancy #24 to Priya Halvorsen, due 2026-12-18');
    expect(
      describeEvent({
        type: 'submittal.revised',
        submittalId: 2,
        discrepancyId: null,
        data: { title: 'Issue B', revisionOf: 1, error: 3, carried: 7, resolved: 6 },
      }),
    ).toBe('submitted submittal #2 “Issue B” as a revision of #1: 3 errors; 7 items carried on, 6 resolved');
  });

  it('folds a run of one revision’s carried or resolved events into one line, and nothing else', () => {
    const e = (id: number, type: string, revisionSubmittalId: number | null) => ({
      id,
      type,
      actor: null,
      data: { revisionSubmittalId },
    });
    const entries = groupEvents([
      e(1, 'discrepancy.resolved', 2),
      e(2, 'discrepancy.resolved', 2),
      e(3, 'discrepancy.carried', 2),
      e(4, 'discrepancy.carried', 2),
      e(5, 'discrepancy.carried', 3),
      e(6, 'discrepancy.answered', null),
      e(7, 'discrepancy.answered', null),
    ]);
    expect(entries.map((x) => [x.event.id, x.count])).toEqual([
      [1, 2],
      [3, 2],
      [5, 1],
      [6, 1],
      [7, 1],
    ]);
  });
});
