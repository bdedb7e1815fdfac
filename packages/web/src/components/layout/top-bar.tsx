import { Button } from '@blueprintjs/core';
import { LogOutIcon, MenuIcon, PersonIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';

import { ROLE_LABELS } from '@/lib/authorization';
import type { SessionUser } from '@/lib/auth';

import { Brand } from './brand';

export interface TopBarProps {
  user: SessionUser;
  onSignOut: () => void;
  /** The narrow-screen menu (the button shows only where the rail is hidden). */
  menu: { id: string; open: boolean; onOpen: () => void };
}

/** Slim bar across the top: the menu on narrow screens, the product name, who is signed in, and the way out. */
export function TopBar({ user, onSignOut, menu }: TopBarProps) {
  return (
    <header className="tc-topbar">
      <Button
        className="tc-menu-button"
        variant="minimal"
        icon={<MenuIcon />}
        aria-label="Menu"
        aria-haspopup="dialog"
        aria-expanded={menu.open}
        aria-controls={menu.id}
        onClick={menu.onOpen}
      />
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
      <Button className="tc-sign-out" variant="minimal" icon={<LogOutIcon />} text="Sign out" onClick={onSignOut} />
    </header>
  );
}
