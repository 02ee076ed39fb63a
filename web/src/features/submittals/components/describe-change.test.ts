import { describe, expect, it } from 'vitest';
import { describeChange } from './describe-change';

describe('describeChange', () => {
  it('names member, hole and field, and keeps old and new values with their units', () => {
    expect(
      describeChange({
        scope: 'hole',
        change: 'moved',
        memberId: 'SP-1',
        holeId: 'B1',
        field: 'position',
        label: 'position',
        before: '(2.5, 5) in',
        after: '(2.5, 5.5) in',
      }),
    ).toEqual({ subject: 'SP-1 · hole B1', verb: 'moved', before: '(2.5, 5) in', after: '(2.5, 5.5) in' });
    expect(
      describeChange({
        scope: 'claim',
        change: 'changed',
        memberId: 'SP-1',
        field: 'claims.An',
        label: 'claimed An',
        before: '5.75 in²',
        after: '5.125 in²',
      }),
    ).toEqual({ subject: 'SP-1 · claimed An', verb: 'changed', before: '5.75 in²', after: '5.125 in²' });
  });

  it('reads a whole member or a profile field on its own', () => {
    expect(describeChange({ scope: 'member', change: 'added', memberId: 'SP-3', after: '2 holes' })).toEqual({
      subject: 'member SP-3',
      verb: 'added',
      after: '2 holes',
    });
    expect(
      describeChange({
        scope: 'profile',
        change: 'changed',
        field: 'code.method',
        label: 'design method',
        before: 'LRFD',
        after: 'ASD',
      }),
    ).toEqual({ subject: 'design method', verb: 'changed', before: 'LRFD', after: 'ASD' });
    expect(
      describeChange({
        scope: 'hole',
        change: 'removed',
        memberId: 'SP-1',
        holeId: 'D1',
        before: '(0, 12) in',
      }),
    ).toEqual({ subject: 'SP-1 · hole D1', verb: 'removed', before: '(0, 12) in' });
  });
});
