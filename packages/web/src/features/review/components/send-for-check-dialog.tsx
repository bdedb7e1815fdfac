import { Button, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, TextArea } from '@blueprintjs/core';
import { useState } from 'react';

import { useCheckers } from '../api/get-checkers';

export interface SendForCheckDialogProps {
  designId: number;
  busy: boolean;
  /** The checker's comment when the design came back: the note becomes the reply to it. */
  returnComment: string | null;
  onCancel: () => void;
  onConfirm: (note: string, checkerId: number | undefined) => void;
}

const NOTE_MAX = 2000;

/**
 * A note for the checker (the reply, when the design came back) and, optionally, the engineer
 * asked to check. No `<form>`: the dialog is rendered inside the design page's form.
 */
export function SendForCheckDialog({ designId, busy, returnComment, onCancel, onConfirm }: SendForCheckDialogProps) {
  const checkers = useCheckers(designId, true);
  const [note, setNote] = useState('');
  const [checker, setChecker] = useState('');
  const tooLong = note.length > NOTE_MAX;
  const label = returnComment ? 'Your reply to the comment (optional)' : 'Note to the checker (optional)';

  return (
    <Dialog title="Send for check" isOpen onClose={onCancel} className="tc-dialog">
      <DialogBody>
        {returnComment ? (
          <div className="tc-review-quote">
            <span className="tc-muted">The design came back with this comment:</span>
            <q className="tc-review-comment">{returnComment}</q>
          </div>
        ) : (
          <p>Another engineer checks the design and releases it or sends it back with a comment.</p>
        )}
        <FormGroup
          label={label}
          labelFor="send-note"
          intent={tooLong ? 'danger' : 'none'}
          helperText={tooLong ? `Keep it under ${NOTE_MAX} characters.` : 'The checker sees it with what changed since the last time.'}
        >
          <TextArea id="send-note" fill rows={3} autoFocus value={note} onChange={(event) => setNote(event.target.value)} />
        </FormGroup>
        <FormGroup label="Ask someone to check it" labelFor="send-checker" helperText="Only they are told; anyone else may still check it.">
          <HTMLSelect id="send-checker" fill value={checker} onChange={(event) => setChecker(event.target.value)}>
            <option value="">Any engineer (all are told)</option>
            {(checkers.data ?? []).map((person) => (
              <option key={person.id} value={person.id}>
                {person.name}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onCancel} disabled={busy} />
            <Button
              intent="primary"
              text="Send for check"
              loading={busy}
              disabled={tooLong}
              onClick={() => onConfirm(note.trim(), checker ? Number(checker) : undefined)}
            />
          </>
        }
      />
    </Dialog>
  );
}
