// Checks the e2e harness itself on a stand-in page (fixtures/harness-page), so that the smoke
// test's "nothing went wrong" assertions are known to be able to fail.
import { fileURLToPath } from 'node:url';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { launchBrowser, openPage, runAxe, saveScreenshot, startApp, waitForCanvasDrawn, type App } from './harness';

const fixture = fileURLToPath(new URL('./fixtures/harness-page', import.meta.url));
const ready = () => document.querySelector('dg-app')?.getAttribute('data-state') === 'ready';

let app: App;
let browser: Browser;
beforeAll(async () => {
  app = await startApp({ root: fixture });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('the e2e harness', () => {
  test('finds nothing wrong on a well-behaved page and counts the 50 × 50 pixels its WebGL canvas cleared', async () => {
    const opened = await openPage(browser, app.url);
    await opened.page.waitForFunction(ready, null, { timeout: 30_000 });
    const drawn = await waitForCanvasDrawn(opened.page, 'dg-app canvas');
    saveScreenshot('harness-well-behaved', drawn.png);
    expect(drawn.kind).toBe('webgl2');
    expect(drawn.pixels.drawn).toBe(50 * 50);
    expect(opened.requests.length).toBeGreaterThanOrEqual(3);
    expect(opened.foreignRequests()).toEqual([]);
    expect(opened.cspViolations).toEqual([]);
    expect(opened.consoleErrors).toEqual([]);
    expect(await runAxe(opened.page)).toEqual([]);
    await opened.close();
  });

  test('records an inline script, an off-origin fetch, eval in a worker, a console error and an image without a text alternative', async () => {
    const opened = await openPage(browser, `${app.url}?misbehave`);
    await opened.page.waitForFunction(ready, null, { timeout: 30_000 });
    // A worker runs evaluations in order: once this one is done, so is the harness's listener setup.
    await opened.page.workers()[0].evaluate(() => 0);
    await opened.page.evaluate(() => (window as unknown as { misbehaveInWorker(): Promise<void> }).misbehaveInWorker());
    // Console messages reach the harness asynchronously: wait for them rather than race them.
    const violations = () => opened.cspViolations.join('\n');
    await expect.poll(violations).toMatch(/inline script/i);
    await expect.poll(violations).toContain('example.invalid/data.csv');
    await expect.poll(violations).toMatch(/^worker: script-src eval/m);
    expect(opened.consoleErrors).toEqual([expect.stringContaining('something went wrong')]);
    expect((await runAxe(opened.page)).map((v) => `${v.id} ${v.impact}`)).toEqual(['image-alt critical']);
    await opened.close();
  });

  test('counts requests to another origin (the same server under another host name) as foreign', async () => {
    const opened = await openPage(browser, app.url);
    const elsewhere = app.url.replace('127.0.0.1', 'localhost');
    await opened.page.goto(elsewhere);
    await opened.page.waitForFunction(ready, null, { timeout: 30_000 });
    expect(opened.foreignRequests()).toEqual([elsewhere, `${elsewhere}main.js`, `${elsewhere}worker.js`]);
    await opened.close();
  });
});
