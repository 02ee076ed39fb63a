import { canonicalFileText, pairFiles } from './revisions.service.js';

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
