import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, newPage, outsideRequests, screenshot, signIn } from './browser';

// The demo data (PRODUCT.md "Demo"): project "North Loop Chilled Water Plant" with a released
// design "CHW pump P-2 skid" and a draft "CHW pump P-3 skid" by engineer@tacet.test.
const PROJECT = 'North Loop Chilled Water Plant';
const DRAFT = 'CHW pump P-3 skid';
const RELEASED = 'CHW pump P-2 skid';

/** Full-page screenshots from the top, so the sticky top bar is where it belongs. */
async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

async function text(page: Page, testId: string): Promise<string> {
  return ((await page.getByTestId(testId).textContent()) ?? '').trim();
}

describe('design workspace', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('an engineer edits the draft, runs the selection, chooses a candidate and finds it saved after a reload', async () => {
    const page = await newPage(browser);
    await signIn(page, 'engineer@tacet.test');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects', exact: true }).click();
    await page.getByRole('table', { name: 'Projects' }).waitFor();
    await shot(page, 'design-01-projects');

    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('heading', { name: PROJECT, level: 1 }).waitFor();
    await page.getByRole('table', { name: 'Designs' }).waitFor();
    await shot(page, 'design-02-project');

    await page.getByRole('link', { name: DRAFT }).click();
    await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
    await page.getByTestId('total-mass').waitFor();
    await shot(page, 'design-03-draft');

    // Change the pump's mass: the totals follow at once, before anything is saved.
    const massBefore = await text(page, 'total-mass');
    const pump = page.getByLabel('Mass of End-suction pump', { exact: true });
    const pumpBefore = Number(await pump.inputValue());
    const pumpAfter = pumpBefore + 20;
    await pump.fill(String(pumpAfter));
    await page.getByText('Unsaved changes').waitFor();
    expect(await text(page, 'total-mass')).not.toBe(massBefore);
    await shot(page, 'design-04-edited');

    await page.getByRole('tab', { name: 'Mount layout' }).click();
    await page.getByTestId('plan-view').waitFor();
    expect(await page.getByTestId('plan-load').count()).toBe(4);
    await shot(page, 'design-05-layout');

    await page.getByRole('tab', { name: 'Running conditions' }).click();
    await page.getByRole('table', { name: 'Disturbing frequencies' }).waitFor();
    await shot(page, 'design-06-running');

    // Run the selection: the edited input is saved first.
    await page.getByRole('tab', { name: 'Mount selection' }).click();
    await page.getByRole('button', { name: 'Save and find mounts' }).click();
    await page.getByTestId('candidates-table').waitFor();
    await page.getByText(/\d+ candidates, \d+ passing/).waitFor();
    await page.getByText('All changes saved').waitFor();
    await shot(page, 'design-07-candidates');

    // Open the best candidate (passing ones come first).
    const best = page.locator('.tc-candidate-open').first();
    const label = ((await best.textContent()) ?? '').trim();
    expect(label).not.toBe('');
    await best.click();
    const chart = page.getByTestId('transmissibility-chart');
    await chart.locator('.VictoryContainer svg').first().waitFor();
    await page.getByTestId('frf-chart').locator('.VictoryContainer svg').first().waitFor();
    await page.getByRole('table', { name: 'Loads per point' }).waitFor();
    await shot(page, 'design-08-candidate');

    await page.getByRole('button', { name: 'Choose this' }).click();
    await page.getByText('Chosen for this design').waitFor();
    expect(await text(page, 'chosen-mounts')).toBe(label);
    await shot(page, 'design-09-chosen');

    // Reload: the input change and the choice are on the server.
    await page.reload();
    await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
    await page.getByTestId('chosen-mounts').waitFor();
    expect(await text(page, 'chosen-mounts')).toBe(label);
    expect(Number(await page.getByLabel('Mass of End-suction pump', { exact: true }).inputValue())).toBe(pumpAfter);
    await page.getByRole('tab', { name: 'Mount selection' }).click();
    await page.getByRole('region', { name: 'Chosen mounts' }).waitFor();
    await page.getByTestId('transmissibility-chart').locator('.VictoryContainer svg').first().waitFor();
    await shot(page, 'design-10-after-reload');
    await page.context().close();
  });

  it('a viewer reads the released design without a way to change it', async () => {
    const page = await newPage(browser);
    await signIn(page, 'viewer@tacet.test');
    await page.goto('/projects');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('link', { name: RELEASED }).click();
    await page.getByRole('heading', { name: RELEASED, level: 1 }).waitFor();
    await page.getByText('Read only', { exact: true }).first().waitFor();
    expect(await page.getByRole('button', { name: 'Save' }).count()).toBe(0);
    expect(await page.getByLabel('Mass of End-suction pump', { exact: true }).getAttribute('readonly')).not.toBeNull();
    await page.getByRole('tab', { name: 'Mount selection' }).click();
    await page.getByRole('region', { name: 'Chosen mounts' }).waitFor();
    await page.getByTestId('transmissibility-chart').locator('.VictoryContainer svg').first().waitFor();
    await shot(page, 'design-11-viewer-released');
    await page.context().close();
  });

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
