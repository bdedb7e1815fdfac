import { Callout } from '@blueprintjs/core';
import { Navigate, useSearchParams } from 'react-router-dom';

import { Brand } from '@/components/layout/brand';
import { PageLoader } from '@/components/page-loader';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useDocumentTitle } from '@/hooks/use-document-title';
import { useAuth } from '@/lib/auth';
import { safeNextPath } from '@/lib/session';

export function Component() {
  useDocumentTitle('Sign in');
  const { status, endReason } = useAuth();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));

  if (status === 'signed-in') return <Navigate to={next} replace />;
  if (status === 'loading') return <PageLoader label="Checking your session" />;

  return (
    <div className="tc-sign-in">
      <main className="tc-sign-in-card">
        <div className="tc-sign-in-brand">
          <Brand />
        </div>
        <h1 className="tc-sign-in-title">Sign in</h1>
        <p className="tc-sign-in-lead">Size isolation mounts under rotating machinery and carry the design to purchase.</p>
        {endReason === 'expired' ? (
          <Callout intent="primary" className="tc-sign-in-notice">
            Your session has ended. Sign in again to continue where you were.
          </Callout>
        ) : null}
        {/* Once signed in, the status changes and the redirect above takes the user on. */}
        <SignInForm />
        <p className="tc-sign-in-note">Demo accounts are listed in the README.</p>
      </main>
    </div>
  );
}
