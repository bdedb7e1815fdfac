import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { launch, newPage, outsideRequests, SCREENSHOT_DIR, screenshot, signIn } from './browser';

// A new design in the demo project, checked for seismic restraint (ASCE 7-16 §13.3.1). The demo
// catalog gives (invented) restraint ratings to its restrained springs and to some housed springs.
const PROJECT = 'North Loop Chilled Water Plant';
const DESIGN = 'Seismic check skid (browser test)';

async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

async function text(page: Page, testId: string): Promise<string> {
  return ((await page.getByTestId(testId).first().textContent()) ?? '').trim();
}

describe('seismic restraint', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('an engineer turns the restraint check on, sees the design force, and finds restrained mounts with their demand and the governing direction', async () => {
    const page = await newPage(browser);
    await signIn(page, 'engineer@tacet.test');
    await page.goto('/projects');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('heading', { name: PROJECT, level: 1 }).waitFor();
    await page.getByRole('button', { name: 'New design' }).click();
    await page.getByRole('dialog', { name: 'New design' }).getByLabel('Name').fill(DESIGN);
    await page.getByRole('button', { name: 'Create and open' }).click();
    await page.getByRole('heading', { name: DESIGN, level: 1 }).waitFor();

    // An offset machine: the force is resisted unevenly and the governing direction is not along an axis.
    await page.getByLabel('CG x of Machine').fill('0.25');
    await page.getByLabel('CG y of Machine').fill('0.12');

    await page.getByRole('tab', { name: 'Seismic restraint' }).click();
    const panel = page.getByLabel('Seismic restraint', { exact: true });
    await panel.getByText('Seismic restraint (ASCE 7-16)').waitFor();
    await panel.getByText('does not size anchorage').waitFor();
    await page.getByText('Check seismic restraint').click();
    await page.getByLabel('S_DS, design spectral acceleration').fill('0.6');
    await page.getByLabel('I_p, component importance factor').selectOption('1.5');
    await page.getByLabel('z/h, height in the building').fill('0.5');
    await page.getByLabel('Gap to the restraints').fill('5');
    // F_p = 0.4·2.5·0.6·W·(1 + 2·0.5)/(2.0/1.5) = 0.9·W with W = 1000 kg·g = 9806.65 N → 8826 N; gap ≤ 6.35 mm: not doubled
    await page.getByTestId('restraint-fp').waitFor();
    expect(await text(page, 'restraint-fp')).toContain('8,826 N (0.90 × W)');
    expect(await text(page, 'restraint-design-force')).toBe('8,826 N (0.90 × W)');
    await shot(page, 'restraint-01-input');

    // A gap above 0.25 in doubles the force (Table 13.6-1 footnote).
    await page.getByLabel('Gap to the restraints').fill('10');
    await page.getByText(/doubled: the gap exceeds 0.25 in/).waitFor();
    expect(await text(page, 'restraint-design-force')).toContain('17,652 N (1.80 × W)');
    await page.getByLabel('Gap to the restraints').fill('5');

    await page.getByRole('tab', { name: 'Mount selection' }).click();
    await page.getByRole('button', { name: 'Save and find mounts' }).click();
    await page.getByTestId('candidates-table').waitFor();
    await page.getByText('All changes saved').waitFor();

    // The best candidate passes, so it carries restraint ratings that cover the demand.
    await page.locator('.tc-candidate-open').first().click();
    const section = page.getByRole('region', { name: 'Seismic restraint' });
    await section.waitFor();
    await section.getByRole('table', { name: 'Restraint demand per point' }).waitFor();
    expect(await section.getByText('within rating').count()).toBe(4);
    await section.getByText('Restraints within their ratings').waitFor();
    const governing = await text(page, 'restraint-governing');
    expect(governing).toMatch(/^(horizontal restraint|uplift) at point [ABCD]: /);
    const arrow = section.getByTestId('restraint-arrow');
    await arrow.waitFor();
    await shot(page, 'restraint-02-candidate');
    await section.screenshot({ path: join(SCREENSHOT_DIR, 'restraint-02b-candidate-section.png') });

    // Further down, mounts without restraint ratings fail and say why.
    await page.getByLabel('Sort by').selectOption('verdict');
    await page.getByRole('button', { name: 'Ascending' }).click();
    await page.locator('.tc-results-row.is-failing .tc-candidate-open').first().click();
    await page
      .getByTestId('candidate-reasons')
      .getByText(/has no horizontal restraint rating/)
      .first()
      .waitFor();
    const unrated = page.getByRole('region', { name: 'Seismic restraint' });
    await unrated.getByText('no rating').first().waitFor();
    await unrated.screenshot({ path: join(SCREENSHOT_DIR, 'restraint-03-unrated-section.png') });
    await page.context().close();
  });

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
