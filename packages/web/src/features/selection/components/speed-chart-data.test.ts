import { transmissibilityFromEfficiency } from '@tacet/vibration';

import type { Model2Candidate, SpeedCurve } from '@/types/model2-api';

import { crossingLabel, modeText, speedChartData, worstPointForces } from './speed-chart-data';

/** Invented whole-machine result of a pump and its motor on a 900–1480 rpm drive. */
function candidate(): Model2Candidate {
  return {
    wholeMachine: {
      stiffnessTolerancePct: 15,
      worst: {
        transmissibility: 2.4,
        efficiencyPct: -140,
        frequencyHz: 1090 / 60,
        speedRpm: 1090,
        source: 'Pump impeller',
        stiffnessFactor: 1.15,
      },
      perFrequency: [
        { source: 'Pump impeller', frequencyHz: 1480 / 60, speedRpm: 1480, transmissibility: 0.08, amplitudeN: 400, perPoint: [] },
        { source: 'Pump impeller', frequencyHz: 15, speedRpm: 900, transmissibility: 0.3, amplitudeN: 400, perPoint: [] },
        {
          source: 'Pump impeller',
          frequencyHz: 1090 / 60,
          speedRpm: 1090,
          transmissibility: 2.4,
          amplitudeN: 250,
          perPoint: [
            { label: 'A', forceN: 120 },
            { label: 'B', forceN: 80 },
          ],
        },
        { source: 'Motor rotor', frequencyHz: 15, speedRpm: 900, transmissibility: 0.2, amplitudeN: 400, perPoint: [] },
        { source: 'Motor rotor', frequencyHz: 1480 / 60, speedRpm: 1480, transmissibility: 0.05, amplitudeN: 400, perPoint: [] },
        // outside the range: left out of the chart
        { source: 'Motor rotor', frequencyHz: 100, speedRpm: null, transmissibility: 0.01, amplitudeN: 400, perPoint: [] },
      ],
    },
    crossings: [
      { mode: 'roll + yaw', modeFrequencyHz: 1090 / 60, source: 'Pump impeller', order: 1, speedRpm: 1090 },
      { mode: 'pitch', modeFrequencyHz: 40, source: 'Pump impeller', order: 2, speedRpm: 1200 },
      // below the range: not drawn
      { mode: 'bounce', modeFrequencyHz: 10, source: 'Motor rotor', order: 1, speedRpm: 600 },
    ],
  };
}

const RANGE = { min: 900, max: 1480 };

describe('speed chart data', () => {
  it('draws one chart per source, in the order of the result, with its computed points in speed order', () => {
    const data = speedChartData({ candidate: candidate(), rangeRpm: RANGE, targetTransmissibility: 0.1 });
    expect(data.sources.map((s) => s.source)).toEqual(['Pump impeller', 'Motor rotor']);
    const pump = data.sources[0]!;
    expect(pump.fromCurve).toBe(false);
    expect(pump.line.map((p) => p.x)).toEqual([900, 1090, 1480]);
    expect(pump.line.map((p) => p.y)).toEqual([0.3, 2.4, 0.08]);
    expect(pump.band).toBeNull();
    expect(pump.worst).toEqual({ x: 1090, y: 2.4 });
    expect(data.sources[1]!.worst).toBeNull();
    expect(data.sources[1]!.line.map((p) => p.x)).toEqual([900, 1480]);
  });

  it('marks the crossings inside the range with their mode and order', () => {
    const data = speedChartData({ candidate: candidate(), rangeRpm: RANGE, targetTransmissibility: null });
    expect(data.sources[0]!.crossings).toEqual([
      { speedRpm: 1090, label: 'roll + yaw · 1×' },
      { speedRpm: 1200, label: 'pitch · 2×' },
    ]);
    expect(data.sources[1]!.crossings).toEqual([]);
    expect(modeText(3)).toBe('mode 3');
    expect(crossingLabel({ mode: 'bounce', order: 0.1 + 0.2 })).toBe('bounce · 0.3×');
  });

  it('draws the requirement at T for the required isolation and spans whole decades that include it and T = 1', () => {
    // T = 1 − 90 % = 0.1 (the definition of isolation efficiency)
    const target = transmissibilityFromEfficiency(90);
    expect(target).toBeCloseTo(0.1, 12);
    const data = speedChartData({ candidate: candidate(), rangeRpm: RANGE, targetTransmissibility: target });
    expect(data.requirement).toBe(target);
    // lowest 0.05, highest 2.4 × 1.2 = 2.88 → [0.01, 10]
    expect(data.yDomain).toEqual([0.01, 10]);
    expect(data.xDomain).toEqual([900, 1480]);
  });

  it('clips the skip bands to the running range and drops the ones outside it', () => {
    const data = speedChartData({
      candidate: candidate(),
      rangeRpm: RANGE,
      targetTransmissibility: null,
      skipBandsRpm: [
        { min: 1050, max: 1130 },
        { min: 1400, max: 1600 },
        { min: 300, max: 500 },
      ],
    });
    expect(data.skipBands).toEqual([
      { min: 1050, max: 1130 },
      { min: 1400, max: 1480 },
    ]);
  });

  it('draws the server’s sweep as the line and its stiffness band as an area, ends in order', () => {
    const curves: SpeedCurve[] = [
      {
        source: 'Pump impeller',
        points: [
          { speedRpm: 1480, transmissibility: 0.08, low: 0.06, high: 0.11 },
          { speedRpm: 900, transmissibility: 0.3, low: 0.2, high: 0.45 },
          // soft end above stiff end below resonance: the area still spans both
          { speedRpm: 1000, transmissibility: 1.2, low: 1.6, high: 0.9 },
          { speedRpm: 1700, transmissibility: 0.02, low: 0.01, high: 0.03 },
        ],
      },
    ];
    const data = speedChartData({ candidate: candidate(), rangeRpm: RANGE, targetTransmissibility: 0.1, curves });
    const pump = data.sources[0]!;
    expect(pump.fromCurve).toBe(true);
    expect(pump.line.map((p) => p.x)).toEqual([900, 1000, 1480]);
    expect(pump.band).toEqual([
      { x: 900, y: 0.45, y0: 0.2 },
      { x: 1000, y: 1.6, y0: 0.9 },
      { x: 1480, y: 0.11, y0: 0.06 },
    ]);
    for (const p of pump.band!) expect(p.y).toBeGreaterThanOrEqual(p.y0);
    // the computed points stay as dots over the curve
    expect(pump.computed).toHaveLength(3);
    // the motor has no curve: its computed points joined
    expect(data.sources[1]!.fromCurve).toBe(false);
  });

  it('gives the peak force per mount at the worst point', () => {
    expect(worstPointForces(candidate())).toEqual([
      { label: 'A', forceN: 120 },
      { label: 'B', forceN: 80 },
    ]);
    expect(worstPointForces({})).toBeNull();
  });
});
