import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, newPage, outsideRequests, screenshot, signIn } from './browser';

// What each role sees in the navigation (PRODUCT.md roles; the client hides what a role may not do).
const NAV = ['Overview', 'Projects', 'Catalog', 'Purchasing', 'People', 'Outbox'];
const EXPECTED: Record<string, string[]> = {
  'admin@tacet.test': NAV,
  'catalog@tacet.test': ['Overview', 'Catalog'],
  'engineer@tacet.test': ['Overview', 'Projects', 'Catalog'],
  'checker@tacet.test': ['Overview', 'Projects', 'Catalog'],
  'buyer@tacet.test': ['Overview', 'Purchasing', 'Projects', 'Catalog'],
  'viewer@tacet.test': ['Overview', 'Projects', 'Catalog'],
};

describe('sign-in and role-aware navigation', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const [email, visible] of Object.entries(EXPECTED)) {
    it(`${email} signs in and sees only the areas of the role`, async () => {
      const page = await newPage(browser);
      await signIn(page, email);
      const nav = page.getByRole('navigation');
      for (const item of NAV) {
        const link = nav.getByRole('link', { name: item, exact: true });
        if (visible.includes(item)) await expect(link.count()).resolves.toBe(1);
        else await expect(link.count()).resolves.toBe(0);
      }
      await screenshot(page, `overview-${email.split('@')[0]}`);
      await page.context().close();
    });
  }

  it('an engineer opens a deep link, a viewer is kept out of the people admin page', async () => {
    const engineer = await newPage(browser);
    await signIn(engineer, 'engineer@tacet.test');
    await engineer.goto('/account');
    const name = engineer.getByLabel('Name');
    await name.waitFor();
    expect(await name.inputValue()).toBe('Erin Engineer');
    await expect(engineer.getByTestId('current-user-name').textContent()).resolves.toContain('Erin Engineer');
    await screenshot(engineer, 'account-engineer');
    await engineer.context().close();

    const viewer = await newPage(browser);
    await signIn(viewer, 'viewer@tacet.test');
    await viewer.goto('/admin/users');
    await viewer.getByText('Your role does not give access to this page').waitFor();
    await screenshot(viewer, 'forbidden-viewer');
    await viewer.context().close();
  });

  it('a wrong password is explained in words and signs nobody in', async () => {
    const page = await newPage(browser);
    await page.goto('/sign-in');
    await page.getByLabel('Email').fill('engineer@tacet.test');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Email or password is incorrect').waitFor();
    await screenshot(page, 'sign-in-wrong-password');
    await page.context().close();
  });

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
