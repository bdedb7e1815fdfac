import { useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Candidate, DesignInput } from '@/types/design-api';
import type { SelectionCurves, SpeedCurve } from '@/types/model2-api';

/** The candidate to draw: a uniform candidate by its mount, a series candidate by its series. */
type CandidateRef = Pick<Candidate, 'kind' | 'mountId' | 'seriesId'>;

/**
 * `POST /api/selection/curves` (engineer, admin): transmissibility against speed per source of one
 * candidate, at the nominal stiffness and both ends of the stiffness band. Nothing is stored.
 */
export async function getSpeedCurves(input: DesignInput, candidate: CandidateRef): Promise<SelectionCurves> {
  const body = {
    components: input.components,
    mountPoints: input.mountPoints,
    operating: input.operating,
    criteria: input.criteria,
    ...(input.restraint ? { restraint: input.restraint } : {}),
    ...(candidate.kind === 'series' ? { seriesId: candidate.seriesId } : { mountId: candidate.mountId }),
  };
  const { data } = await api.post<SelectionCurves>('/selection/curves', body);
  return data;
}

/** The server's arrays → one point per speed, band ends as low/high, for the chart. */
export function toSpeedCurves(curves: SelectionCurves): SpeedCurve[] {
  return curves.sources.map((source) => ({
    source: source.label,
    points: source.speedRpm.map((speedRpm, i) => ({
      speedRpm,
      transmissibility: source.transmissibility[i]!,
      ...(source.softEnd && source.stiffEnd ? { low: source.softEnd[i]!, high: source.stiffEnd[i]! } : {}),
    })),
  }));
}

/**
 * The speed curves of a candidate for an input, or null while they load, fail or cannot apply
 * (no input given, no running range). A failure only loses the curves: the chart falls back to
 * the points of the selection result.
 */
export function useSpeedCurves(input: DesignInput | null, candidate: CandidateRef, enabled: boolean): SpeedCurve[] | null {
  const key = candidate.kind === 'series' ? `series:${candidate.seriesId}` : `mount:${candidate.mountId}`;
  const query = useQuery({
    queryKey: ['selection-curves', key, input] as const,
    queryFn: () => getSpeedCurves(input!, candidate),
    enabled: enabled && input !== null && input.operating.speedRangeRpm !== undefined,
    staleTime: 5 * 60_000,
    retry: false,
    select: toSpeedCurves,
  });
  return query.data ?? null;
}
