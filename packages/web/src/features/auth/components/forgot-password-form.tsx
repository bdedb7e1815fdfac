import { Button, Callout } from '@blueprintjs/core';
import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { errorMessage } from '@/lib/api-errors';

import { useRequestPasswordReset } from '../api/password-reset';

const schema = yup.object({
  email: yup.string().trim().required('Enter the email address you sign in with').email('Enter an email address such as name@example.com'),
});

/** "Forgot password": asks for a one-time link by e-mail. The answer is the same for any address. */
export function ForgotPasswordForm() {
  const reset = useRequestPasswordReset();
  const [answer, setAnswer] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  if (answer) {
    return (
      <Callout intent="success" role="status" className="tc-form-success">
        {answer}
      </Callout>
    );
  }
  return (
    <Formik
      initialValues={{ email: '' }}
      validationSchema={schema}
      onSubmit={async (values) => {
        setFailure(null);
        try {
          setAnswer((await reset.mutateAsync({ email: values.email.trim() })).message);
        } catch (error) {
          setFailure(errorMessage(error));
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Forgot password">
          <TextField name="email" label="Email" type="email" autoComplete="username" autoFocus />
          <FormError message={failure} />
          <Button type="submit" intent="primary" fill size="large" loading={isSubmitting} text="Send me a link" />
        </Form>
      )}
    </Formik>
  );
}
