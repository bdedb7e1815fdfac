import { fileURLToPath } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, newPage, outsideRequests, screenshot, signIn } from './browser';

// The demo data: the released design "CHW pump P-2 skid" carries one invented tap test, and the
// same record is in catalog/demo-tap-test.csv (tools/tap-test/make-demo-tap-test.ts).
const PROJECT = 'North Loop Chilled Water Plant';
const RELEASED = 'CHW pump P-2 skid';
const DEMO_FILE = fileURLToPath(new URL('../../catalog/demo-tap-test.csv', import.meta.url));

async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

async function openMeasured(page: Page): Promise<void> {
  await page.goto('/projects');
  await page.getByRole('link', { name: PROJECT }).click();
  await page.getByRole('link', { name: RELEASED }).click();
  await page.getByRole('heading', { name: RELEASED, level: 1 }).waitFor();
  await page.getByRole('tab', { name: 'Measured' }).click();
  await page.getByTestId('measured-panel').waitFor();
}

describe('as-built verification (Measured tab)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the engineer uploads the demo tap test to the released design and sees the overlay and the verdict', async () => {
    const page = await newPage(browser);
    await signIn(page, 'engineer@tacet.test');
    await openMeasured(page);
    const before = await page.getByRole('table', { name: 'Measurements' }).locator('tbody tr').count();

    const upload = page.getByRole('group', { name: 'Upload a tap test' });
    await upload.getByLabel('The file holds').selectOption('impact');
    await upload.getByLabel('Measurement file').setInputFiles(DEMO_FILE);
    await upload.getByLabel('Where and how it was measured (optional)').fill('Browser test: the demo record again');
    await upload.getByRole('button', { name: 'Upload and compare' }).click();

    await page.getByText('Browser test: the demo record again').waitFor();
    await expect
      .poll(() => page.getByRole('table', { name: 'Measurements' }).locator('tbody tr').count(), { timeout: 15_000 })
      .toBe(before + 1);
    const result = page.getByTestId('verification-result');
    expect((await result.getByTestId('verification-verdict').textContent())?.trim()).toBe('Agrees with the design');
    const deviation = (await result.getByTestId('frequency-deviation').textContent()) ?? '';
    expect(deviation).toMatch(/^\+[2-6]\.\d %/);
    const chart = page.getByTestId('measured-frf-chart');
    await chart.locator('.VictoryContainer svg').nth(1).waitFor();
    // measured points and the predicted curve in both panels
    expect(await chart.locator('.VictoryContainer svg path').count()).toBeGreaterThan(100);
    await shot(page, 'verification-01-uploaded');
    await chart.scrollIntoViewIfNeeded();
    await screenshot(page, 'verification-02-overlay');
    await page.context().close();
  });

  it('a viewer reads the measurements without the upload', async () => {
    const page = await newPage(browser);
    await signIn(page, 'viewer@tacet.test');
    await openMeasured(page);
    await page.getByTestId('verification-result').waitFor();
    expect(await page.getByRole('group', { name: 'Upload a tap test' }).count()).toBe(0);
    await page.getByTestId('measured-frf-chart').locator('.VictoryContainer svg').first().waitFor();
    await shot(page, 'verification-03-viewer');
    await page.context().close();
  });

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
