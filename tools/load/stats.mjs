// Latency and status bookkeeping of the load test, and its report.

/**
 * Nearest-rank percentile: the smallest value with at least p % of the values at or below it
 * (p in (0, 100]). `sorted` ascending, not empty.
 * @param {number[]} sorted
 * @param {number} p
 */
export function percentile(sorted, p) {
  if (sorted.length === 0) return NaN;
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[Math.min(sorted.length, rank) - 1];
}

/** Latencies (ms) and statuses per kind of request. */
export class Recorder {
  constructor() {
    /** @type {Map<string, { latencies: number[], statuses: Map<string, number> }>} */
    this.kinds = new Map();
  }

  /**
   * @param {string} kind
   * @param {number | null} ms null when there was no answer (a transport error): counted, not timed
   * @param {number | 'transport error'} status
   */
  record(kind, ms, status) {
    let entry = this.kinds.get(kind);
    if (!entry) {
      entry = { latencies: [], statuses: new Map() };
      this.kinds.set(kind, entry);
    }
    if (ms !== null) entry.latencies.push(ms);
    const key = String(status);
    entry.statuses.set(key, (entry.statuses.get(key) ?? 0) + 1);
  }

  /**
   * One row per kind and one overall: count, requests/s, p50/p95/p99/max latency (ms), statuses.
   * @param {number} seconds length of the measured run
   */
  summary(seconds) {
    const row = (kind, latencies, statuses) => {
      const sorted = [...latencies].sort((a, b) => a - b);
      const count = [...statuses.values()].reduce((sum, n) => sum + n, 0);
      return {
        kind,
        count,
        perSecond: count / seconds,
        p50: percentile(sorted, 50),
        p95: percentile(sorted, 95),
        p99: percentile(sorted, 99),
        max: sorted.length ? sorted[sorted.length - 1] : NaN,
        statuses: Object.fromEntries([...statuses].sort()),
      };
    };
    const rows = [...this.kinds].sort(([a], [b]) => a.localeCompare(b)).map(([kind, e]) => row(kind, e.latencies, e.statuses));
    const all = new Map();
    for (const { statuses } of this.kinds.values()) for (const [s, n] of statuses) all.set(s, (all.get(s) ?? 0) + n);
    rows.push(
      row(
        'all',
        [...this.kinds.values()].flatMap((e) => e.latencies),
        all,
      ),
    );
    return rows;
  }
}

/** The summary as a fixed-width table. */
export function formatSummary(rows) {
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
  const line = (cells) => cells.map((c, i) => (i === 0 || i === cells.length - 1 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  return [line(head), ...body.map(line)].join('\n');
}
