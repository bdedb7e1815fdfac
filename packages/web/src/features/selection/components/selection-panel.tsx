import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { SearchIcon } from '@blueprintjs/icons';
import { massProperties } from '@tacet/vibration';
import { memo, useCallback, useEffect, useMemo, useRef, useState } from 'react';

import { SafetyCautions } from '@/components/safety-cautions';
import { errorMessage } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';
import type { Candidate, DesignInput, SelectionResult, StoredSelection } from '@/types/design-api';
import type { Model2Criteria, Model2Operating } from '@/types/model2-api';

import { useRunDesignSelection } from '../api/run-design-selection';
import { candidateKey } from './candidate-format';
import { CandidateComparison } from './candidate-comparison';
import { CandidateDetail, type DisturbingFrequencyLine } from './candidate-detail';
import type { RestraintPlanLayout } from './candidate-restraint';
import type { WholeMachineContext } from './candidate-whole-machine';
import { CandidatesTable, MAX_COMPARED, type CandidateSort, type RankedCandidate } from './candidates-table';

/** How many candidates a run asks for: enough to see why plausible mounts were rejected. */
export const SELECTION_LIMIT = 50;

export interface SelectionPanelProps {
  designId: number;
  /** The input as saved (the selection runs on it). */
  savedInput: DesignInput;
  chosen: Candidate | null;
  /** The last selection run on the saved input, kept with the design (null when none). */
  stored: StoredSelection | null;
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
  /** A run finished and was kept with the design on the server. */
  onRun?: () => void;
}

interface Run {
  result: SelectionResult;
  /** The saved input the run was computed from. */
  inputKey: string;
  /** When and by whom, for a run kept from earlier; null for a run made here. */
  kept: { ranAt: string; ranBy: string | null; catalogChanged: boolean } | null;
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

/** What the whole-machine section needs of the saved input. */
export function wholeMachineContextOf(input: DesignInput): WholeMachineContext {
  const operating = input.operating as DesignInput['operating'] & Model2Operating;
  const criteria = input.criteria as DesignInput['criteria'] & Model2Criteria;
  return {
    rangeRpm: operating.speedRangeRpm ?? null,
    skipBandsRpm: operating.skipBandsRpm ?? [],
    maxResonantMotionMm: criteria.maxResonantMotionMm ?? null,
  };
}

/** Total mass of a saved input [kg], for the chosen candidate's reference. */
function savedMassKg(input: DesignInput): number | null {
  try {
    return massProperties(input.components).massKg;
  } catch {
    return null;
  }
}

function keptRun(stored: StoredSelection | null, savedInput: DesignInput): Run | null {
  if (!stored) return null;
  return {
    result: stored.result,
    inputKey: JSON.stringify(savedInput),
    kept: { ranAt: stored.ranAt, ranBy: stored.ranBy?.name ?? null, catalogChanged: stored.catalogChanged },
  };
}

/**
 * "Find mounts" and its results. A run uses the design's saved input (`POST
 * /api/designs/:id/selection`), saving unsaved input first, so that the candidates shown are
 * exactly what "Choose this" records on the server. The server keeps the last run with the
 * design, so the results come back after a reload until the input changes. Up to four
 * candidates can be compared side by side.
 */
export const SelectionPanel = memo(function SelectionPanel({
  designId,
  savedInput,
  chosen,
  stored,
  liveMassKg,
  frequencies,
  targetTransmissibility,
  canRun,
  canEdit,
  dirty,
  saveIfNeeded,
  choose,
  choosing,
  onRun,
}: SelectionPanelProps) {
  const runSelection = useRunDesignSelection();
  const [run, setRun] = useState<Run | null>(() => keptRun(stored, savedInput));
  const [sort, setSort] = useState<CandidateSort>(DEFAULT_SORT);
  const [selectedKey, setSelectedKey] = useState<string | null>(null);
  const [compareKeys, setCompareKeys] = useState<string[]>([]);
  const [comparing, setComparing] = useState(false);
  const [runError, setRunError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const detailRef = useRef<HTMLDivElement>(null);
  const comparisonRef = useRef<HTMLDivElement>(null);

  const savedKey = useMemo(() => JSON.stringify(savedInput), [savedInput]);
  const stale = run !== null && (dirty || run.inputKey !== savedKey);

  const rows = useMemo<RankedCandidate[]>(
    () => (run ? run.result.candidates.map((candidate, index) => ({ rank: index + 1, candidate })) : []),
    [run],
  );
  const byKey = useMemo(() => new Map(rows.map((row) => [candidateKey(row.candidate), row])), [rows]);
  const selected = selectedKey ? (byKey.get(selectedKey)?.candidate ?? null) : null;
  const compared = useMemo(() => compareKeys.map((key) => byKey.get(key)).filter((row) => row !== undefined), [compareKeys, byKey]);
  const chosenKey = chosen ? candidateKey(chosen) : null;
  const savedMass = useMemo(() => savedMassKg(savedInput), [savedInput]);
  const restraintLayout = useMemo(() => restraintLayoutOf(savedInput), [savedInput]);
  const wholeMachineContext = useMemo(() => wholeMachineContextOf(savedInput), [savedInput]);

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
      setRun({ result, inputKey: JSON.stringify(saved.input), kept: null });
      setSelectedKey(null);
      setCompareKeys([]);
      setComparing(false);
      setSort(DEFAULT_SORT);
      onRun?.();
    } catch (error) {
      setRunError(errorMessage(error));
    }
  };

  const open = useCallback((key: string) => setSelectedKey(key), []);
  const toggleCompare = useCallback((key: string) => {
    setCompareKeys((keys) => (keys.includes(key) ? keys.filter((k) => k !== key) : keys.length >= MAX_COMPARED ? keys : [...keys, key]));
  }, []);
  const compare = useCallback(() => setComparing(true), []);
  useEffect(() => {
    if (selectedKey) detailRef.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }, [selectedKey]);
  useEffect(() => {
    if (comparing) comparisonRef.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }, [comparing]);
  const showComparison = comparing && compared.length >= 2;

  const passing = run ? run.result.candidates.filter((c) => c.passes).length : 0;
  const busy = saving || runSelection.isPending;

  // the candidate opened from the list, else the chosen mounts
  const detailCandidate = selected ?? chosen;
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
                from {run.result.considered.toLocaleString('en-US')} catalog mounts considered in {Math.round(run.result.elapsedMs)} ms
                {run.kept
                  ? `; run ${formatDateTime(run.kept.ranAt)}${run.kept.ranBy ? ` by ${run.kept.ranBy}` : ''}, kept with the design`
                  : ''}
                .
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
      {!stale && run?.kept?.catalogChanged ? (
        <Callout intent="warning" className="tc-note" title="The catalog changed since this run">
          Mounts or suppliers were added, changed or retired after these results were found. Find mounts again to rank the catalog as it is
          now.
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
        <CandidatesTable
          rows={rows}
          sort={sort}
          onSort={setSort}
          selectedKey={selectedKey}
          chosenKey={chosenKey}
          onOpen={open}
          compareKeys={compareKeys}
          onToggleCompare={toggleCompare}
          onCompare={compare}
        />
      ) : null}

      {showComparison ? (
        <div ref={comparisonRef} className="tc-comparison-anchor">
          <CandidateComparison
            compared={compared}
            frequencies={frequencies}
            targetTransmissibility={targetTransmissibility}
            onOpen={open}
            onRemove={toggleCompare}
            onClose={() => setComparing(false)}
          />
        </div>
      ) : null}

      <div className="tc-selection-body">
        <div className="tc-selection-main" ref={detailRef}>
          {detailCandidate && referenceMass !== null ? (
            <CandidateDetail
              key={candidateKey(detailCandidate)}
              candidate={detailCandidate}
              heading={selected ? `Candidate ${byKey.get(selectedKey!)?.rank ?? ''}` : 'Chosen mounts'}
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
              wholeMachineContext={wholeMachineContext}
              curvesInput={stale ? null : savedInput}
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
