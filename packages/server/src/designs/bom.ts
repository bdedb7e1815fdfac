import type { BomLine, Candidate, MountSnapshot } from '../selection/selection.types.js';

/** Cents are the smallest unit a bill of materials shows. */
const toCents = (value: number): number => Math.round(value * 100) / 100;

/**
 * The bill of materials of a chosen candidate: one line per part number (in the order the
 * mount points first use it), with the points it goes to, quantity, unit and extended price
 * and lead time from the catalog data frozen in the snapshot.
 */
export function buildBom(candidate: Candidate, mounts: readonly MountSnapshot[]): BomLine[] {
  const byId = new Map(mounts.map((m) => [m.id, m]));
  const lines = new Map<number, BomLine>();
  for (const point of candidate.perPoint) {
    let line = lines.get(point.mountId);
    if (!line) {
      const mount = byId.get(point.mountId);
      if (!mount) throw new Error(`Mount ${point.mountId} is missing from the snapshot`);
      line = {
        supplier: { ...mount.supplier },
        partNumber: mount.partNumber,
        mountId: mount.id,
        quantity: 0,
        mountPoints: [],
        unitPrice: mount.unitPrice,
        extendedPrice: null,
        currency: mount.currency,
        leadTimeDays: mount.leadTimeDays,
      };
      lines.set(point.mountId, line);
    }
    line.quantity += 1;
    line.mountPoints.push(point.label);
  }
  for (const line of lines.values()) {
    line.extendedPrice = line.unitPrice === null ? null : toCents(line.unitPrice * line.quantity);
  }
  return [...lines.values()];
}
