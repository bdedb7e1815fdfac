import { AREAS, areasFor, canDesign, canUseArea, canWriteCatalog, isRole, ROLES, type AreaKey, type Role } from './authorization';

// The role → area table from the product's role list (PRODUCT.md "Who uses it") and the
// navigation brief. Written out in full so a change to the table must change this test too.
const EXPECTED: Record<Role, AreaKey[]> = {
  admin: ['overview', 'projects', 'catalog', 'purchasing', 'people', 'outbox'],
  catalog_manager: ['overview', 'catalog'],
  engineer: ['overview', 'projects', 'catalog'],
  purchaser: ['overview', 'projects', 'catalog', 'purchasing'],
  viewer: ['overview', 'projects', 'catalog'],
};

describe('authorization table', () => {
  it.each(ROLES)('%s sees exactly its areas, in navigation order', (role) => {
    expect(areasFor(role).map((area) => area.key)).toEqual(EXPECTED[role]);
  });

  it('gives People and Outbox to admins only', () => {
    for (const role of ROLES) {
      expect(canUseArea(role, 'people')).toBe(role === 'admin');
      expect(canUseArea(role, 'outbox')).toBe(role === 'admin');
    }
  });

  it('lets every role use the overview and the catalog', () => {
    for (const role of ROLES) {
      expect(canUseArea(role, 'overview')).toBe(true);
      expect(canUseArea(role, 'catalog')).toBe(true);
    }
  });

  it('has one path and one label per area', () => {
    expect(new Set(AREAS.map((area) => area.path)).size).toBe(AREAS.length);
    expect(AREAS.map((area) => area.label)).toEqual(['Overview', 'Projects', 'Catalog', 'Purchasing', 'People', 'Outbox']);
  });

  it('recognises only the five role strings of the API', () => {
    expect(ROLES).toEqual(['admin', 'catalog_manager', 'engineer', 'purchaser', 'viewer']);
    expect(isRole('engineer')).toBe(true);
    expect(isRole('Engineer')).toBe(false);
    expect(isRole(undefined)).toBe(false);
  });
});

describe('design rights', () => {
  it('lets engineers and admins create and change designs, nobody else', () => {
    expect(ROLES.filter((role) => canDesign(role))).toEqual(['admin', 'engineer']);
  });
});

describe('catalog rights', () => {
  it('lets catalog managers and admins change and import the catalog, nobody else', () => {
    expect(ROLES.filter((role) => canWriteCatalog(role))).toEqual(['admin', 'catalog_manager']);
  });
});
