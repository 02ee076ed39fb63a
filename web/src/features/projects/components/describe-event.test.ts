import { describe, expect, it } from 'vitest';
import { describeEvent } from './describe-event';

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
});
