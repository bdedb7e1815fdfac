import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, newPage, outsideRequests, screenshot, signIn } from './browser';

// A distinctive part number that the demo catalog does not hold.
const NEW_PART = 'QM-E2E-47731';

/** An invented catalog file: one new mount and two rows the import must reject. */
const CSV = [
  'supplier,part_number,series,mount_type,rated_load_n,vertical_stiffness_n_per_mm,dynamic_stiffness_ratio,damping_ratio,loss_factor,max_deflection_mm',
  `Quillmere Isolation,${NEW_PART},E2E,housed_spring,3100,95.5,1,0.01,,44`,
  'Quillmere Isolation,QM-E2E-47732,E2E,housed_spring,-5,95.5,1,0.01,,44',
  'Quillmere Isolation,QM-E2E-47733,E2E,coil_thing,3100,95.5,1,0.01,,44',
].join('\n');

describe('catalog screens in the browser', () => {
  let browser: Browser;
  let folder: string;
  beforeAll(async () => {
    browser = await launch();
    folder = mkdtempSync(join(tmpdir(), 'tacet-e2e-catalog-'));
  });
  afterAll(async () => {
    await browser?.close();
    if (folder) rmSync(folder, { recursive: true, force: true });
  });

  it('a catalog manager checks a file with bad rows, imports the valid ones and finds the new mount', async () => {
    const file = join(folder, 'e2e-spring-range.csv');
    writeFileSync(file, `${CSV}\n`);

    const page = await newPage(browser);
    await signIn(page, 'catalog@tacet.test');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalog', exact: true }).click();
    await page.getByRole('navigation', { name: 'Catalog sections' }).getByRole('link', { name: 'Import' }).click();
    await page.getByRole('heading', { name: 'Import mounts', level: 1 }).waitFor();
    await page.setInputFiles('#import-file', file);
    await screenshot(page, 'catalog-import-chosen');

    await page.getByRole('button', { name: 'Check file' }).click();
    const problems = page.getByRole('table', { name: 'Problems in the file' });
    await problems.waitFor();
    const loadProblem = problems.getByRole('row').filter({ hasText: 'rated_load_n' });
    await expect(loadProblem.getByRole('cell').allTextContents()).resolves.toEqual([
      '3',
      'rated_load_n',
      'must be a positive number (got "-5")',
    ]);
    await expect(problems.getByRole('row').filter({ hasText: 'mount_type' }).getByRole('cell').first().textContent()).resolves.toBe('4');
    await expect(page.getByRole('button', { name: 'Import all' }).isDisabled()).resolves.toBe(true);
    await screenshot(page, 'catalog-import-problems');

    await page.getByRole('button', { name: 'Import the valid rows only' }).click();
    const confirm = page.getByRole('alertdialog');
    await confirm.getByText('Import 1 row and skip 2 rows?').waitFor();
    await screenshot(page, 'catalog-import-confirm');
    await confirm.getByRole('button', { name: 'Import the valid rows' }).click();

    const done = page.getByRole('region', { name: 'Imported e2e-spring-range.csv' });
    await done.getByText('1 mount added and 0 mounts updated. 2 rejected rows were not imported.').waitFor();
    await done.getByRole('button', { name: 'Download the error report (CSV)' }).waitFor();
    await page.getByRole('table', { name: 'Earlier imports' }).getByText('e2e-spring-range.csv').waitFor();
    await screenshot(page, 'catalog-import-done');

    await page.getByRole('navigation', { name: 'Catalog sections' }).getByRole('link', { name: 'Mounts' }).click();
    await page.getByLabel('Search').fill(NEW_PART);
    await page.getByText('1 mount', { exact: true }).waitFor();
    const row = page.getByRole('region', { name: 'Catalog mounts' }).getByRole('button', { name: NEW_PART }).first();
    await row.waitFor();
    await screenshot(page, 'catalog-search-new-part');

    await row.click();
    const drawer = page.getByRole('dialog', { name: `Mount ${NEW_PART}` });
    await drawer.waitFor();
    // 3,100 N on 95.5 N/mm: 32.5 mm static deflection, fn = (1/2π)·√(g/δ) = 2.77 Hz.
    await drawer.getByText('2.77 Hz', { exact: true }).waitFor();
    await drawer.getByRole('figure', { name: 'Natural frequency against load' }).locator('svg').first().waitFor();
    await screenshot(page, 'catalog-mount-detail');
    await drawer.getByRole('figure', { name: 'Natural frequency against load' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'catalog-mount-detail-charts');
    await page.context().close();
  });

  it('a viewer reads the catalog and is offered no import', async () => {
    const page = await newPage(browser);
    await signIn(page, 'viewer@tacet.test');
    await page.goto('/catalog');
    await page.getByText(/^[\d,]+ mounts$/).waitFor();
    const sections = page.getByRole('navigation', { name: 'Catalog sections' });
    await expect(sections.getByRole('link').allTextContents()).resolves.toEqual(['Mounts', 'Suppliers']);
    await expect(page.getByRole('button', { name: 'Add mount' }).count()).resolves.toBe(0);
    await expect(page.getByRole('region', { name: 'Catalog mounts' }).getByRole('button').count()).resolves.toBeGreaterThan(0);
    await screenshot(page, 'catalog-viewer');

    await sections.getByRole('link', { name: 'Suppliers' }).click();
    await page.getByRole('table', { name: 'Suppliers' }).waitFor();
    await expect(page.getByRole('button', { name: 'Add supplier' }).count()).resolves.toBe(0);
    await screenshot(page, 'catalog-suppliers-viewer');

    await page.goto('/catalog/import');
    await page.getByText('Your role does not give access to this page').waitFor();
    await page.context().close();
  });

  it('loads nothing from outside hosts', () => {
    expect(outsideRequests).toEqual([]);
  });
});
