import { Button, Callout } from '@blueprintjs/core';
import { Form, Formik } from 'formik';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import * as yup from 'yup';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { errorMessage } from '@/lib/api-errors';

import { useConfirmPasswordReset } from '../api/password-reset';

/** The server's minimum length of a password. */
const PASSWORD_MIN_LENGTH = 10;

const schema = yup.object({
  password: yup.string().required('Choose a new password').min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`),
  confirm: yup
    .string()
    .required('Type the new password again')
    .oneOf([yup.ref('password')], 'The two passwords differ'),
});

/** The page the mailed link opens: choose a new password with the link's one-time token. */
export function ResetPasswordForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const [done, setDone] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  if (done) {
    return (
      <Callout intent="success" role="status" className="tc-form-success">
        {done} <Link to="/sign-in">Sign in</Link>
      </Callout>
    );
  }
  return (
    <Formik
      initialValues={{ password: '', confirm: '' }}
      validationSchema={schema}
      onSubmit={async (values) => {
        setFailure(null);
        try {
          setDone((await confirm.mutateAsync({ token, password: values.password })).message);
        } catch (error) {
          setFailure(errorMessage(error));
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Choose a new password">
          <TextField
            name="password"
            id="reset-password"
            label="New password"
            type="password"
            autoComplete="new-password"
            autoFocus
            helperText={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          />
          <TextField name="confirm" id="reset-confirm" label="New password again" type="password" autoComplete="new-password" />
          <FormError message={failure} />
          {failure ? (
            <p className="tc-sign-in-note">
              <Link to="/forgot-password">Ask for a new link</Link>
            </p>
          ) : null}
          <Button type="submit" intent="primary" fill size="large" loading={isSubmitting} text="Set the new password" />
        </Form>
      )}
    </Formik>
  );
}
