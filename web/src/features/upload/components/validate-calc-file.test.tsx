import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { readFixture } from '@/testing/fixtures';
import { renderWithProviders } from '@/testing/render';
import { FileCheckList } from './file-check-list';
import { validateCalcFile } from './validate-calc-file';

const fixture = readFixture;

describe('validateCalcFile', () => {
  it('accepts a valid calc file and names its members', async () => {
    const check = await validateCalcFile(new File([fixture('gusset-g2.json')], 'gusset-g2.json'));
    expect(check).toEqual({
      state: 'valid',
      members: ['G-2'],
      project: 'Harbour Lantern Footbridge',
      units: 'mm',
    });
  });

  it('refuses a broken file with the file, line, column, pointer and rule of each error', async () => {
    const check = await validateCalcFile(
      new File([fixture('broken-anchor-plate.json')], 'broken-anchor-plate.json'),
    );
    expect(check.state).toBe('invalid');
    if (check.state !== 'invalid') return;
    const thickness = check.errors.find((e) => e.pointer === '/members/0/thickness');
    expect(thickness).toMatchObject({ file: 'broken-anchor-plate.json', line: 12, rule: 'pattern' });
  });
});

describe('FileCheckList', () => {
  it('shows each error with its position and lets the user remove the file', async () => {
    const check = await validateCalcFile(
      new File([fixture('broken-anchor-plate.json')], 'broken-anchor-plate.json'),
    );
    const onRemove = vi.fn();
    renderWithProviders(
      <FileCheckList
        files={[{ key: 'k1', file: new File(['{}'], 'broken-anchor-plate.json'), check }]}
        onRemove={onRemove}
      />,
    );
    expect(screen.getByText(/fix before uploading/)).toBeInTheDocument();
    expect(screen.getByText(/line 12, column \d+ · \/members\/0\/thickness · pattern/)).toBeInTheDocument();
    screen.getByRole('button', { name: 'Remove broken-anchor-plate.json' }).click();
    expect(onRemove).toHaveBeenCalledWith('k1');
  });
});
