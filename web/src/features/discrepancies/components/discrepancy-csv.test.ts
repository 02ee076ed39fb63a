import { describe, expect, it } from 'vitest';
import type { Schema } from '@/lib/api-schemas';
import { CSV_HEADER, discrepanciesCsv, quantityOf, unitOf } from './discrepancy-csv';

// Invented demo rows.
const row = (over: Partial<Schema<'DiscrepancyDto'>>): Schema<'DiscrepancyDto'> => ({
  id: 1,
  projectId: 1,
  submittalId: 3,
  calcFileId: 9,
  fileName: 'splice-plates.json',
  memberId: 'SP-1',
  code: 'LG101',
  name: 'overstated-net-area',
  class: 'overstated',
  severity: 'error',
  direction: '-x',
  chain: ['A1', 'B1', 'A2'],
  claimed: 5.9,
  recomputed: 5.625,
  message: 'Claimed An 5.90 in² exceeds the recomputed 5.63 in², "zigzag" A1–B1–A2',
  pointer: '/members/0/claims/An',
  status: 'raised',
  acknowledgedAt: null,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-02T00:00:00.000Z',
  ...over,
});

describe('discrepanciesCsv', () => {
  it('starts with a UTF-8 byte-order mark and the header, one CRLF line per row', () => {
    const text = discrepanciesCsv([row({}), row({ id: 2 })], new Map([[9, 'in']]));
    expect(text.charCodeAt(0)).toBe(0xfeff);
    const lines = text.slice(1).split('\r\n');
    expect(lines[0]).toBe(CSV_HEADER.join(','));
    expect(lines).toHaveLength(4); // header, two rows, the empty string after the last CRLF
  });

  it('gives the quantity, unit and unit system beside the numbers, and quotes a cell with commas or quotes', () => {
    const [, line] = discrepanciesCsv([row({})], new Map([[9, 'in']]))
      .slice(1)
      .split('\r\n');
    expect(line).toContain(',An,5.9,5.625,in²,in,/members/0/claims/An,');
    expect(line).toContain('"Claimed An 5.90 in² exceeds the recomputed 5.63 in², ""zigzag"" A1–B1–A2"');
  });

  it('names the unit from the pointer and the file units: force in kN, width in mm, U unitless', () => {
    expect(unitOf(row({ pointer: '/members/0/claims/rupture' }), 'mm')).toEqual({
      quantity: 'rupture',
      unit: 'kN',
    });
    expect(unitOf(row({ pointer: '/members/1/claims/chains/0/netWidth' }), 'mm')).toEqual({
      quantity: 'netWidth',
      unit: 'mm',
    });
    expect(unitOf(row({ pointer: '/members/0/claims/U' }), 'in')).toEqual({ quantity: 'U', unit: '1' });
    expect(unitOf(row({ claimed: null, recomputed: null, pointer: '/members/0/holes' }), 'in')).toEqual({
      quantity: '',
      unit: '',
    });
    expect(quantityOf('/members/0/section/Ag')).toBe('Ag');
  });
});
