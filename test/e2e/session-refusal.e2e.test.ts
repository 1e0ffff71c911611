// A session file with a setting no run can have is refused by the page in the command line's
// words (the sentence after the file name is the same; the page names the file, the command line
// the path it was given).
import { describe, expect, test } from 'vitest';
import { runCli } from '../cli/run-cli';
import { openPage, servedWorkbench } from './harness';

const SESSION = 'test/e2e/fixtures/session-rotate-sideways.json';
const REFUSAL = 'settings.rotateAt "sideways": expected slice or occurrence';
const served = servedWorkbench();

describe('a session file with rotateAt "sideways"', () => {
  test('is refused by the page with the same sentence as by driftgrid coverage --session, and the settings stay', async () => {
    const cli = await runCli('coverage', '--session', SESSION, '--quiet');
    expect(cli.status).toBe(1);
    expect(cli.stderr).toBe(`driftgrid: ${SESSION}, ${REFUSAL}\n`);

    const opened = await openPage(served.browser, served.app.url);
    const { page } = opened;
    try {
      await page.waitForFunction(() => document.querySelector('dg-app')?.getAttribute('data-state') === 'ready', null, { timeout: 60_000 });
      const hashBefore = await page.evaluate(() => location.hash);
      await page.locator('dg-import-panel input[name="session"]').setInputFiles(SESSION);
      const problem = page.locator('dg-app .problem-bar p');
      await expect.poll(async () => (await problem.count()) === 0 ? '' : (await problem.textContent()) ?? '').toBe(`session-rotate-sideways.json, ${REFUSAL}`);
      expect(await page.evaluate(() => location.hash)).toBe(hashBefore);
      expect(opened.foreignRequests()).toEqual([]);
    } finally {
      await opened.close();
    }
  });
});
