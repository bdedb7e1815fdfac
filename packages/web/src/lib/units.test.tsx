import { renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';

import { AppProvider } from '@/app/provider';
import { createTestQueryClient } from '@/testing/render';
import { TEST_USERS } from '@/testing/factories';

import { meQueryKey, type SessionUser } from './auth';
import { setToken } from './session';
import { formatNumber, formatQuantity, useUnits } from './units';

function wrapperFor(user: SessionUser | null) {
  const queryClient = createTestQueryClient();
  if (user) {
    setToken('t');
    queryClient.setQueryData(meQueryKey, user);
  }
  return ({ children }: { children: ReactNode }) => <AppProvider queryClient={queryClient}>{children}</AppProvider>;
}

describe('useUnits', () => {
  it('formats in SI for a user who prefers SI', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor({ ...TEST_USERS.engineer, unitSystem: 'SI' }) });
    expect(result.current.system).toBe('SI');
    // 0.0254 m = 25.4 mm exactly (the inch is defined as 25.4 mm).
    expect(result.current.format('deflection', 0.0254)).toBe('25.4 mm');
    expect(result.current.label('stiffness')).toBe('N/mm');
    expect(result.current.toSi('deflection', 6)).toBeCloseTo(0.006, 12);
  });

  it('formats in US customary for a user who prefers US', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor({ ...TEST_USERS.engineer, unitSystem: 'US' }) });
    expect(result.current.system).toBe('US');
    expect(result.current.format('deflection', 0.0254)).toBe('1.00 in');
    expect(result.current.label('force')).toBe('lbf');
    expect(result.current.toSi('deflection', 1)).toBeCloseTo(0.0254, 12);
    expect(result.current.toDisplay('deflection', 0.0508)).toBeCloseTo(2, 12);
  });

  it('measure: a figure beside the server’s words reads as they do ("6.6 mm" / "0.26 in")', () => {
    const si = renderHook(() => useUnits(), { wrapper: wrapperFor({ ...TEST_USERS.engineer, unitSystem: 'SI' }) }).result.current;
    const us = renderHook(() => useUnits(), { wrapper: wrapperFor({ ...TEST_USERS.engineer, unitSystem: 'US' }) }).result.current;
    expect(si.measure('deflection', 0.0066)).toBe('6.6 mm');
    expect(us.measure('deflection', 0.0066)).toBe('0.26 in'); // 6.6 / 25.4 = 0.2598
    expect(us.measure('deflection', Number.NaN)).toBe('—');
  });

  it('falls back to SI when nobody is signed in', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor(null) });
    expect(result.current.format('mass', 850)).toBe('850 kg');
  });
});

describe('formatQuantity', () => {
  // Conversion factors are exact by definition: 1 in = 0.0254 m, 1 lb = 0.45359237 kg,
  // 1 lbf = 4.4482216152605 N (NIST SP 811, appendix B).
  it.each([
    ['mass', 850, 'SI', '850 kg'],
    ['mass', 850, 'US', '1,874 lb'],
    ['force', 2450, 'SI', '2,450 N'],
    ['force', 2450, 'US', '551 lbf'],
    ['stiffness', 250_000, 'SI', '250 N/mm'],
    ['stiffness', 250_000, 'US', '1,428 lbf/in'],
    ['deflection', 0.006, 'US', '0.236 in'],
    ['speed', 24.75, 'SI', '1,485 rpm'],
    ['frequency', 4.8, 'US', '4.80 Hz'],
    ['temperature', 40, 'SI', '40.0 °C'],
    ['temperature', 40, 'US', '104 °F'],
    ['temperature', -40, 'US', '-40.0 °F'],
    ['position', 1.2, 'SI', '1.20 m'],
  ] as const)('%s %d in %s → %s', (quantity, si, system, expected) => {
    expect(formatQuantity(quantity, si, system)).toBe(expected);
  });

  it('uses a fixed number of decimals when asked', () => {
    expect(formatQuantity('deflection', 0.0254, 'SI', 2)).toBe('25.40 mm');
    expect(formatQuantity('deflection', 0.0254, 'US', 3)).toBe('1.000 in');
  });

  it('shows a dash for missing values', () => {
    expect(formatQuantity('mass', Number.NaN, 'SI')).toBe('—');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('—');
    expect(formatNumber(0)).toBe('0');
  });
});
