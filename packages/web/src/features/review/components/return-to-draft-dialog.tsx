import { Button, Dialog, DialogBody, DialogFooter, FormGroup, TextArea } from '@blueprintjs/core';
import { useState } from 'react';

import { returnCommentProblem } from '../schemas/review-rules';

export interface ReturnToDraftDialogProps {
  isOpen: boolean;
  busy: boolean;
  onCancel: () => void;
  onConfirm: (comment: string) => void;
}

/**
 * Asks why the design goes back to its author. No `<form>` here: the dialog is rendered from
 * inside the design page's form, and a nested submit would reach that form.
 */
export function ReturnToDraftDialog({ isOpen, busy, onCancel, onConfirm }: ReturnToDraftDialogProps) {
  const [comment, setComment] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  const close = () => {
    setComment('');
    setProblem(null);
    onCancel();
  };
  const confirm = () => {
    const found = returnCommentProblem(comment);
    setProblem(found);
    if (!found) onConfirm(comment.trim());
  };

  return (
    <Dialog title="Return to draft" isOpen={isOpen} onClose={close} className="tc-dialog">
      <DialogBody>
        <p>The design goes back to its author as a draft. Say what needs to change.</p>
        <FormGroup
          label="What needs to change"
          labelFor="return-comment"
          intent={problem ? 'danger' : 'none'}
          helperText={problem ? <span id="return-comment-help">{problem}</span> : undefined}
        >
          <TextArea
            id="return-comment"
            fill
            rows={4}
            value={comment}
            autoFocus
            intent={problem ? 'danger' : 'none'}
            aria-invalid={problem ? true : undefined}
            aria-describedby={problem ? 'return-comment-help' : undefined}
            onChange={(event) => setComment(event.target.value)}
          />
        </FormGroup>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={close} disabled={busy} />
            <Button intent="warning" text="Return to draft" loading={busy} onClick={confirm} />
          </>
        }
      />
    </Dialog>
  );
}
