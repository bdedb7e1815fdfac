/**
 * Where to write the labels of a chart's vertical marker lines (disturbing frequencies) so that no
 * two overlap: each label is centred over its line in the band above the plot, in the first row
 * where it has room; rows stack upwards. A label that finds no room in any row is left off the
 * chart and listed under it instead. Pure, so that it can be tested without drawing.
 */

export interface MarkerLabelInput {
  key: string;
  /** Horizontal position of the marker line [px]. */
  x: number;
  text: string;
  /** Placed first (e.g. the governing frequency), so that it always gets a place when any label does. */
  priority?: boolean;
}

export interface PlacedMarkerLabel {
  key: string;
  text: string;
  /** Position of the line [px]. */
  lineX: number;
  /** Centre of the label [px]: over the line, moved inwards where the line is near an edge. */
  x: number;
  width: number;
  /** 0 = the row next to the plot, 1 above it, … */
  row: number;
}

export interface MarkerLabelLayout {
  placed: PlacedMarkerLabel[];
  /** Keys of the labels that found no room. */
  unplaced: string[];
  /** Rows in use (0 when there is nothing to place). */
  rows: number;
}

export interface MarkerLabelOptions {
  /** Leftmost and rightmost x a label may reach [px]. */
  left: number;
  right: number;
  /** Average advance of one character at the label font [px]. */
  charWidth?: number;
  /** Clear space between two labels in a row [px]. */
  gap?: number;
  maxRows?: number;
}

/** Estimated width of a label [px] (there is no text measurement outside a browser). */
export function labelWidth(text: string, charWidth: number): number {
  return Math.ceil(text.length * charWidth) + 4;
}

export function layoutMarkerLabels(items: readonly MarkerLabelInput[], options: MarkerLabelOptions): MarkerLabelLayout {
  const { left, right, charWidth = 6, gap = 6, maxRows = 3 } = options;
  const rows: { from: number; to: number }[][] = [];
  const placed: PlacedMarkerLabel[] = [];
  const unplaced: string[] = [];
  const order = items
    .map((item, index) => ({ item, index }))
    .sort((a, b) => Number(b.item.priority ?? false) - Number(a.item.priority ?? false) || a.item.x - b.item.x || a.index - b.index);

  for (const { item } of order) {
    const width = labelWidth(item.text, charWidth);
    const half = width / 2;
    const x = right - left < width ? (left + right) / 2 : Math.min(Math.max(item.x, left + half), right - half);
    const from = x - half;
    const to = x + half;
    let row = -1;
    for (let r = 0; r < maxRows; r++) {
      const taken = rows[r] ?? [];
      if (taken.every((span) => to + gap <= span.from || from >= span.to + gap)) {
        row = r;
        break;
      }
    }
    if (row < 0) {
      unplaced.push(item.key);
      continue;
    }
    (rows[row] ??= []).push({ from, to });
    placed.push({ key: item.key, text: item.text, lineX: item.x, x, width, row });
  }
  placed.sort((a, b) => a.lineX - b.lineX || a.row - b.row);
  return { placed, unplaced, rows: rows.length };
}

/** x of a value on a log axis drawn from `left` to `right` [px]. */
export function logAxisX(value: number, [min, max]: readonly [number, number], left: number, right: number): number {
  return left + ((Math.log10(value) - Math.log10(min)) / (Math.log10(max) - Math.log10(min))) * (right - left);
}
