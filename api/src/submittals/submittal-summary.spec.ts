import type { Finding } from 'ligament';
import { summarise } from './submittal-summary.js';

const finding = (
  code: string,
  cls: Finding['class'],
  severity: Finding['severity'],
  memberId = 'M',
): Finding => ({
  code,
  name: code,
  class: cls,
  severity,
  memberId,
  message: `${code} on ${memberId}`,
  pointer: '/members/0',
});

describe('summarise', () => {
  it('counts every class and severity, zeros included', () => {
    const s = summarise(2, 3, [
      { fileName: 'a.json', finding: finding('LG111', 'understated', 'note') },
      { fileName: 'a.json', finding: finding('LG201', 'detailing', 'warning') },
      { fileName: 'b.json', finding: finding('LG201', 'detailing', 'warning') },
    ]);
    expect(s).toMatchObject({
      files: 2,
      members: 3,
      findings: 3,
      bySeverity: { error: 0, warning: 2, note: 1 },
    });
    expect(s.byClass).toEqual({
      overstated: 0,
      understated: 1,
      'missed-chain': 0,
      'phantom-chain': 0,
      'chain-width': 0,
      'equal-share': 0,
      detailing: 2,
      input: 0,
    });
  });

  it('names the worst finding: severity first, then class order, then code', () => {
    const s = summarise(1, 2, [
      { fileName: 'a.json', finding: finding('LG201', 'detailing', 'warning') },
      { fileName: 'a.json', finding: finding('LG121', 'missed-chain', 'error', 'SP-2') },
      { fileName: 'b.json', finding: finding('LG103', 'overstated', 'error', 'SP-1') },
      { fileName: 'b.json', finding: finding('LG101', 'overstated', 'error', 'SP-1') },
    ]);
    expect(s.worst).toEqual({
      code: 'LG101',
      name: 'LG101',
      class: 'overstated',
      severity: 'error',
      fileName: 'b.json',
      memberId: 'SP-1',
      message: 'LG101 on SP-1',
    });
  });

  it('has no worst finding when there are none', () => {
    expect(summarise(1, 1, []).worst).toBeNull();
  });
});
