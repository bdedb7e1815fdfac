import { Alert, Button, Callout, FormGroup, TextArea } from '@blueprintjs/core';
import { ConfirmIcon, DuplicateIcon, SendMessageIcon, UndoIcon } from '@blueprintjs/icons';
import { GENERAL_CAUTION } from '@tacet/vibration';
import { useState } from 'react';

import { errorMessage, errorStatus } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';
import type { Design } from '@/types/design-api';

import { useCreateRevision } from '../api/create-revision';
import { useTransitionDesign } from '../api/transition-design';
import { reviewActions, type ActionRule } from '../schemas/review-rules';
import type { TransitionTarget } from '../types';
import { useDesignHistory } from '../api/get-design-history';
import { ReturnToDraftDialog } from './return-to-draft-dialog';
import { ReviewHistory } from './review-history';
import { ReviewStage } from './review-stage';
import { SendForCheckDialog } from './send-for-check-dialog';
import { SubmissionSummary } from './submission-summary';

import './review.css';

export interface ReviewPanelProps {
  design: Design;
  /** The design as the server answered a transition (new status, checker, version). */
  onChanged: (design: Design) => void;
  /** A new draft revision was made from this one. */
  onRevisionCreated: (design: Design) => void;
  /** The input on the page has edits not saved yet. */
  unsavedEdits?: boolean;
  /** Saves those edits; resolves with the saved design, or null when they could not be saved. */
  saveEdits?: () => Promise<Design | null>;
}

/** A refusal in words: the server's own sentence, with a lead-in for the status. */
function refusal(error: unknown): string {
  const status = errorStatus(error);
  const text = errorMessage(error);
  if (status === 403) return `Not allowed: ${text}`;
  if (status === 409) return `Not possible now: ${text}`;
  return text;
}

function Blocked({ rule, id }: { rule: ActionRule; id: string }) {
  return rule.visible && rule.blockedBy ? (
    <span className="tc-review-why" id={id}>
      {rule.blockedBy}
    </span>
  ) : null;
}

/**
 * "Check and release": the design's stage, the moves the signed-in user may make (each with
 * the reason when it is not available), and the record of earlier moves.
 */
export function ReviewPanel({ design, onChanged, onRevisionCreated, unsavedEdits = false, saveEdits }: ReviewPanelProps) {
  const user = useUser();
  const transition = useTransitionDesign();
  const revision = useCreateRevision();
  const [returning, setReturning] = useState(false);
  const [confirmRelease, setConfirmRelease] = useState(false);
  const [sending, setSending] = useState(false);
  const [releaseNotes, setReleaseNotes] = useState('');
  const history = useDesignHistory(design.id);
  const lastEntry = history.data?.at(-1);
  const returnComment = lastEntry?.from === 'in_review' && lastEntry.to === 'draft' ? lastEntry.comment : null;
  const [failure, setFailure] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const actions = reviewActions(design, user);
  const busy = transition.isPending || revision.isPending || saving;

  const move = async (to: TransitionTarget, comment?: string, extra: { note?: string; checkerId?: number } = {}): Promise<boolean> => {
    setFailure(null);
    // The checker checks what the author sees: unsaved edits are saved first, or nothing is sent.
    if (to === 'in_review' && unsavedEdits && saveEdits) {
      setSaving(true);
      const saved = await saveEdits().finally(() => setSaving(false));
      if (!saved) {
        setFailure('Your changes could not be saved, so the design was not sent for check. Correct the input and try again.');
        return false;
      }
      if (design.chosen && !saved.chosen) {
        setFailure(
          'Your changes were saved. A changed input clears the chosen mounts: run the selection again and choose mounts, then send the design for check.',
        );
        return false;
      }
    }
    try {
      const updated = await transition.mutateAsync({ designId: design.id, to, comment, ...extra });
      onChanged(updated);
      return true;
    } catch (error) {
      setFailure(refusal(error));
      return false;
    }
  };

  const startRevision = async () => {
    setFailure(null);
    try {
      onRevisionCreated(await revision.mutateAsync(design.id));
    } catch (error) {
      setFailure(refusal(error));
    }
  };

  return (
    <section className="tc-review-panel" aria-labelledby="review-panel-title">
      <div className="tc-review-head">
        <h2 id="review-panel-title" className="tc-review-title">
          Check and release
        </h2>
        <ReviewStage status={design.status} />
        {design.checker && (design.status === 'released' || design.status === 'superseded') ? (
          <span className="tc-muted">Checked and released by {design.checker.name}</span>
        ) : null}
      </div>

      <div className="tc-review-actions">
        {actions.sendForCheck.visible ? (
          <span className="tc-review-action">
            <Button
              intent="primary"
              icon={<SendMessageIcon />}
              text="Send for check"
              disabled={actions.sendForCheck.blockedBy !== null || busy}
              title={unsavedEdits ? 'Saves your changes, then sends the design for check' : undefined}
              loading={saving || (transition.isPending && transition.variables?.to === 'in_review')}
              aria-describedby={actions.sendForCheck.blockedBy ? 'why-send' : undefined}
              onClick={() => setSending(true)}
            />
            <Blocked rule={actions.sendForCheck} id="why-send" />
          </span>
        ) : null}
        {actions.release.visible ? (
          <span className="tc-review-action">
            <Button
              intent="success"
              icon={<ConfirmIcon />}
              text="Release"
              disabled={actions.release.blockedBy !== null || busy}
              aria-describedby={actions.release.blockedBy ? 'why-release' : undefined}
              onClick={() => setConfirmRelease(true)}
            />
            <Blocked rule={actions.release} id="why-release" />
          </span>
        ) : null}
        {actions.returnToDraft.visible ? (
          <Button icon={<UndoIcon />} text="Return to draft" disabled={busy} onClick={() => setReturning(true)} />
        ) : null}
        {actions.newRevision.visible ? (
          <Button
            icon={<DuplicateIcon />}
            text="Start new revision"
            loading={revision.isPending}
            disabled={busy}
            onClick={() => void startRevision()}
          />
        ) : null}
        {actions.readOnlyNote ? <span className="tc-muted">{actions.readOnlyNote}</span> : null}
      </div>

      {design.status === 'in_review' ? <SubmissionSummary designId={design.id} /> : null}
      {design.status === 'draft' && returnComment ? (
        <Callout intent="warning" className="tc-note" title="Returned to the author">
          <q className="tc-review-comment">{returnComment}</q>
        </Callout>
      ) : null}

      {failure ? (
        <Callout intent="danger" role="alert" className="tc-note" title="The design did not move">
          {failure}
        </Callout>
      ) : null}

      <div className="tc-review-record">
        <h3 className="tc-review-subtitle">Record</h3>
        <ReviewHistory designId={design.id} />
      </div>

      {returning ? (
        <ReturnToDraftDialog
          isOpen
          busy={transition.isPending}
          onCancel={() => setReturning(false)}
          onConfirm={(comment) => {
            void move('draft', comment).then((moved) => {
              if (moved) setReturning(false);
            });
          }}
        />
      ) : null}
      {sending ? (
        <SendForCheckDialog
          designId={design.id}
          busy={transition.isPending || saving}
          returnComment={returnComment}
          onCancel={() => setSending(false)}
          onConfirm={(note, checkerId) => {
            void move('in_review', undefined, { note: note || undefined, checkerId }).then((moved) => {
              if (moved) setSending(false);
            });
          }}
        />
      ) : null}
      <Alert
        isOpen={confirmRelease}
        intent="success"
        icon={<ConfirmIcon />}
        confirmButtonText="Release this revision"
        cancelButtonText="Not yet"
        onCancel={() => setConfirmRelease(false)}
        onConfirm={() => {
          setConfirmRelease(false);
          void move('released', releaseNotes.trim() || undefined).then((moved) => {
            if (moved) setReleaseNotes('');
          });
        }}
      >
        <p>
          Release revision {design.revision} of {design.name}? You are recorded as its checker, the revision is frozen and purchasers can
          order from it.
        </p>
        <FormGroup
          label="Release notes (optional)"
          labelFor="release-notes"
          helperText="The author and the purchasers read them; the report prints them."
        >
          <TextArea id="release-notes" fill rows={3} value={releaseNotes} onChange={(event) => setReleaseNotes(event.target.value)} />
        </FormGroup>
        <p className="tc-muted">{GENERAL_CAUTION}</p>
      </Alert>
    </section>
  );
}
