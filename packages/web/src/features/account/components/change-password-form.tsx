import { Button, Callout } from '@blueprintjs/core';
import { Form, Formik, type FormikHelpers } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { formFailure } from '@/lib/api-errors';

import { useChangePassword } from '../api/change-password';
import { changePasswordSchema, PASSWORD_MIN_LENGTH, type ChangePasswordValues } from '../schemas/account-schemas';

const EMPTY: ChangePasswordValues = { currentPassword: '', newPassword: '', confirmPassword: '' };

/**
 * Change the signed-in user's password (`POST /api/auth/me/password`). `temporary`: the
 * current password is the one an admin gave; `onChanged` runs once the new one is set.
 */
export function ChangePasswordForm({ temporary = false, onChanged }: { temporary?: boolean; onChanged?: () => void } = {}) {
  const changePassword = useChangePassword();
  const [failure, setFailure] = useState<string | null>(null);
  const [changed, setChanged] = useState(false);

  const submit = async (values: ChangePasswordValues, helpers: FormikHelpers<ChangePasswordValues>) => {
    setFailure(null);
    setChanged(false);
    try {
      await changePassword.mutateAsync({ currentPassword: values.currentPassword, newPassword: values.newPassword });
      helpers.resetForm({ values: EMPTY });
      setChanged(true);
      onChanged?.();
    } catch (error) {
      const { fields, general } = formFailure(error, ['currentPassword', 'newPassword', 'confirmPassword']);
      helpers.setErrors(fields);
      setFailure(general);
    }
  };

  return (
    <Formik<ChangePasswordValues> initialValues={EMPTY} validationSchema={changePasswordSchema} onSubmit={submit}>
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Change password">
          <TextField
            name="currentPassword"
            id="current-password"
            label={temporary ? 'Temporary password' : 'Current password'}
            type="password"
            autoComplete="current-password"
          />
          <TextField
            name="newPassword"
            id="new-password"
            label="New password"
            type="password"
            autoComplete="new-password"
            helperText={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          />
          <TextField name="confirmPassword" id="confirm-password" label="New password again" type="password" autoComplete="new-password" />
          <FormError message={failure} />
          {changed ? (
            <Callout intent="success" className="tc-form-success" role="status">
              Your password has been changed. Use the new one next time you sign in.
            </Callout>
          ) : null}
          <Button type="submit" intent="primary" text="Change password" loading={isSubmitting} />
        </Form>
      )}
    </Formik>
  );
}
