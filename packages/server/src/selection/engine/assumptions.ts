/**
 * Catalog values the engine had to assume, never silently (docs/engineering/selection.md §14).
 * A row that lacks a figure gets the value that is unfavourable for the check the figure feeds,
 * the row is marked (`CandidateStore.rowAssumed`, bits of ASSUMED), and every candidate using it
 * lists the assumption in words (`assumptionsFor`). A candidate with assumptions ranks below an
 * otherwise equal one with full data (ranking.ts `candidateOrder`).
 */
import { measure } from '../../common/units/reader-words.js';
import type { MountType } from '../../catalog/mount-rules.js';
import { formatNumber } from '../selection-format.js';
import type { CandidateStore } from './candidate-store.js';
import { SPRING_RESERVE, SPRING_TYPES } from './spring-checks.js';

/** What a row lacks (bits of `CandidateStore.rowAssumed`). */
export const ASSUMED = {
  /** No dynamic-to-static stiffness ratio: UNFAVOURABLE_DYNAMIC_RATIO of its type. */
  dynamicRatio: 1,
  /** No horizontal stiffness: HORIZONTAL_RATIO_WHEN_MISSING × the vertical (both ends in the mode check). */
  horizontalStiffness: 2,
  /** No maximum deflection: the deflection at the rated load, P_r/k_v. */
  travel: 4,
} as const;

/**
 * Dynamic-to-static ratio assumed when the catalog gives none, the high end of what the family
 * commonly shows: a stiffer mount raises the natural frequencies, which is unfavourable for the
 * isolation above them and brings the rigid-body modes nearer the disturbing frequencies above
 * them (selection.md §14). Elastomers 1.2–2.0 and more for filled, highly damped compounds;
 * wire rope and air springs depend on amplitude and volume; steel coils are rate-independent
 * (≈ 1.0). Values: common practice, from memory, no single source.
 */
export const UNFAVOURABLE_DYNAMIC_RATIO: Readonly<Record<MountType, number>> = {
  elastomer_pad: 2,
  elastomer_mount: 2,
  wire_rope: 2,
  air_spring: 1.5,
  open_spring: 1,
  housed_spring: 1,
  restrained_spring: 1,
};

/** The ratio assumed for a type this table does not know (the highest above). */
export const UNFAVOURABLE_DYNAMIC_RATIO_ANY = 2;

/**
 * Horizontal-to-vertical stiffness assumed when the catalog gives no horizontal stiffness: the
 * whole-machine verdict is judged at both ends and the worse governs (the mode notes look at both
 * ends too); the modes shown and the seismic shares use the high end. The span covers compression pads
 * (about 0.2) to mounts as stiff across as along (1.0): common practice, from memory.
 */
export const HORIZONTAL_RATIO_WHEN_MISSING = { low: 0.2, high: 1 } as const;

export function unfavourableDynamicRatio(mountType: string): number {
  return UNFAVOURABLE_DYNAMIC_RATIO[mountType as MountType] ?? UNFAVOURABLE_DYNAMIC_RATIO_ANY;
}

/** The assumptions of candidate c about its catalog data, in words (one line per row and field). */
export function catalogAssumptionsFor(store: CandidateStore, c: number): string[] {
  const out: string[] = [];
  for (const r of store.rowsOf(c)) {
    const a = store.rowAssumed[r];
    if (!a) continue;
    const part = store.partNumberOf(r);
    if (a & ASSUMED.dynamicRatio) {
      out.push(
        `${part}: the catalog gives no dynamic-to-static stiffness ratio; ${formatNumber(store.nd[r], 1)} is assumed ` +
          `(the high end for ${typeName(store.mountType[r])}: it raises the natural frequencies, the unfavourable side for isolation).`,
      );
    }
    if (a & ASSUMED.horizontalStiffness) {
      const { low, high } = HORIZONTAL_RATIO_WHEN_MISSING;
      out.push(
        `${part}: the catalog gives no horizontal stiffness; the whole machine is judged with ${formatNumber(low, 1)}× and ` +
          `${formatNumber(high, 1)}× the vertical stiffness (the worse of the two decides) and the modes are shown at ` +
          `${formatNumber(high, 1)}×` +
          (SPRING_TYPES.has(store.mountType[r] ?? '') ? '; lateral stability cannot be shown.' : '.'),
      );
    }
    if (a & ASSUMED.travel) {
      const mm = (store.rated[r] / store.kv[r]) * 1000;
      out.push(
        `${part}: the catalog gives no maximum deflection; the deflection at the rated load (${measure('deflection', mm / 1000)}) is taken ` +
          'as the travel, the least a mount rated for that load must allow' +
          (SPRING_TYPES.has(store.mountType[r] ?? '')
            ? `, and the reserve travel (${SPRING_RESERVE * 100} % of the static deflection) is checked against it.`
            : '.'),
      );
    }
  }
  return out;
}

function typeName(mountType: string | undefined): string {
  return mountType ? mountType.replace(/_/g, ' ') + 's' : 'this kind of mount';
}
