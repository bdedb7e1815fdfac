// @ts-check
// Latency and status bookkeeping of the load test, its report and its targets.

/**
 * Nearest-rank percentile: the smallest value with at least p % of the values at or below it
 * (p in (0, 100]). `sorted` ascending; NaN when empty.
 * @param {number[]} sorted
 * @param {number} p
 */
export function percentile(sorted, p) {
  if (sorted.length === 0) return NaN;
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[Math.min(sorted.length, rank) - 1];
}

/**
 * One request as measured by a client.
 * @typedef {object} Sample
 * @property {string} kind
 * @property {number | null} ms from sending to the last byte of the answer; null when there was
 *   no answer (a transport error): counted, not timed
 * @property {number | string} status the HTTP status or 'transport error'
 * @property {number} at when it was sent (performance.now() ms)
 * @property {boolean} newConnection it opened a TCP connection (no idle keep-alive one was free)
 */

/**
 * A row of the report: one kind of request, or 'all'.
 * @typedef {{ kind: string, count: number, perSecond: number, p50: number, p95: number, p99: number, max: number,
 *   statuses: Record<string, number> }} SummaryRow
 */

/** Every request of a run, summarised per kind for the whole run or a part of it. */
export class Recorder {
  constructor() {
    /** @type {Sample[]} */
    this.samples = [];
  }

  /**
   * @param {string} kind
   * @param {number | null} ms
   * @param {number | string} status
   * @param {{ at?: number, newConnection?: boolean }} [when]
   */
  record(kind, ms, status, { at = 0, newConnection = false } = {}) {
    this.samples.push({ kind, ms, status, at, newConnection });
  }

  /**
   * One row per kind and one overall ('all', last): count, requests/s, p50/p95/p99/max latency
   * (ms), statuses; over the requests sent from `from` on (performance.now() ms; default all).
   * @param {number} seconds length of the measured part of the run, for the rates
   * @param {{ from?: number }} [part]
   * @returns {SummaryRow[]}
   */
  summary(seconds, { from = -Infinity } = {}) {
    const samples = this.samples.filter((s) => s.at >= from);
    /**
     * @param {string} kind
     * @param {Sample[]} group
     * @returns {SummaryRow}
     */
    const row = (kind, group) => {
      const sorted = group.flatMap((s) => (s.ms === null ? [] : [s.ms])).sort((a, b) => a - b);
      /** @type {Map<string, number>} */
      const statuses = new Map();
      for (const s of group) statuses.set(String(s.status), (statuses.get(String(s.status)) ?? 0) + 1);
      return {
        kind,
        count: group.length,
        perSecond: group.length / seconds,
        p50: percentile(sorted, 50),
        p95: percentile(sorted, 95),
        p99: percentile(sorted, 99),
        max: sorted.length ? sorted[sorted.length - 1] : NaN,
        statuses: Object.fromEntries([...statuses].sort()),
      };
    };
    const kinds = [...new Set(samples.map((s) => s.kind))].sort((a, b) => a.localeCompare(b));
    return [
      ...kinds.map((kind) =>
        row(
          kind,
          samples.filter((s) => s.kind === kind),
        ),
      ),
      row('all', samples),
    ];
  }

  /** The requests that opened a connection: how many, p50 and max latency (ms), the last one sent (ms). */
  newConnections() {
    const opened = this.samples.filter((s) => s.newConnection);
    const sorted = opened.flatMap((s) => (s.ms === null ? [] : [s.ms])).sort((a, b) => a - b);
    return {
      count: opened.length,
      p50: percentile(sorted, 50),
      max: sorted.length ? sorted[sorted.length - 1] : NaN,
      lastAt: Math.max(-Infinity, ...opened.map((s) => s.at)),
    };
  }
}

/** The targets of the load test (issue 17): 50 clients on a 2-core machine, measured after the ramp. */
export const TARGETS = Object.freeze({ clients: 50, p99Ms: 300, maxMs: 1000 });

/**
 * Whether the latency targets are met by the overall row after the ramp.
 * @param {SummaryRow} overall
 * @returns {Array<{ what: string, value: number, limit: number, met: boolean }>}
 */
export function judgeLatency(overall) {
  return [
    { what: 'p99', value: overall.p99, limit: TARGETS.p99Ms, met: overall.p99 < TARGETS.p99Ms },
    { what: 'maximum', value: overall.max, limit: TARGETS.maxMs, met: overall.max < TARGETS.maxMs },
  ];
}

/**
 * Which kind of request holds the maximum, and the largest maximum of the other kinds (ms), so
 * a report can say what one slow kind (e.g. the deliberately slow sign-in) does to the total.
 * @param {SummaryRow[]} rows per kind, 'all' ignored
 */
export function slowestKind(rows) {
  const kinds = rows.filter((r) => r.kind !== 'all' && Number.isFinite(r.max)).sort((a, b) => b.max - a.max);
  return { kind: kinds[0]?.kind, max: kinds[0]?.max ?? NaN, othersMax: kinds[1]?.max ?? NaN };
}

/**
 * The summary as a fixed-width table.
 * @param {SummaryRow[]} rows
 */
export function formatSummary(rows) {
  /** @param {number} v */
  const ms = (v) => (Number.isFinite(v) ? v.toFixed(1) : '-');
  const head = ['kind', 'count', 'req/s', 'p50 ms', 'p95 ms', 'p99 ms', 'max ms', 'statuses'];
  const body = rows.map((r) => [
    r.kind,
    String(r.count),
    r.perSecond.toFixed(1),
    ms(r.p50),
    ms(r.p95),
    ms(r.p99),
    ms(r.max),
    Object.entries(r.statuses)
      .map(([s, n]) => `${s}×${n}`)
      .join(' '),
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((b) => b[i].length)));
  /** @param {string[]} cells */
  const line = (cells) => cells.map((c, i) => (i === 0 || i === cells.length - 1 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  return [line(head), ...body.map(line)].join('\n');
}
