import type { ReactNode } from 'react';

import type { SessionUser } from '@/lib/auth';

import { NavRail } from './nav-rail';
import { TopBar } from './top-bar';

export interface AppLayoutProps {
  user: SessionUser;
  onSignOut: () => void;
  children: ReactNode;
}

/** The signed-in frame: top bar, navigation rail on the left, the page on the right. */
export function AppLayout({ user, onSignOut, children }: AppLayoutProps) {
  return (
    <div className="tc-shell">
      <a className="tc-skip-link" href="#tc-main">
        Skip to content
      </a>
      <TopBar user={user} onSignOut={onSignOut} />
      <div className="tc-shell-body">
        <NavRail role={user.role} />
        <main className="tc-main" id="tc-main" tabIndex={-1}>
          <div className="tc-main-inner">{children}</div>
        </main>
      </div>
    </div>
  );
}
