import { describe, expect, it } from '@jest/globals';
import { changeLines, formatInputChange, inputChanges } from './input-changes.js';

const context = { supplierName: (id: number) => ({ 7: 'Aldwick Springs', 8: 'Brisk Mounts' })[id] ?? `supplier ${id}` };

const base = {
  components: [
    { name: 'Pump', massKg: 420, cg: { x: 0.3, y: 0, z: 0.35 } },
    { name: 'Motor', massKg: 380, cg: { x: -0.4, y: 0.02, z: 0.4 } },
  ],
  mountPoints: [
    { label: 'A', x: 0.8, y: 0.45, z: 0 },
    { label: 'B', x: 0.8, y: -0.45, z: 0 },
  ],
  operating: { speedRpm: 1480, orders: [1, 2], lineFrequencyHz: 50 },
  criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1, supplierIds: [7], mountTypes: ['open_spring'] },
};
const clone = () => JSON.parse(JSON.stringify(base)) as typeof base & Record<string, unknown>;

describe('inputChanges (what changed between two submissions)', () => {
  it('finds nothing between equal inputs', () => {
    expect(inputChanges({ input: base, chosen: 'X' }, { input: clone(), chosen: 'X' }, context)).toEqual([]);
  });

  it('names every changed field in words, keeps SI values, and matches list items by name or label', () => {
    const after = clone();
    after.components.reverse(); // order alone is no change
    after.components[0].massKg = 400; // Motor
    after.mountPoints[1].x = 0.85;
    after.mountPoints.push({ label: 'C', x: -0.8, y: 0.45, z: 0 });
    after.operating.speedRpm = 1780;
    after.criteria.minUtilization = 0.6;
    after.criteria.supplierIds = [7, 8];
    after.criteria.mountTypes = ['open_spring', 'housed_spring'];
    const changes = inputChanges({ input: base, chosen: 'AS-450 (Aldwick Springs)' }, { input: after, chosen: null }, context);
    const byField = Object.fromEntries(changes.map((c) => [c.field, c]));
    expect(byField['components[Motor].massKg']).toMatchObject({ label: 'Motor: mass', quantity: 'mass', before: 380, after: 400 });
    expect(byField['mountPoints[B].x']).toMatchObject({
      label: 'Mount point B: x position',
      quantity: 'position',
      before: 0.8,
      after: 0.85,
    });
    expect(byField['mountPoints[C]']).toMatchObject({ label: 'Mount point C', beforeText: null, afterText: 'added' });
    expect(byField['mountPoints[C].x']).toMatchObject({ before: null, after: -0.8 });
    expect(byField['operating.speedRpm']).toMatchObject({ label: 'Running speed', quantity: 'speed' });
    expect(byField['operating.speedRpm'].after).toBeCloseTo(1780 / 60, 12); // rpm → Hz (SI)
    expect(byField['criteria.minUtilization']).toMatchObject({
      label: 'Lowest utilisation',
      quantity: 'percent',
      before: 50,
      after: 60,
    });
    expect(byField['criteria.supplierIds']).toMatchObject({ beforeText: 'Aldwick Springs', afterText: 'Aldwick Springs, Brisk Mounts' });
    expect(byField['criteria.mountTypes']).toMatchObject({ afterText: 'open spring, housed spring' });
    expect(byField.chosen).toMatchObject({ label: 'Chosen mounts', beforeText: 'AS-450 (Aldwick Springs)', afterText: null });
    expect(changes.map((c) => c.field)).not.toContain('components[Pump].massKg');
    for (const change of changes) expect(change.label).not.toMatch(/[a-z][A-Z]|_/); // words, not identifiers
  });

  it('names the operating sources by their label, and the skip bands, motor poles and stiffness tolerance in words', () => {
    const impeller = { label: 'Impeller', kind: 'unbalance', at: { x: 0.3, y: 0, z: 0.5 }, axis: 'x', rotorMassKg: 30 };
    const before = { ...clone(), operating: { ...base.operating, sources: [impeller] } };
    const after = {
      ...clone(),
      operating: {
        ...base.operating,
        motorPoles: 4,
        skipBandsRpm: [{ min: 1000, max: 1100 }],
        sources: [{ ...impeller, rotorMassKg: 35, at: { x: 0.3, y: 0, z: 0.55 } }],
      },
      criteria: { ...base.criteria, stiffnessTolerancePct: 15, maxResonantMotionMm: 4 },
    };
    const changes = inputChanges({ input: before, chosen: null }, { input: after, chosen: null }, context);
    const byField = Object.fromEntries(changes.map((c) => [c.field, c]));
    expect(byField['operating.sources[Impeller].rotorMassKg']).toMatchObject({
      label: 'Source Impeller: rotor mass',
      quantity: 'mass',
      before: 30,
      after: 35,
    });
    expect(byField['operating.sources[Impeller].at.z']).toMatchObject({ label: 'Source Impeller: position z', before: 0.5, after: 0.55 });
    expect(byField['operating.skipBandsRpm']).toMatchObject({ label: 'Skip bands', beforeText: null, afterText: '1000–1100 rpm' });
    expect(byField['operating.motorPoles']).toMatchObject({ label: 'Motor poles', after: 4 });
    expect(byField['criteria.stiffnessTolerancePct']).toMatchObject({ label: 'Stiffness tolerance', quantity: 'percent', after: 15 });
    // in metres, like every length the units layer converts (4 mm)
    expect(byField['criteria.maxResonantMotionMm']).toMatchObject({
      label: 'Largest motion on start-up',
      quantity: 'deflection',
      after: 0.004,
    });
    for (const change of changes) expect(change.label).not.toMatch(/[a-z][A-Z]|_/);
  });

  it('names a field it has no rule for from its key and unit suffix (fields added later)', () => {
    const after = clone();
    after.support = { floorStiffnessNPerM: 2e7, spanM: 6 };
    const changes = inputChanges({ input: base, chosen: null }, { input: after, chosen: null }, context);
    expect(changes).toEqual([
      expect.objectContaining({
        field: 'support.floorStiffnessNPerM',
        label: 'support: floor stiffness',
        quantity: 'stiffness',
        after: 2e7,
      }),
      expect.objectContaining({ field: 'support.spanM', label: 'support: span', quantity: 'position', after: 6 }),
    ]);
  });

  it('reads a support stiffness in N/mm as a stiffness in N/m, not a deflection', () => {
    const after = clone();
    after.mountPoints[0] = { ...after.mountPoints[0], supportStiffnessNPerMm: 5000 } as (typeof after.mountPoints)[0];
    const changes = inputChanges({ input: base, chosen: null }, { input: after, chosen: null }, context);
    expect(changes).toEqual([
      expect.objectContaining({ field: 'mountPoints[A].supportStiffnessNPerMm', quantity: 'stiffness', before: null, after: 5e6 }),
    ]);
  });
});

describe('formatInputChange (in the reader’s units)', () => {
  it('converts to SI or US customary units (NIST SP 811 factors: 1 lb = 0.45359237 kg, 1 in = 0.0254 m)', () => {
    const mass = {
      field: 'components[Motor].massKg',
      label: 'Motor: mass',
      quantity: 'mass' as const,
      before: 380,
      after: 400,
      beforeText: null,
      afterText: null,
    };
    expect(formatInputChange(mass, 'SI')).toEqual({ label: 'Motor: mass', before: '380 kg', after: '400 kg' });
    expect(formatInputChange(mass, 'US')).toEqual({ label: 'Motor: mass', before: '838 lb', after: '882 lb' }); // 380 / 0.45359237 = 837.76
    const x = { ...mass, label: 'x', quantity: 'position' as const, before: 0.8, after: 0.85 };
    expect(formatInputChange(x, 'US')).toMatchObject({ before: '31.5 in', after: '33.5 in' });
    const speed = { ...mass, quantity: 'speed' as const, before: 1480 / 60, after: 1780 / 60 };
    expect(formatInputChange(speed, 'US')).toMatchObject({ before: '1,480 rpm', after: '1,780 rpm' });
    const temperature = { ...mass, quantity: 'temperature' as const, before: 20, after: 40 };
    expect(formatInputChange(temperature, 'US')).toMatchObject({ before: '68 °F', after: '104 °F' });
  });

  it('shows enough digits to tell two close values apart, and a dash for a value that was absent', () => {
    const close = { field: 'f', label: 'x', quantity: 'position' as const, before: 0.8, after: 0.8004, beforeText: null, afterText: null };
    expect(formatInputChange(close, 'SI')).toMatchObject({ before: '0.8 m', after: '0.8004 m' });
    expect(formatInputChange({ ...close, before: null }, 'SI')).toMatchObject({ before: '—', after: '0.8 m' });
    expect(changeLines([{ ...close, quantity: 'percent', before: 50, after: 60 }], 'SI')).toEqual(['x: 50 % → 60 %']);
  });
});
