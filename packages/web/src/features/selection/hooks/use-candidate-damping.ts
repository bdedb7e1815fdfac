import { hystereticDamping, viscousDamping, type Damping } from '@tacet/vibration';
import { useMemo } from 'react';

import type { Candidate } from '@/types/design-api';

import { useMounts, type MountDampingData } from '../api/get-mount';

export interface CandidateDampingState {
  /** The damping the curves use; undefined = undamped (unknown). */
  damping: Damping | undefined;
  /** Where it came from, for the chart caption. */
  source: 'catalog' | 'unknown' | 'loading';
  /** Sizes of a series differ in damping: the curves use the first point's. */
  varies: boolean;
  /** e.g. "loss factor η = 0.12" */
  description: string | null;
}

/** A catalog row's damping: a loss factor means hysteretic, a damping ratio viscous. */
export function mountDamping(mount: MountDampingData): Damping | undefined {
  if (mount.lossFactor !== null && mount.lossFactor !== undefined && mount.dampingModel !== 'viscous') {
    return hystereticDamping(mount.lossFactor);
  }
  if (mount.dampingRatio !== null && mount.dampingRatio !== undefined) return viscousDamping(mount.dampingRatio);
  return undefined;
}

export function describeDamping(damping: Damping | undefined): string | null {
  if (!damping) return null;
  return damping.model === 'viscous'
    ? `viscous, damping ratio ζ = ${damping.dampingRatio.toFixed(3)}`
    : `hysteretic, loss factor η = ${damping.lossFactor.toFixed(3)}`;
}

function sameDamping(a: Damping | undefined, b: Damping | undefined): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

const UNKNOWN: CandidateDampingState = { damping: undefined, source: 'unknown', varies: false, description: null };
const LOADING: CandidateDampingState = { damping: undefined, source: 'loading', varies: false, description: null };

/** A candidate's damping from the catalog rows of its parts (by mount id); undefined = not read yet. */
export function candidateDamping(candidate: Candidate, rows: ReadonlyMap<number, MountDampingData | undefined>): CandidateDampingState {
  const ids = [...new Set(candidate.perPoint.map((p) => p.mountId))];
  const dampings = ids.map((id) => {
    const row = rows.get(id);
    return row ? mountDamping(row) : undefined;
  });
  const first = dampings[0];
  if (!first) return UNKNOWN;
  const varies = dampings.some((d) => !sameDamping(d, first));
  return { damping: first, source: 'catalog', varies, description: describeDamping(first) };
}

/**
 * The damping of several candidates' mounts, read from the catalog rows of their parts (a
 * candidate carries none) in one set of requests. Unknown (catalog unreachable) → undamped.
 */
export function useCandidatesDamping(candidates: readonly Candidate[]): CandidateDampingState[] {
  const mountIds = useMemo(() => [...new Set(candidates.flatMap((c) => c.perPoint.map((p) => p.mountId)))], [candidates]);
  const mounts = useMounts(mountIds, mountIds.length > 0);
  const loading = mounts.some((m) => m.isPending);
  const loaded = mounts.map((m) => m.data);
  const key = JSON.stringify(loaded);

  return useMemo<CandidateDampingState[]>(() => {
    if (loading) return candidates.map(() => LOADING);
    const rows = new Map(mountIds.map((id, i) => [id, loaded[i]]));
    return candidates.map((candidate) => candidateDamping(candidate, rows));
    // eslint-disable-next-line react-hooks/exhaustive-deps -- `key` stands for `loaded`, a new array every render
  }, [candidates, mountIds, loading, key]);
}

/** The damping of one candidate's mounts (see useCandidatesDamping). */
export function useCandidateDamping(candidate: Candidate | null): CandidateDampingState {
  const list = useMemo(() => (candidate ? [candidate] : []), [candidate]);
  return useCandidatesDamping(list)[0] ?? UNKNOWN;
}
