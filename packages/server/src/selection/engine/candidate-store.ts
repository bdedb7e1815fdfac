/**
 * Candidate storage: the catalog rows of one request and every candidate built from them, as
 * typed arrays (struct of arrays, sized once per request, so the evaluation loops allocate
 * nothing and read plain numbers). It owns the layout and the lookups; it computes nothing.
 *
 * - rows r = 0..R−1: one catalog mount each (CATALOG_COLUMNS, plus DETAIL_COLUMNS once loaded);
 * - series groups g = 0..G−1: the rows of one supplier + series, back to back in `groupRows`
 *   (by ascending id inside a group);
 * - candidates c = 0..R+G−1: c < R is the uniform candidate of row c (that mount at every point),
 *   c ≥ R the series candidate of group c − R (a size per point, in `seriesRow`/`seriesLoad`).
 *
 * The evaluation files fill the candidate arrays; `pointsOf` is the one small view of a
 * candidate's mounts for the code that runs on a few candidates only (finalist checks, wording).
 */
import { ASSUMED, unfavourableDynamicRatio } from './assumptions.js';
import { allowedSuppliersOf, DETAIL_FAILS, detailChecks, rowChecks } from './checks.js';
import { springDeflectionLimitM, springRowChecks, SPRING_TYPES } from './spring-checks.js';
import { CATALOG_COLUMN_INDEX as COL, DETAIL_COLUMNS, DETAILS_AT, num, type CatalogTuple, type DetailsLoader } from './catalog-tuple.js';
import type { SelectionProblem } from '../selection-problem.js';

/** The mount at one point of a candidate, with the load it carries (SI; NaN where the catalog gives nothing). */
export interface PointMount {
  /** Row index in the store. */
  row: number;
  mountId: number;
  /** `#<id>` until the mount's details are loaded. */
  partNumber: string;
  /** Undefined until the mount's details are loaded. */
  mountType: string | undefined;
  loadN: number;
  ratedLoadN: number;
  /** Static vertical stiffness, N/m. */
  verticalStiffnessNPerM: number;
  /** Static horizontal stiffness, N/m (NaN when the catalog gives none or the details are not loaded). */
  horizontalStiffnessNPerM: number;
  /** Dynamic-to-static stiffness ratio (assumptions.ts when the catalog gives none). */
  dynamicStiffnessRatio: number;
  /** Loss factor η when `hysteretic`, else viscous damping ratio ζ (0 when the catalog gives none). */
  damping: number;
  hysteretic: boolean;
  /** Maximum deflection, m (the deflection at the rated load when the catalog gives none: assumptions.ts). */
  maxDeflectionM: number;
  tempMinC: number;
  tempMaxC: number;
  hasDetails: boolean;
}

export class CandidateStore {
  readonly rowCount: number;
  readonly groupCount: number;
  /** Rows + series groups. */
  readonly candidateCount: number;
  readonly pointCount: number;

  // ---- rows (R) -----------------------------------------------------------------------------
  readonly id: Int32Array;
  readonly supplierId: Int32Array;
  readonly rated: Float64Array;
  /** Static vertical stiffness, N/m. */
  readonly kv: Float64Array;
  /** Static horizontal stiffness, N/m (NaN: not given). */
  readonly kh: Float64Array;
  /** Dynamic-to-static stiffness ratio (the unfavourable one of the type when not given: assumptions.ts). */
  readonly nd: Float64Array;
  /** What the catalog did not give and the engine assumed (bits of ASSUMED, assumptions.ts). */
  readonly rowAssumed: Uint8Array;
  /** 1 for the coil springs the spring checks apply to (spring-checks.ts). */
  readonly isSpring: Uint8Array;
  /** Highest static deflection a spring may take with its reserve travel, m (Infinity for other types). */
  readonly springLimitM: Float64Array;
  /** Loss factor η for hysteretic rows, damping ratio ζ for viscous rows. */
  readonly rowDamping: Float64Array;
  readonly rowHysteretic: Uint8Array;
  readonly maxDeflectionM: Float64Array;
  readonly tempMin: Float64Array;
  readonly tempMax: Float64Array;
  readonly unitPrice: Float64Array;
  readonly leadDays: Float64Array;
  /** Index into `currencies`. */
  readonly currencyIndex: Int32Array;
  /** Row checks failed (checks.ts: supplier, temperature, type, spring stability). */
  readonly rowFail: Uint16Array;
  readonly series: (string | null)[];
  // details (DETAIL_COLUMNS), known for the rows in `hasDetails`
  readonly hasDetails: Uint8Array;
  readonly partNumber: string[];
  readonly mountType: string[];
  readonly currencies: string[] = [];

  // ---- series groups (G) --------------------------------------------------------------------
  /** `${supplierId}:${series}` of each group. */
  readonly groupKeys: string[] = [];
  readonly groupByKey = new Map<string, number>();
  /** Group g holds positions groupStart[g]..groupStart[g+1]−1 of `groupRows`. */
  readonly groupStart: Int32Array;
  /** Row index of each group position (groups back to back, rows by ascending id inside a group). */
  readonly groupRows: Int32Array;
  /** Row picked at each point of each series candidate (g·n + point). */
  readonly seriesRow: Int32Array;
  /** Load at each point of each series candidate with its picked sizes, N (g·n + point). */
  readonly seriesLoad: Float64Array;

  // ---- candidates (C = R + G) ---------------------------------------------------------------
  /** Not offered (a series that levels no better than one size, or with fewer than two sizes). */
  readonly skip: Uint8Array;
  /** Fail mask (checks.ts). */
  readonly fail: Uint16Array;
  /** ASSUMED bits of its mounts, or-ed (assumptions.ts): ranks it below an otherwise equal candidate with full data. */
  readonly assumed: Uint8Array;
  /** Uncoupled vertical natural frequency √(Σ n_d·k / m)/2π, Hz. */
  readonly fnHz: Float64Array;
  readonly damping: Float64Array;
  readonly hysteretic: Uint8Array;
  /** Transmissibility at each disturbing frequency (c·nf + j). */
  readonly transmissibility: Float64Array;
  /** Bounce estimate of the second mass case, Hz (NaN without one: mass-case.ts). */
  readonly fnAltHz: Float64Array;
  /** Transmissibility of the second mass case at each disturbing frequency (c·nf + j; empty without one). */
  readonly transmissibilityAlt: Float64Array;
  /** Transmissibility at resonance (r = 1). */
  readonly resonance: Float64Array;
  readonly meanUtilization: Float64Array;
  readonly levelErrorM: Float64Array;
  readonly meanDeflectionM: Float64Array;
  /** Total price (NaN when unknown or in mixed currencies). */
  readonly price: Float64Array;
  /** Longest lead time of its mounts, days (NaN when unknown). */
  readonly lead: Float64Array;
  readonly candidateCurrency: Int32Array;
  /** Isolation at the worst disturbing frequency, dB. */
  readonly minIsolationDb: Float64Array;
  readonly score: Float64Array;
  /** Last tie-break of the ranking: the mount id (uniform) or 2³¹ + the first id of the series. */
  readonly tieKey: Float64Array;

  constructor(
    private readonly problem: SelectionProblem,
    rows: readonly CatalogTuple[],
  ) {
    const R = rows.length;
    const n = problem.pointCount;
    this.rowCount = R;
    this.pointCount = n;
    this.id = new Int32Array(R);
    this.supplierId = new Int32Array(R);
    this.rated = new Float64Array(R);
    this.kv = new Float64Array(R);
    this.kh = new Float64Array(R);
    this.nd = new Float64Array(R);
    this.rowAssumed = new Uint8Array(R);
    this.isSpring = new Uint8Array(R);
    this.springLimitM = new Float64Array(R);
    this.rowDamping = new Float64Array(R);
    this.rowHysteretic = new Uint8Array(R);
    this.maxDeflectionM = new Float64Array(R);
    this.tempMin = new Float64Array(R);
    this.tempMax = new Float64Array(R);
    this.unitPrice = new Float64Array(R);
    this.leadDays = new Float64Array(R);
    this.currencyIndex = new Int32Array(R);
    this.rowFail = new Uint16Array(R);
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
    this.seriesRow = new Int32Array(G * n);
    this.seriesLoad = new Float64Array(G * n);

    const C = R + G;
    this.candidateCount = C;
    this.skip = new Uint8Array(C);
    this.fail = new Uint16Array(C);
    this.assumed = new Uint8Array(C);
    this.fnHz = new Float64Array(C);
    this.damping = new Float64Array(C);
    this.hysteretic = new Uint8Array(C);
    this.transmissibility = new Float64Array(C * problem.frequenciesHz.length);
    this.resonance = new Float64Array(C);
    this.fnAltHz = new Float64Array(C).fill(Number.NaN);
    this.transmissibilityAlt = new Float64Array(problem.alt ? C * problem.frequenciesHz.length : 0);
    this.meanUtilization = new Float64Array(C);
    this.levelErrorM = new Float64Array(C);
    this.meanDeflectionM = new Float64Array(C);
    this.price = new Float64Array(C);
    this.lead = new Float64Array(C);
    this.candidateCurrency = new Int32Array(C);
    this.minIsolationDb = new Float64Array(C);
    this.score = new Float64Array(C);
    this.tieKey = new Float64Array(C);
  }

  /** Copies the rows into the typed arrays and assigns each row to its series group. */
  private loadRows(rows: readonly CatalogTuple[], groupOf: Int32Array): void {
    const groupsBySupplier = new Map<number, Map<string, number>>();
    const currencyByCode = new Map<string, number>();
    const allowedSuppliers = allowedSuppliersOf(this.problem.criteria);
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
      const k = Number(row[COL.verticalStiffnessNPerM]);
      kv[r] = k;
      const type = String(row[COL.mountType]);
      this.mountType[r] = type;
      const kh = num(row[COL.horizontalStiffnessNPerM]);
      this.kh[r] = kh;
      // missing figures: the unfavourable value, and the row says so (assumptions.ts)
      let assumed = kh > 0 ? 0 : ASSUMED.horizontalStiffness;
      const ratio = num(row[COL.dynamicStiffnessRatio]);
      if (ratio > 0) nd[r] = ratio;
      else {
        nd[r] = unfavourableDynamicRatio(type);
        assumed |= ASSUMED.dynamicRatio;
      }
      const loss = num(row[COL.lossFactor]);
      const hysteretic = loss === loss; // not NaN
      rowHysteretic[r] = hysteretic ? 1 : 0;
      rowDamping[r] = hysteretic ? loss : num(row[COL.dampingRatio]) || 0;
      const travel = num(row[COL.maxDeflectionMm]) / 1000;
      if (travel > 0) maxDeflectionM[r] = travel;
      else {
        maxDeflectionM[r] = rated[r] / k;
        assumed |= ASSUMED.travel;
      }
      this.rowAssumed[r] = assumed;
      this.isSpring[r] = SPRING_TYPES.has(type) ? 1 : 0;
      this.springLimitM[r] = springDeflectionLimitM(type, maxDeflectionM[r]);
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
      rowFail[r] = rowChecks(allowedSuppliers, supplier) | springRowChecks(type, k, kh);
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

  /** Stores a row's details (DETAIL_COLUMNS values, in order, at `at`) and applies the row checks that need them. */
  private setDetails(r: number, values: readonly unknown[], at: number = DETAILS_AT): void {
    this.partNumber[r] = String(values[at]);
    this.mountType[r] = String(values[at + 1]);
    this.tempMin[r] = num(values[at + 2]);
    this.tempMax[r] = num(values[at + 3]);
    this.hasDetails[r] = 1;
    this.rowFail[r] |= detailChecks(this.problem.criteria, this.mountType[r], this.tempMin[r], this.tempMax[r]);
  }

  /**
   * Makes sure the details of every mount used by these candidates are known (one read for the
   * missing ones). A failure found in them (temperature, type) fails the candidate.
   */
  async ensureDetails(candidates: readonly number[], load: DetailsLoader): Promise<void> {
    const missing = new Map<number, number[]>();
    for (const c of candidates) {
      for (let i = 0; i < this.pointCount; i++) {
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
      for (let i = 0; i < this.pointCount; i++) this.fail[c] |= this.rowFail[this.rowOf(c, i)] & DETAIL_FAILS;
    }
  }

  /** The row used at a point of a candidate. */
  rowOf(c: number, point: number): number {
    return c < this.rowCount ? c : this.seriesRow[(c - this.rowCount) * this.pointCount + point];
  }

  /** The load at a point of a candidate, N. */
  loadOf(c: number, point: number): number {
    return c < this.rowCount ? this.problem.equalLoadsN[point] : this.seriesLoad[(c - this.rowCount) * this.pointCount + point];
  }

  /** The distinct rows a candidate uses, in point order. */
  rowsOf(c: number): number[] {
    return [...new Set(Array.from({ length: this.pointCount }, (_, i) => this.rowOf(c, i)))];
  }

  /** The mounts of a candidate, point by point (allocates: for the few candidates that are judged or shown). */
  pointsOf(c: number): PointMount[] {
    return Array.from({ length: this.pointCount }, (_, i): PointMount => {
      const r = this.rowOf(c, i);
      return {
        row: r,
        mountId: this.id[r],
        partNumber: this.partNumberOf(r),
        mountType: this.mountType[r],
        loadN: this.loadOf(c, i),
        ratedLoadN: this.rated[r],
        verticalStiffnessNPerM: this.kv[r],
        horizontalStiffnessNPerM: this.kh[r],
        dynamicStiffnessRatio: this.nd[r],
        damping: this.rowDamping[r],
        hysteretic: this.rowHysteretic[r] === 1,
        maxDeflectionM: this.maxDeflectionM[r],
        tempMinC: this.tempMin[r],
        tempMaxC: this.tempMax[r],
        hasDetails: this.hasDetails[r] === 1,
      };
    });
  }

  isUniform(c: number): boolean {
    return c < this.rowCount;
  }

  partNumberOf(r: number): string {
    return this.partNumber[r] ?? `#${this.id[r]}`;
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

  /** `${supplierId}:${series}` of a series candidate. */
  seriesIdOf(c: number): string {
    return this.groupKeys[c - this.rowCount];
  }

  /** Supplier of a candidate. */
  supplierOf(c: number): number {
    return this.supplierId[this.rowOf(c, 0)];
  }
}
