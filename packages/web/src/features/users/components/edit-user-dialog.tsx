import { Button, Dialog, DialogBody, DialogFooter, FormGroup, Switch } from '@blueprintjs/core';
import { Form, Formik, useField, type FormikHelpers } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { SelectField } from '@/components/form/select-field';
import { TextField } from '@/components/form/text-field';
import { formFailure } from '@/lib/api-errors';
import { useAuth } from '@/lib/auth';

import { useUpdateUser } from '../api/update-user';
import { editUserSchema, type EditUserValues } from '../schemas/user-schemas';
import type { UpdateUserInput, User } from '../types';
import { ROLE_OPTIONS, UNIT_OPTIONS } from './role-options';

function ActiveSwitch({ disabled, helperText }: { disabled: boolean; helperText?: string }) {
  const [field, , helpers] = useField<boolean>('active');
  return (
    <FormGroup helperText={helperText}>
      <Switch
        label="Active — can sign in"
        checked={field.value}
        disabled={disabled}
        onChange={(event) => void helpers.setValue(event.currentTarget.checked)}
      />
    </FormGroup>
  );
}

/** Only what changed is sent, so a save never overwrites a field the admin did not touch. */
function changedFields(user: User, values: EditUserValues): UpdateUserInput {
  const changes: UpdateUserInput = {};
  const name = values.name.trim();
  if (name !== user.name) changes.name = name;
  if (values.role !== user.role) changes.role = values.role;
  if (values.unitSystem !== user.unitSystem) changes.unitSystem = values.unitSystem;
  if (values.active !== user.active) changes.active = values.active;
  return changes;
}

export interface EditUserDialogProps {
  /** The account being edited; `null` closes the dialog. */
  user: User | null;
  isSelf: boolean;
  onClose: () => void;
}

export function EditUserDialog({ user, isSelf, onClose }: EditUserDialogProps) {
  const updateUser = useUpdateUser();
  const { setUser } = useAuth();
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const submit = async (values: EditUserValues, helpers: FormikHelpers<EditUserValues>) => {
    if (!user) return;
    setFailure(null);
    const changes = changedFields(user, values);
    if (Object.keys(changes).length === 0) {
      close();
      return;
    }
    try {
      const updated = await updateUser.mutateAsync({ id: user.id, changes });
      // Editing yourself here changes the name in the top bar and your units everywhere.
      if (isSelf) setUser(updated);
      close();
    } catch (error) {
      const { fields, general } = formFailure(error, ['name', 'role', 'unitSystem']);
      helpers.setErrors(fields);
      setFailure(general);
    }
  };

  return (
    <Dialog title={user ? `Edit ${user.name}` : 'Edit'} isOpen={user !== null} onClose={close} className="tc-dialog">
      {user ? (
        <Formik<EditUserValues>
          initialValues={{ name: user.name, role: user.role, unitSystem: user.unitSystem, active: user.active }}
          validationSchema={editUserSchema}
          onSubmit={submit}
        >
          {({ isSubmitting }) => (
            <Form noValidate aria-label={`Edit ${user.name}`}>
              <DialogBody>
                <p className="tc-muted">{user.email}</p>
                <TextField name="name" id="edit-user-name" label="Name" autoComplete="off" />
                <SelectField
                  name="role"
                  id="edit-user-role"
                  label="Role"
                  options={ROLE_OPTIONS}
                  disabled={isSelf}
                  helperText={isSelf ? 'You cannot change your own role.' : undefined}
                />
                <SelectField name="unitSystem" id="edit-user-units" label="Units" options={UNIT_OPTIONS} />
                <ActiveSwitch disabled={isSelf} helperText={isSelf ? 'You cannot deactivate your own account.' : undefined} />
                <FormError message={failure} />
              </DialogBody>
              <DialogFooter
                actions={
                  <>
                    <Button text="Cancel" onClick={close} disabled={isSubmitting} />
                    <Button type="submit" intent="primary" text="Save changes" loading={isSubmitting} />
                  </>
                }
              />
            </Form>
          )}
        </Formik>
      ) : null}
    </Dialog>
  );
}
