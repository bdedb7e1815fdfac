/**
 * The first screen's JavaScript, as a browser downloads it (PRODUCT.md "Targets": under 350 kB
 * gzipped, routes split): the built app served by the built server (demo mode), opened in
 * headless Debian Chromium; the script resources of the page are summed as transferred
 * (gzip by the server's compression), from the browser's Resource Timing entries. Two screens:
 * the sign-in page, and the engineer's first page after signing in (everything loaded so far).
 * There is no bare baseline for a size. Run from the repository root after `npm run build`:
 *
 *   npx tsx tools/bench/web-bundle.bench.ts
 */
import { chromium, type Page } from 'playwright-core';
import { startServer } from '../harness/server.mjs';
import { reportFigure } from './bench-result.js';

const TARGET_KB = 350;

/** Scripts loaded by the page so far: count, bytes on the wire, bytes decoded. */
async function scripts(page: Page): Promise<{ count: number; encoded: number; decoded: number }> {
  return page.evaluate(() => {
    const entries = performance.getEntriesByType('resource') as PerformanceResourceTiming[];
    const js = entries.filter((e) => e.name.endsWith('.js') || e.initiatorType === 'script');
    return {
      count: js.length,
      encoded: js.reduce((sum, e) => sum + e.encodedBodySize, 0),
      decoded: js.reduce((sum, e) => sum + e.decodedBodySize, 0),
    };
  });
}

const server = await startServer({ web: true, label: 'bench' });
const browser = await chromium.launch({
  executablePath: process.env.TACET_CHROMIUM ?? '/usr/bin/chromium',
  headless: true,
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
});
try {
  const page = await (await browser.newContext({ baseURL: server.baseURL })).newPage();
  await page.goto('/sign-in');
  await page.getByLabel('Email').waitFor();
  await page.waitForLoadState('networkidle');
  const signIn = await scripts(page);
  await page.getByLabel('Email').fill('engineer@tacet.test');
  await page.getByLabel('Password').fill('tacet-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
  await page.waitForLoadState('networkidle');
  const home = await scripts(page);
  const kb = (bytes: number) => bytes / 1000;
  console.log(
    `sign-in screen: ${signIn.count} scripts, ${kb(signIn.encoded).toFixed(1)} kB gzipped (${kb(signIn.decoded).toFixed(0)} kB decoded)`,
  );
  console.log(
    `engineer's first page after sign-in (cumulative): ${home.count} scripts, ${kb(home.encoded).toFixed(1)} kB gzipped (${kb(home.decoded).toFixed(0)} kB decoded)`,
  );
  console.log(`target: under ${TARGET_KB} kB gzipped`);
  reportFigure({ figure: 'first screen JavaScript (sign-in), gzipped', value: kb(signIn.encoded), unit: 'kB', target: TARGET_KB });
  reportFigure({
    figure: 'JavaScript after sign-in, engineer home (cumulative), gzipped',
    value: kb(home.encoded),
    unit: 'kB',
    target: TARGET_KB,
  });
} finally {
  await browser.close();
  await server.stop();
}
