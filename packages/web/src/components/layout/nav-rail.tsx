import { EnvelopeIcon, FolderCloseIcon, HomeIcon, PeopleIcon, ShoppingCartIcon, ThListIcon } from '@blueprintjs/icons';
import { useId, type ReactElement } from 'react';
import { NavLink } from 'react-router-dom';

import { areasFor, type Area, type AreaKey, type Role } from '@/lib/authorization';

const AREA_ICONS: Record<AreaKey, ReactElement> = {
  overview: <HomeIcon />,
  projects: <FolderCloseIcon />,
  catalog: <ThListIcon />,
  purchasing: <ShoppingCartIcon />,
  people: <PeopleIcon />,
  outbox: <EnvelopeIcon />,
};

const GROUP_TITLES: Record<Area['group'], string> = {
  work: 'Work',
  administration: 'Administration',
};

export interface NavRailProps {
  role: Role;
  /** Called when a link is followed (the narrow-screen menu closes itself). */
  onNavigate?: () => void;
  /** The nav's class: `tc-rail` beside the page (the default), `tc-rail tc-rail--menu` inside the narrow-screen menu. */
  className?: string;
}

/** The main navigation: only the areas the user's role may use. */
export function NavRail({ role, onNavigate, className = 'tc-rail' }: NavRailProps) {
  const areas = areasFor(role);
  // the rail and the phone menu may both be in the page: their group headings need their own ids
  const idPrefix = useId();
  const groups = (['work', 'administration'] as const)
    .map((group) => ({ group, areas: areas.filter((area) => area.group === group) }))
    .filter((entry) => entry.areas.length > 0);

  return (
    <nav className={className} aria-label="Main">
      {groups.map(({ group, areas: groupAreas }) => (
        <div className="tc-rail-group" key={group}>
          <h2 className="tc-rail-group-title" id={`${idPrefix}-${group}`}>
            {GROUP_TITLES[group]}
          </h2>
          <ul aria-labelledby={`${idPrefix}-${group}`}>
            {groupAreas.map((area) => (
              <li key={area.key}>
                <NavLink
                  to={area.path}
                  end={area.path === '/'}
                  onClick={onNavigate}
                  className={({ isActive }) => (isActive ? 'tc-rail-link is-active' : 'tc-rail-link')}
                >
                  {AREA_ICONS[area.key]}
                  <span className="tc-rail-label">{area.label}</span>
                </NavLink>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </nav>
  );
}
