import { checkFiles } from './check-files.js';

const rules = { allowedExtensions: ['.json'] };

function plate(id: string, claimedAn?: number): Buffer {
  return Buffer.from(
    JSON.stringify({
      $schema: 'urn:ligament:schema:calc:1.0',
      format: 'ligament-calc',
      formatVersion: '1.0',
      meta: { project: 'Harbour Lantern Footbridge', preparedBy: 'Priya Halvorsen', date: '2026-11-20' },
      units: 'in',
      code: { standard: 'AISC 360-22', method: 'LRFD' },
      members: [
        {
          id,
          kind: 'plate',
          width: 12,
          thickness: '1/2',
          material: { grade: 'A36', Fy: 36, Fu: 58 },
          holes: [
            { id: 'A1', x: 0, y: 3, bolt: '3/4' },
            { id: 'B1', x: 0, y: 9, bolt: '3/4' },
          ],
          load: { directions: ['-x'], U: 1.0 },
          ...(claimedAn !== undefined ? { claims: { An: claimedAn } } : {}),
        },
      ],
    }),
  );
}

describe('checkFiles', () => {
  it('recomputes every member of valid files', () => {
    const out = checkFiles([{ name: 'a.json', content: plate('P-1') }], rules);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    // Two 3/4 in bolts in standard holes: 13/16 + 1/16 = 7/8 in each (AISC 360-22 Table J3.3 and
    // B4.3b); wn = 12 − 2 × 0.875 = 10.25 in, An = 10.25 × 0.5 = 5.125 in² (hand calculation).
    expect(out.files[0]?.audit.members[0]?.result.An).toBeCloseTo(5.125, 9);
    expect(out.files[0]?.sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it('flags a claim above the recomputed net area as overstated', () => {
    const out = checkFiles([{ name: 'a.json', content: plate('P-1', 6.0) }], rules);
    expect(out.ok && out.files[0]?.audit.members[0]?.findings.map((f) => f.code)).toEqual(['LG101']);
  });

  it('reports every problem of every file and recomputes nothing when any file is bad', () => {
    const out = checkFiles(
      [
        { name: 'a.txt', content: plate('P-1') },
        { name: 'b.json', content: Buffer.from('{') },
        { name: 'c.json', content: plate('P-3') },
        { name: 'c.json', content: plate('P-4') },
        { name: 'd.json', content: Buffer.from([0x7b, 0xff, 0xfe, 0x7d]) },
      ],
      rules,
    );
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.invalidFiles).toBe(4);
    expect(out.errors.map((e) => [e.file, e.rule])).toEqual([
      ['a.txt', 'file-extension'],
      ['b.json', 'json-syntax'],
      ['c.json', 'duplicate-file-name'],
      ['d.json', 'encoding'],
    ]);
  });

  it('refuses a member whose least chain leaves a net width ≤ 0 (rule net-area-positive), never a negative strength', () => {
    // 2-1/2 in plate, four 3/4 in bolts on gauge lines 1/2 in apart, staggered 0.7 in (no holes overlap):
    // wn = 2.5 − 4 · 0.875 + 3 · 0.7²/(4 · 0.5) = −0.265 in (AISC 360 B4.3b and s²/4g, common practice).
    const doc = JSON.parse(plate('P-Z').toString()) as { members: Record<string, unknown>[] };
    doc.members[0]!['width'] = '2-1/2';
    doc.members[0]!['holes'] = [0.5, 1, 1.5, 2].map((y, i) => ({
      id: 'ABCD'[i],
      x: i % 2 === 0 ? 0 : 0.7,
      y,
      bolt: '3/4',
    }));
    const out = checkFiles([{ name: 'z.json', content: Buffer.from(JSON.stringify(doc, null, 2)) }], rules);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.errors.map((e) => [e.file, e.pointer, e.rule])).toEqual([
      ['z.json', '/members/0/holes', 'net-area-positive'],
    ]);
  });
});

describe('recompute limits', () => {
  function holes(n: number): Buffer {
    const doc = JSON.parse(plate('BIG').toString()) as { members: { width: number; holes: unknown[] }[] };
    const member = doc.members[0] as { width: number; holes: unknown[] };
    member.width = 14;
    member.holes = Array.from({ length: n }, (_, i) => ({
      id: `H${i}`,
      x: 3 * Math.floor(i / 4),
      y: 2 + 3 * (i % 4),
      bolt: '3/4',
    }));
    return Buffer.from(JSON.stringify(doc));
  }

  it('a member with more than 1,000 holes is refused with file, pointer and rule, and nothing is recomputed', () => {
    const outcome = checkFiles([{ name: 'big.json', content: holes(1001) }], rules);
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.errors).toEqual([
      expect.objectContaining({
        file: 'big.json',
        pointer: '/members/0/holes',
        rule: 'max-holes-per-member',
      }),
    ]);
    expect(outcome.errors[0]?.message).toMatch(/1001 holes; at most 1000/);
  });

  it('an upload of more than 20,000 holes in all is refused at the member where the budget runs out', () => {
    const files = Array.from({ length: 21 }, (_, i) => ({ name: `f${i}.json`, content: holes(1000) }));
    const outcome = checkFiles(files, rules);
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.errors).toEqual([
      expect.objectContaining({
        file: 'f20.json',
        pointer: '/members/0/holes',
        rule: 'max-holes-per-upload',
      }),
    ]);
  });

  it('1,000 holes in a member are accepted', () => {
    expect(checkFiles([{ name: 'ok.json', content: holes(1000) }], rules).ok).toBe(true);
  });
});
