import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import type { Locator } from 'playwright-core';
import { launch, newPage, outsideRequests, screenshot, SCREENSHOT_DIR, signIn } from './browser';

// The demo draft "CHW pump P-3 skid" (PRODUCT.md "Demo"), driven at a desk width of 1,440 px.
const PROJECT = 'North Loop Chilled Water Plant';
const DRAFT = 'CHW pump P-3 skid';

function openAt(browser: Browser, width: number, height = 900): Promise<Page> {
  return newPage(browser, { width, height });
}

async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

/** A screenshot of one part of the page, to look at closely. */
async function partShot(locator: Locator, name: string): Promise<void> {
  await locator.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`) });
}

async function openDraftSelection(page: Page): Promise<void> {
  await page.goto('/projects');
  await page.getByRole('link', { name: PROJECT }).click();
  await page.getByRole('link', { name: DRAFT }).click();
  await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
  await page.getByRole('tab', { name: 'Mount selection' }).click();
}

/** Horizontal overflow of the page itself (a page that scrolls sideways). */
function pageOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

interface TableGeometry {
  /** The table's own sideways scroll (0 when it fits). */
  overflow: number;
  boxRight: number;
  /** Right edge of every reason cell, and whether any cuts its text. */
  reasonRights: number[];
  reasonsClipped: boolean;
  /** Columns whose header text is wider than the column. */
  crampedHeaders: string[];
}

function tableGeometry(page: Page): Promise<TableGeometry> {
  return page.evaluate(() => {
    const box = document.querySelector('[data-testid="candidates-table"]') as HTMLElement;
    const cells = Array.from(box.querySelectorAll<HTMLElement>('.tc-reason-cell'));
    const headers = Array.from(box.querySelectorAll<HTMLElement>('thead th'));
    return {
      overflow: box.scrollWidth - box.clientWidth,
      boxRight: box.getBoundingClientRect().right,
      reasonRights: cells.map((c) => c.getBoundingClientRect().right),
      reasonsClipped: cells.some((c) => c.scrollWidth > c.clientWidth + 1),
      crampedHeaders: headers.filter((h) => h.scrollWidth > h.clientWidth + 1).map((h) => h.textContent ?? ''),
    };
  });
}

describe('mount selection at desk and narrow widths', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('at 1,440 px the results fit with their reasons, two candidates compare side by side, and the run survives a reload', async () => {
    const page = await openAt(browser, 1440);
    await signIn(page, 'engineer@tacet.test');
    await openDraftSelection(page);

    await page.getByRole('button', { name: /Find mounts/ }).click();
    await page.getByText(/\d+ candidates, \d+ passing/).waitFor();
    const table = page.getByTestId('candidates-table');
    await table.waitFor();

    // the page does not scroll sideways, the table needs no sideways scroll, every reason is inside the box and whole
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    const geometry = await tableGeometry(page);
    expect(geometry.overflow).toBeLessThanOrEqual(0);
    expect(geometry.reasonRights.length).toBeGreaterThan(0);
    expect(Math.max(...geometry.reasonRights)).toBeLessThanOrEqual(geometry.boxRight + 0.5);
    expect(geometry.reasonsClipped).toBe(false);
    expect(geometry.crampedHeaders).toEqual([]);
    expect(await table.getByText('…').count()).toBe(0);
    const headers = await table.locator('thead th').allInnerTexts();
    expect(headers.map((h) => h.split('\n')[0]!.replace(/[▲▼]/g, '').trim())).toEqual([
      'Candidate',
      'Result',
      'Isolation',
      'fn',
      'Utilisation',
      'Price',
      'Lead time',
      'Reason',
    ]);
    await shot(page, 'selection-01-table-1440');
    await partShot(page.locator('.tc-candidates'), 'selection-01b-table-part');

    // a failing candidate's reason reads in full
    const failing = table.locator('tr.is-failing').first();
    if ((await failing.count()) > 0) {
      const reason = ((await failing.locator('.tc-reason-cell').innerText()) ?? '').trim();
      expect(reason.length).toBeGreaterThan(20);
      await failing.scrollIntoViewIfNeeded();
      await screenshot(page, 'selection-02-failing-row');
    }

    // compare the first two candidates
    const boxes = table.getByRole('checkbox', { name: /^Compare / });
    // Blueprint draws its own box over the input: the click lands on it, as a person's would
    await boxes.nth(0).check({ force: true });
    await boxes.nth(1).check({ force: true });
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    const comparison = page.getByRole('region', { name: 'Comparison' });
    await comparison.waitFor();
    expect(await comparison.getByRole('table', { name: 'Compared candidates' }).locator('thead th').count()).toBe(2);
    const chart = comparison.getByTestId('comparison-chart');
    await chart.locator('.VictoryContainer svg').first().waitFor();
    expect(await chart.locator('.tc-chart-legend li').count()).toBe(2);
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    await comparison.scrollIntoViewIfNeeded();
    await screenshot(page, 'selection-03-comparison');
    await partShot(comparison, 'selection-03b-comparison-part');

    // open the best candidate: labels on its chart do not overlap, modes are named by their motion
    await table.locator('.tc-candidate-open').first().click();
    const detail = page.getByRole('region', { name: 'Candidate 1' });
    await detail.getByTestId('transmissibility-chart').locator('.VictoryContainer svg').first().waitFor();
    const labelBoxes = await detail.locator('.tc-marker-labels text').evaluateAll((nodes) =>
      nodes.map((n) => {
        const r = (n as SVGGraphicsElement).getBoundingClientRect();
        return { left: r.left, right: r.right, top: r.top, bottom: r.bottom, text: n.textContent };
      }),
    );
    expect(labelBoxes.length).toBeGreaterThanOrEqual(3);
    const collisions = labelBoxes.flatMap((a, i) =>
      labelBoxes
        .slice(i + 1)
        .filter((b) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom)
        .map((b) => `${a.text} / ${b.text}`),
    );
    expect(collisions).toEqual([]);
    await detail.scrollIntoViewIfNeeded();
    await screenshot(page, 'selection-04-candidate');
    await partShot(detail.getByTestId('transmissibility-chart'), 'selection-04b-chart-labels');
    await partShot(detail.getByRole('table', { name: 'Rigid-body modes' }), 'selection-04c-modes');

    // a reload shows the same results without running the selection again
    const summary = await page.getByText(/\d+ candidates, \d+ passing/).innerText();
    let runs = 0;
    page.on('request', (request) => {
      if (request.method() === 'POST' && /\/api\/designs\/\d+\/selection$/.test(request.url())) runs++;
    });
    await page.reload();
    await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
    await page.getByRole('tab', { name: 'Mount selection' }).click();
    await page.getByTestId('candidates-table').waitFor();
    expect(await page.getByText(/\d+ candidates, \d+ passing/).innerText()).toBe(summary);
    await page.getByText(/kept with the design/).waitFor();
    expect(runs).toBe(0);
    await shot(page, 'selection-05-after-reload');
    await page.context().close();
  });

  it('when a save clears the chosen mounts the page says so', async () => {
    const page = await openAt(browser, 1440);
    await signIn(page, 'engineer@tacet.test');
    await openDraftSelection(page);
    const table = page.getByTestId('candidates-table');
    if ((await table.count()) === 0) {
      await page.getByRole('button', { name: /Find mounts/ }).click();
    }
    await table.waitFor();
    await table.locator('.tc-candidate-open').first().click();
    const choose = page.getByRole('button', { name: 'Choose this' });
    if ((await choose.count()) > 0) await choose.click();
    await page.getByText('Chosen for this design').first().waitFor();

    await page.getByRole('tab', { name: 'Equipment' }).click();
    const pump = page.getByLabel('Mass of End-suction pump', { exact: true });
    await pump.fill(String(Number(await pump.inputValue()) + 5));
    await page.getByText('Saving clears the chosen mounts').waitFor();
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    const notice = page.getByTestId('choice-cleared');
    await notice.waitFor();
    expect(await notice.innerText()).toMatch(/Saving the changed input cleared the choice of .+: its loads and figures were worked out/);
    expect(((await page.getByTestId('chosen-mounts').innerText()) ?? '').trim()).toBe('None chosen yet');
    await shot(page, 'selection-06-choice-cleared');

    // the kept results belong to the old input now
    await notice.getByRole('button', { name: 'Go to Mount selection' }).click();
    await page.getByText('These results are for an earlier input').waitFor();
    await page.reload();
    await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
    await page.getByRole('tab', { name: 'Mount selection' }).click();
    await page.getByText('No mounts chosen yet').waitFor();
    expect(await page.getByTestId('candidates-table').count()).toBe(0);
    await page.context().close();
  });

  it('narrower than the table (1,024 px), the table scrolls inside its own box with the candidate column in place', async () => {
    const page = await openAt(browser, 1024);
    await signIn(page, 'engineer@tacet.test');
    await openDraftSelection(page);
    await page.getByRole('button', { name: /Find mounts/ }).click();
    const table = page.getByTestId('candidates-table');
    await table.waitFor();
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    const geometry = await tableGeometry(page);
    expect(geometry.overflow).toBeGreaterThan(0);
    const before = await table.locator('tbody th').first().boundingBox();
    await table.evaluate((el) => {
      el.scrollLeft = el.scrollWidth;
    });
    const after = await table.locator('tbody th').first().boundingBox();
    expect(after!.x).toBeCloseTo(before!.x, 0);
    await table.scrollIntoViewIfNeeded();
    await screenshot(page, 'selection-07-narrow-scrolled');
    await partShot(page.locator('.tc-candidates'), 'selection-07b-narrow-table');
    await page.context().close();
  });

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
