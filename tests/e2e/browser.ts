import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { DEMO_PASSWORD } from '../../tools/harness/fixtures.mjs';

export { DEMO_PASSWORD };

/** Screenshots land here (ignored by git); look at them after a run. */
export const SCREENSHOT_DIR = fileURLToPath(new URL('../../test-results/e2e/', import.meta.url));

export function baseURL(): string {
  return inject('baseURL');
}

export async function launch(): Promise<Browser> {
  return chromium.launch({
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
}

/** Requests a page tried to send anywhere but our own server (fonts or assets from a CDN...). */
export const outsideRequests: string[] = [];

export async function newPage(browser: Browser, viewport = { width: 1400, height: 900 }): Promise<Page> {
  const context = await browser.newContext({ baseURL: baseURL(), viewport });
  const ownHost = new URL(baseURL()).host;
  await context.route('**/*', (route) => {
    const url = new URL(route.request().url());
    if (url.protocol.startsWith('http') && url.host !== ownHost) {
      outsideRequests.push(url.href);
      return route.abort();
    }
    return route.continue();
  });
  return context.newPage();
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

/** A call to the server's API as the browser tests set things up (throws on anything but 2xx). */
export async function apiCall<T>(token: string | null, method: string, path: string, body?: unknown): Promise<T> {
  const response = await fetch(new URL(`/api${path}`, baseURL()), {
    method,
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text}`);
  return (text ? JSON.parse(text) : undefined) as T;
}
