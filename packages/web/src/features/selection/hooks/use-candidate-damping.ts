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

/**
 * The damping of a candidate's mounts, read from the catalog rows of its parts (a candidate
 * carries none). Unknown (catalog unreachable) → undamped.
 */
export function useCandidateDamping(candidate: Candidate | null): CandidateDampingState {
  const mountIds = useMemo(() => (candidate ? [...new Set(candidate.perPoint.map((p) => p.mountId))] : []), [candidate]);
  const mounts = useMounts(mountIds, mountIds.length > 0);
  const loaded = mounts.map((m) => m.data);
  const loading = mounts.some((m) => m.isPending);
  const key = JSON.stringify(loaded);

  return useMemo<CandidateDampingState>(() => {
    if (!candidate) return { damping: undefined, source: 'unknown', varies: false, description: null };
    if (loading) return { damping: undefined, source: 'loading', varies: false, description: null };
    const dampings = loaded.map((m) => (m ? mountDamping(m) : undefined));
    const first = dampings[0];
    if (!first) return { damping: undefined, source: 'unknown', varies: false, description: null };
    const varies = dampings.some((d) => !sameDamping(d, first));
    return { damping: first, source: 'catalog', varies, description: describeDamping(first) };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- `key` stands for `loaded`, a new array every render
  }, [candidate, loading, key]);
}
