import { canonicalFileText, changesByMeaning, pairFiles } from './revisions.service.js';

const file = (id: number, fileName: string, memberIds: string[], json: object) => ({
  id,
  fileName,
  memberIds,
  content: Buffer.from(JSON.stringify(json)),
  document: json as never,
});

describe('pairFiles', () => {
  it('pairs by file name first, then by shared member ids; the rest are added or removed', () => {
    const previous = [
      file(1, 'north.json', ['SP-N1'], { a: 1 }),
      file(2, 'gusset.json', ['G-2'], { b: 1 }),
      file(3, 'old.json', ['X-1'], { c: 1 }),
    ];
    const current = [
      file(4, 'north.json', ['SP-N1'], { a: 1 }),
      file(5, 'gusset-b.json', ['G-2'], { b: 2 }),
      file(6, 'new.json', ['Y-1'], { d: 1 }),
    ];
    const out = pairFiles(previous, current);
    expect(out.map((f) => [f.previousFile, f.currentFile, f.change, f.matchedBy])).toEqual([
      ['north.json', 'north.json', 'unchanged', 'file-name'],
      ['gusset.json', 'gusset-b.json', 'changed', 'member-ids'],
      [null, 'new.json', 'added', 'none'],
      ['old.json', null, 'removed', 'none'],
    ]);
    expect(out[1]?.patch).toContain('-  "b": 1');
    expect(out[1]?.patch).toContain('+  "b": 2');
  });

  it('diffs content, not key order or spacing', () => {
    const a = file(1, 'x.json', ['M'], {});
    a.content = Buffer.from('{"b":1,"a":[1,2]}');
    const b = file(2, 'x.json', ['M'], {});
    b.content = Buffer.from('{\n  "a": [1, 2],\n    "b": 1\n}');
    expect(canonicalFileText(a)).toBe(canonicalFileText(b));
    expect(pairFiles([a], [b])[0]?.change).toBe('unchanged');
  });
});

describe('changesByMeaning', () => {
  const doc = (members: { id: string; holes: number }[]) =>
    ({
      format: 'ligament-calc',
      formatVersion: '1.0',
      meta: { project: 'Harbour Lantern Footbridge', preparedBy: 'Priya Halvorsen', date: '2026-11-20' },
      profile: { standard: 'AISC 360-22', method: 'LRFD', units: 'in' },
      members: members.map((m, index) => ({
        index,
        input: {
          id: m.id,
          kind: 'plate',
          width: 8,
          thickness: 0.5,
          material: { Fy: 36, Fu: 58 },
          holes: Array.from({ length: m.holes }, (_, i) => ({
            id: `A${i + 1}`,
            x: 0,
            y: 2 + i,
            type: 'standard',
          })),
          directions: ['-x'],
        },
      })),
    }) as never;

  it('lists every member of an added or a removed file', () => {
    const file = doc([
      { id: 'H-2', holes: 2 },
      { id: 'H-3', holes: 1 },
    ]);
    expect(changesByMeaning(null, file)).toEqual([
      { scope: 'member', change: 'added', memberId: 'H-2', after: '2 holes' },
      { scope: 'member', change: 'added', memberId: 'H-3', after: '1 hole' },
    ]);
    expect(changesByMeaning(file, null)).toEqual([
      { scope: 'member', change: 'removed', memberId: 'H-2', before: '2 holes' },
      { scope: 'member', change: 'removed', memberId: 'H-3', before: '1 hole' },
    ]);
  });

  it('answers null, not an error, for a stored document it cannot read', () => {
    expect(changesByMeaning({ a: 1 } as never, doc([{ id: 'H-2', holes: 1 }]))).toBeNull();
  });
});
