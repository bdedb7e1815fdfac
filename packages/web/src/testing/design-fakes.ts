import { isolationDb, isolationEfficiencyPct, transmissibilityAt, viscousDamping } from '@tacet/vibration';

import { designFormSchema, type DesignFormValues } from '@/features/designs/schemas/design-form';
import type { Units } from '@/lib/units';
import type { Candidate, Design, DesignInput, DesignListItem, Project, SelectionResult, UpdateDesignInput } from '@/types/design-api';

import { TEST_USERS } from './factories';
import type { FakeApi } from './fake-api';

/**
 * Invented projects, designs and selection results for the web tests, and an in-memory
 * stand-in for the server's projects/designs/selection routes.
 */

/**
 * The pump skid of check value docs/engineering/check-values.md CV-14: pump 300 kg, motor 450 kg,
 * frame 250 kg → 1000 kg, CG (0.0600, 0.0150, 0.3775) m; four mounts at (±0.8, ±0.45, 0) as in
 * CV-15; a 1480 rpm pump with 6 vanes on a 50 Hz supply as in CV-13.
 */
export function demoInput(): DesignInput {
  return {
    components: [
      { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
      { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
      { name: 'Frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 }, box: { lx: 2, ly: 1, lz: 0.2 } },
    ],
    mountPoints: [
      { label: 'A', x: 0.8, y: 0.45, z: 0 },
      { label: 'B', x: 0.8, y: -0.45, z: 0 },
      { label: 'C', x: -0.8, y: 0.45, z: 0 },
      { label: 'D', x: -0.8, y: -0.45, z: 0 },
    ],
    operating: { speedRpm: 1480, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50 },
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1, ambientTempC: 25 },
  };
}

export const DEMO_FREQUENCIES_HZ = [1480 / 60, (2 * 1480) / 60, 100, (6 * 1480) / 60];

let nextId = 500;

export function makeProject(overrides: Partial<Project> = {}): Project {
  const id = overrides.id ?? nextId++;
  return {
    id,
    name: `Project ${id}`,
    site: 'Riverside plant room',
    client: 'Harbour Estates',
    description: 'Chilled water pumps on inertia bases.',
    owner: { id: TEST_USERS.engineer.id, name: TEST_USERS.engineer.name },
    archived: false,
    designCount: 0,
    statusCounts: { draft: 0, in_review: 0, released: 0, superseded: 0 },
    createdAt: '2025-01-06T09:00:00.000Z',
    updatedAt: '2025-01-08T15:30:00.000Z',
    ...overrides,
  };
}

export function makeDesign(overrides: Partial<Design> = {}): Design {
  const id = overrides.id ?? nextId++;
  return {
    id,
    projectId: 1,
    projectName: 'Harbour Chiller Hall',
    name: `Pump skid ${id}`,
    revision: 1,
    status: 'draft',
    version: 3,
    input: demoInput(),
    disturbingFrequencies: [],
    chosen: null,
    bom: [],
    lastSelection: null,
    author: { id: TEST_USERS.engineer.id, name: TEST_USERS.engineer.name },
    checker: null,
    createdAt: '2025-01-06T09:00:00.000Z',
    updatedAt: '2025-01-08T15:30:00.000Z',
    ...overrides,
  };
}

export function listItemOf(design: Design): DesignListItem {
  const { id, name, revision, status, updatedAt, author } = design;
  return { id, name, revision, status, updatedAt, author };
}

/** CV-15 loads on the four equal mounts [N] (A..D = (+,+), (+,−), (−,+), (−,−)). */
const CV15_LOADS = [2717.3, 2553.8, 2349.5, 2186.1];

interface CandidateSpec {
  kind: 'uniform' | 'series';
  id: number | string;
  label: string;
  supplier: { id: number; name: string };
  fnHz: number;
  ratedLoadN: number | number[];
  passes: boolean;
  reasons?: string[];
  notes?: string[];
  price?: number | null;
  leadTimeDays?: number | null;
  partNumbers?: string[];
  withModes?: boolean;
  weightMarginPct?: number;
}

type Shares = NonNullable<NonNullable<Candidate['modes']>[number]['energyFractions']>;
const shares = (given: Partial<Shares>): Shares => ({ surge: 0, sway: 0, bounce: 0, roll: 0, pitch: 0, yaw: 0, ...given });

/** A candidate whose isolation figures follow from its fn (ζ = 0.05) with the library. */
export function makeCandidate(spec: CandidateSpec): Candidate {
  const damping = viscousDamping(0.05);
  const rated = Array.isArray(spec.ratedLoadN) ? spec.ratedLoadN : CV15_LOADS.map(() => spec.ratedLoadN as number);
  const mountIds = typeof spec.id === 'number' ? CV15_LOADS.map(() => spec.id as number) : CV15_LOADS.map((_, i) => 900 + i);
  return {
    kind: spec.kind,
    ...(spec.kind === 'uniform' ? { mountId: spec.id as number } : { seriesId: spec.id as string }),
    label: spec.label,
    supplier: spec.supplier,
    perPoint: ['A', 'B', 'C', 'D'].map((label, i) => ({
      label,
      mountId: mountIds[i]!,
      partNumber: spec.partNumbers?.[i] ?? `${spec.label.split(' ')[0]}`,
      loadN: CV15_LOADS[i]!,
      utilization: CV15_LOADS[i]! / rated[i]!,
      staticDeflectionMm: 25 * (CV15_LOADS[i]! / CV15_LOADS[0]!),
    })),
    verticalNaturalFrequencyHz: spec.fnHz,
    isolation: DEMO_FREQUENCIES_HZ.map((f) => {
      const t = transmissibilityAt(f, spec.fnHz, damping);
      return { frequencyHz: f, transmissibility: t, efficiencyPct: isolationEfficiencyPct(t), dB: isolationDb(t) };
    }),
    resonanceAmplification: 10.05,
    levelErrorMm: spec.kind === 'series' ? 0.4 : 2.66,
    totalPrice: spec.price === undefined ? 4 * 85 : spec.price,
    currency: 'USD',
    maxLeadTimeDays: spec.leadTimeDays === undefined ? 21 : spec.leadTimeDays,
    weightMarginPct: spec.weightMarginPct ?? 0,
    modes: spec.withModes
      ? [
          { frequencyHz: 2.1, dominant: 'sway', coupled: true, energyFractions: shares({ sway: 0.7, roll: 0.3 }) },
          { frequencyHz: 2.4, dominant: 'surge', coupled: true, energyFractions: shares({ surge: 0.8, pitch: 0.2 }) },
          // two modes a dominant-only name would both call yaw: mixed roll and yaw
          { frequencyHz: 2.9, dominant: 'yaw', coupled: true, energyFractions: shares({ yaw: 0.55, roll: 0.4, sway: 0.05 }) },
          { frequencyHz: spec.fnHz, dominant: 'bounce', coupled: false, energyFractions: shares({ bounce: 1 }) },
          { frequencyHz: 4.2, dominant: 'yaw', coupled: true, energyFractions: shares({ yaw: 0.5, roll: 0.45, sway: 0.05 }) },
          { frequencyHz: 5.3, dominant: 'pitch', coupled: false, energyFractions: shares({ pitch: 0.92, surge: 0.08 }) },
        ]
      : undefined,
    passes: spec.passes,
    reasons: spec.reasons ?? [],
    notes: spec.notes ?? [],
    score: spec.passes ? 0.8 : 0.2,
    scoreTerms: { isolation: 0.4, utilization: 0.2, level: 0.1, price: 0.05, leadTime: 0.05 },
  };
}

export const QUELLBROOK = { id: 2, name: 'Quellbrook Mounts' };
export const STILLMOOR = { id: 3, name: 'Stillmoor Isolation' };

/** Three candidates: a passing uniform one, a passing series, a failing one with reasons. */
export function demoCandidates(): Candidate[] {
  return [
    makeCandidate({
      kind: 'uniform',
      id: 11,
      label: 'QB-HS-300 housed spring',
      supplier: QUELLBROOK,
      fnHz: 3.15,
      ratedLoadN: 3200,
      passes: true,
      notes: ['Level error 2.7 mm: shim the low corner'],
      withModes: true,
      price: 4 * 92,
    }),
    makeCandidate({
      kind: 'series',
      id: '3:SM-LV',
      label: 'SM-LV series, sized per point',
      supplier: STILLMOOR,
      fnHz: 3.6,
      ratedLoadN: [3000, 3000, 2800, 2800],
      passes: true,
      partNumbers: ['SM-LV-300', 'SM-LV-300', 'SM-LV-280', 'SM-LV-280'],
      price: 4 * 70,
      leadTimeDays: 35,
    }),
    makeCandidate({
      kind: 'uniform',
      id: 12,
      label: 'QB-EP-40 elastomer pad',
      supplier: QUELLBROOK,
      fnHz: 12.5,
      ratedLoadN: 2400,
      passes: false,
      reasons: ['Isolation 57.8 % at 24.67 Hz is below the 90 % asked for', 'Utilisation 1.13 at point A exceeds 1.00'],
      price: 4 * 12,
      leadTimeDays: 7,
    }),
  ];
}

export function selectionResultFor(input: DesignInput, candidates = demoCandidates()): SelectionResult {
  return {
    candidates,
    considered: 412,
    elapsedMs: 18.4,
    totalMassKg: input.components.reduce((sum, c) => sum + c.massKg, 0),
    cg: { x: 0.06, y: 0.015, z: 0.3775 },
    pointLoadsN: CV15_LOADS,
    disturbingFrequenciesHz: DEMO_FREQUENCIES_HZ,
  };
}

export interface DesignServer {
  fake: FakeApi;
  design: Design;
}

/**
 * Answers the design routes like the server: GET and PUT (optimistic locking by version;
 * drafts only), the selection from the saved input, the catalog mounts' damping, suppliers.
 */
export function serveDesign(fake: FakeApi, initial: Design, candidates = demoCandidates()): DesignServer {
  const state: DesignServer = { fake, design: structuredClone(initial) };
  fake
    .on('get', '/designs/:id', ({ params }) =>
      Number(params.id) === state.design.id
        ? { status: 200, data: state.design }
        : { status: 404, data: { statusCode: 404, message: 'Design not found' } },
    )
    .on('put', '/designs/:id', ({ body }) => {
      const update = body as UpdateDesignInput;
      if (state.design.status !== 'draft') {
        return { status: 409, data: { statusCode: 409, message: 'Released designs are frozen; start a new revision' } };
      }
      if (update.version !== state.design.version) {
        return { status: 409, data: { statusCode: 409, message: 'This design was changed by someone else; reload it' } };
      }
      const next: Design = { ...state.design, version: state.design.version + 1, updatedAt: '2025-01-09T10:00:00.000Z' };
      if (update.name) next.name = update.name;
      // like the server: a changed input clears the choice and ends the kept selection
      if (update.input && JSON.stringify(update.input) !== JSON.stringify(state.design.input)) {
        next.input = update.input;
        next.chosen = null;
        next.lastSelection = null;
      }
      if (update.chosenMountId !== undefined || update.chosenSeriesId !== undefined) {
        next.chosen =
          candidates.find((c) =>
            update.chosenSeriesId !== undefined ? c.seriesId === update.chosenSeriesId : c.mountId === update.chosenMountId,
          ) ?? null;
      }
      state.design = next;
      return { status: 200, data: next };
    })
    .on('post', '/designs/:id/selection', ({ body }) => {
      const result = selectionResultFor(state.design.input, candidates);
      const limit = (body as { limit?: number } | undefined)?.limit ?? 20;
      state.design = {
        ...state.design,
        lastSelection: {
          ranAt: '2025-01-09T11:00:00.000Z',
          ranBy: { id: TEST_USERS.engineer.id, name: TEST_USERS.engineer.name },
          limit,
          catalogChanged: false,
          result,
        },
      };
      return { status: 200, data: result };
    })
    .on('get', '/mounts/:id', ({ params }) => ({
      status: 200,
      data: { id: Number(params.id), partNumber: `P-${params.id}`, dampingModel: 'viscous', dampingRatio: 0.05, lossFactor: null },
    }))
    .on('get', '/suppliers', {
      status: 200,
      data: [
        { ...QUELLBROOK, active: true },
        { ...STILLMOOR, active: true },
      ],
    });
  return state;
}

/** The design form's problems per field path (the first message of each), as the form shows them; {} when valid. */
export function designFormErrors(values: DesignFormValues, units: Units): Record<string, string> {
  try {
    designFormSchema(units).validateSync(values, { abortEarly: false });
    return {};
  } catch (error) {
    const out: Record<string, string> = {};
    for (const inner of (error as { inner: { path: string; message: string }[] }).inner) out[inner.path] ??= inner.message;
    return out;
  }
}
