import { Button } from '@blueprintjs/core';
import { Form, Formik } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { errorMessage } from '@/lib/api-errors';
import { useAuth, type SessionUser } from '@/lib/auth';

import { signInSchema, type SignInValues } from '../schemas/sign-in-schema';

const INITIAL_VALUES: SignInValues = { email: '', password: '' };

/** Email and password; on success the session starts and the sign-in route moves on. */
export function SignInForm({ onSignedIn }: { onSignedIn?: (user: SessionUser) => void }) {
  const { login } = useAuth();
  const [failure, setFailure] = useState<string | null>(null);

  return (
    <Formik<SignInValues>
      initialValues={INITIAL_VALUES}
      validationSchema={signInSchema}
      onSubmit={async (values) => {
        setFailure(null);
        try {
          const user = await login({ email: values.email.trim(), password: values.password });
          onSignedIn?.(user);
        } catch (error) {
          setFailure(errorMessage(error));
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Sign in">
          <TextField name="email" label="Email" type="email" autoComplete="username" autoFocus />
          <TextField name="password" label="Password" type="password" autoComplete="current-password" />
          <FormError message={failure} />
          <Button type="submit" intent="primary" fill size="large" loading={isSubmitting} text="Sign in" />
        </Form>
      )}
    </Formik>
  );
}
