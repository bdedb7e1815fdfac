import { Callout } from '@blueprintjs/core';
import { Link, useSearchParams } from 'react-router-dom';

import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

import { PasswordPage } from './password-page';

export function Component() {
  const token = useSearchParams()[0].get('token') ?? '';
  return (
    <PasswordPage title="Choose a new password" lead="The link works once, for one hour after it was sent.">
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <Callout intent="warning">
          This page opens from the link in the e-mail. <Link to="/forgot-password">Ask for a link</Link>
        </Callout>
      )}
    </PasswordPage>
  );
}
