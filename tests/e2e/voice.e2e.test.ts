import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cleanUp, startServer } from '../../tools/harness/server.mjs';
import { launch, newPage, screenshot, signIn } from './browser';

// One voice (PRODUCT.md): the design page's tabs carry the glossary's names and the cautions
// from one source under every tab; the sign-in page mentions demo accounts only in demo mode.
const PROJECT = 'North Loop Chilled Water Plant';
const RELEASED = 'CHW pump P-2 skid';
const TABS = ['Equipment', 'Mount layout', 'Running conditions', 'Requirements', 'Seismic restraint', 'Mount selection'];

describe('words, states and cautions on screen (e2e)', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launch();
  });

  afterAll(async () => {
    await browser?.close();
    await cleanUp();
  });

  it('every design tab shows the cautions; the state reads "Released"', async () => {
    const page = await newPage(browser);
    await signIn(page, 'engineer@tacet.test');
    await page.goto('/projects');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('link', { name: RELEASED }).click();
    await page.getByRole('tab', { name: 'Equipment' }).waitFor();
    for (const [index, tab] of TABS.entries()) {
      await page.getByRole('tab', { name: tab }).click();
      const cautions = page.locator('[data-testid="cautions"]:visible').first();
      await cautions.waitFor();
      expect(await cautions.textContent()).toMatch(/qualified, licensed engineer/);
      expect(await cautions.textContent()).toMatch(/confirmed with the supplier before purchase/);
      await page.evaluate('window.scrollTo(0, 0)');
      await screenshot(page, `voice-design-tab-${index + 1}-${tab.toLowerCase().replace(/ /g, '-')}`);
    }
    expect(await page.locator('.tc-status').first().textContent()).toBe('Released');
    expect(await page.locator('body').textContent()).not.toMatch(/in_review|open_spring|massKg/);
  });

  it('the sign-in page names the demo accounts in demo mode', async () => {
    const page = await newPage(browser);
    await page.goto('/sign-in');
    await page.getByText('Demo accounts are listed in the README.').waitFor();
    await screenshot(page, 'voice-sign-in-demo');
  });

  it('outside demo mode the sign-in page says nothing of demo accounts', async () => {
    const server = await startServer({
      demo: false,
      web: true,
      env: {
        JWT_SECRET: 'a-secret-for-this-test-only-0123456789abcdef',
        TACET_ADMIN_EMAIL: 'admin@example.test',
        TACET_ADMIN_PASSWORD: 'an admin password 1',
      },
    });
    try {
      const health = (await (await fetch(new URL('/api/health', server.baseURL))).json()) as { demo: boolean };
      expect(health.demo).toBe(false);
      const context = await browser.newContext({ baseURL: server.baseURL, viewport: { width: 1400, height: 900 } });
      const page = await context.newPage();
      const healthAnswered = page.waitForResponse((r) => r.url().endsWith('/api/health'));
      await page.goto('/sign-in');
      await page.getByRole('button', { name: 'Sign in' }).waitFor();
      await healthAnswered; // the answer that would show the note has come
      await page.waitForTimeout(300);
      expect(await page.getByText(/demo accounts/i).count()).toBe(0);
      await screenshot(page, 'voice-sign-in-not-demo');
      await context.close();
    } finally {
      await server.stop();
    }
  });
});
