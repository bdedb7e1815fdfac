import { fireEvent, screen, waitFor, within } from '@testing-library/react';

import { ROLES, type Role } from '@/lib/authorization';
import { renderApp } from '@/testing/render';

// What each role must see in the main navigation (PRODUCT.md roles; People and Outbox are admin-only).
const EXPECTED_LINKS: Record<Role, string[]> = {
  admin: ['Overview', 'Projects', 'Catalog', 'Purchasing', 'People', 'Outbox'],
  catalog_manager: ['Overview', 'Catalog'],
  engineer: ['Overview', 'Projects', 'Catalog'],
  purchaser: ['Overview', 'Projects', 'Catalog', 'Purchasing'],
  viewer: ['Overview', 'Projects', 'Catalog'],
};

const HREFS: Record<string, string> = {
  Overview: '/',
  Projects: '/projects',
  Catalog: '/catalog',
  Purchasing: '/purchasing',
  People: '/admin/users',
  Outbox: '/admin/outbox',
};

describe('navigation rail', () => {
  it.each(ROLES)('shows the %s role exactly its allowed areas', async (role) => {
    renderApp({ signedInAs: role, path: '/' });
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    const links = within(nav).getAllByRole('link');
    expect(links.map((link) => link.textContent)).toEqual(EXPECTED_LINKS[role]);
    for (const link of links) expect(link).toHaveAttribute('href', HREFS[link.textContent ?? '']);
  });

  it('marks the current area', async () => {
    renderApp({ signedInAs: 'engineer', path: '/catalog' });
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Catalog' })).toHaveAttribute('aria-current', 'page');
    expect(within(nav).getByRole('link', { name: 'Overview' })).not.toHaveAttribute('aria-current');
  });

  it('lets the user move between areas', async () => {
    const { user, router } = renderApp({ signedInAs: 'purchaser', path: '/' });
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    await user.click(within(nav).getByRole('link', { name: 'Purchasing' }));
    expect(await screen.findByRole('heading', { name: 'Purchasing', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/purchasing');
  });
});

// On narrow screens (app.css) the rail is hidden and the top bar's menu button opens the same links in a drawer.
describe('the narrow-screen menu', () => {
  it('opens the role’s links in a drawer, follows one and closes behind it', async () => {
    const { user, router } = renderApp({ signedInAs: 'purchaser', path: '/' });
    const button = await screen.findByRole('button', { name: 'Menu' });
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(screen.getAllByRole('navigation', { name: 'Main' })).toHaveLength(1);

    await user.click(button);
    expect(button).toHaveAttribute('aria-expanded', 'true');
    const [, menu] = screen.getAllByRole('navigation', { name: 'Main' });
    expect(
      within(menu!)
        .getAllByRole('link')
        .map((link) => link.textContent),
    ).toEqual(EXPECTED_LINKS.purchaser);

    await user.click(within(menu!).getByRole('link', { name: 'Purchasing' }));
    expect(await screen.findByRole('heading', { name: 'Purchasing', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/purchasing');
    await waitFor(() => expect(screen.getAllByRole('navigation', { name: 'Main' })).toHaveLength(1));
    expect(button).toHaveAttribute('aria-expanded', 'false');
  });

  it('closes with Escape', async () => {
    const { user } = renderApp({ signedInAs: 'viewer', path: '/' });
    await user.click(await screen.findByRole('button', { name: 'Menu' }));
    const navigations = screen.getAllByRole('navigation', { name: 'Main' });
    expect(navigations).toHaveLength(2);
    // Escape pressed inside the drawer (a real browser moves the focus there; jsdom does not
    // reliably, so the key goes to the drawer's own navigation; the browser test presses it for real).
    fireEvent.keyDown(navigations[1]!, { key: 'Escape', code: 'Escape', keyCode: 27, which: 27 });
    await waitFor(() => expect(screen.getAllByRole('navigation', { name: 'Main' })).toHaveLength(1));
  });
});
