import { roleValues, type ApiSchemas } from '@/api/schema';

/**
 * Who may use which area of the app. This is the client's single table of roles and areas:
 * the navigation, the route guards and the overview all read it. The server enforces the
 * same rules on every API route; hiding here only keeps the screen honest.
 */
export const ROLES = roleValues;
/** A role as the API names it (generated from the server's OpenAPI document). */
export type Role = ApiSchemas['Role'];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  catalog_manager: 'Catalog manager',
  engineer: 'Engineer',
  purchaser: 'Purchaser',
  viewer: 'Viewer',
};

export type AreaKey = 'overview' | 'projects' | 'catalog' | 'purchasing' | 'people' | 'outbox';

export interface Area {
  key: AreaKey;
  /** Visible text of the navigation link. */
  label: string;
  path: string;
  group: 'work' | 'administration';
  roles: readonly Role[];
}

const EVERYONE = ROLES;

/** Areas in navigation order. */
export const AREAS: readonly Area[] = [
  { key: 'overview', label: 'Overview', path: '/', group: 'work', roles: EVERYONE },
  {
    key: 'projects',
    label: 'Projects',
    path: '/projects',
    group: 'work',
    roles: ['admin', 'engineer', 'purchaser', 'viewer'],
  },
  { key: 'catalog', label: 'Catalog', path: '/catalog', group: 'work', roles: EVERYONE },
  { key: 'purchasing', label: 'Purchasing', path: '/purchasing', group: 'work', roles: ['admin', 'purchaser'] },
  { key: 'people', label: 'People', path: '/admin/users', group: 'administration', roles: ['admin'] },
  { key: 'outbox', label: 'Outbox', path: '/admin/outbox', group: 'administration', roles: ['admin'] },
];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function getArea(key: AreaKey): Area {
  const area = AREAS.find((candidate) => candidate.key === key);
  if (!area) throw new Error(`Unknown area ${key}`);
  return area;
}

export function canUseArea(role: Role, key: AreaKey): boolean {
  return getArea(key).roles.includes(role);
}

/** The areas a role sees in the navigation, in navigation order. */
export function areasFor(role: Role): Area[] {
  return AREAS.filter((area) => area.roles.includes(role));
}

/** Roles that create projects and designs, run selections and save designs (PRODUCT.md roles). */
export const DESIGNER_ROLES: readonly Role[] = ['admin', 'engineer'];

export function canDesign(role: Role): boolean {
  return DESIGNER_ROLES.includes(role);
}

/** Roles that add, edit, retire and import catalog mounts and suppliers (PRODUCT.md roles). */
export const CATALOG_WRITER_ROLES: readonly Role[] = ['admin', 'catalog_manager'];

export function canWriteCatalog(role: Role): boolean {
  return CATALOG_WRITER_ROLES.includes(role);
}
