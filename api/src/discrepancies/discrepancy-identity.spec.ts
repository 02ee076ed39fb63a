import {
  carriedStatus,
  discrepancyIdentity,
  matchFiles,
  reconcile,
  stablePointer,
  type PreviousItem,
} from './discrepancy-identity.js';

// Invented calc files of the demo scenario (Harbour Lantern Footbridge).
const splice = (holes: string[], claimed: { holes: string[]; netWidth: number }[] = []) => ({
  members: [
    { id: 'SP-1', holes: holes.map((id) => ({ id, x: 0, y: 0 })), claims: { An: 5.9, chains: claimed } },
    { id: 'SP-2', holes: [{ id: 'A1' }], claims: {} },
  ],
});

describe('stablePointer', () => {
  it('names a member and a hole by their ids instead of their positions', () => {
    expect(stablePointer('/members/0/holes/2/y', splice(['A1', 'B1', 'A2']))).toBe(
      '/members/@SP-1/holes/@A2/y',
    );
    expect(stablePointer('/members/1/claims/An', splice(['A1']))).toBe('/members/@SP-2/claims/An');
  });

  it('is the same pointer after a hole is added before the one it names', () => {
    const before = stablePointer('/members/0/holes/1', splice(['A1', 'B1']));
    const after = stablePointer('/members/0/holes/2', splice(['A1', 'A0', 'B1']));
    expect(after).toBe(before);
    expect(before).toBe('/members/@SP-1/holes/@B1');
  });

  it('names a claimed chain by its holes, and a hole id inside it by itself', () => {
    const doc = splice(['A1', 'B1', 'A2'], [{ holes: ['A1', 'B1', 'A2'], netWidth: 7.8 }]);
    expect(stablePointer('/members/0/claims/chains/0/netWidth', doc)).toBe(
      '/members/@SP-1/claims/chains/@A1-B1-A2/netWidth',
    );
    expect(stablePointer('/members/0/claims/chains/0/holes/1', doc)).toBe(
      '/members/@SP-1/claims/chains/@A1-B1-A2/holes/@B1',
    );
  });

  it('keeps a position the document does not explain, and escapes names as JSON pointers do', () => {
    expect(stablePointer('/members/7/claims/An', splice(['A1']))).toBe('/members/7/claims/An');
    expect(stablePointer('/members/0/load', null)).toBe('/members/0/load');
    expect(stablePointer('', splice([]))).toBe('');
    expect(stablePointer('/members/0', { members: [{ id: 'a/b~c' }] })).toBe('/members/@a~1b~0c');
  });
});

describe('matchFiles', () => {
  const f = (fileName: string, memberIds: string[]) => ({ fileName, memberIds });

  it('pairs the same name first, then the file sharing the most member ids; the rest is new', () => {
    const north = f('north.json', ['SP-N1']);
    const gusset = f('gusset.json', ['G-2', 'G-3']);
    const old = f('old.json', ['X-1']);
    const north2 = f('north.json', ['SP-N1', 'SP-N2']);
    const renamed = f('gusset-issue-b.json', ['G-3']);
    const added = f('new.json', ['Y-1']);
    const pairs = matchFiles([north, gusset, old], [north2, renamed, added]);
    expect(pairs.get(north2)).toBe(north);
    expect(pairs.get(renamed)).toBe(gusset);
    expect(pairs.has(added)).toBe(false);
  });

  it('never pairs one previous file twice', () => {
    const a = f('a.json', ['M']);
    const b1 = f('b1.json', ['M']);
    const b2 = f('b2.json', ['M']);
    const pairs = matchFiles([a], [b1, b2]);
    expect([...pairs.values()]).toEqual([a]);
  });
});

describe('discrepancyIdentity', () => {
  const parts = {
    fileKey: 'splice.json',
    memberId: 'SP-1',
    code: 'LG101',
    direction: '-x',
    stablePointer: '/members/@SP-1/claims/An',
  };

  it('is file + member + code + direction + stable pointer', () => {
    expect(discrepancyIdentity(parts)).toBe(discrepancyIdentity({ ...parts }));
    expect(discrepancyIdentity({ ...parts, code: 'LG102' })).not.toBe(discrepancyIdentity(parts));
    expect(discrepancyIdentity({ ...parts, direction: '+x' })).not.toBe(discrepancyIdentity(parts));
    expect(discrepancyIdentity({ ...parts, fileKey: 'other.json' })).not.toBe(discrepancyIdentity(parts));
  });

  it('sees a member whose id changed as another member', () => {
    expect(
      discrepancyIdentity({ ...parts, memberId: 'SP-1A', stablePointer: '/members/@SP-1A/claims/An' }),
    ).not.toBe(discrepancyIdentity(parts));
  });

  it('cannot be fooled by separators inside the parts', () => {
    expect(discrepancyIdentity({ ...parts, fileKey: 'a', memberId: 'b|c' })).not.toBe(
      discrepancyIdentity({ ...parts, fileKey: 'a|b', memberId: 'c' }),
    );
  });
});

describe('reconcile', () => {
  const item = (id: number, identity: string, calcFileId = 1): PreviousItem => ({ id, calcFileId, identity });

  it('carries on what the revision still raises, resolves what it re-checked and no longer raises', () => {
    const out = reconcile(
      [item(1, 'a'), item(2, 'b'), item(3, 'c')],
      [{ identity: 'c' }, { identity: 'd' }],
      new Set([1]),
    );
    expect(out.carried).toEqual([[0, 3]]);
    expect(out.resolved).toEqual([1, 2]);
    expect(out.untouched).toEqual([]);
  });

  it('leaves alone the items of a file the revision does not hold', () => {
    const out = reconcile([item(1, 'a', 1), item(2, 'b', 2)], [{ identity: 'a' }], new Set([1]));
    expect(out.carried).toEqual([[0, 1]]);
    expect(out.resolved).toEqual([]);
    expect(out.untouched).toEqual([2]);
  });

  it('pairs two items of one identity in order, and resolves the one left over', () => {
    const out = reconcile(
      [item(5, 'x'), item(4, 'x'), item(6, 'x')],
      [{ identity: 'x' }, { identity: 'x' }],
      new Set([1]),
    );
    expect(out.carried).toEqual([
      [0, 4],
      [1, 5],
    ]);
    expect(out.resolved).toEqual([6]);
  });

  it('has nothing to carry with no previous items, and resolves everything re-checked when nothing is raised', () => {
    expect(reconcile([], [{ identity: 'a' }], new Set([1]))).toEqual({
      carried: [],
      resolved: [],
      untouched: [],
    });
    expect(reconcile([item(1, 'a')], [], new Set([1])).resolved).toEqual([1]);
  });
});

describe('carriedStatus', () => {
  it('keeps an open item where the conversation was: raised, answered or returned', () => {
    for (const status of ['raised', 'answered', 'returned'] as const)
      expect(
        carriedStatus({ status, claimed: 5.9, recomputed: 5.6 }, { claimed: 6.1, recomputed: 5.6 }),
      ).toEqual({
        status,
        reRaised: null,
      });
  });

  it('keeps an accepted or waived item while its numbers are the same', () => {
    expect(
      carriedStatus(
        { status: 'accepted', claimed: 5.9, recomputed: 5.625 },
        { claimed: 5.9, recomputed: 5.625 + 1e-12 },
      ),
    ).toEqual({ status: 'accepted', reRaised: null });
    expect(
      carriedStatus(
        { status: 'waived', claimed: null, recomputed: null },
        { claimed: null, recomputed: null },
      ),
    ).toEqual({
      status: 'waived',
      reRaised: null,
    });
  });

  it('raises an accepted or waived item again when the numbers changed, and says why', () => {
    const next = carriedStatus(
      { status: 'accepted', claimed: 5.9, recomputed: 5.625 },
      { claimed: 6.2, recomputed: 5.625 },
    );
    expect(next.status).toBe('raised');
    expect(next.reRaised).toBe(
      'was accepted at claimed 5.9 / recomputed 5.625; the revision has 6.2 / 5.625',
    );
    expect(
      carriedStatus({ status: 'waived', claimed: null, recomputed: 1 }, { claimed: 0.85, recomputed: 1 })
        .status,
    ).toBe('raised');
  });
});
