import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { Schema } from '@/lib/api-schemas';
import { renderWithProviders } from '@/testing/render';
import { DiscrepancyDetail } from './discrepancy-detail';

type Detail = Schema<'DiscrepancyDetailDto'>;

// Demo discrepancies (fictional project). Their numbers are the hand arithmetic of the files:
// PL 12 × 1/2 in with two 3/4 in holes, An = (12 − 2 × 0.875) × 0.5 = 5.125 in², claimed 6.0 in²;
// schema/examples/south-hanger-missed-chain.json, An = 2987.6 mm² (meta.notes), claimed 3232 mm².
const base: Detail = {
  id: 7,
  projectId: 1,
  submittalId: 3,
  calcFileId: 9,
  fileName: 'deck-plate-in.json',
  memberId: 'SP-IN',
  code: 'LG101',
  name: 'overstated-net-area',
  class: 'overstated',
  severity: 'error',
  direction: '-x',
  chain: ['A1', 'B1'],
  claimed: 6,
  recomputed: 5.125,
  units: 'in',
  quantity: 'area',
  message: 'Claimed An 6.000 in² exceeds the recomputed 5.125 in² (chain A1-B1, −x) by 17.1 %',
  pointer: '/members/0/claims/An',
  status: 'raised',
  version: 0,
  acknowledgedAt: null,
  current: true,
  supersededBySubmittalId: null,
  carriedFromId: null,
  assignee: null,
  dueDate: null,
  firstRaisedAt: '2026-12-01T09:00:00.000Z',
  createdAt: '2026-12-01T09:00:00.000Z',
  updatedAt: '2026-12-01T09:00:00.000Z',
  raisedBy: 'Priya Halvorsen',
  submittalTitle: 'Issue C — deck plates',
  history: [],
  comments: [],
  lineage: [],
  carriedInto: null,
  resolution: null,
  allowedMoves: [],
  moves: [],
  canAcknowledge: false,
  canAssign: false,
  canComment: false,
};

let shown: Detail = base;
vi.mock('../api/get-discrepancy', () => ({
  useDiscrepancy: () => ({ isPending: false, isError: false, data: shown, refetch: vi.fn() }),
}));

function claimedAndRecomputed(detail: Detail): string | null {
  shown = detail;
  const { unmount } = renderWithProviders(<DiscrepancyDetail discrepancyId={detail.id} projectId={1} />);
  const text = screen.getByText('Claimed · recomputed').nextElementSibling?.textContent ?? null;
  unmount();
  return text;
}

describe('DiscrepancyDetail writes claimed and recomputed with their file’s unit and precision', () => {
  it('an inch file: in² to 0.001', () => {
    expect(claimedAndRecomputed(base)).toBe('6.000 in² · 5.125 in²');
  });

  it('a mm file: whole mm²', () => {
    expect(
      claimedAndRecomputed({
        ...base,
        fileName: 'south-hanger-mm.json',
        memberId: 'H-S1',
        claimed: 3232,
        recomputed: 2987.6363636363635,
        units: 'mm',
      }),
    ).toBe('3232 mm² · 2988 mm²');
  });

  it('a force in kN to 0.1 and a net width in mm to 0.1, each by its quantity', () => {
    expect(
      claimedAndRecomputed({
        ...base,
        claimed: 1090.8,
        recomputed: 1008.3381818,
        units: 'mm',
        quantity: 'force',
      }),
    ).toBe('1090.8 kN · 1008.3 kN');
    expect(
      claimedAndRecomputed({ ...base, claimed: 202, recomputed: 186.72727, units: 'mm', quantity: 'length' }),
    ).toBe('202.0 mm · 186.7 mm');
  });
});
