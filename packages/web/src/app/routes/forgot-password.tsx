import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

import { PasswordPage } from './password-page';

export function Component() {
  return (
    <PasswordPage title="Forgot your password?" lead="Enter the address you sign in with: we e-mail you a link to choose a new password.">
      <ForgotPasswordForm />
    </PasswordPage>
  );
}
