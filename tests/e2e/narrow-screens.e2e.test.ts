import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../tools/harness/fixtures.mjs';
import { join } from 'node:path';
import { launch, newPage, outsideRequests, screenshot, SCREENSHOT_DIR, signIn } from './browser';

// The app on a phone (390 px) and an upright tablet (768 px): the navigation collapses into a
// menu button that opens the links in a drawer, and no page scrolls sideways (tables scroll
// inside their own box, the design tabs wrap). Demo data as PRODUCT.md "Demo".
const PROJECT = 'North Loop Chilled Water Plant';
const DRAFT = 'CHW pump P-3 skid';

const OVERVIEW = { link: 'Overview', path: '/', heading: /^Welcome, / };
const PROJECTS = { link: 'Projects', path: '/projects', heading: /^Projects$/ };
const CATALOG = { link: 'Catalog', path: '/catalog', heading: /^Catalog$/ };
const PURCHASING = { link: 'Purchasing', path: '/purchasing', heading: /^Purchasing$/ };
const PEOPLE = { link: 'People', path: '/admin/users', heading: /^People$/ };
const OUTBOX = { link: 'Outbox', path: '/admin/outbox', heading: /^Outbox$/ };

/** What each role reaches through the menu (PRODUCT.md roles), in menu order. */
const AREAS: Record<string, { link: string; path: string; heading: RegExp }[]> = {
  [DEMO_ACCOUNTS.admin]: [OVERVIEW, PROJECTS, CATALOG, PURCHASING, PEOPLE, OUTBOX],
  [DEMO_ACCOUNTS.catalogManager]: [OVERVIEW, CATALOG],
  [DEMO_ACCOUNTS.engineer]: [OVERVIEW, PROJECTS, CATALOG],
  [DEMO_ACCOUNTS.purchaser]: [OVERVIEW, PROJECTS, CATALOG, PURCHASING],
  [DEMO_ACCOUNTS.viewer]: [OVERVIEW, PROJECTS, CATALOG],
};

const WIDTHS = [
  { width: 390, height: 844, name: 'phone' },
  { width: 768, height: 1024, name: 'tablet' },
] as const;

/** How far the page itself scrolls sideways (0 when it does not). */
function pageOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.scrollingElement!.scrollWidth - window.innerWidth);
}

async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

/** The heading of the page, once the page has loaded its data (no spinner left in the main area). */
async function settle(page: Page): Promise<void> {
  await page.locator('main h1').first().waitFor();
  await page.locator('main .bp6-spinner').first().waitFor({ state: 'detached', timeout: 15_000 });
}

/** Opens the menu from the top bar and follows one of its links; the menu closes behind it. */
async function goThroughMenu(page: Page, link: string): Promise<void> {
  const button = page.getByRole('button', { name: 'Menu' });
  await button.click();
  const menu = page.getByRole('navigation', { name: 'Main' });
  await menu.getByRole('link', { name: link, exact: true }).click();
  await menu.waitFor({ state: 'hidden' });
  expect(await button.getAttribute('aria-expanded')).toBe('false');
}

/** Each tab of a tab list lies within the list (none cut off at the right). */
async function tabsOutsideTheirList(tabList: Locator): Promise<string[]> {
  return tabList.evaluate((list) => {
    const box = list.getBoundingClientRect();
    return Array.from(list.querySelectorAll('[role="tab"]'))
      .filter((tab) => tab.getBoundingClientRect().right > box.right + 0.5)
      .map((tab) => tab.textContent ?? '');
  });
}

describe.each(WIDTHS)('at $width px ($name)', ({ width, height }) => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it.each(Object.keys(AREAS))('%s reaches each of their pages through the menu, none scrolling sideways', async (email) => {
    const page = await newPage(browser, { width, height });
    await signIn(page, email);
    // the rail beside the page is gone; the top bar's menu button stands in for it
    expect(await page.getByRole('navigation', { name: 'Main' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Menu' }).click();
    const menu = page.getByRole('navigation', { name: 'Main' });
    await menu.waitFor();
    const links = menu.getByRole('link');
    expect(await links.allInnerTexts()).toEqual(AREAS[email]!.map((area) => area.link));
    // the icons are drawn at their size (they were once squeezed to 1 × 1 px)
    for (const size of await menu.locator('.tc-rail-link svg').evaluateAll((icons) => icons.map((icon) => icon.getBoundingClientRect()))) {
      expect(size.width).toBeGreaterThanOrEqual(14);
      expect(size.height).toBeGreaterThanOrEqual(14);
    }
    // the drawer has slid in and rests against the left edge, nothing cut off
    await page.waitForFunction(() => document.querySelector('.tc-menu-drawer')?.getBoundingClientRect().left === 0);
    if (email === DEMO_ACCOUNTS.admin) await screenshot(page, `narrow-${width}-01-menu`);
    await page.keyboard.press('Escape');
    await menu.waitFor({ state: 'hidden' });

    for (const area of AREAS[email]!) {
      await goThroughMenu(page, area.link);
      await page.waitForURL((url) => url.pathname === area.path);
      await page.getByRole('heading', { level: 1, name: area.heading }).waitFor();
      await settle(page);
      expect(await pageOverflow(page), `${area.path} scrolls sideways`).toBeLessThanOrEqual(0);
      if (email === DEMO_ACCOUNTS.admin) await shot(page, `narrow-${width}-02-${area.link.toLowerCase()}`);
    }
    await page.context().close();
  });

  it('the design page: the tabs wrap, every tab fits, tables scroll in their own box', async () => {
    const page = await newPage(browser, { width, height });
    await signIn(page, DEMO_ACCOUNTS.engineer);
    await goThroughMenu(page, 'Projects');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('heading', { name: PROJECT, level: 1 }).waitFor();
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    await shot(page, `narrow-${width}-03-project`);
    await page.getByRole('link', { name: DRAFT }).click();
    await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();

    const tabList = page.locator('.tc-design-tabs > [role="tablist"]');
    const tabs = await tabList.getByRole('tab').allInnerTexts();
    expect(tabs.length).toBeGreaterThanOrEqual(6);
    expect(await tabsOutsideTheirList(tabList)).toEqual([]);
    for (const [index, tab] of tabs.entries()) {
      const tabButton = tabList.getByRole('tab').nth(index);
      await tabButton.click();
      const panelId = await tabButton.getAttribute('aria-controls');
      await page.locator(`[id="${panelId}"]`).waitFor();
      expect(await pageOverflow(page), `the ${tab} tab scrolls the page sideways`).toBeLessThanOrEqual(0);
      await shot(page, `narrow-${width}-04-design-${index + 1}`);
    }

    // the ranked candidates scroll inside their own box
    const table = page.getByTestId('candidates-table');
    if ((await table.count()) === 0) await page.getByRole('button', { name: /Find mounts/ }).click();
    await table.waitFor();
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    expect(await table.evaluate((box) => box.scrollWidth > box.clientWidth)).toBe(true);
    await table.scrollIntoViewIfNeeded();
    await page.locator('.tc-candidates').screenshot({ path: join(SCREENSHOT_DIR, `narrow-${width}-05-candidates.png`) });
    await page.context().close();
  });

  it('the purchasing pages and the catalog', async () => {
    const page = await newPage(browser, { width, height });
    await signIn(page, DEMO_ACCOUNTS.purchaser);
    await goThroughMenu(page, 'Purchasing');
    const queue = page.getByRole('table', { name: 'Released designs' });
    await queue.waitFor();
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    await queue.locator('a[href^="/purchasing/designs/"]').first().click();
    await page.getByRole('table', { name: 'Bill of materials' }).waitFor();
    await settle(page);
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    await shot(page, `narrow-${width}-06-purchasing-design`);

    await goThroughMenu(page, 'Catalog');
    await page.getByRole('heading', { name: 'Catalog', level: 1 }).waitFor();
    await page.getByText(/^[\d,]+ mounts$/).waitFor();
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    await shot(page, `narrow-${width}-07-catalog`);

    // a mount's details open in a drawer that takes the screen (up to 560 px), not half of it
    await page
      .getByRole('region', { name: 'Catalog mounts' })
      .getByRole('button', { name: /^[A-Z]{2}-/ })
      .first()
      .click();
    const drawer = page.getByRole('dialog', { name: /^Mount / });
    await drawer.getByRole('figure').first().waitFor();
    const drawerWidth = await page.locator('.tc-mount-drawer').evaluate((el) => el.getBoundingClientRect().width);
    expect(drawerWidth).toBeGreaterThanOrEqual(Math.min(width, 560) - 1);
    await page.evaluate('window.scrollTo(0, 0)');
    await screenshot(page, `narrow-${width}-08-mount-drawer`);
    await page.context().close();
  });
});

it('loads nothing from outside hosts', () => {
  expect(outsideRequests).toEqual([]);
});
