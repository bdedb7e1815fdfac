import { Callout } from '@blueprintjs/core';
import { Link, Navigate, useSearchParams } from 'react-router-dom';

import { PageLoader } from '@/components/page-loader';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useAuth } from '@/lib/auth';
import { useDemoMode } from '@/lib/server-mode';
import { safeNextPath } from '@/lib/session';

import { PasswordPage } from './password-page';

export function Component() {
  const { status, endReason } = useAuth();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const demo = useDemoMode();

  if (status === 'signed-in') return <Navigate to={next} replace />;
  if (status === 'loading') return <PageLoader label="Checking your session" />;

  return (
    <PasswordPage
      title="Sign in"
      lead="Size isolation mounts under rotating machinery and carry the design to purchase."
      footer={
        <>
          <p className="tc-sign-in-note">
            <Link to="/forgot-password">Forgot your password?</Link>
          </p>
          {demo ? <p className="tc-sign-in-note">Demo accounts are listed in the README.</p> : null}
        </>
      }
    >
      {endReason === 'expired' ? (
        <Callout intent="primary" className="tc-sign-in-notice">
          Your session has ended. Sign in again to continue where you were.
        </Callout>
      ) : null}
      {/* Once signed in, the status changes and the redirect above takes the user on. */}
      <SignInForm />
    </PasswordPage>
  );
}
