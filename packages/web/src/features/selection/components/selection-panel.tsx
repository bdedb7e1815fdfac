import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { SearchIcon } from '@blueprintjs/icons';
import { massProperties } from '@tacet/vibration';
import { memo, useCallback, useEffect, useMemo, useRef, useState } from 'react';

import { SafetyCautions } from '@/components/safety-cautions';
import { errorMessage } from '@/lib/api-errors';
import { useUnits } from '@/lib/units';
import type { Candidate, DesignInput, SelectionResult } from '@/types/design-api';

import { useRunDesignSelection } from '../api/run-design-selection';
import { candidateKey } from './candidate-format';
import { CandidateDetail, type DisturbingFrequencyLine } from './candidate-detail';
import type { RestraintPlanLayout } from './candidate-restraint';
import { CandidatesTable, type CandidateSort, type RankedCandidate } from './candidates-table';

/** How many candidates a run asks for: enough to see why plausible mounts were rejected. */
export const SELECTION_LIMIT = 50;

export interface SelectionPanelProps {
  designId: number;
  /** The input as saved (the selection runs on it). */
  savedInput: DesignInput;
  chosen: Candidate | null;
  /** Mass of the input as it is now [kg], or null while incomplete. */
  liveMassKg: number | null;
  frequencies: readonly DisturbingFrequencyLine[] | null;
  targetTransmissibility: number | null;
  canRun: boolean;
  canEdit: boolean;
  /** The input has unsaved changes. */
  dirty: boolean;
  /** Saves unsaved input; resolves with the saved design or null when it could not be saved. */
  saveIfNeeded: () => Promise<{ input: DesignInput } | null>;
  choose: (candidate: Candidate) => Promise<boolean>;
  choosing: boolean;
}

interface Run {
  result: SelectionResult;
  /** The saved input the run was computed from. */
  inputKey: string;
}

const DEFAULT_SORT: CandidateSort = { column: 'rank', direction: 'asc' };

/** Mount points and CG in plan of a saved input, for the restraint plan (null when it cannot be computed). */
function restraintLayoutOf(input: DesignInput): RestraintPlanLayout | null {
  try {
    const { cg } = massProperties(input.components);
    return { points: input.mountPoints.map((p) => ({ label: p.label, x: p.x, y: p.y })), cg: { x: cg.x, y: cg.y } };
  } catch {
    return null;
  }
}

/** Total mass of a saved input [kg], for the chosen candidate's reference. */
function savedMassKg(input: DesignInput): number | null {
  try {
    return massProperties(input.components).massKg;
  } catch {
    return null;
  }
}

/**
 * "Find mounts" and its results. A run uses the design's saved input (`POST
 * /api/designs/:id/selection`), saving unsaved input first, so that the candidates shown are
 * exactly what "Choose this" records on the server.
 */
export const SelectionPanel = memo(function SelectionPanel({
  designId,
  savedInput,
  chosen,
  liveMassKg,
  frequencies,
  targetTransmissibility,
  canRun,
  canEdit,
  dirty,
  saveIfNeeded,
  choose,
  choosing,
}: SelectionPanelProps) {
  const units = useUnits();
  const runSelection = useRunDesignSelection();
  const [run, setRun] = useState<Run | null>(null);
  const [sort, setSort] = useState<CandidateSort>(DEFAULT_SORT);
  const [selectedKey, setSelectedKey] = useState<string | null>(null);
  const [runError, setRunError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const detailRef = useRef<HTMLDivElement>(null);

  const savedKey = useMemo(() => JSON.stringify(savedInput), [savedInput]);
  const stale = run !== null && (dirty || run.inputKey !== savedKey);

  const rows = useMemo<RankedCandidate[]>(
    () => (run ? run.result.candidates.map((candidate, index) => ({ rank: index + 1, candidate })) : []),
    [run],
  );
  const selected = useMemo(
    () => (selectedKey ? (run?.result.candidates.find((c) => candidateKey(c) === selectedKey) ?? null) : null),
    [run, selectedKey],
  );
  const chosenKey = chosen ? candidateKey(chosen) : null;
  const savedMass = useMemo(() => savedMassKg(savedInput), [savedInput]);
  const restraintLayout = useMemo(() => restraintLayoutOf(savedInput), [savedInput]);

  const find = async () => {
    setRunError(null);
    setSaving(dirty);
    const saved = await saveIfNeeded();
    setSaving(false);
    if (!saved) {
      setRunError('The changed input could not be saved, so the selection did not run. See the messages above.');
      return;
    }
    try {
      const result = await runSelection.mutateAsync({ designId, limit: SELECTION_LIMIT });
      setRun({ result, inputKey: JSON.stringify(saved.input) });
      setSelectedKey(null);
      setSort(DEFAULT_SORT);
    } catch (error) {
      setRunError(errorMessage(error));
    }
  };

  const open = useCallback((key: string) => setSelectedKey(key), []);
  useEffect(() => {
    if (selectedKey) detailRef.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }, [selectedKey]);

  const passing = run ? run.result.candidates.filter((c) => c.passes).length : 0;
  const busy = saving || runSelection.isPending;

  const detailCandidate = selected ?? (run ? null : chosen);
  const referenceMass = selected ? run!.result.totalMassKg : savedMass;

  return (
    <div className="tc-selection">
      <div className="tc-selection-bar">
        {canRun ? (
          <Button
            className="tc-find-button"
            intent="primary"
            size="large"
            icon={<SearchIcon />}
            text={dirty && canEdit ? 'Save and find mounts' : 'Find mounts'}
            loading={busy}
            onClick={() => void find()}
          />
        ) : null}
        <div className="tc-selection-summary" role="status">
          {run ? (
            <>
              <strong>
                {run.result.candidates.length} candidates, {passing} passing
              </strong>{' '}
              <span className="tc-muted">
                from {run.result.considered.toLocaleString('en-US')} catalog mounts considered in {Math.round(run.result.elapsedMs)} ms.
              </span>
            </>
          ) : canRun ? (
            <span className="tc-muted">
              Ranks the catalog against the saved input and requirements: passing candidates first, then the ones that fail with their
              reasons.
            </span>
          ) : (
            <span className="tc-muted">Running a selection is for engineers and administrators.</span>
          )}
        </div>
      </div>

      {runError ? (
        <Callout intent="danger" role="alert" title="The selection did not run" className="tc-note">
          {runError}
        </Callout>
      ) : null}
      {stale ? (
        <Callout intent="warning" className="tc-note" title="These results are for an earlier input">
          The input changed since this run. Find mounts again before choosing.
        </Callout>
      ) : null}

      {run && rows.length === 0 ? (
        <NonIdealState
          icon={<SearchIcon size={40} />}
          title="No mount in the catalog fits"
          description="No part carries these loads within the allowed types, suppliers and temperature. Widen the requirements or check the input."
        />
      ) : null}
      {rows.length > 0 ? (
        <CandidatesTable rows={rows} sort={sort} onSort={setSort} selectedKey={selectedKey} onOpen={open} units={units} />
      ) : null}

      <div className="tc-selection-body">
        <div className="tc-selection-main" ref={detailRef}>
          {detailCandidate && referenceMass !== null ? (
            <CandidateDetail
              key={candidateKey(detailCandidate)}
              candidate={detailCandidate}
              heading={selected ? `Candidate ${rows.find((r) => r.candidate === selected)?.rank ?? ''}` : 'Chosen mounts'}
              referenceMassKg={referenceMass}
              liveMassKg={liveMassKg}
              frequencies={frequencies}
              targetTransmissibility={targetTransmissibility}
              isChosen={chosenKey !== null && candidateKey(detailCandidate) === chosenKey}
              canChoose={canEdit && selected !== null}
              chooseBlockedReason={stale ? 'Find mounts again first: the input changed since this run.' : null}
              choosing={choosing}
              onChoose={() => void choose(detailCandidate)}
              restraintLayout={restraintLayout}
            />
          ) : run ? (
            <p className="tc-muted tc-note">Select a candidate to see its loads, curves and modes.</p>
          ) : (
            <NonIdealState
              icon={<SearchIcon size={40} />}
              title="No mounts chosen yet"
              description={canRun ? 'Find mounts to see the ranked candidates.' : undefined}
            />
          )}
        </div>
        <aside className="tc-selection-aside" aria-label="Cautions">
          <SafetyCautions />
        </aside>
      </div>
    </div>
  );
});
