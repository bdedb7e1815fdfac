import { documentBaseName, formatLeadTime, formatPrice } from './format';

describe('purchasing formats', () => {
  it('prints prices with the currency code and cents', () => {
    expect(formatPrice(1240.5, 'USD')).toBe('USD 1,240.50');
    expect(formatPrice(92, 'EUR')).toBe('EUR 92.00');
    expect(formatPrice(null, 'USD')).toBe('—');
  });

  it('prints lead times and file names', () => {
    expect(formatLeadTime(21)).toBe('21 days');
    expect(formatLeadTime(1)).toBe('1 day');
    expect(formatLeadTime(null)).toBe('—');
    expect(documentBaseName('CHW pump P-3 skid', 2)).toBe('chw-pump-p-3-skid-rev2');
  });
});
