import {
  createLevellingWorkspace,
  isolationDb,
  isolationEfficiencyPct,
  isVibrationInputError,
  naturalFrequencyHz,
  rigidBodyModes,
  selectSizesForLevellingInto,
  transmissibilityBatch,
  type ResilientMount,
} from '@tacet/vibration';
import type { MountType } from '../catalog/mount-rules.js';
import { BestCandidates } from './best-candidates.js';
import { scoreCandidate, PREFERRED_UTILIZATION, type ScoreInputs } from './scoring.js';
import { formatHz, formatMm, formatNumber, formatPct, formatPctValue } from './selection-format.js';
import type { SelectionProblem } from './selection-problem.js';
import type { Candidate, CandidateMode, CandidatePoint, ScoreTerms } from './selection.types.js';

/** A catalog mount with the fields the selection uses (numbers may arrive as strings from some drivers). */
export interface CatalogRow {
  id: number;
  supplierId: number;
  partNumber: string;
  series: string | null;
  mountType: string;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  horizontalStiffnessNPerM: number | null;
  dynamicStiffnessRatio: number;
  dampingRatio: number | null;
  lossFactor: number | null;
  maxDeflectionMm: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  unitPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
}

/**
 * The columns the prefilter reads per mount, in this order (rows arrive as arrays: no object
 * per row). Only what ranking needs: the other fields of a mount (DETAIL_COLUMNS) are read
 * afterwards, for the few candidates whose modes are computed or that are shown.
 */
export const CATALOG_COLUMNS = [
  'id',
  'supplierId',
  'series',
  'ratedLoadN',
  'verticalStiffnessNPerM',
  'dynamicStiffnessRatio',
  'dampingRatio',
  'lossFactor',
  'maxDeflectionMm',
  'unitPrice',
  'currency',
  'leadTimeDays',
] as const satisfies readonly (keyof CatalogRow)[];

/**
 * Fields read for a few mounts only; a tuple may carry them after CATALOG_COLUMNS (a choice
 * evaluated outside the prefilter does, so that its temperature and type are checked).
 */
export const DETAIL_COLUMNS = [
  'partNumber',
  'mountType',
  'horizontalStiffnessNPerM',
  'tempMinC',
  'tempMaxC',
] as const satisfies readonly (keyof CatalogRow)[];

/** The detail fields of one mount. */
export type MountDetails = Pick<CatalogRow, (typeof DETAIL_COLUMNS)[number]>;

/** Loads the details of mounts by id. */
export type DetailsLoader = (mountIds: number[]) => Promise<ReadonlyMap<number, MountDetails>>;

/** One mount as read: the CATALOG_COLUMNS values in order (+ DETAIL_COLUMNS, optionally). */
export type CatalogTuple = readonly unknown[];

/** Column positions (plain constants: the hot loop reads them per row). */
export const CATALOG_COLUMN_INDEX = {
  id: 0,
  supplierId: 1,
  series: 2,
  ratedLoadN: 3,
  verticalStiffnessNPerM: 4,
  dynamicStiffnessRatio: 5,
  dampingRatio: 6,
  lossFactor: 7,
  maxDeflectionMm: 8,
  unitPrice: 9,
  currency: 10,
  leadTimeDays: 11,
} as const satisfies { [K in (typeof CATALOG_COLUMNS)[number]]: number };
const COL = CATALOG_COLUMN_INDEX;
const DETAILS_AT = CATALOG_COLUMNS.length;

/** A catalog row object → the tuple the engine reads (tests, and drivers that return objects). */
export function toCatalogTuple(row: Partial<CatalogRow>, withDetails = false): unknown[] {
  const tuple: unknown[] = CATALOG_COLUMNS.map((name) => row[name] ?? null);
  if (withDetails) for (const name of DETAIL_COLUMNS) tuple.push(row[name] ?? null);
  return tuple;
}

/** Why a candidate fails (bit set). */
const FAIL = {
  cgOutside: 1,
  isolation: 2,
  utilization: 4,
  deflection: 8,
  temperature: 16,
  modes: 32,
  type: 64,
  supplier: 128,
} as const;

/** A rigid-body mode this close to a disturbing frequency fails the candidate (common practice: ±20 %). */
export const MODE_SEPARATION = 0.2;

/** Rounds of mode checks for the best passing candidates: 2×limit first, doubling up to 8×limit. */
const MODE_CHECK_GROWTH = 2;
const MODE_CHECK_MAX_FACTOR = 8;

const num = (value: unknown): number => (value === null || value === undefined ? Number.NaN : Number(value));

interface ModeCheck {
  modes: CandidateMode[] | null;
  /** Reason when a mode is too close to a disturbing frequency (or a mechanism). */
  reason: string | null;
}

/**
 * Evaluates every candidate of one request over typed arrays (struct of arrays, sized once
 * per request; the per-candidate loops allocate nothing):
 *
 * - uniform candidates: one row at every point. With identical mounts the rigid-frame loads
 *   equal the equal-stiffness loads, so they are reused;
 * - series candidates: rows grouped by supplier + series; per point the size is picked with
 *   `selectSizesForLevellingInto` for a common deflection δ₀ = u*·mean(P_r/k) (u* = 0.8
 *   kept inside the utilisation window), then the loads are re-solved with those sizes. A
 *   series is kept only when its level error beats ΔF/k of its stiffest picked size alone.
 *
 * Transmissibility is computed for all candidates at once with `transmissibilityBatch`
 * (hysteretic for loss-factor rows, viscous for damping-ratio rows). The coupled rigid-body
 * modes are computed only for the best candidates, in `rank`.
 *
 * Candidate index c: rows 0..R−1 are uniform candidates, R..R+G−1 the series (group c − R).
 */
export class SelectionEvaluation {
  readonly rowCount: number;
  readonly groupCount: number;
  /**
   * Candidates evaluated and offered: every row, plus the series whose per-point sizes level the
   * skid better than one size would (the others duplicate a uniform candidate and are dropped).
   */
  readonly considered: number;

  // rows
  private readonly id: Int32Array;
  private readonly supplierId: Int32Array;
  private readonly rated: Float64Array;
  private readonly kv: Float64Array;
  private readonly kh: Float64Array;
  private readonly nd: Float64Array;
  private readonly rowDamping: Float64Array;
  private readonly rowHysteretic: Uint8Array;
  private readonly maxDeflectionM: Float64Array;
  private readonly tempMin: Float64Array;
  private readonly tempMax: Float64Array;
  private readonly unitPrice: Float64Array;
  private readonly leadDays: Float64Array;
  private readonly currencyIndex: Int32Array;
  private readonly rowFail: Uint8Array;
  private readonly series: (string | null)[];
  // details (DETAIL_COLUMNS), known for the rows in `hasDetails`
  private readonly hasDetails: Uint8Array;
  private readonly partNumber: string[];
  private readonly mountType: string[];
  private readonly currencies: string[] = [];

  // groups (series)
  private readonly groupKeys: string[] = [];
  private readonly groupByKey = new Map<string, number>();
  private readonly groupStart: Int32Array;
  /** Row index of each group position (groups back to back, rows by ascending id inside a group). */
  private readonly groupRows: Int32Array;
  private readonly seriesRow: Int32Array;
  private readonly seriesLoad: Float64Array;

  // candidates
  private readonly skip: Uint8Array;
  private readonly fail: Uint16Array;
  private readonly fnHz: Float64Array;
  private readonly damping: Float64Array;
  private readonly hysteretic: Uint8Array;
  private readonly transmissibility: Float64Array;
  private readonly resonance: Float64Array;
  private readonly meanUtilization: Float64Array;
  private readonly levelErrorM: Float64Array;
  private readonly meanDeflectionM: Float64Array;
  private readonly price: Float64Array;
  private readonly lead: Float64Array;
  private readonly candidateCurrency: Int32Array;
  private readonly minIsolationDb: Float64Array;
  private readonly score: Float64Array;
  private readonly tieKey: Float64Array;
  private readonly minPrice: Float64Array;
  private minLead = Number.NaN;

  private readonly modeChecks = new Map<number, ModeCheck>();
  private modesUnavailable: string | null = null;

  constructor(
    private readonly problem: SelectionProblem,
    rows: readonly CatalogTuple[],
    options: { everySeries?: boolean } = {},
  ) {
    const R = rows.length;
    const n = problem.pointCount;
    this.rowCount = R;
    this.id = new Int32Array(R);
    this.supplierId = new Int32Array(R);
    this.rated = new Float64Array(R);
    this.kv = new Float64Array(R);
    this.kh = new Float64Array(R);
    this.nd = new Float64Array(R);
    this.rowDamping = new Float64Array(R);
    this.rowHysteretic = new Uint8Array(R);
    this.maxDeflectionM = new Float64Array(R);
    this.tempMin = new Float64Array(R);
    this.tempMax = new Float64Array(R);
    this.unitPrice = new Float64Array(R);
    this.leadDays = new Float64Array(R);
    this.currencyIndex = new Int32Array(R);
    this.rowFail = new Uint8Array(R);
    this.series = new Array<string | null>(R);
    this.hasDetails = new Uint8Array(R);
    this.partNumber = new Array<string>(R);
    this.mountType = new Array<string>(R);
    this.kh.fill(Number.NaN);
    this.tempMin.fill(Number.NaN);
    this.tempMax.fill(Number.NaN);
    const groupOf = new Int32Array(R);
    this.loadRows(rows, groupOf);

    // Series: rows back to back per group, by ascending id inside a group (counting sort), so
    // that ties in the size pick do not depend on the order the database returned the rows.
    const G = this.groupKeys.length;
    this.groupCount = G;
    this.groupStart = new Int32Array(G + 1);
    for (let r = 0; r < R; r++) if (groupOf[r] >= 0) this.groupStart[groupOf[r] + 1]++;
    for (let g = 0; g < G; g++) this.groupStart[g + 1] += this.groupStart[g];
    const fill = this.groupStart.slice(0, G);
    this.groupRows = new Int32Array(this.groupStart[G]);
    for (let r = 0; r < R; r++) if (groupOf[r] >= 0) this.groupRows[fill[groupOf[r]]++] = r;
    for (let g = 0; g < G; g++) {
      // insertion sort by id inside the group (a series has a handful of sizes)
      for (let p = this.groupStart[g] + 1; p < this.groupStart[g + 1]; p++) {
        const r = this.groupRows[p];
        let q = p - 1;
        while (q >= this.groupStart[g] && this.id[this.groupRows[q]] > this.id[r]) {
          this.groupRows[q + 1] = this.groupRows[q];
          q--;
        }
        this.groupRows[q + 1] = r;
      }
    }
    const groupRated = new Float64Array(this.groupRows.length);
    const groupK = new Float64Array(this.groupRows.length);
    for (let p = 0; p < this.groupRows.length; p++) {
      groupRated[p] = this.rated[this.groupRows[p]];
      groupK[p] = this.kv[this.groupRows[p]];
    }

    const C = R + G;
    this.skip = new Uint8Array(C);
    this.fail = new Uint16Array(C);
    this.fnHz = new Float64Array(C);
    this.damping = new Float64Array(C);
    this.hysteretic = new Uint8Array(C);
    this.meanUtilization = new Float64Array(C);
    this.levelErrorM = new Float64Array(C);
    this.meanDeflectionM = new Float64Array(C);
    this.price = new Float64Array(C);
    this.lead = new Float64Array(C);
    this.candidateCurrency = new Int32Array(C);
    this.minIsolationDb = new Float64Array(C);
    this.score = new Float64Array(C);
    this.tieKey = new Float64Array(C);
    this.seriesRow = new Int32Array(G * n);
    this.seriesLoad = new Float64Array(G * n);

    this.evaluateUniform();

    const skipped = this.evaluateSeries(groupRated, groupK, options.everySeries === true);
    this.considered = C - skipped;

    // ---- transmissibility, resonance, isolation check -------------------------------------
    const nf = problem.frequenciesHz.length;
    this.transmissibility = new Float64Array(C * nf);
    transmissibilityBatch(this.fnHz, this.damping, this.hysteretic, problem.frequenciesHz, this.transmissibility);
    // Resonance amplification T(r = 1) through the same kernel: fn = 1 Hz evaluated at f = 1 Hz.
    this.resonance = new Float64Array(C);
    transmissibilityBatch(new Float64Array(C).fill(1), this.damping, this.hysteretic, [1], this.resonance);

    const target = problem.transmissibilityTarget;
    for (let c = 0; c < C; c++) {
      if (this.skip[c]) continue;
      let worst = 0;
      for (let j = 0; j < nf; j++) {
        const t = this.transmissibility[c * nf + j];
        if (t > worst) worst = t;
      }
      if (worst > target) this.fail[c] |= FAIL.isolation;
      this.minIsolationDb[c] = isolationDb(worst);
    }

    // Cheapest price (per currency) and shortest lead time among the candidates that pass the
    // checks so far (among all candidates where none passes): the references of the score.
    this.minPrice = new Float64Array(this.currencies.length).fill(Number.POSITIVE_INFINITY);
    const minPriceAny = new Float64Array(this.currencies.length).fill(Number.POSITIVE_INFINITY);
    let minLead = Number.POSITIVE_INFINITY;
    let minLeadAny = Number.POSITIVE_INFINITY;
    for (let c = 0; c < C; c++) {
      if (this.skip[c]) continue;
      const cur = this.candidateCurrency[c];
      const p = this.price[c];
      if (p >= 0 && p < minPriceAny[cur]) minPriceAny[cur] = p;
      if (this.lead[c] < minLeadAny) minLeadAny = this.lead[c];
      if (this.fail[c] !== 0) continue;
      if (p >= 0 && p < this.minPrice[cur]) this.minPrice[cur] = p;
      if (this.lead[c] < minLead) minLead = this.lead[c];
    }
    for (let k = 0; k < this.minPrice.length; k++) if (!Number.isFinite(this.minPrice[k])) this.minPrice[k] = minPriceAny[k];
    if (!Number.isFinite(minLead)) minLead = minLeadAny;
    this.minLead = Number.isFinite(minLead) ? minLead : Number.NaN;

    // ---- score ----------------------------------------------------------------------------
    const s = this.scratch;
    s.isolationDbTarget = problem.isolationDbTarget;
    s.minLeadTimeDays = this.minLead;
    for (let c = 0; c < C; c++) {
      if (this.skip[c]) continue;
      this.fillScoreInputs(c, s);
      this.score[c] = scoreCandidate(s);
    }
  }

  /** Copies the rows into the typed arrays and assigns each row to its series group. */
  private loadRows(rows: readonly CatalogTuple[], groupOf: Int32Array): void {
    const { criteria } = this.problem;
    const groupsBySupplier = new Map<number, Map<string, number>>();
    const currencyByCode = new Map<string, number>();
    const allowedSuppliers = criteria.supplierIds?.length ? new Set<number>(criteria.supplierIds) : null;
    const { id, supplierId, rated, kv, nd, rowDamping, rowHysteretic, maxDeflectionM } = this;
    const { unitPrice, leadDays, currencyIndex, rowFail, series: seriesOf } = this;
    let lastCode = '';
    let lastCurrency = -1;
    const R = rows.length;
    for (let r = 0; r < R; r++) {
      const row = rows[r];
      id[r] = Number(row[COL.id]);
      const supplier = Number(row[COL.supplierId]);
      supplierId[r] = supplier;
      rated[r] = Number(row[COL.ratedLoadN]);
      kv[r] = Number(row[COL.verticalStiffnessNPerM]);
      nd[r] = num(row[COL.dynamicStiffnessRatio]) || 1;
      const loss = num(row[COL.lossFactor]);
      const hysteretic = loss === loss; // not NaN
      rowHysteretic[r] = hysteretic ? 1 : 0;
      rowDamping[r] = hysteretic ? loss : num(row[COL.dampingRatio]) || 0;
      maxDeflectionM[r] = num(row[COL.maxDeflectionMm]) / 1000;
      unitPrice[r] = num(row[COL.unitPrice]);
      leadDays[r] = num(row[COL.leadTimeDays]);
      const code = (row[COL.currency] as string | null) ?? 'USD';
      if (code !== lastCode) {
        let index = currencyByCode.get(code);
        if (index === undefined) {
          index = this.currencies.length;
          currencyByCode.set(code, index);
          this.currencies.push(code);
        }
        lastCode = code;
        lastCurrency = index;
      }
      currencyIndex[r] = lastCurrency;
      rowFail[r] = allowedSuppliers && !allowedSuppliers.has(supplier) ? FAIL.supplier : 0;
      if (row.length > DETAILS_AT) this.setDetails(r, row);
      const series = row[COL.series] as string | null;
      seriesOf[r] = series;
      if (series === null || series === undefined || series === '') {
        groupOf[r] = -1;
        continue;
      }
      // supplier → series → group, without building a key string per row
      let bySeries = groupsBySupplier.get(supplier);
      if (bySeries === undefined) {
        bySeries = new Map<string, number>();
        groupsBySupplier.set(supplier, bySeries);
      }
      let g = bySeries.get(series);
      if (g === undefined) {
        g = this.groupKeys.length;
        const key = `${supplier}:${series}`;
        bySeries.set(series, g);
        this.groupByKey.set(key, g);
        this.groupKeys.push(key);
      }
      groupOf[r] = g;
    }
  }

  /**
   * Stores a row's details (DETAIL_COLUMNS values, in order, at `at`) and applies the checks
   * that need them (temperature, type). Rows from the SQL prefilter meet both already.
   */
  private setDetails(r: number, values: readonly unknown[], at: number = DETAILS_AT): void {
    const { criteria } = this.problem;
    this.partNumber[r] = String(values[at]);
    this.mountType[r] = String(values[at + 1]);
    this.kh[r] = num(values[at + 2]);
    this.tempMin[r] = num(values[at + 3]);
    this.tempMax[r] = num(values[at + 4]);
    this.hasDetails[r] = 1;
    const ambient = criteria.ambientTempC;
    if (ambient !== undefined && (ambient < this.tempMin[r] || ambient > this.tempMax[r])) this.rowFail[r] |= FAIL.temperature;
    if (criteria.mountTypes?.length && !criteria.mountTypes.includes(this.mountType[r] as MountType)) this.rowFail[r] |= FAIL.type;
  }

  /**
   * Makes sure the details of every mount used by these candidates are known (one read for the
   * missing ones). A failure found in them (temperature, type) fails the candidate.
   */
  async ensureDetails(candidates: readonly number[], load: DetailsLoader): Promise<void> {
    const missing = new Map<number, number[]>();
    for (const c of candidates) {
      for (let i = 0; i < this.problem.pointCount; i++) {
        const r = this.rowOf(c, i);
        if (this.hasDetails[r]) continue;
        const rowsOfId = missing.get(this.id[r]);
        if (rowsOfId) {
          if (!rowsOfId.includes(r)) rowsOfId.push(r);
        } else missing.set(this.id[r], [r]);
      }
    }
    if (missing.size === 0) return;
    const details = await load([...missing.keys()]);
    for (const [mountId, rows] of missing) {
      const found = details.get(mountId);
      if (!found) continue;
      const values = DETAIL_COLUMNS.map((name) => found[name]);
      for (const r of rows) this.setDetails(r, values, 0);
    }
    for (const c of candidates) {
      for (let i = 0; i < this.problem.pointCount; i++) this.fail[c] |= this.rowFail[this.rowOf(c, i)] & (FAIL.temperature | FAIL.type);
    }
  }

  /** One row at every point: the equal-stiffness loads hold (identical mounts). */
  private evaluateUniform(): void {
    const { problem } = this;
    const { minUtilization, maxUtilization } = problem.criteria;
    const n = problem.pointCount;
    const loads = problem.equalLoadsN;
    const margin = problem.marginFactor;
    const massKg = problem.massKg;
    const baseFail = problem.cgInside ? 0 : FAIL.cgOutside;
    const spread = problem.maxLoadN - problem.minLoadN;
    for (let r = 0; r < this.rowCount; r++) {
      const k = this.kv[r];
      const rated = this.rated[r];
      const maxDefl = this.maxDeflectionM[r];
      let fail = baseFail | this.rowFail[r];
      let sumU = 0;
      for (let i = 0; i < n; i++) {
        const u = loads[i] / rated;
        sumU += u;
        if (u * margin > maxUtilization || u < minUtilization) fail |= FAIL.utilization;
        if ((loads[i] / k) * margin > maxDefl) fail |= FAIL.deflection;
      }
      this.fail[r] = fail;
      this.meanUtilization[r] = sumU / n;
      this.levelErrorM[r] = spread / k;
      this.meanDeflectionM[r] = problem.weightN / (n * k);
      this.fnHz[r] = naturalFrequencyHz(this.nd[r] * n * k, massKg);
      this.damping[r] = this.rowDamping[r];
      this.hysteretic[r] = this.rowHysteretic[r];
      this.price[r] = this.unitPrice[r] * n;
      this.lead[r] = this.leadDays[r];
      this.candidateCurrency[r] = this.currencyIndex[r];
      this.tieKey[r] = this.id[r];
    }
  }

  /** Per series: sizes picked per point for a level skid; returns how many series were dropped. */
  private evaluateSeries(groupRated: Float64Array, groupK: Float64Array, everySeries: boolean): number {
    const { problem } = this;
    const { minUtilization, maxUtilization } = problem.criteria;
    const n = problem.pointCount;
    const loads = problem.equalLoadsN;
    const margin = problem.marginFactor;
    const massKg = problem.massKg;
    const baseFail = problem.cgInside ? 0 : FAIL.cgOutside;
    const spread = problem.maxLoadN - problem.minLoadN;
    const R = this.rowCount;
    const G = this.groupCount;
    const workspace = createLevellingWorkspace(problem.layout);
    const preferredU = Math.min(Math.max(PREFERRED_UTILIZATION, minUtilization), maxUtilization);
    let skipped = 0;
    for (let g = 0; g < G; g++) {
      const c = R + g;
      const from = this.groupStart[g];
      const to = this.groupStart[g + 1];
      this.fnHz[c] = 1; // placeholder for skipped entries (the kernels need fn > 0)
      if (to - from < 2 && !everySeries) {
        this.skip[c] = 1;
        skipped++;
        continue;
      }
      let sumDeflectionAtRated = 0;
      for (let p = from; p < to; p++) sumDeflectionAtRated += groupRated[p] / groupK[p];
      const target = (preferredU * sumDeflectionAtRated) / (to - from);
      selectSizesForLevellingInto(
        problem.layout,
        problem.weightN,
        problem.cg.x,
        problem.cg.y,
        loads,
        groupRated,
        groupK,
        from,
        to,
        target,
        workspace,
      );
      const first = this.groupRows[workspace.sizeIndex[0]];
      let allSame = true;
      let fail = baseFail;
      let sumU = 0;
      let sumKd = 0;
      let sumK = 0;
      let sumKDamping = 0;
      let sumDefl = 0;
      let price = 0;
      let lead = 0;
      const currency = this.currencyIndex[first];
      for (let i = 0; i < n; i++) {
        const r = this.groupRows[workspace.sizeIndex[i]];
        if (r !== first) allSame = false;
        const f = workspace.loadsN[i];
        this.seriesRow[g * n + i] = r;
        this.seriesLoad[g * n + i] = f;
        const u = f / this.rated[r];
        sumU += u;
        if (u * margin > maxUtilization || u < minUtilization) fail |= FAIL.utilization;
        const d = workspace.deflectionsM[i];
        sumDefl += d;
        if (d * margin > this.maxDeflectionM[r]) fail |= FAIL.deflection;
        fail |= this.rowFail[r];
        const k = this.kv[r];
        sumK += k;
        sumKd += this.nd[r] * k;
        sumKDamping += k * this.rowDamping[r];
        price += this.unitPrice[r];
        if (this.currencyIndex[r] !== currency) price = Number.NaN;
        lead = Math.max(lead, this.leadDays[r]); // NaN (unknown) stays NaN
      }
      // Offered only when picking sizes per point levels the skid better than one size of the
      // series everywhere would: with one size k at every point the level error is ΔF/k, least
      // for the stiffest size picked.
      let stiffest = 0;
      for (let i = 0; i < n; i++) stiffest = Math.max(stiffest, this.kv[this.groupRows[workspace.sizeIndex[i]]]);
      if ((allSame || workspace.levelErrorM >= spread / stiffest) && !everySeries) {
        this.skip[c] = 1;
        skipped++;
        continue;
      }
      this.fail[c] = fail;
      this.meanUtilization[c] = sumU / n;
      this.levelErrorM[c] = workspace.levelErrorM;
      this.meanDeflectionM[c] = sumDefl / n;
      this.fnHz[c] = naturalFrequencyHz(sumKd, massKg);
      // One series shares one damping figure in practice; sizes that differ are averaged by stiffness.
      this.damping[c] = sumKDamping / sumK;
      this.hysteretic[c] = this.rowHysteretic[first];
      this.price[c] = price;
      this.lead[c] = lead;
      this.candidateCurrency[c] = currency;
      this.tieKey[c] = 2 ** 31 + this.id[this.groupRows[from]];
    }
    return skipped;
  }

  private readonly scratch: ScoreInputs = {
    minIsolationDb: 0,
    isolationDbTarget: 1,
    meanUtilization: 0,
    levelErrorM: 0,
    meanDeflectionM: 0,
    price: 0,
    minPrice: 0,
    leadTimeDays: 0,
    minLeadTimeDays: 0,
  };

  private fillScoreInputs(c: number, s: ScoreInputs): void {
    s.minIsolationDb = this.minIsolationDb[c];
    s.meanUtilization = this.meanUtilization[c];
    s.levelErrorM = this.levelErrorM[c];
    s.meanDeflectionM = this.meanDeflectionM[c];
    s.price = this.price[c];
    const minPrice = this.minPrice[this.candidateCurrency[c]];
    s.minPrice = Number.isFinite(minPrice) ? minPrice : Number.NaN;
    s.leadTimeDays = this.lead[c];
  }

  /** a ranks above b: higher score, then lower resonance amplification, then a stable key. */
  private readonly better = (a: number, b: number): boolean => {
    const sa = this.score[a];
    const sb = this.score[b];
    if (sa !== sb) return sa > sb;
    const ra = this.resonance[a];
    const rb = this.resonance[b];
    if (ra !== rb) return ra < rb;
    return this.tieKey[a] < this.tieKey[b];
  };

  /**
   * Best `limit` passing candidates (after the rigid-body mode check, done for the best 2×limit
   * passing ones and more if needed), then the best `limit` failing ones. Details of the mounts
   * concerned are loaded on the way.
   */
  async rank(limit: number, loadDetails: DetailsLoader): Promise<number[]> {
    const C = this.rowCount + this.groupCount;
    let capacity = Math.max(1, MODE_CHECK_GROWTH * limit);
    let passing: number[];
    for (;;) {
      const best = new BestCandidates(capacity, this.better);
      let passingTotal = 0;
      for (let c = 0; c < C; c++) {
        if (this.skip[c] || this.fail[c] !== 0) continue;
        passingTotal++;
        best.offer(c);
      }
      const top = best.sorted();
      await this.ensureDetails(top, loadDetails);
      for (const c of top) if (this.fail[c] === 0) this.checkModes(c);
      passing = top.filter((c) => this.fail[c] === 0);
      if (passing.length >= limit || passingTotal <= capacity || capacity >= MODE_CHECK_MAX_FACTOR * limit) break;
      capacity *= 2;
    }
    const failing = new BestCandidates(limit, this.better);
    for (let c = 0; c < C; c++) if (!this.skip[c] && this.fail[c] !== 0) failing.offer(c);
    const ranked = [...passing.slice(0, limit), ...failing.sorted()];
    await this.ensureDetails(ranked, loadDetails);
    return ranked;
  }

  /** The uniform candidate of a mount, or −1 when the mount was not among the rows. */
  findUniform(mountId: number): number {
    for (let r = 0; r < this.rowCount; r++) if (this.id[r] === mountId) return r;
    return -1;
  }

  /** The series candidate `${supplierId}:${series}`, or −1 when it was not evaluated. */
  findSeries(seriesId: string): number {
    const g = this.groupByKey.get(seriesId);
    return g === undefined || this.skip[this.rowCount + g] ? -1 : this.rowCount + g;
  }

  /** Supplier of a candidate. */
  supplierOf(c: number): number {
    return this.supplierId[this.rowOf(c, 0)];
  }

  /** Mount ids used by a candidate (point order). */
  mountIdsOf(c: number): number[] {
    return Array.from({ length: this.problem.pointCount }, (_, i) => this.id[this.rowOf(c, i)]);
  }

  private rowOf(c: number, point: number): number {
    return c < this.rowCount ? c : this.seriesRow[(c - this.rowCount) * this.problem.pointCount + point];
  }

  private loadOf(c: number, point: number): number {
    return c < this.rowCount ? this.problem.equalLoadsN[point] : this.seriesLoad[(c - this.rowCount) * this.problem.pointCount + point];
  }

  /**
   * The six coupled rigid-body modes (rigidBodyModes) with the mounts' dynamic stiffnesses; a
   * mode within ±MODE_SEPARATION of a disturbing frequency fails the candidate.
   */
  checkModes(c: number): ModeCheck {
    const known = this.modeChecks.get(c);
    if (known) return known;
    const { problem } = this;
    let check: ModeCheck = { modes: null, reason: null };
    if (this.modesUnavailable === null) {
      const mounts: ResilientMount[] = problem.points.map((p, i) => {
        const r = this.rowOf(c, i);
        const vertical = this.kv[r] * this.nd[r];
        const horizontal = (Number.isNaN(this.kh[r]) ? this.kv[r] : this.kh[r]) * this.nd[r];
        return { position: { x: p.x, y: p.y, z: p.z }, stiffness: { x: horizontal, y: horizontal, z: vertical } };
      });
      try {
        const result = rigidBodyModes({ massKg: problem.massKg, inertia: problem.inertia, cg: problem.cg, mounts });
        const modes = result.modes.map((m) => ({ frequencyHz: m.frequencyHz, dominant: m.dominant, coupled: m.coupled }));
        check = { modes, reason: this.modeConflict(result.modes) };
      } catch (error) {
        if (!isVibrationInputError(error)) throw error;
        this.modesUnavailable =
          'Rigid-body modes not computed: the inertia of the machine is unknown or degenerate (give the components box dimensions or their inertia).';
      }
    }
    if (check.reason) this.fail[c] |= FAIL.modes;
    this.modeChecks.set(c, check);
    return check;
  }

  private modeConflict(modes: ReturnType<typeof rigidBodyModes>['modes']): string | null {
    const { frequenciesHz, frequencyLabels } = this.problem;
    if (modes.some((m) => m.status !== 'ok')) {
      return 'The mounts leave the machine free to move in one direction (a rigid-body mode has no stiffness).';
    }
    let hit: { mode: number; j: number } | null = null;
    for (let j = 0; j < frequenciesHz.length; j++) {
      for (let k = 0; k < modes.length; k++) {
        const fd = frequenciesHz[j];
        if (Math.abs(modes[k].frequencyHz - fd) <= MODE_SEPARATION * fd) {
          if (!hit || fd < frequenciesHz[hit.j]) hit = { mode: k, j };
        }
      }
    }
    if (!hit) return null;
    const mode = modes[hit.mode];
    const fd = frequenciesHz[hit.j];
    return (
      `The ${mode.coupled ? 'coupled ' : ''}${mode.dominant} mode at ${formatHz(mode.frequencyHz)} lies within ` +
      `±${Math.round(MODE_SEPARATION * 100)} % of the disturbing frequency ${formatHz(fd)}${labelSuffix(frequencyLabels[hit.j])}: ` +
      'the machine would rock or sway strongly there.'
    );
  }

  /** The candidate as the API shows it. */
  describe(c: number, supplierNames: ReadonlyMap<number, string>): Candidate {
    const { problem } = this;
    const nf = problem.frequenciesHz.length;
    const uniform = c < this.rowCount;
    const first = this.rowOf(c, 0);
    const supplierId = this.supplierId[first];
    const perPoint: CandidatePoint[] = problem.points.map((p, i) => {
      const r = this.rowOf(c, i);
      const loadN = this.loadOf(c, i);
      return {
        label: p.label,
        mountId: this.id[r],
        partNumber: this.partNumberOf(r),
        loadN,
        utilization: loadN / this.rated[r],
        staticDeflectionMm: (loadN / this.kv[r]) * 1000,
      };
    });
    const isolation = Array.from({ length: nf }, (_, j) => {
      const t = this.transmissibility[c * nf + j];
      return {
        frequencyHz: problem.frequenciesHz[j],
        transmissibility: t,
        efficiencyPct: isolationEfficiencyPct(t),
        dB: isolationDb(t),
      };
    });
    const terms: ScoreTerms = { isolation: 0, utilization: 0, level: 0, price: 0, leadTime: 0 };
    const s = { ...this.scratch };
    this.fillScoreInputs(c, s);
    const score = scoreCandidate(s, terms);
    const modeCheck = this.modeChecks.get(c);
    const price = this.price[c];
    const lead = this.lead[c];
    const candidate: Candidate = {
      kind: uniform ? 'uniform' : 'series',
      ...(uniform ? { mountId: this.id[c] } : { seriesId: this.groupKeys[c - this.rowCount] }),
      label: uniform ? this.partNumberOf(c) : this.seriesLabel(c),
      supplier: { id: supplierId, name: supplierNames.get(supplierId) ?? `Supplier ${supplierId}` },
      perPoint,
      verticalNaturalFrequencyHz: this.fnHz[c],
      isolation,
      resonanceAmplification: this.resonance[c],
      levelErrorMm: this.levelErrorM[c] * 1000,
      totalPrice: Number.isFinite(price) ? price : null,
      currency: this.currencies[this.candidateCurrency[c]] ?? 'USD',
      maxLeadTimeDays: Number.isFinite(lead) ? lead : null,
      ...(modeCheck?.modes ? { modes: modeCheck.modes } : {}),
      passes: this.fail[c] === 0,
      reasons: this.reasons(c, perPoint, supplierNames),
      notes: this.notes(c),
      score,
      scoreTerms: terms,
    };
    return candidate;
  }

  private partNumberOf(r: number): string {
    return this.partNumber[r] ?? `#${this.id[r]}`;
  }

  private seriesLabel(c: number): string {
    const counts = new Map<string, number>();
    for (let i = 0; i < this.problem.pointCount; i++) {
      const part = this.partNumberOf(this.rowOf(c, i));
      counts.set(part, (counts.get(part) ?? 0) + 1);
    }
    const series = this.series[this.rowOf(c, 0)];
    return `Series ${series}: ${[...counts].map(([part, count]) => `${part} ×${count}`).join(', ')}`;
  }

  private reasons(c: number, perPoint: CandidatePoint[], supplierNames: ReadonlyMap<number, string>): string[] {
    const { problem } = this;
    const { criteria } = problem;
    const fail = this.fail[c];
    const reasons: string[] = [];
    const marginNote = problem.marginFactor > 1 ? ` with the ${formatNumber((problem.marginFactor - 1) * 100, 1)} % weight margin` : '';
    if (fail & FAIL.cgOutside) {
      reasons.push(
        `The centre of gravity (x ${formatNumber(problem.cg.x, 3)} m, y ${formatNumber(problem.cg.y, 3)} m) lies outside ` +
          'the polygon of the mount points: the machine would tip. Move the mount points or the equipment.',
      );
    }
    if (fail & FAIL.isolation) {
      const nf = problem.frequenciesHz.length;
      let worst = -1;
      for (let j = 0; j < nf; j++) {
        if (this.transmissibility[c * nf + j] > problem.transmissibilityTarget) {
          if (worst < 0 || problem.frequenciesHz[j] < problem.frequenciesHz[worst]) worst = j;
        }
      }
      const fd = problem.frequenciesHz[worst];
      const t = this.transmissibility[c * nf + worst];
      const fn = this.fnHz[c];
      const at = `${formatHz(fd)}${labelSuffix(problem.frequencyLabels[worst])}`;
      reasons.push(
        fd < Math.SQRT2 * fn
          ? `At ${at} the mounts amplify the vibration instead of isolating it (transmissibility ${formatNumber(t, 2)}): ` +
              `${formatHz(fd)} is below √2 × the natural frequency ${formatHz(fn)}. Softer mounts are needed.`
          : `Isolation at ${at} is ${formatPctValue(isolationEfficiencyPct(t))}, below the ${formatNumber(criteria.minIsolationPct, 1)} % ` +
              `target (natural frequency ${formatHz(fn)}). Softer mounts are needed.`,
      );
    }
    if (fail & FAIL.utilization) {
      const lifting = perPoint.filter((p) => p.loadN < 0);
      for (const p of lifting) {
        reasons.push(`Point ${p.label} would lift off (it would need to pull ${formatNumber(-p.loadN, 0)} N).`);
      }
      const over = (p: CandidatePoint) => p.utilization * problem.marginFactor > criteria.maxUtilization;
      const outside = perPoint.filter((p) => p.loadN >= 0 && (over(p) || p.utilization < criteria.minUtilization));
      if (outside.length > 0) {
        const shown = (p: CandidatePoint) => formatPct(over(p) ? p.utilization * problem.marginFactor : p.utilization);
        reasons.push(
          `Load outside the allowed ${formatPct(criteria.minUtilization)}–${formatPct(criteria.maxUtilization)} of the rated ` +
            `load${marginNote} at ${outside.map((p) => `point ${p.label} (${shown(p)})`).join(', ')}.`,
        );
      }
    }
    if (fail & FAIL.deflection) {
      perPoint.forEach((p, i) => {
        const r = this.rowOf(c, i);
        const maxMm = this.maxDeflectionM[r] * 1000;
        if (p.staticDeflectionMm * problem.marginFactor > maxMm) {
          reasons.push(
            `Static deflection at point ${p.label} (${formatMm(p.staticDeflectionMm * problem.marginFactor)}${marginNote}) exceeds ` +
              `the ${formatMm(maxMm)} the mount ${p.partNumber} allows.`,
          );
        }
      });
    }
    const rowsUsed = [...new Set(perPoint.map((_, i) => this.rowOf(c, i)))];
    if (fail & FAIL.temperature) {
      for (const r of rowsUsed) {
        if (this.rowFail[r] & FAIL.temperature) {
          reasons.push(
            `The ambient temperature ${formatNumber(criteria.ambientTempC ?? 0, 1)} °C is outside the range of ${this.partNumberOf(r)} ` +
              `(${rangeText(this.tempMin[r], this.tempMax[r])}).`,
          );
        }
      }
    }
    if (fail & FAIL.modes) {
      const reason = this.modeChecks.get(c)?.reason;
      if (reason) reasons.push(reason);
    }
    if (fail & FAIL.type) {
      const types = [...new Set(rowsUsed.filter((r) => this.rowFail[r] & FAIL.type).map((r) => this.mountType[r]))];
      reasons.push(`Mount type ${types.join(', ')} is not among the allowed types.`);
    }
    if (fail & FAIL.supplier) {
      reasons.push(`${supplierNames.get(this.supplierOf(c)) ?? 'This supplier'} is not among the allowed suppliers.`);
    }
    return reasons;
  }

  private notes(c: number): string[] {
    const notes: string[] = [];
    const check = this.modeChecks.get(c);
    const rows = new Set(Array.from({ length: this.problem.pointCount }, (_, i) => this.rowOf(c, i)));
    if (check?.modes && [...rows].some((r) => this.hasDetails[r] && Number.isNaN(this.kh[r]))) {
      notes.push('The catalog gives no horizontal stiffness: the rigid-body modes take it equal to the vertical stiffness.');
    }
    if (check && !check.modes && this.modesUnavailable) notes.push(this.modesUnavailable);
    if (this.problem.criteria.ambientTempC !== undefined) {
      for (const r of rows) {
        if (this.hasDetails[r] && Number.isNaN(this.tempMin[r]) && Number.isNaN(this.tempMax[r])) {
          notes.push(`${this.partNumberOf(r)}: the supplier states no temperature range.`);
        }
      }
    }
    if (c >= this.rowCount && this.levelErrorM[c] > 0) {
      notes.push(
        `Sizes picked per point for a level skid; the remaining level error of ${formatMm(this.levelErrorM[c] * 1000)} is trimmed with shims or levelling bolts.`,
      );
    }
    return notes;
  }
}

function labelSuffix(label: string | undefined): string {
  return label ? ` (${label})` : '';
}

function rangeText(min: number, max: number): string {
  const lo = Number.isNaN(min) ? 'no lower limit' : `${formatNumber(min, 1)} °C`;
  const hi = Number.isNaN(max) ? 'no upper limit' : `${formatNumber(max, 1)} °C`;
  return `${lo} to ${hi}`;
}
