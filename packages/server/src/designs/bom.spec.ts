import type { Candidate, MountSnapshot } from '../selection/selection.types.js';
import { buildBom } from './bom.js';

const mount = (id: number, partNumber: string, unitPrice: number | null, leadTimeDays: number | null): MountSnapshot => ({
  id,
  supplier: { id: 9, name: 'Invented Mounts' },
  partNumber,
  series: 'X',
  mountType: 'open_spring',
  ratedLoadN: 3000,
  verticalStiffnessNPerM: 1e5,
  horizontalStiffnessNPerM: null,
  dynamicStiffnessRatio: 1,
  dampingModel: 'viscous',
  dampingRatio: 0.05,
  lossFactor: null,
  maxDeflectionMm: null,
  tempMinC: null,
  tempMaxC: null,
  heightMm: null,
  unitPrice,
  currency: 'EUR',
  leadTimeDays,
  updatedAt: '2026-01-01T00:00:00.000Z',
});

const point = (label: string, mountId: number, partNumber: string) => ({
  label,
  mountId,
  partNumber,
  loadN: 1,
  utilization: 0.8,
  staticDeflectionMm: 20,
});

describe('buildBom', () => {
  it('groups points by part number in first-use order, with quantity, points, unit and extended price', () => {
    const candidate = {
      perPoint: [point('A', 2, 'X-300'), point('B', 1, 'X-200'), point('C', 2, 'X-300'), point('D', 2, 'X-300')],
    } as Candidate;
    const bom = buildBom(candidate, [mount(1, 'X-200', 19.99, 5), mount(2, 'X-300', 33.333, null)]);
    expect(bom).toEqual([
      {
        supplier: { id: 9, name: 'Invented Mounts' },
        partNumber: 'X-300',
        mountId: 2,
        quantity: 3,
        mountPoints: ['A', 'C', 'D'],
        unitPrice: 33.333,
        extendedPrice: 100,
        currency: 'EUR',
        leadTimeDays: null,
      },
      {
        supplier: { id: 9, name: 'Invented Mounts' },
        partNumber: 'X-200',
        mountId: 1,
        quantity: 1,
        mountPoints: ['B'],
        unitPrice: 19.99,
        extendedPrice: 19.99,
        currency: 'EUR',
        leadTimeDays: 5,
      },
    ]);
  });

  it('leaves the extended price empty when the unit price is unknown', () => {
    const candidate = { perPoint: [point('A', 1, 'X-200')] } as Candidate;
    expect(buildBom(candidate, [mount(1, 'X-200', null, 5)])[0].extendedPrice).toBeNull();
  });
});
