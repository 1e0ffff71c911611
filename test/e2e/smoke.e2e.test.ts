// The workbench as a user first meets it: the built app, served from 127.0.0.1, loads its demo
// scenario and reports ready, without reaching beyond its origin, without a CSP violation or a
// console error, and without a serious or critical accessibility violation (axe-core).
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { finishDrawing, launchBrowser, openPage, runAxe, saveScreenshot, startApp, type App, type OpenedPage } from './harness';

let app: App;
let browser: Browser;
let opened: OpenedPage;
beforeAll(async () => {
  app = await startApp();
  browser = await launchBrowser();
  opened = await openPage(browser, app.url);
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

// The later checks run even when the first fails: what they list often says why.
describe('the workbench on first load', () => {
  test('loads the demo scenario, reports ready within a minute, and draws it (screenshot kept)', async () => {
    const { page } = opened;
    try {
      await page.waitForFunction(() => document.querySelector('dg-app')?.getAttribute('data-state') === 'ready', null, { timeout: 60_000 });
      expect(await finishDrawing(page)).toBeGreaterThan(0);
    } finally {
      saveScreenshot('smoke-first-load', await page.screenshot({ fullPage: true, animations: 'disabled' }));
    }
  });

  test('requests nothing outside its own origin', () => {
    expect(opened.requests.length).toBeGreaterThan(0);
    expect(opened.foreignRequests()).toEqual([]);
  });

  test('violates none of its Content-Security-Policy', () => {
    expect(opened.cspViolations).toEqual([]);
  });

  test('logs no console error and throws no uncaught exception', () => {
    expect(opened.consoleErrors).toEqual([]);
  });

  test('has no serious or critical accessibility violation', async () => {
    expect(await runAxe(opened.page)).toEqual([]);
  });
});
