import { nextPointLabel } from './mount-points-table';

describe('labels of new mount points', () => {
  it('takes the next free letter, then numbered labels', () => {
    expect(nextPointLabel(['A', 'B', 'C', 'D'])).toBe('E');
    expect(nextPointLabel(['A', 'c', 'B'])).toBe('D');
    const all = Array.from({ length: 26 }, (_, i) => String.fromCharCode(65 + i));
    expect(nextPointLabel(all)).toBe('P27');
  });
});
