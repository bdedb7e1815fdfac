import { Spinner } from '@blueprintjs/core';
import type { Damping } from '@tacet/vibration';
import { lazy, Suspense } from 'react';

import type { FrequencyMarker } from '@/components/charts/transmissibility-chart';

// Victory is large: the charts load as their own chunk when a candidate is first shown.
const TransmissibilityChart = lazy(() =>
  import('@/components/charts/transmissibility-chart').then((m) => ({ default: m.TransmissibilityChart })),
);
const FrfChart = lazy(() => import('@/components/charts/frf-chart').then((m) => ({ default: m.FrfChart })));

function ChartLoading() {
  return (
    <div className="tc-chart-loading">
      <Spinner size={24} aria-label="Loading the chart" />
    </div>
  );
}

export interface CandidateChartsProps {
  /** Natural frequency with the current mass [Hz]. */
  naturalFrequencyHz: number;
  massKg: number;
  /** Σk_dyn of the candidate's mounts [N/m]. */
  stiffnessNPerM: number;
  damping: Damping | undefined;
  markers: readonly FrequencyMarker[];
  targetTransmissibility: number | null;
  dampingNote: string;
  /** The whole-machine figures are the verdict: label these as the bounce estimate. */
  estimate?: boolean;
}

/** The candidate's transmissibility and the machine's frequency response, side by side with captions. */
export function CandidateCharts({
  naturalFrequencyHz,
  massKg,
  stiffnessNPerM,
  damping,
  markers,
  targetTransmissibility,
  dampingNote,
  estimate = false,
}: CandidateChartsProps) {
  return (
    <>
      <figure className="tc-chart" data-testid="transmissibility-chart" aria-label="Transmissibility against frequency">
        <h4 className="tc-chart-title">{estimate ? 'Transmissibility, bounce estimate' : 'Transmissibility'}</h4>
        <Suspense fallback={<ChartLoading />}>
          <TransmissibilityChart
            naturalFrequencyHz={naturalFrequencyHz}
            damping={damping}
            markers={markers}
            targetTransmissibility={targetTransmissibility}
          />
        </Suspense>
        <figcaption className="tc-muted tc-chart-caption">
          Force reaching the floor per unit of force from the machine. Shaded: isolation (above √2 × fn). Dashed lines: the disturbing
          frequencies{targetTransmissibility ? ' and the target' : ''}. {dampingNote}
        </figcaption>
      </figure>
      <figure className="tc-chart" data-testid="frf-chart" aria-label="Frequency response of the mounted machine">
        <h4 className="tc-chart-title">Frequency response of the machine on these mounts</h4>
        <Suspense fallback={<ChartLoading />}>
          <FrfChart
            massKg={massKg}
            stiffnessNPerM={stiffnessNPerM}
            damping={damping}
            naturalFrequencyHz={naturalFrequencyHz}
            markers={markers}
          />
        </Suspense>
        <figcaption className="tc-muted tc-chart-caption">
          Vertical motion per unit force (receptance) with its phase, and the dynamic stiffness, of the whole machine on all its mounts as
          one mass on one spring.
        </figcaption>
      </figure>
    </>
  );
}
