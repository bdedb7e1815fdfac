import { formatDate, formatDateTime } from './dates';

describe('dates', () => {
  it('shows a day without the time', () => {
    expect(formatDate('2025-01-06T12:00:00.000Z')).toBe('6 Jan 2025');
  });

  it('shows a dash for a missing or broken value', () => {
    expect(formatDate(null)).toBe('—');
    expect(formatDate('not a date')).toBe('—');
    expect(formatDateTime(undefined)).toBe('—');
  });

  it('shows day and time', () => {
    expect(formatDateTime('2025-01-06T12:00:00.000Z')).toMatch(/^6 Jan 2025, \d{2}:\d{2}$/);
  });
});
