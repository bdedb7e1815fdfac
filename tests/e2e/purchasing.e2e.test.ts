import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn as signInThroughApi } from '../../tools/harness/fixtures.mjs';
import { baseURL, launch, newPage, outsideRequests, screenshot, signIn } from './browser';

// The demo data (PRODUCT.md "Demo"): project "North Loop Chilled Water Plant" with a draft
// "CHW pump P-3 skid" by engineer@tacet.test, mounts already chosen. The other browser tests
// share the server and edit that draft, so this file works on its own copy: a new draft with
// P-3's input and the best candidate chosen (set up through the API as the same engineer),
// which it carries through check and release to a request for quotation.
const PROJECT = 'North Loop Chilled Water Plant';
const DEMO_DRAFT = 'CHW pump P-3 skid';
/** Shares no words with the demo designs' names, so their links stay unique on the project page. */
const DRAFT = `Purchasing walk-through ${Date.now().toString(36)}`;

async function apiCall<T>(token: string, method: string, path: string, body?: unknown): Promise<T> {
  const response = await fetch(new URL(`/api${path}`, baseURL()), {
    method,
    headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text}`);
  return (text ? JSON.parse(text) : undefined) as T;
}

interface Candidate {
  kind: 'uniform' | 'series';
  mountId?: number;
  seriesId?: string;
  passes: boolean;
}

/** A copy of the demo draft P-3 under its own name, with the best passing candidate chosen. */
async function createDraftCopy(): Promise<void> {
  const token = await signInThroughApi(baseURL(), 'engineer@tacet.test');
  const projects = await apiCall<{ id: number; name: string }[]>(token, 'GET', '/projects');
  const project = projects.find((candidate) => candidate.name === PROJECT)!;
  const designs = await apiCall<{ id: number; name: string }[]>(token, 'GET', `/projects/${project.id}/designs`);
  const demo = await apiCall<{ input: unknown }>(token, 'GET', `/designs/${designs.find((d) => d.name === DEMO_DRAFT)!.id}`);
  const created = await apiCall<{ id: number; version: number }>(token, 'POST', `/projects/${project.id}/designs`, {
    name: DRAFT,
    input: demo.input,
  });
  const selection = await apiCall<{ candidates: Candidate[] }>(token, 'POST', `/designs/${created.id}/selection`, {});
  const best = selection.candidates.find((candidate) => candidate.passes)!;
  const chosen = best.kind === 'series' ? { chosenSeriesId: best.seriesId } : { chosenMountId: best.mountId };
  await apiCall(token, 'PUT', `/designs/${created.id}`, { version: created.version, ...chosen });
}

/** Full-page screenshots from the top, so the sticky top bar is where it belongs. */
async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

async function openDraft(page: Page): Promise<void> {
  await page.goto('/projects');
  await page.getByRole('link', { name: PROJECT }).click();
  await page.getByRole('link', { name: DRAFT, exact: true }).click();
  await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
}

async function stage(page: Page): Promise<string | null> {
  return page.getByTestId('review-stage').getAttribute('data-status');
}

async function authorSendsForCheck(browser: Browser): Promise<void> {
  const page = await newPage(browser);
  await signIn(page, 'engineer@tacet.test');
  await openDraft(page);
  const panel = page.getByRole('region', { name: 'Check and release' });
  await panel.waitFor();
  expect(await stage(page)).toBe('draft');
  expect(await panel.getByRole('button', { name: 'Release' }).count()).toBe(0);
  await shot(page, 'purchasing-01-author-draft');

  await panel.getByRole('button', { name: 'Send for check' }).click();
  // a note for the checker (optional), then send
  const send = page.getByRole('dialog', { name: 'Send for check' });
  await send.getByLabel('Note to the checker (optional)').fill('Ready for check.');
  await send.getByRole('button', { name: 'Send for check' }).click();
  await page.locator('[data-testid="review-stage"][data-status="in_review"]').waitFor();
  await page.getByText('This revision is in check, so it cannot be changed now.').waitFor();
  // The author may not release their own design, and the page says why.
  await panel.getByText('You wrote this design, so another engineer releases it.').waitFor();
  expect(await panel.getByRole('button', { name: 'Release' }).isDisabled()).toBe(true);
  await shot(page, 'purchasing-02-author-in-review');
  await page.context().close();
}

async function checkerReleases(browser: Browser): Promise<void> {
  const page = await newPage(browser);
  await signIn(page, 'checker@tacet.test');
  await openDraft(page);
  const panel = page.getByRole('region', { name: 'Check and release' });
  await panel.getByRole('button', { name: 'Release' }).click();
  const confirm = page.getByRole('alertdialog');
  await confirm.getByText('licensed engineer').waitFor();
  await shot(page, 'purchasing-03-checker-confirm');
  await confirm.getByRole('button', { name: 'Release this revision' }).click();
  await page.locator('[data-testid="review-stage"][data-status="released"]').waitFor();
  await panel.getByText('Checked and released by').waitFor();
  await panel.getByRole('list', { name: 'Check and release record' }).getByText('In check → Released').waitFor();
  await shot(page, 'purchasing-04-checker-released');
  await page.context().close();
}

async function purchaserRequestsQuotation(browser: Browser): Promise<void> {
  const page = await newPage(browser);
  await signIn(page, 'buyer@tacet.test');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Purchasing', exact: true }).click();
  const queue = page.getByRole('table', { name: 'Released designs' });
  await queue.waitFor();
  await shot(page, 'purchasing-05-queue');

  await queue.getByRole('link', { name: DRAFT, exact: true }).click();
  await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
  await page.getByRole('table', { name: 'Bill of materials' }).waitFor();
  expect(((await page.getByTestId('bom-total-quantity').textContent()) ?? '').trim()).not.toBe('0');
  await shot(page, 'purchasing-06-design');

  // A blob download does not reliably raise playwright's "download" event: watch the file's response.
  const [csv] = await Promise.all([
    page.waitForResponse((response) => new URL(response.url()).pathname.endsWith('/bom.csv')),
    page.getByRole('button', { name: 'BOM (CSV)' }).click(),
  ]);
  expect(csv.status()).toBe(200);
  expect((await csv.text()).split('\n')[0]).toContain('part_number');

  const supplier = page.locator('.tc-supplier-requests').first();
  const supplierName = ((await supplier.locator('.tc-supplier-title').textContent()) ?? '').split(' · ')[0]!.trim();
  expect(supplierName).not.toBe('');
  await supplier.getByLabel('Message to the supplier (optional)').fill('Please quote delivery to site within six weeks.');
  await supplier.getByRole('button', { name: 'Preview request for quotation' }).click();
  await page
    .getByRole('dialog', { name: `Send this request to ${supplierName}?` })
    .getByRole('button', { name: 'Send request' })
    .click();
  await supplier
    .getByRole('list', { name: `Requests to ${supplierName}` })
    .getByText('Requested', { exact: true })
    .waitFor();
  await shot(page, 'purchasing-07-rfq-sent');
  await page.context().close();
}

async function adminReadsOutbox(browser: Browser): Promise<void> {
  const page = await newPage(browser);
  await signIn(page, 'admin@tacet.test');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox', exact: true }).click();
  const table = page.getByRole('table', { name: 'Captured messages' });
  await table.waitFor();
  const message = table.getByText(`Request for quotation: ${DRAFT}`).first();
  await message.waitFor();
  await message.click();
  await page.getByText('Please quote delivery to site within six weeks.').waitFor();
  await shot(page, 'purchasing-08-outbox');
  await page.context().close();
}

describe('check, release and purchasing', () => {
  let browser: Browser;
  beforeAll(async () => {
    await createDraftCopy();
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  // One story in order: each step needs the one before, so they run as one test.
  it('carries a draft through check and release to a request for quotation the admin can read', async () => {
    await authorSendsForCheck(browser);
    await checkerReleases(browser);
    await purchaserRequestsQuotation(browser);
    await adminReadsOutbox(browser);
  }, 180_000);

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
