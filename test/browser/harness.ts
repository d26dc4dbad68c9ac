/**
 * Browser-test harness: the app on 127.0.0.1 (port 0), Debian Chromium driven by playwright-core
 * (TOOLCHAIN.md: never a test tool's own browser download), and helpers that wait for the page's
 * body[data-ready] marker. Screenshots go to test-artifacts/ (git-ignored).
 */
import { mkdir } from 'node:fs/promises';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { createApp } from '../../server/app.js';
import { REPO_ROOT, ensureViewerBundle } from '../../server/http/bundle.js';

/** Debian's Chromium (apt-get install chromium). */
export const CHROMIUM_PATH = '/usr/bin/chromium';
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];
/** Chromium's console line for a fetch answered 400 (an invalid scenario: expected, shown beside the field). */
const EXPECTED_CONSOLE_ERROR = /^Failed to load resource: the server responded with a status of 400 \(Bad Request\)$/;
/** Where screenshots are saved. */
export const ARTIFACTS_DIR = join(REPO_ROOT, 'test-artifacts');
/** Longest wait for the page to draw, ms (a cold server traces a 501-ray fan in well under a second). */
export const READY_TIMEOUT_MS = 30_000;

export interface Viewer {
  browser: Browser;
  server: Server;
  baseUrl: string;
  /**
   * Problems the page reported (console errors, uncaught exceptions, failed requests), except
   * Chromium's console line for a 400 answer (the server answers invalid scenarios with 400 by
   * design and the page shows the problem beside the field) and requests the page aborted itself.
   */
  pageErrors: string[];
  close(): Promise<void>;
}

/** Builds the bundle if needed, starts the app on a free port and launches Chromium. */
export async function startViewer(): Promise<Viewer> {
  await ensureViewerBundle();
  await mkdir(ARTIFACTS_DIR, { recursive: true });
  const loomline = createApp({ log: (m) => process.stderr.write(`server: ${m}\n`) });
  await loomline.warm();
  const server = await new Promise<Server>((resolve) => {
    const s = loomline.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
  return {
    browser,
    server,
    baseUrl: `http://127.0.0.1:${port}`,
    pageErrors: [],
    async close() {
      await browser.close();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await loomline.close();
    },
  };
}

/** Opens the viewer (optionally on a scenario id) and waits until its plots are drawn. */
export async function openPage(viewer: Viewer, scenarioId?: string, size = { width: 1440, height: 1500 }): Promise<Page> {
  const page = await viewer.browser.newPage({ viewport: size });
  page.on('console', (m) => {
    if (m.type() === 'error' && !EXPECTED_CONSOLE_ERROR.test(m.text())) viewer.pageErrors.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => viewer.pageErrors.push(`page: ${e.message}`));
  page.on('requestfailed', (r) => {
    // The page aborts requests it no longer needs (a newer edit, a stopped run): not a failure.
    if (r.failure()?.errorText !== 'net::ERR_ABORTED') viewer.pageErrors.push(`request failed: ${r.url()} (${r.failure()?.errorText})`);
  });
  await page.goto(`${viewer.baseUrl}/${scenarioId ? `?scenario=${scenarioId}` : ''}`);
  await page.waitForSelector('body[data-ready]', { timeout: READY_TIMEOUT_MS });
  return page;
}

/** The page's current ready generation (body[data-ready]). */
export async function readyGeneration(page: Page): Promise<string> {
  return (await page.getAttribute('body', 'data-ready')) ?? '';
}

/** Waits until the page has drawn an update after `previous` (a generation from readyGeneration). */
export async function waitForRedraw(page: Page, previous: string): Promise<void> {
  await page.waitForFunction(
    (p) => {
      // Runs in the page (root tsconfig has no DOM types).
      const ready = (globalThis as unknown as { document: { body: { dataset: Record<string, string | undefined> } } }).document.body.dataset.ready;
      return ready !== undefined && ready !== p;
    },
    previous,
    { timeout: READY_TIMEOUT_MS },
  );
}

/** Saves a full-page screenshot under test-artifacts/. */
export async function screenshot(page: Page, name: string): Promise<string> {
  const path = join(ARTIFACTS_DIR, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
