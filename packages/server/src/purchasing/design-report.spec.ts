import { describe, expect, it } from '@jest/globals';
import type { Design } from '../designs/design.entity.js';
import { pdfHasText, pdfPageCount } from '../../test/utils/pdf-text.js';
import { measure } from '../common/units/reader-words.js';
import { designReportPdf, modeMotionText, utilizationText } from './design-report.js';

const design = (status: Design['status']) =>
  ({
    id: 1,
    name: 'Invented skid',
    revision: 1,
    status,
    project: { name: 'Invented plant' },
    author: { name: 'Author' },
    checker: null,
    input: { components: [{ name: 'Machine', massKg: 100, cg: { x: 0, y: 0, z: 0.2 } }] },
    chosen: null,
    bom: [],
    snapshot: null,
  }) as unknown as Design;

describe('designReportPdf', () => {
  it('writes a PDF of at least two pages', async () => {
    const pdf = await designReportPdf(design('draft'), { disturbingFrequencies: [], releasedAt: null, compress: false });
    expect(pdf.subarray(0, 4).toString()).toBe('%PDF');
    expect(pdfPageCount(pdf)).toBe(2);
    expect(pdfHasText(pdf, 'Invented skid')).toBe(true);
    expect(pdfHasText(pdf, 'licensed engineer')).toBe(true);
    expect(pdfHasText(pdf, 'not in this report')).toBe(false);
    expect(pdfHasText(pdf, 'page 1 of 2')).toBe(true);
    expect(pdfHasText(pdf, 'page 2 of 2')).toBe(true);
  }, 20000);

  it('states the inputs and the frozen mount data, and draws the transmissibility chart', async () => {
    const mount = {
      id: 7,
      supplier: { id: 1, name: 'Invented Springs' },
      partNumber: 'IS-100',
      series: 'S',
      mountType: 'open_spring',
      ratedLoadN: 3000,
      verticalStiffnessNPerM: 80000,
      horizontalStiffnessNPerM: null,
      dynamicStiffnessRatio: 1,
      dampingModel: 'viscous',
      dampingRatio: 0.01,
      lossFactor: null,
      maxDeflectionMm: 50,
      tempMinC: -40,
      tempMaxC: 100,
      heightMm: null,
      unitPrice: 40,
      currency: 'USD',
      leadTimeDays: 10,
      updatedAt: '2026-01-01',
    };
    const candidate = {
      label: 'IS-100',
      supplier: mount.supplier,
      verticalNaturalFrequencyHz: 2.85,
      resonanceAmplification: 50,
      levelErrorMm: 1,
      perPoint: [],
      isolation: [],
      modes: [],
      passes: false,
      reasons: ['Lateral stability of IS-100 cannot be shown: the catalog gives no horizontal stiffness.'],
      notes: ['Sizes picked per point for a level skid.'],
      assumptions: ['IS-100: the catalog gives no horizontal stiffness; the modes are checked with 0.2x and 1x the vertical.'],
    };
    const withSnapshot = {
      ...design('released'),
      input: {
        components: [{ name: 'Machine', massKg: 100, cg: { x: 0, y: 0, z: 0.2 } }],
        mountPoints: [{ label: 'A', x: 0.5, y: 0.3, z: 0 }],
        operating: { speedRpm: 1480, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50 },
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1 },
      },
      chosen: candidate,
      snapshot: {
        takenAt: '2026-01-02T00:00:00Z',
        mounts: [mount],
        candidate,
        massProperties: { massKg: 100, cg: { x: 0, y: 0, z: 0.2 } },
      },
    } as unknown as Design;
    const pdf = await designReportPdf(withSnapshot, {
      disturbingFrequencies: [{ frequencyHz: 24.67, label: '1× shaft at 1480 rpm' }],
      releasedAt: new Date('2026-01-03'),
      compress: false,
    });
    const wanted = [
      'Speed 1480 rpm',
      'Vanes or blades: 6',
      'Minimum isolation 90.0 % of the whole machine',
      'x 0.5 m',
      'IS-100',
      'damping ratio 0.01',
      'Transmissibility T (log)',
      'Weight margin 10 % (the default for weights not yet final)',
      // the verdict, reasons, notes and assumptions of the chosen candidate (docs/engineering/selection.md §14)
      'Verdict: the chosen mounts do NOT meet one check of the selection:',
      'Lateral stability of IS-100 cannot be shown',
      'Sizes picked per point for a level skid.',
      'Assumptions (values not given by the catalog or the input',
      'IS-100: the catalog gives no horizontal stiffness',
    ];
    expect(wanted.filter((text) => !pdfHasText(pdf, text))).toEqual([]);
  }, 20000);
});

describe('designReportPdf: the whole machine (docs/engineering/selection.md §19–§22)', () => {
  it('prints the frozen sources, skip bands, band, worst point, crossings and verdict, and draws the speed chart', async () => {
    const worst = {
      transmissibility: 7.5,
      efficiencyPct: -650,
      frequencyHz: 13.8,
      speedRpm: 829,
      source: 'Impeller',
      stiffnessFactor: 1.15,
    };
    const crossings = [{ mode: 'roll + sway (mixed)', modeFrequencyHz: 13.89, source: 'Impeller', order: 1, speedRpm: 833.4 }];
    const speeds = [780, 829, 833.4, 1000, 1100, 1800];
    const candidate = {
      label: 'WM-TALL',
      supplier: { id: 1, name: 'Invented Rubber' },
      verticalNaturalFrequencyHz: 5.03,
      resonanceAmplification: 10,
      levelErrorMm: 0,
      perPoint: [],
      isolation: [],
      modes: [],
      passes: false,
      reasons: ['Whole machine, Impeller: at 829 rpm (13.82 Hz), stiffness 15 % above nominal the mounts amplify the force'],
      wholeMachine: { worst, stiffnessTolerancePct: 15, perFrequency: [] },
      crossings,
    };
    const operating = {
      speedRangeRpm: { min: 780, max: 1800 },
      orders: [1],
      motorPoles: 4,
      skipBandsRpm: [{ min: 1000, max: 1100 }],
      sources: [{ label: 'Impeller', kind: 'unbalance', at: { x: 0, y: 0, z: 0.5 }, axis: 'z', rotorMassKg: 40 }],
    };
    const released = {
      ...design('released'),
      input: {
        components: [{ name: 'Tall machine', massKg: 800, cg: { x: 0, y: 0, z: 1.2 } }],
        mountPoints: [{ label: 'A', x: 0.5, y: 0.4, z: 0 }],
        operating,
        criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1 },
      },
      chosen: candidate,
      snapshot: {
        takenAt: '2026-01-02T00:00:00Z',
        mounts: [],
        candidate,
        massProperties: { massKg: 800, cg: { x: 0, y: 0, z: 1.2 } },
        operating,
        wholeMachine: {
          worst,
          stiffnessTolerancePct: 15,
          crossings,
          passes: false,
          reasons: candidate.reasons,
          curves: [
            {
              label: 'Impeller',
              order: 1,
              fixedFrequencyHz: null,
              speedRpm: speeds,
              frequencyHz: speeds.map((n) => n / 60),
              transmissibility: [1.2, 7.5, 7.1, 0.4, 0.3, 0.1],
              softEnd: [2, 3, 3.5, 0.5, 0.35, 0.1],
              stiffEnd: [1, 6, 7.5, 0.35, 0.3, 0.1],
            },
          ],
          speedRangeRpm: { min: 780, max: 1800 },
          skipBandsRpm: [{ min: 1000, max: 1100 }],
          requirementTransmissibility: 0.2,
        },
      },
    } as unknown as Design;
    const pdf = await designReportPdf(released, {
      disturbingFrequencies: [{ frequencyHz: 13, label: '1× shaft' }],
      releasedAt: null,
      compress: false,
    });
    const wanted = [
      'Whole machine over the running range',
      'Source Impeller: unbalance of a 40.0 kg rotor balanced to G6.3',
      'Skip bands of the drive: 1000 rpm',
      'Motor on a drive with 4 poles',
      'Stiffness band:',
      'Worst point: Impeller at 829 rpm (13.80 Hz), stiff end of the band',
      'whole-machine transmissibility 7.5000',
      'Verdict: does not meet the requirements',
      'Crossing: the roll + sway (mixed) mode at 13.89 Hz is crossed by Impeller (1',
      'Whole-machine transmissibility T (log) against shaft speed',
      'Isolation at each disturbing frequency (bounce estimate)',
      'of the whole machine over the running range',
    ];
    expect(wanted.filter((text) => !pdfHasText(pdf, text))).toEqual([]);
  }, 20000);

  // 1 in = 25.4 mm, 1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N (NIST SP 811, Appendix B); °F = 1.8 °C + 32.
  const chosenDesign = () => {
    const candidate = {
      label: 'IS-100',
      supplier: { id: 1, name: 'Invented Springs' },
      verticalNaturalFrequencyHz: 2.85,
      resonanceAmplification: 50,
      levelErrorMm: 6.6,
      weightMarginPct: 10,
      perPoint: [{ label: 'A', partNumber: 'IS-100', loadN: 2224.11080763025, utilization: 0.8, staticDeflectionMm: 25.4 }],
      isolation: [],
      modes: [],
      reasons: [
        `Static deflection at point A (${measure('deflection', 0.0254)}) exceeds the ${measure('deflection', 0.02)} the mount IS-100 allows.`,
      ],
    };
    return {
      ...design('released'),
      input: {
        components: [{ name: 'Machine', massKg: 453.59237, cg: { x: 0.254, y: 0, z: 0.508 } }],
        mountPoints: [{ label: 'A', x: 0.762, y: 0.254, z: 0 }],
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1, ambientTempC: 40, weightMarginPct: 10 },
      },
      chosen: candidate,
    } as unknown as Design;
  };

  it('follows a US customary reader: lb, in, lbf, °F, and the reasons in inches', async () => {
    const pdf = await designReportPdf(chosenDesign(), { disturbingFrequencies: [], releasedAt: null, compress: false, units: 'US' });
    const wanted = [
      'Machine: 1000 lb, centre of gravity (10, 0, 20) in',
      'A: x 30 in, y 10 in, z 0 in',
      'Ambient temperature 104 °F',
      'level error between points: 0.26 in',
      'load 500 lbf',
      'static deflection 1 in',
      'Static deflection at point A (1 in) exceeds the 0.79 in the mount IS-100 allows.',
    ];
    expect(wanted.filter((text) => !pdfHasText(pdf, text))).toEqual([]);
    expect(pdfHasText(pdf, ' mm')).toBe(false);
    expect(pdfHasText(pdf, ' kg')).toBe(false);
  }, 20000);

  it('follows a metric reader, and shows utilisation on the check’s basis (with the weight margin)', async () => {
    const pdf = await designReportPdf(chosenDesign(), { disturbingFrequencies: [], releasedAt: null, compress: false, units: 'SI' });
    const wanted = [
      'Machine: 453.6 kg, centre of gravity (0.254, 0, 0.508) m',
      'level error between points: 6.6 mm',
      'load 2224 N',
      'utilisation 88 % with the 10 % weight margin (80 % without)',
      'static deflection 25.4 mm',
      'Static deflection at point A (25.4 mm) exceeds the 20 mm the mount IS-100 allows.',
      'the upper limit with the 10 % weight margin on the load',
    ];
    expect(wanted.filter((text) => !pdfHasText(pdf, text))).toEqual([]);
    expect(utilizationText(0.8, 0)).toBe('80 %');
  }, 20000);
});

describe('modeMotionText', () => {
  const fractions = { surge: 0, sway: 0.05, bounce: 0, roll: 0.4, pitch: 0, yaw: 0.55 };
  it('names a mixed mode by the coordinates that carry it, with their shares (docs/engineering/rigid-body-modes.md §6)', () => {
    expect(modeMotionText({ dominant: 'yaw', coupled: true, energyFractions: fractions })).toBe('yaw + roll (mixed): yaw 55 %, roll 40 %');
    expect(
      modeMotionText({ dominant: 'bounce', coupled: false, energyFractions: { ...fractions, sway: 0, roll: 0, yaw: 0, bounce: 1 } }),
    ).toBe('bounce');
  });

  it('never writes 90 % for the largest share of a mixed mode', () => {
    expect(
      modeMotionText({
        dominant: 'pitch',
        coupled: true,
        energyFractions: { ...fractions, sway: 0, roll: 0, yaw: 0, pitch: 0.8962, surge: 0.1038 },
      }),
    ).toBe('pitch + surge (mixed): pitch 89.6 %, surge 10 %');
  });

  it('falls back to the dominant coordinate for a candidate stored without the shares', () => {
    expect(modeMotionText({ dominant: 'pitch', coupled: true })).toBe('mostly pitch (coupled)');
  });
});
