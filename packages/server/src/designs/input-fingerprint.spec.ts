import { describe, expect, it } from '@jest/globals';
import type { DesignInput } from '../selection/dto/design-input.dto.js';
import { canonicalJson, inputFingerprint } from './input-fingerprint.js';

const input = (): DesignInput => ({
  components: [{ name: 'Pump', massKg: 300, cg: { x: 0.1, y: 0, z: 0.4 } }],
  mountPoints: [
    { label: 'A', x: 0.8, y: 0.45, z: 0 },
    { label: 'B', x: 0.8, y: -0.45, z: 0 },
    { label: 'C', x: -0.8, y: 0, z: 0 },
  ],
  operating: { speedRpm: 1480, orders: [1, 2] },
  criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1 },
});

describe('inputFingerprint', () => {
  it('is the same for the same input whatever the key order, and drops undefined keys', () => {
    const a = input();
    const b = JSON.parse(canonicalJson(a)) as DesignInput;
    const reordered = {
      criteria: b.criteria,
      operating: { orders: [1, 2], speedRpm: 1480 },
      mountPoints: b.mountPoints,
      components: b.components,
    };
    expect(inputFingerprint(reordered)).toBe(inputFingerprint(a));
    expect(inputFingerprint({ ...a, criteria: { ...a.criteria, ambientTempC: undefined } })).toBe(inputFingerprint(a));
    expect(inputFingerprint(a)).toMatch(/^[0-9a-f]{64}$/);
  });

  it('changes with any value, including the order of a list', () => {
    const base = inputFingerprint(input());
    const changed = [
      { ...input(), components: [{ ...input().components[0]!, massKg: 300.000001 }] },
      { ...input(), operating: { speedRpm: 1480, orders: [2, 1] } },
      { ...input(), criteria: { ...input().criteria, weightMarginPct: 0 } },
      { ...input(), mountPoints: input().mountPoints.slice().reverse() },
    ];
    for (const other of changed) expect(inputFingerprint(other)).not.toBe(base);
  });

  it('writes canonical JSON with sorted keys', () => {
    expect(canonicalJson({ b: 1, a: [{ d: null, c: 'x' }], e: undefined })).toBe('{"a":[{"c":"x","d":null}],"b":1}');
  });
});
