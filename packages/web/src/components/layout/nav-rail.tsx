import { EnvelopeIcon, FolderCloseIcon, HomeIcon, PeopleIcon, ShoppingCartIcon, ThListIcon } from '@blueprintjs/icons';
import type { ReactElement } from 'react';
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

/** The left navigation: only the areas the user's role may use. */
export function NavRail({ role }: { role: Role }) {
  const areas = areasFor(role);
  const groups = (['work', 'administration'] as const)
    .map((group) => ({ group, areas: areas.filter((area) => area.group === group) }))
    .filter((entry) => entry.areas.length > 0);

  return (
    <nav className="tc-rail" aria-label="Main">
      {groups.map(({ group, areas: groupAreas }) => (
        <div className="tc-rail-group" key={group}>
          <h2 className="tc-rail-group-title" id={`tc-rail-${group}`}>
            {GROUP_TITLES[group]}
          </h2>
          <ul aria-labelledby={`tc-rail-${group}`}>
            {groupAreas.map((area) => (
              <li key={area.key}>
                <NavLink
                  to={area.path}
                  end={area.path === '/'}
                  className={({ isActive }) => (isActive ? 'tc-rail-link is-active' : 'tc-rail-link')}
                >
                  {AREA_ICONS[area.key]}
                  <span>{area.label}</span>
                </NavLink>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </nav>
  );
}
