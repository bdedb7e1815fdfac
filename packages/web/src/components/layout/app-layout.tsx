import { Drawer, Position } from '@blueprintjs/core';
import { useState, type ReactNode } from 'react';

import type { SessionUser } from '@/lib/auth';

import { Brand } from './brand';
import { NavRail } from './nav-rail';
import { TopBar } from './top-bar';

export interface AppLayoutProps {
  user: SessionUser;
  onSignOut: () => void;
  children: ReactNode;
}

/** The id of the narrow-screen menu, named by the menu button's aria-controls. */
const MENU_ID = 'tc-nav-menu';

/**
 * The signed-in frame: top bar, navigation rail on the left, the page on the right. Below
 * 900 px (phones, tablets upright) the rail gives way to a menu button in the top bar that opens
 * the same links in a drawer from the left (app.css "Narrow screens").
 */
export function AppLayout({ user, onSignOut, children }: AppLayoutProps) {
  const [menuOpen, setMenuOpen] = useState(false);
  const closeMenu = () => setMenuOpen(false);
  return (
    <div className="tc-shell">
      <a className="tc-skip-link" href="#tc-main">
        Skip to content
      </a>
      <TopBar user={user} onSignOut={onSignOut} menu={{ id: MENU_ID, open: menuOpen, onOpen: () => setMenuOpen(true) }} />
      <div className="tc-shell-body">
        <NavRail role={user.role} />
        <main className="tc-main" id="tc-main" tabIndex={-1}>
          <div className="tc-main-inner">{children}</div>
        </main>
      </div>
      <Drawer
        isOpen={menuOpen}
        onClose={closeMenu}
        position={Position.LEFT}
        size="min(300px, 85vw)"
        title={<Brand />}
        className="tc-menu-drawer"
      >
        <div id={MENU_ID}>
          <NavRail role={user.role} onNavigate={closeMenu} className="tc-rail tc-rail--menu" />
        </div>
      </Drawer>
    </div>
  );
}
