import { describe, expect, it } from 'vitest';
import { normaliseMeta } from './normaliseMeta.js';

describe('normaliseMeta', () => {
  it('keeps the optional fields only when given and joins notes written as lines', () => {
    expect(
      normaliseMeta({
        project: 'Harbour Lantern Footbridge',
        preparedBy: 'A. Engineer',
        date: '2026-11-20',
        notes: ['a', 'b'],
      }),
    ).toEqual({
      project: 'Harbour Lantern Footbridge',
      preparedBy: 'A. Engineer',
      date: '2026-11-20',
      notes: 'a\nb',
    });
    expect(
      Object.keys(
        normaliseMeta({ project: 'P', preparedBy: 'Q', date: '2026-01-01', firm: 'F', reference: 'R' }),
      ),
    ).toEqual(['project', 'preparedBy', 'firm', 'date', 'reference']);
  });
});
