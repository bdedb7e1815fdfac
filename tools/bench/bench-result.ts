/**
 * One figure of a benchmark for the summary table of `npm run bench` (tools/bench/run.mjs):
 * each benchmark prints its own detail, then one marked line per figure, which run.mjs reads.
 */
export interface BenchFigure {
  /** What was measured, e.g. "selection, HTTP p95 (100,000 mounts)". */
  figure: string;
  value: number;
  unit: string;
  /** Upper bound from PRODUCT.md / the issue, in `unit` (lower is better). */
  target?: number;
  /** The bare baseline measured in the same run, in `unit`. */
  bare?: number;
  /** Upper bound on value / bare. */
  ratioTarget?: number;
}

export const FIGURE_MARK = '@@bench-figure ';

export function reportFigure(figure: BenchFigure): void {
  console.log(`${FIGURE_MARK}${JSON.stringify(figure)}`);
}
