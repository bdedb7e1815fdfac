import { formatBytes } from './format-bytes';

describe('formatBytes', () => {
  // Decimal prefixes as the SI defines them (k = 1000, M = 1 000 000; IEC 80000-13 symbol B).
  it.each([
    [0, '0 B'],
    [999, '999 B'],
    [1000, '1 kB'],
    [1824, '1.8 kB'],
    [999_949, '999.9 kB'],
    [1_000_000, '1 MB'],
    [2_400_000, '2.4 MB'],
  ])('%d bytes → %s', (bytes, text) => {
    expect(formatBytes(bytes)).toBe(text);
  });

  it('shows a dash for a size that is not one', () => {
    expect(formatBytes(-1)).toBe('—');
    expect(formatBytes(Number.NaN)).toBe('—');
  });
});
