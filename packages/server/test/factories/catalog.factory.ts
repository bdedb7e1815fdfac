import { fileURLToPath } from 'node:url';

/** catalog/examples of the repository. */
export const EXAMPLES_DIR = fileURLToPath(new URL('../../../../catalog/examples/', import.meta.url));

export const example = (name: string): string => `${EXAMPLES_DIR}${name}`;

/** The export's (and the demo file's) header: every SI column. */
export const SI_HEADER = [
  'supplier',
  'part_number',
  'series',
  'mount_type',
  'rated_load_n',
  'vertical_stiffness_n_per_mm',
  'horizontal_stiffness_n_per_mm',
  'dynamic_stiffness_ratio',
  'damping_ratio',
  'loss_factor',
  'max_deflection_mm',
  'temp_min_c',
  'temp_max_c',
  'height_mm',
  'restraint_capacity_n',
  'uplift_capacity_n',
  'unit_price',
  'currency',
  'lead_time_days',
] as const;

let counter = 0;

/** A valid SI row (invented data) as a header → cell map; `part_number` unique per call. */
export function mountRow(overrides: Partial<Record<(typeof SI_HEADER)[number], string>> = {}): Record<string, string> {
  counter++;
  return {
    supplier: 'Factory Example Mounts',
    part_number: `FX-${String(counter).padStart(5, '0')}`,
    series: 'F1',
    mount_type: 'open_spring',
    rated_load_n: String(1000 + counter),
    vertical_stiffness_n_per_mm: '40',
    horizontal_stiffness_n_per_mm: '36',
    dynamic_stiffness_ratio: '1',
    damping_ratio: '0.01',
    loss_factor: '',
    max_deflection_mm: '40',
    temp_min_c: '-40',
    temp_max_c: '120',
    height_mm: '100',
    restraint_capacity_n: '',
    uplift_capacity_n: '',
    unit_price: '40',
    currency: 'USD',
    lead_time_days: '20',
    ...overrides,
  };
}

/** A CSV file body (no quoting needed by the factory's own data). */
export function csvOf(rows: Array<Record<string, string>>, header: readonly string[] = SI_HEADER): string {
  return [header.join(','), ...rows.map((row) => header.map((name) => row[name] ?? '').join(','))].join('\n') + '\n';
}

/** A mount body for POST /api/mounts. */
export function mountBody(supplierId: number, overrides: object = {}): Record<string, unknown> {
  counter++;
  return {
    supplierId,
    partNumber: `API-${String(counter).padStart(5, '0')}`,
    series: 'A1',
    mountType: 'housed_spring',
    ratedLoadN: 2000,
    verticalStiffnessNPerM: 60_000,
    dampingRatio: 0.03,
    ...overrides,
  };
}
