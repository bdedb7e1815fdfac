import { NavLink } from 'react-router-dom';

import './catalog.css';

export interface CatalogSectionNavProps {
  /** Catalog managers and admins also see the import page. */
  canImport: boolean;
}

const linkClass = ({ isActive }: { isActive: boolean }) => (isActive ? 'tc-section-nav-link is-active' : 'tc-section-nav-link');

/** The catalog area's own sections: the mounts, the CSV import (writers only), the suppliers. */
export function CatalogSectionNav({ canImport }: CatalogSectionNavProps) {
  return (
    <nav className="tc-section-nav" aria-label="Catalog sections">
      <NavLink to="/catalog" end className={linkClass}>
        Mounts
      </NavLink>
      {canImport ? (
        <NavLink to="/catalog/import" className={linkClass}>
          Import
        </NavLink>
      ) : null}
      <NavLink to="/catalog/suppliers" className={linkClass}>
        Suppliers
      </NavLink>
    </nav>
  );
}
