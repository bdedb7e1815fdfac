import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiCall, DEMO_PASSWORD, launch, newPage, outsideRequests, screenshot, signIn } from './browser';

// The hand-offs between people, as each of them meets them in the browser: the checker finds a
// resubmitted design on the overview and sees what changed; the buyer confirms a request for
// quotation and records a quote line by line; someone who forgot their password sets a new one
// through the link mailed to them. The set-up goes through the API, like the other browser tests,
// on a copy of the demo draft so nothing else on the shared server changes.
const PROJECT = 'North Loop Chilled Water Plant';
const DEMO_DRAFT = 'CHW pump P-3 skid';
const DRAFT = `Hand-off walk-through ${Date.now().toString(36)}`;
const FORGETFUL = { email: `forgetful.${Date.now().toString(36)}@example.test`, name: 'Fern Forgetful' };

const api = apiCall;

const login = async (email: string, password = DEMO_PASSWORD) =>
  (await api<{ accessToken: string }>(null, 'POST', '/auth/login', { email, password })).accessToken;

interface Candidate {
  kind: 'uniform' | 'series';
  mountId?: number;
  seriesId?: string;
  passes: boolean;
}

/** A copy of the demo draft, sent for check, returned by the checker, changed and sent again with a reply. */
async function resubmittedDesign(): Promise<number> {
  const engineer = await login('engineer@tacet.test');
  const checker = await login('checker@tacet.test');
  const projects = await api<{ id: number; name: string }[]>(engineer, 'GET', '/projects');
  const project = projects.find((candidate) => candidate.name === PROJECT)!;
  const designs = await api<{ id: number; name: string }[]>(engineer, 'GET', `/projects/${project.id}/designs`);
  const demo = await api<{ input: { mountPoints: { x: number }[] } }>(
    engineer,
    'GET',
    `/designs/${designs.find((d) => d.name === DEMO_DRAFT)!.id}`,
  );
  const created = await api<{ id: number; version: number }>(engineer, 'POST', `/projects/${project.id}/designs`, {
    name: DRAFT,
    input: demo.input,
  });
  const choose = async () => {
    const current = await api<{ version: number }>(engineer, 'GET', `/designs/${created.id}`);
    const selection = await api<{ candidates: Candidate[] }>(engineer, 'POST', `/designs/${created.id}/selection`, {});
    const best = selection.candidates.find((candidate) => candidate.passes)!;
    const chosen = best.kind === 'series' ? { chosenSeriesId: best.seriesId } : { chosenMountId: best.mountId };
    await api(engineer, 'PUT', `/designs/${created.id}`, { version: current.version, ...chosen });
  };
  await choose();
  await api(engineer, 'POST', `/designs/${created.id}/transitions`, { to: 'in_review', note: 'First pass; please check the layout.' });
  await api(checker, 'POST', `/designs/${created.id}/transitions`, {
    to: 'draft',
    comment: 'Move the first mount point 25 mm outwards so the frame overhang is within the limit.',
  });
  const returned = await api<{ version: number; input: { mountPoints: { x: number }[] } }>(engineer, 'GET', `/designs/${created.id}`);
  const input = structuredClone(returned.input);
  input.mountPoints[0]!.x += Math.sign(input.mountPoints[0]!.x || 1) * 0.025;
  await api(engineer, 'PUT', `/designs/${created.id}`, { version: returned.version, input });
  await choose();
  const me = await api<{ id: number }>(checker, 'GET', '/auth/me');
  await api(engineer, 'POST', `/designs/${created.id}/transitions`, {
    to: 'in_review',
    note: 'Moved the first point out by 25 mm as asked; chose the mounts again.',
    checkerId: me.id,
  });
  return created.id;
}

async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

async function checkerFindsAndReleases(browser: Browser): Promise<void> {
  const page = await newPage(browser);
  await signIn(page, 'checker@tacet.test');
  const toCheck = page.getByRole('region', { name: /Waiting for your check/ });
  await toCheck.getByRole('link', { name: DRAFT }).waitFor();
  await toCheck.getByText('who asked you to check it').first().waitFor();
  await shot(page, 'hand-offs-01-checker-overview');

  await toCheck.getByRole('link', { name: DRAFT }).click();
  await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();
  const sent = page.getByLabel('What the author sent');
  await sent.getByText('Moved the first point out by 25 mm as asked').waitFor();
  await sent.getByText('Move the first mount point 25 mm outwards', { exact: false }).waitFor();
  const changes = sent.getByRole('table', { name: 'What changed since it was last sent for check' });
  await changes.getByText(/Mount point .*: x position/).waitFor();
  // the report and the BOM of the design in check, marked as drafts
  const files = page.getByRole('region', { name: 'Report and bill of materials' });
  await files.getByRole('button', { name: 'Calculation report (PDF)' }).waitFor();
  await files.getByRole('button', { name: 'BOM (CSV)' }).waitFor();
  await shot(page, 'hand-offs-02-checker-what-changed');

  const panel = page.getByRole('region', { name: 'Check and release' });
  await panel.getByRole('button', { name: 'Release' }).click();
  const confirm = page.getByRole('alertdialog');
  await confirm.getByLabel('Release notes (optional)').fill('Checked with the moved mount point; overhang within the limit.');
  await confirm.getByRole('button', { name: 'Release this revision' }).click();
  await page.locator('[data-testid="review-stage"][data-status="released"]').waitFor();
  await panel.getByText('Release notes: Checked with the moved mount point').waitFor();
  await shot(page, 'hand-offs-03-checker-released');
  await page.context().close();
}

async function buyerRequestsAndRecordsQuote(browser: Browser): Promise<void> {
  const page = await newPage(browser);
  await signIn(page, 'buyer@tacet.test');
  const waiting = page.getByRole('region', { name: /Released, waiting for a request for quotation/ });
  await waiting.getByRole('link', { name: DRAFT }).click();
  await page.getByRole('heading', { name: DRAFT, level: 1 }).waitFor();

  const supplier = page.locator('.tc-supplier-requests').first();
  const supplierName = ((await supplier.locator('.tc-supplier-title').textContent()) ?? '').split(' · ')[0]!.trim();
  await supplier.getByLabel('Identical machines').fill('2');
  await supplier.getByLabel('Message to the supplier (optional)').fill('Two identical skids; delivery to site in week 20.');
  await supplier.getByRole('button', { name: 'Preview request for quotation' }).click();
  const confirm = page.getByRole('dialog', { name: `Send this request to ${supplierName}?` });
  await confirm.getByText('2 identical machines', { exact: true }).waitFor();
  const attachments = confirm.getByRole('list', { name: 'Attachments' });
  expect(await attachments.textContent()).toMatch(/quote-list\.csv.*quote-list\.xlsx.*report\.pdf/);
  expect(await confirm.getByLabel('Message to the supplier').textContent()).not.toMatch(/USD|EUR|\d\.\d\d\b/);
  await shot(page, 'hand-offs-04-buyer-confirm');
  await confirm.getByRole('button', { name: 'Send request' }).click();
  await confirm.waitFor({ state: 'detached' });
  const requests = supplier.getByRole('list', { name: `Requests to ${supplierName}` });
  await requests.getByText('Requested', { exact: true }).waitFor();

  await requests.getByRole('button', { name: 'Record progress' }).first().click();
  const dialog = page.getByRole('dialog', { name: `Record progress — ${supplierName}` });
  const prices = dialog.getByLabel(/^Unit price of /);
  const leads = dialog.getByLabel(/^Lead time of /);
  for (let index = 0; index < (await prices.count()); index++) {
    await prices.nth(index).fill(String(60 + index * 5));
    await leads.nth(index).fill('28');
  }
  await dialog.getByLabel('Supplier’s reference (optional)').fill('Q-2291');
  await dialog.getByLabel('Valid until (optional)').fill('2030-06-30');
  await shot(page, 'hand-offs-05-buyer-quote');
  await dialog.getByRole('button', { name: 'Record' }).click();
  await dialog.waitFor({ state: 'detached' });
  await requests.getByText(/Quoted USD .* \(ref\. Q-2291\), valid until 2030-06-30/).waitFor();
  await shot(page, 'hand-offs-06-buyer-quoted');

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Purchasing', exact: true }).click();
  const queue = page.getByRole('table', { name: 'Released designs' });
  const row = queue.getByRole('row').filter({ hasText: DRAFT });
  await row.getByText(`Quoted by ${supplierName}`, { exact: false }).waitFor();
  await shot(page, 'hand-offs-07-buyer-queue');
  await page.context().close();
}

async function forgottenPasswordReset(browser: Browser): Promise<void> {
  const admin = await login('admin@tacet.test');
  await api(admin, 'POST', '/users', { ...FORGETFUL, role: 'viewer', password: 'an old password 1' });
  const page = await newPage(browser);
  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await page.getByRole('heading', { name: 'Forgot your password?', level: 1 }).waitFor();
  await page.getByLabel('Email').fill(FORGETFUL.email);
  await page.getByRole('button', { name: 'Send me a link' }).click();
  await page.getByText('If an account uses this address').waitFor();
  await shot(page, 'hand-offs-08-forgot-password');

  // the link, read from the outbox as the person would read their mail
  let link: string | undefined;
  for (let attempt = 0; attempt < 50 && !link; attempt++) {
    const messages = await api<{ id: number; to: string; subject: string }[]>(admin, 'GET', '/outbox');
    const message = messages.find((m) => m.to.includes(FORGETFUL.email) && m.subject === 'Choose a new Tacet password');
    if (message)
      link = /https?:\/\/\S+\/reset-password\?token=\S+/.exec(
        (await api<{ text: string }>(admin, 'GET', `/outbox/${message.id}`)).text,
      )?.[0];
    else await new Promise((resolve) => setTimeout(resolve, 100));
  }
  expect(link).toBeDefined();
  const url = new URL(link!);
  await page.goto(`${url.pathname}${url.search}`);
  await page.getByRole('heading', { name: 'Choose a new password', level: 1 }).waitFor();
  await page.getByLabel('New password', { exact: true }).fill('a brand new password 1');
  await page.getByLabel('New password again').fill('a brand new password 1');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await page.getByText('Your new password is set.').waitFor();
  await shot(page, 'hand-offs-09-new-password-set');

  // the link works once
  await page.goto(`${url.pathname}${url.search}`);
  await page.getByLabel('New password', { exact: true }).fill('yet another password 1');
  await page.getByLabel('New password again').fill('yet another password 1');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await page.getByText('has been used or has expired').waitFor();

  await signIn(page, FORGETFUL.email, 'a brand new password 1');
  await shot(page, 'hand-offs-10-signed-in-with-new-password');
  await page.context().close();
}

async function temporaryPasswordForcesChange(browser: Browser): Promise<void> {
  const admin = await login('admin@tacet.test');
  const users = await api<{ id: number; email: string }[]>(admin, 'GET', '/users');
  const person = users.find((user) => user.email === FORGETFUL.email)!;
  await api(admin, 'POST', `/users/${person.id}/temporary-password`, { password: 'temporary pass 123' });
  const page = await newPage(browser);
  await signIn(page, FORGETFUL.email, 'temporary pass 123');
  await page.getByRole('heading', { name: 'Choose your own password' }).waitFor();
  expect(await page.getByRole('heading', { name: /Welcome/ }).count()).toBe(0);
  await shot(page, 'hand-offs-11-temporary-password');
  await page.getByLabel('Temporary password').fill('temporary pass 123');
  await page.getByLabel('New password', { exact: true }).fill('my very own password 1');
  await page.getByLabel('New password again').fill('my very own password 1');
  await page.getByRole('button', { name: 'Change password' }).click();
  await page.getByRole('heading', { name: /Welcome/ }).waitFor();
  await page.context().close();
}

async function projectListShowsStates(browser: Browser): Promise<void> {
  const engineer = await login('engineer@tacet.test');
  const archived = await api<{ id: number }>(engineer, 'POST', '/projects', { name: `Archived plant ${Date.now().toString(36)}` });
  await api(engineer, 'PATCH', `/projects/${archived.id}`, { archived: true });
  const page = await newPage(browser);
  await signIn(page, 'engineer@tacet.test');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects', exact: true }).click();
  const table = page.getByRole('table', { name: 'Projects' });
  const demo = table.getByRole('row').filter({ hasText: PROJECT });
  await demo.getByText(/\d+ released/).waitFor();
  expect(await table.getByText('Archived plant').count()).toBe(0); // archived projects are hidden at first
  await shot(page, 'hand-offs-12-projects-states');
  await page.getByText(/Show archived projects/).click();
  await table.getByText('Archived plant', { exact: false }).first().waitFor();
  await table
    .getByRole('link', { name: /Archived plant/ })
    .first()
    .click();
  await page.getByRole('button', { name: 'Restore' }).waitFor();
  await page.getByRole('button', { name: 'Rename' }).waitFor();
  await page.getByRole('button', { name: 'Delete' }).click();
  await page.getByRole('alertdialog').getByRole('button', { name: 'Delete the project' }).click();
  await page.getByRole('heading', { name: 'Projects', level: 1 }).waitFor();
  await page.context().close();
}

describe('hand-offs between people', () => {
  let browser: Browser;
  beforeAll(async () => {
    await resubmittedDesign();
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the checker finds the resubmitted design on the overview, sees what changed and releases it with notes', async () => {
    await checkerFindsAndReleases(browser);
  }, 120_000);

  it('the buyer confirms a request for quotation for two machines and records the quote line by line', async () => {
    await buyerRequestsAndRecordsQuote(browser);
  }, 120_000);

  it('a forgotten password is reset through the mailed one-time link', async () => {
    await forgottenPasswordReset(browser);
  }, 120_000);

  it('a temporary password must be changed before anything else', async () => {
    await temporaryPasswordForcesChange(browser);
  }, 120_000);

  it('the project list shows the states of its designs and hides archived projects until asked; the owner deletes one', async () => {
    await projectListShowsStates(browser);
  }, 120_000);

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
