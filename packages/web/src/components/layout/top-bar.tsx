import { Button } from '@blueprintjs/core';
import { LogOutIcon, PersonIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';

import { ROLE_LABELS } from '@/lib/authorization';
import type { SessionUser } from '@/lib/auth';

import { Brand } from './brand';

export interface TopBarProps {
  user: SessionUser;
  onSignOut: () => void;
}

/** Slim bar across the top: the product name, who is signed in, and the way out. */
export function TopBar({ user, onSignOut }: TopBarProps) {
  return (
    <header className="tc-topbar">
      <Link to="/" className="tc-topbar-home" aria-label="Tacet home">
        <Brand />
      </Link>
      <div className="tc-topbar-spacer" />
      <Link to="/account" className="tc-topbar-user" title="Your account: name, units and password">
        <PersonIcon className="tc-topbar-user-icon" />
        <span className="tc-topbar-user-name" data-testid="current-user-name">
          {user.name}
        </span>
        <span className="tc-topbar-user-role" data-testid="current-user-role">
          {ROLE_LABELS[user.role]}
        </span>
      </Link>
      <Button variant="minimal" icon={<LogOutIcon />} text="Sign out" onClick={onSignOut} />
    </header>
  );
}
