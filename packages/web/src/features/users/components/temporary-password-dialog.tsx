import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup } from '@blueprintjs/core';
import { useState, type FormEvent } from 'react';

import { FormError } from '@/components/form/form-error';
import { errorMessage } from '@/lib/api-errors';

import { useSetTemporaryPassword } from '../api/set-temporary-password';
import type { User } from '../types';

const MIN_LENGTH = 10;

/** An admin gives someone a temporary password to pass on; they choose their own at the next sign-in. */
export function TemporaryPasswordDialog({ user, onClose }: { user: User; onClose: () => void }) {
  const setPassword = useSetTemporaryPassword();
  const [password, setPasswordText] = useState('');
  const [failure, setFailure] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const problem = password.length > 0 && password.length < MIN_LENGTH ? `Use at least ${MIN_LENGTH} characters.` : null;

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (password.length < MIN_LENGTH) return;
    setFailure(null);
    try {
      await setPassword.mutateAsync({ id: user.id, password });
      setDone(true);
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    <Dialog title={`Temporary password for ${user.name}`} isOpen onClose={onClose} className="tc-dialog">
      <form onSubmit={(event) => void submit(event)} aria-label="Temporary password">
        <DialogBody>
          {done ? (
            <Callout intent="success" role="status">
              Set. Pass it on to {user.name} in person or by phone; at the next sign-in they must choose their own.
            </Callout>
          ) : (
            <>
              <p>{user.name} signs in with it once and must then choose their own password.</p>
              <FormGroup
                label="Temporary password"
                labelFor="temporary-password"
                intent={problem ? 'danger' : 'none'}
                helperText={problem ?? `At least ${MIN_LENGTH} characters.`}
              >
                <InputGroup
                  id="temporary-password"
                  autoComplete="off"
                  value={password}
                  onChange={(event) => setPasswordText(event.target.value)}
                />
              </FormGroup>
              <FormError message={failure} />
            </>
          )}
        </DialogBody>
        <DialogFooter
          actions={
            done ? (
              <Button intent="primary" text="Close" onClick={onClose} />
            ) : (
              <>
                <Button text="Cancel" onClick={onClose} />
                <Button
                  type="submit"
                  intent="primary"
                  text="Set temporary password"
                  loading={setPassword.isPending}
                  disabled={password.length < MIN_LENGTH}
                />
              </>
            )
          }
        />
      </form>
    </Dialog>
  );
}
