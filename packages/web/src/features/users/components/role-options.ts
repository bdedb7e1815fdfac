import type { SelectOption } from '@/components/form/select-field';
import { ROLE_LABELS, ROLES } from '@/lib/authorization';

export const ROLE_OPTIONS: readonly SelectOption[] = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export const UNIT_OPTIONS: readonly SelectOption[] = [
  { value: 'SI', label: 'SI (kg, N, mm)' },
  { value: 'US', label: 'US customary (lb, lbf, in)' },
];
