import { Button, NonIdealState } from '@blueprintjs/core';
import { OfflineIcon } from '@blueprintjs/icons';
import { Navigate, Outlet, useLocation, useMatches } from 'react-router-dom';

import { Forbidden } from '@/components/errors/forbidden';
import { AppLayout } from '@/components/layout/app-layout';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { ChangePasswordForm } from '@/features/account/components/change-password-form';
import { errorMessage } from '@/lib/api-errors';
import { useAuth } from '@/lib/auth';
import { canUseArea, type Role } from '@/lib/authorization';
import { signInPath } from '@/lib/session';

import type { RouteHandle } from '../../router';

/** Renders the matched page, or the "no access" page when the role may not use its area. */
function AreaOutlet({ role }: { role: Role }) {
  const matches = useMatches();
  const area = [...matches].reverse().find((match) => (match.handle as RouteHandle | undefined)?.area)?.handle as RouteHandle | undefined;
  if (area?.area && !canUseArea(role, area.area)) return <Forbidden />;
  return <Outlet />;
}

/** The signed-in part of the app: sends visitors to sign in, then frames every page. */
export function Component() {
  const { status, user, endReason, loadError, reload, logout, setUser } = useAuth();
  const location = useLocation();

  if (status === 'loading') return <PageLoader label="Loading your session" />;
  if (status === 'error') {
    return (
      <div className="tc-message-page tc-message-page--standalone">
        <NonIdealState
          icon={<OfflineIcon size={40} />}
          title="Tacet cannot load your session"
          description={errorMessage(loadError)}
          action={<Button intent="primary" text="Try again" onClick={reload} />}
        />
      </div>
    );
  }
  if (!user) {
    const target = endReason === 'signed-out' ? '/sign-in' : signInPath(`${location.pathname}${location.search}`);
    return <Navigate to={target} replace />;
  }

  // An admin set a temporary password: nothing else until a new one is chosen (the server refuses the rest too).
  if (user.mustChangePassword) {
    return (
      <AppLayout user={user} onSignOut={logout}>
        <PageHeader
          title="Choose your own password"
          description="An administrator gave you a temporary password. Choose your own before you go on; nobody else will know it."
        />
        <div className="tc-panel tc-narrow-panel">
          <ChangePasswordForm temporary onChanged={() => setUser({ ...user, mustChangePassword: false })} />
        </div>
      </AppLayout>
    );
  }

  // Signing out clears the session; the redirect above then leads to the sign-in page.
  return (
    <AppLayout user={user} onSignOut={logout}>
      <AreaOutlet role={user.role} />
    </AppLayout>
  );
}
