/**
 * Generates Tacet's invented demo mount catalog, deterministically (seeded PRNG), in the catalog
 * CSV format of catalog/FORMAT.md (SI columns).
 *
 *   npx tsx tools/catalog/generate-demo-catalog.ts   → catalog/demo-mounts.csv and catalog/demo-suppliers.csv
 *   npx tsx tools/catalog/generate-demo-catalog.ts --rows 100000 --out /tmp/big.csv --seed 7
 *
 * Every supplier, series and part number is invented. The ranges below are common practice for
 * each mount type (not from any supplier): static deflection at rated load about 1–5 mm for
 * elastomer pads, 3–10 mm for elastomer mounts, 25–75 mm for steel springs; steel springs nearly
 * undamped (ζ ≈ 0.005–0.03 with housing friction) with a dynamic-to-static stiffness ratio of 1.0;
 * elastomers with loss factors 0.1–0.25 and dynamic ratios 1.2–2.0; springs with about 50 % travel
 * beyond the rated deflection.
 *
 * Restraint ratings (horizontal and uplift, strength level) are invented too: every restrained-spring
 * series has them (horizontal 1.0–2.0 × rated load, uplift 0.5–1.0 ×), and the housed springs of
 * every other supplier (horizontal 0.4–0.8 ×, uplift 0.2–0.4 ×); the other mounts have none. They
 * come from a PRNG of their own, so adding them left every other figure of the file as it was.
 */
import { createWriteStream, mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface DemoSupplier {
  name: string;
  code: string;
  email: string;
  phone: string;
}

/** Invented suppliers; e-mail domains use the reserved `.example` TLD (RFC 2606). */
export const DEMO_SUPPLIERS: DemoSupplier[] = [
  { name: 'Quillmere Isolation', code: 'QM', email: 'quotes@quillmere.example', phone: '+1 555 0101' },
  { name: 'Tamberlin Elastics', code: 'TE', email: 'sales@tamberlin.example', phone: '+1 555 0102' },
  { name: 'Norrwick Spring & Wire', code: 'NW', email: 'orders@norrwick.example', phone: '+1 555 0103' },
  { name: 'Calderfen Resilient Works', code: 'CF', email: 'rfq@calderfen.example', phone: '+1 555 0104' },
  { name: 'Brightholm Mounting', code: 'BH', email: 'desk@brightholm.example', phone: '+1 555 0105' },
];

type MountType = 'elastomer_pad' | 'elastomer_mount' | 'open_spring' | 'housed_spring' | 'restrained_spring' | 'air_spring' | 'wire_rope';

interface TypeProfile {
  type: MountType;
  code: string;
  loadRangeN: [number, number];
  deflectionMm: [number, number];
  damping: { kind: 'ratio' | 'loss'; range: [number, number] };
  dynamicRatio: [number, number];
  horizontalRatio: [number, number];
  travelFactor: number;
  tempC: [number, number];
  heightMm: [number, number];
  pricePerKn: [number, number];
  basePrice: number;
  leadDays: [number, number];
  seriesPerSupplier: number;
}

const PROFILES: TypeProfile[] = [
  {
    type: 'elastomer_pad',
    code: 'P',
    loadRangeN: [100, 20000],
    deflectionMm: [1, 5],
    damping: { kind: 'loss', range: [0.12, 0.25] },
    dynamicRatio: [1.4, 2.0],
    horizontalRatio: [0.3, 0.6],
    travelFactor: 1.6,
    tempC: [-30, 80],
    heightMm: [10, 30],
    pricePerKn: [0.8, 2.0],
    basePrice: 4,
    leadDays: [3, 10],
    seriesPerSupplier: 1,
  },
  {
    type: 'elastomer_mount',
    code: 'E',
    loadRangeN: [200, 15000],
    deflectionMm: [3, 10],
    damping: { kind: 'loss', range: [0.1, 0.22] },
    dynamicRatio: [1.2, 1.6],
    horizontalRatio: [0.5, 1.0],
    travelFactor: 1.5,
    tempC: [-30, 70],
    heightMm: [30, 90],
    pricePerKn: [2.5, 6],
    basePrice: 12,
    leadDays: [5, 20],
    seriesPerSupplier: 2,
  },
  {
    type: 'open_spring',
    code: 'S',
    loadRangeN: [500, 50000],
    deflectionMm: [25, 50],
    damping: { kind: 'ratio', range: [0.005, 0.01] },
    dynamicRatio: [1.0, 1.0],
    horizontalRatio: [0.8, 1.2],
    travelFactor: 1.5,
    tempC: [-40, 120],
    heightMm: [90, 220],
    pricePerKn: [3, 7],
    basePrice: 35,
    leadDays: [10, 30],
    seriesPerSupplier: 2,
  },
  {
    type: 'housed_spring',
    code: 'H',
    loadRangeN: [500, 40000],
    deflectionMm: [25, 50],
    damping: { kind: 'ratio', range: [0.02, 0.05] },
    dynamicRatio: [1.0, 1.0],
    horizontalRatio: [0.7, 1.0],
    travelFactor: 1.5,
    tempC: [-40, 100],
    heightMm: [110, 250],
    pricePerKn: [4, 9],
    basePrice: 55,
    leadDays: [14, 35],
    seriesPerSupplier: 1,
  },
  {
    type: 'restrained_spring',
    code: 'R',
    loadRangeN: [1000, 50000],
    deflectionMm: [25, 75],
    damping: { kind: 'ratio', range: [0.01, 0.03] },
    dynamicRatio: [1.0, 1.0],
    horizontalRatio: [0.8, 1.2],
    travelFactor: 1.5,
    tempC: [-40, 100],
    heightMm: [150, 320],
    pricePerKn: [6, 12],
    basePrice: 90,
    leadDays: [20, 45],
    seriesPerSupplier: 1,
  },
  {
    type: 'air_spring',
    code: 'A',
    loadRangeN: [2000, 50000],
    deflectionMm: [40, 100],
    damping: { kind: 'ratio', range: [0.02, 0.05] },
    dynamicRatio: [1.1, 1.3],
    horizontalRatio: [0.3, 0.5],
    travelFactor: 1.3,
    tempC: [-20, 70],
    heightMm: [120, 260],
    pricePerKn: [10, 20],
    basePrice: 180,
    leadDays: [25, 60],
    seriesPerSupplier: 0,
  },
  {
    type: 'wire_rope',
    code: 'W',
    loadRangeN: [100, 10000],
    deflectionMm: [5, 20],
    damping: { kind: 'loss', range: [0.15, 0.3] },
    dynamicRatio: [1.0, 1.2],
    horizontalRatio: [0.6, 1.2],
    travelFactor: 2.0,
    tempC: [-60, 200],
    heightMm: [40, 160],
    pricePerKn: [8, 16],
    basePrice: 25,
    leadDays: [15, 40],
    seriesPerSupplier: 0,
  },
];

/** Mulberry32: a small, well-known seeded PRNG, so the demo file is the same on every machine. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const HEADER = [
  'supplier',
  'part_number',
  'series',
  'mount_type',
  'rated_load_n',
  'vertical_stiffness_n_per_mm',
  'horizontal_stiffness_n_per_mm',
  'dynamic_stiffness_ratio',
  'damping_ratio',
  'loss_factor',
  'max_deflection_mm',
  'temp_min_c',
  'temp_max_c',
  'height_mm',
  'restraint_capacity_n',
  'uplift_capacity_n',
  'unit_price',
  'currency',
  'lead_time_days',
];

/** Restraint ratings of a series as multiples of the rated load (invented), or none. */
interface RatingRatios {
  horizontal: number;
  uplift: number;
}

/** Which series carry restraint ratings, and how strong (see the file comment). */
function ratingRatios(ratingRand: () => number, supplierIndex: number, p: TypeProfile): RatingRatios | null {
  if (p.type === 'restrained_spring') return { horizontal: 1 + ratingRand(), uplift: 0.5 + ratingRand() * 0.5 };
  if (p.type === 'housed_spring' && supplierIndex % 2 === 0)
    return { horizontal: 0.4 + ratingRand() * 0.4, uplift: 0.2 + ratingRand() * 0.2 };
  return null;
}

const round = (v: number, digits: number): number => Number(v.toFixed(digits));

/** Rows of one series: rated loads in a geometric progression, one deflection family. */
function* seriesRows(
  rand: () => number,
  supplier: DemoSupplier,
  p: TypeProfile,
  seriesName: string,
  ratings: RatingRatios | null,
): Generator<string[]> {
  const span = p.loadRangeN[1] / p.loadRangeN[0];
  const start = p.loadRangeN[0] * Math.pow(span, rand() * 0.15);
  const step = 1.3 + rand() * 0.25;
  const deflMm = p.deflectionMm[0] + rand() * (p.deflectionMm[1] - p.deflectionMm[0]);
  const damping = round(p.damping.range[0] + rand() * (p.damping.range[1] - p.damping.range[0]), 3);
  const nd = round(p.dynamicRatio[0] + rand() * (p.dynamicRatio[1] - p.dynamicRatio[0]), 2);
  const hr = p.horizontalRatio[0] + rand() * (p.horizontalRatio[1] - p.horizontalRatio[0]);
  const lead = Math.round(p.leadDays[0] + rand() * (p.leadDays[1] - p.leadDays[0]));
  const pricePerKn = p.pricePerKn[0] + rand() * (p.pricePerKn[1] - p.pricePerKn[0]);
  for (let load = start, size = 1; load <= p.loadRangeN[1]; load *= step, size++) {
    const ratedLoad = Math.round(load / 10) * 10;
    // Each size deflects within ±8 % of the series' nominal deflection at its rated load.
    const sizeDefl = deflMm * (0.92 + rand() * 0.16);
    const kv = ratedLoad / sizeDefl; // N/mm
    const height = p.heightMm[0] + (p.heightMm[1] - p.heightMm[0]) * Math.min(1, Math.log(load / p.loadRangeN[0]) / Math.log(span));
    yield [
      supplier.name,
      `${supplier.code}-${seriesName}-${String(ratedLoad).padStart(5, '0')}`,
      seriesName,
      p.type,
      String(ratedLoad),
      String(round(kv, 2)),
      String(round(kv * hr, 2)),
      String(nd),
      p.damping.kind === 'ratio' ? String(damping) : '',
      p.damping.kind === 'loss' ? String(damping) : '',
      String(round(sizeDefl * p.travelFactor, 1)),
      String(p.tempC[0]),
      String(p.tempC[1]),
      String(Math.round(height)),
      ratings ? String(Math.round((ratedLoad * ratings.horizontal) / 10) * 10) : '',
      ratings ? String(Math.round((ratedLoad * ratings.uplift) / 10) * 10) : '',
      String(round(p.basePrice + (pricePerKn * ratedLoad) / 1000, 2)),
      'USD',
      String(lead + size),
    ];
  }
}

/** The demo catalog's rows (without the header). With `rows`, series repeat in variants until that many rows. */
export function* demoCatalogRows(seed = 1, rows?: number): Generator<string[]> {
  const rand = prng(seed);
  const ratingRand = prng(seed + 0x5eed);
  let produced = 0;
  for (let variant = 0; rows === undefined ? variant < 1 : produced < rows; variant++) {
    for (const [si, supplier] of DEMO_SUPPLIERS.entries()) {
      for (const p of PROFILES) {
        // Air springs and wire ropes come from two suppliers only.
        const count = p.seriesPerSupplier || (si % 2 === 0 && si < 4 ? 1 : 0);
        for (let s = 1; s <= count; s++) {
          const seriesName = `${p.code}${s}${variant ? `V${variant}` : ''}`;
          const ratings = ratingRatios(ratingRand, si, p);
          for (const row of seriesRows(rand, supplier, p, seriesName, ratings)) {
            if (rows !== undefined && produced >= rows) return;
            produced++;
            yield row;
          }
        }
      }
    }
  }
}

function csvField(v: string): string {
  return /[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

export function csvLine(fields: string[]): string {
  return fields.map(csvField).join(',') + '\n';
}

export async function writeDemoCatalog(path: string, seed = 1, rows?: number): Promise<number> {
  mkdirSync(dirname(path), { recursive: true });
  const out = createWriteStream(path);
  out.write(csvLine(HEADER));
  let n = 0;
  for (const row of demoCatalogRows(seed, rows)) {
    if (!out.write(csvLine(row))) await new Promise<void>((r) => out.once('drain', () => r()));
    n++;
  }
  await new Promise<void>((r, j) => out.end((e?: Error | null) => (e ? j(e) : r())));
  return n;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const arg = (name: string): string | undefined => {
    const i = process.argv.indexOf(`--${name}`);
    return i > 0 ? process.argv[i + 1] : undefined;
  };
  const root = fileURLToPath(new URL('../..', import.meta.url));
  const out = resolve(arg('out') ?? join(root, 'catalog', 'demo-mounts.csv'));
  const rows = arg('rows') ? Number(arg('rows')) : undefined;
  const n = await writeDemoCatalog(out, Number(arg('seed') ?? 1), rows);
  console.log(`wrote ${n} mounts to ${out}`);
  if (!arg('out')) {
    const suppliersFile = join(root, 'catalog', 'demo-suppliers.csv');
    writeFileSync(
      suppliersFile,
      csvLine(['name', 'contact_email', 'phone']) + DEMO_SUPPLIERS.map((s) => csvLine([s.name, s.email, s.phone])).join(''),
    );
    console.log(`wrote ${DEMO_SUPPLIERS.length} suppliers to ${suppliersFile}`);
  }
}
