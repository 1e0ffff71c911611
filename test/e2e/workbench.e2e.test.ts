// What a user does with the workbench, in headless Chromium against the built app: scrub with
// the keyboard and read the same numbers the command line writes, change the grid, import a
// table through the mapping step and see its rejected row, export and reopen a session, and
// use the page with no WebGL at all. Screenshots are kept in test-artifacts/e2e/.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { runCli } from '../cli/run-cli';
import { countDrawnPixels, openPage, runAxe, saveScreenshot, servedWorkbench, waitForCanvasDrawn, waitReady, type OpenedPage } from './harness';

const DEMO = 'assets/demo';
const served = servedWorkbench();

/** The command line's slices.csv for the demo with the given options (the app loads the demo's poles too). */
async function cliSlices(...options: string[]): Promise<{ text: string; rows: Map<string, Record<string, string>> }> {
  const out = mkdtempSync(join(tmpdir(), 'dg-e2e-'));
  const run = await runCli('coverage', `${DEMO}/occurrences.csv`, '--rotation', `${DEMO}/poles.csv`, ...options, '--out', out, '--quiet');
  expect(run.status, run.stderr).toBe(0);
  const text = readFileSync(join(out, 'slices.csv'), 'utf8');
  const [header, ...lines] = text.trim().split('\n');
  const names = header.split(',');
  const rows = new Map(lines.map((line) => {
    const fields = line.split(',');
    const row = Object.fromEntries(names.map((n, k) => [n, fields[k]]));
    return [row.name, row] as const;
  }));
  return { text, rows };
}

async function field(page: Page, name: string): Promise<string> {
  return (await page.locator(`dg-slice-summary [data-field="${name}"]`).textContent())?.trim() ?? '';
}

/** The page's numbers for the current slice, as the CSV writes them (thousands separators gone). */
async function pageSlice(page: Page): Promise<Record<string, string>> {
  const read = async (name: string) => (await field(page, name)).replace(/,/g, '');
  return {
    name: await field(page, 'name'),
    occurrences: await read('occurrences'), collections: await read('collections'), taxa: await read('taxa'), cells: await read('cells'),
    hull_km2: await read('hull_km2'), mst_km: await read('mst_km'), lat_span: await read('lat_span'),
    hull_without_km2: await read('hull_without_km2'), span_without_deg: await read('span_without_deg'),
  };
}

/** Checks the page's slice against a slices.csv row; the page rounds km to whole numbers and degrees to 0.1. */
function expectSameSlice(shown: Record<string, string>, row: Record<string, string> | undefined): void {
  expect(row, `slice ${shown.name} in slices.csv`).toBeDefined();
  if (row === undefined) return;
  for (const key of ['occurrences', 'collections', 'taxa', 'cells']) expect(shown[key], key).toBe(row[key]);
  // An empty CSV field (no hull, no places) is shown as a dash.
  const rounded = (v: string, decimals: number) => (v === '' ? '—' : Number(v).toFixed(decimals));
  expect(shown.hull_km2, 'hull_km2').toBe(rounded(row.hull_km2, 0));
  expect(shown.mst_km, 'mst_km').toBe(rounded(row.mst_km, 0));
  expect(shown.lat_span, 'lat_span').toBe(rounded(row.lat_span, 1));
  expect(shown.hull_without_km2, 'hull_without_km2').toBe(rounded(row.hull_without_km2, 0));
  expect(shown.span_without_deg, 'span_without_deg').toBe(rounded(row.span_without_deg, 1));
}

describe('the workbench with the demo scenario', () => {
  let opened: OpenedPage;
  beforeAll(async () => {
    opened = await openPage(served.browser, served.app.url);
    await waitReady(opened.page);
  });
  afterAll(() => opened?.close());

  test('draws the globe (screenshot kept, pixels checked)', async () => {
    const { png, pixels } = await waitForCanvasDrawn(opened.page, 'dg-globe-view canvas', { minPixels: 2000 });
    saveScreenshot('globe', png);
    expect(pixels.distinctColours).toBeGreaterThan(10);
  });

  test('steps slices with Left/Right and shows the numbers slices.csv has for each', async () => {
    const { page } = opened;
    const { rows } = await cliSlices('--bins', 'stages', '--grid', 'healpix:32');
    const first = await pageSlice(page);
    expectSameSlice(first, rows.get(first.name));
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    for (let step = 0; step < 3; step++) {
      const before = await field(page, 'name');
      await page.keyboard.press('ArrowRight');
      await expect.poll(() => field(page, 'name')).not.toBe(before);
      expectSameSlice(await pageSlice(page), rows.get(await field(page, 'name')));
    }
    const here = await field(page, 'name');
    await page.keyboard.press('ArrowLeft');
    await expect.poll(() => field(page, 'name')).not.toBe(here);
    // Inside a form field the arrow keys belong to the field (here they change the rule, which
    // recomputes and keeps the slice); they do not step the slice.
    const inField = await field(page, 'name');
    const assign = page.locator('dg-frame-controls select#assign');
    await assign.focus();
    await page.keyboard.press('ArrowRight');
    await page.waitForTimeout(300);
    await waitReady(page);
    expect(await field(page, 'name')).toBe(inField);
    await assign.selectOption('mid-age');
    await waitReady(page);
    await assign.blur();
    await page.keyboard.press('End');
    const last = await field(page, 'name');
    expect(Number(rows.get(last)?.occurrences)).toBeGreaterThan(0);
  });

  test('keeps the slice and shows the new numbers after the grid changes', async () => {
    const { page } = opened;
    const before = await field(page, 'name');
    await page.locator('dg-frame-controls select').filter({ has: page.locator('option[value="16"]') }).selectOption('16');
    await expect.poll(() => page.evaluate(() => location.hash), { timeout: 30_000 }).toContain('grid=healpix%3A16');
    await waitReady(page);
    expect(await field(page, 'name')).toBe(before);
    const { rows } = await cliSlices('--bins', 'stages', '--grid', 'healpix:16');
    expectSameSlice(await pageSlice(page), rows.get(before));
  });

  test('exports slices.csv identical to the command line, and a session that restores the settings', async () => {
    const { page } = opened;
    const { text } = await cliSlices('--bins', 'stages', '--grid', 'healpix:16');
    const slicesDownload = page.waitForEvent('download');
    await page.locator('dg-export-menu button[data-export="slices.csv"]').click();
    expect(readFileSync(await (await slicesDownload).path(), 'utf8')).toBe(text);

    const sessionDownload = page.waitForEvent('download');
    await page.locator('dg-export-menu button[data-export="session.json"]').click();
    const sessionPath = await (await sessionDownload).path();
    const session = JSON.parse(readFileSync(sessionPath, 'utf8'));
    expect(session.settings).toMatchObject({ bins: 'stages', grid: 'healpix:16', assign: 'mid-age' });

    await page.locator('dg-frame-controls select#bins').selectOption('epochs');
    await expect.poll(() => page.evaluate(() => location.hash), { timeout: 30_000 }).toContain('bins=epochs');
    await waitReady(page);
    await page.locator('dg-import-panel input[name="session"]').setInputFiles(sessionPath);
    await expect.poll(() => page.evaluate(() => location.hash), { timeout: 30_000 }).toContain('bins=stages');
    await waitReady(page);
    expect(await page.locator('dg-frame-controls select#bins').inputValue()).toBe('stages');
  });

  test('exports curves.csv identical to the command line for the same settings (curves at their defaults)', async () => {
    const { page } = opened;
    await page.locator('dg-frame-controls select#bins').selectOption('stages');
    await page.locator('dg-frame-controls select').filter({ has: page.locator('option[value="16"]') }).selectOption('16');
    await waitReady(page);
    const out = mkdtempSync(join(tmpdir(), 'dg-e2e-curves-'));
    const run = await runCli('curves', `${DEMO}/occurrences.csv`, '--rotation', `${DEMO}/poles.csv`, '--bins', 'stages', '--grid', 'healpix:16', '--out', out, '--quiet');
    expect(run.status, run.stderr).toBe(0);
    const download = page.waitForEvent('download');
    await page.locator('dg-export-menu button[data-export="curves.csv"]').click();
    expect(readFileSync(await (await download).path(), 'utf8')).toBe(readFileSync(join(out, 'curves.csv'), 'utf8'));
  });

  test('opens a session file written before format 3 and exports one with the present names', async () => {
    const { page } = opened;
    const former = 'test/e2e/fixtures/session-former-names.json';
    const cli = await runCli('coverage', '--session', former, '--out', mkdtempSync(join(tmpdir(), 'driftgrid-former-')), '--quiet');
    expect(cli.stderr).toBe('');
    expect(cli.status).toBe(0);
    await waitReady(page);
    await page.locator('dg-import-panel input[name="session"]').setInputFiles(former);
    await expect.poll(() => page.evaluate(() => location.hash), { timeout: 30_000 }).toContain('assign=share%3A0.5');
    await waitReady(page);
    expect(await page.locator('dg-frame-controls select#assign').inputValue()).toBe('share');
    const sessionDownload = page.waitForEvent('download');
    await page.locator('dg-export-menu button[data-export="session.json"]').click();
    const session = JSON.parse(readFileSync(await (await sessionDownload).path(), 'utf8'));
    expect(session.formatVersion).toBe(3);
    // The page keeps the column map of the table it has loaded; the former names are gone.
    expect(session.settings).toMatchObject({ assign: 'share:0.5', grid: 'healpix:16' });
    expect(JSON.stringify(session.settings)).not.toMatch(/max_ma|min_ma|overlap/);
  });

  test('exports gaps.csv identical to driftgrid gaps for the same settings', async () => {
    const { page } = opened;
    await waitReady(page);
    const settings = JSON.parse(readFileSync(await (await Promise.all([
      page.waitForEvent('download'), page.locator('dg-export-menu button[data-export="session.json"]').click(),
    ]))[0].path(), 'utf8')).settings as { bins: string; grid: string };
    const out = mkdtempSync(join(tmpdir(), 'dg-e2e-gaps-'));
    const run = await runCli(
      'gaps', `${DEMO}/occurrences.csv`, '--rotation', `${DEMO}/poles.csv`, '--area', 'occupied', '--bins', settings.bins, '--grid', settings.grid,
      '--out', out, '--quiet',
    );
    expect(run.status, run.stderr).toBe(0);
    const download = page.waitForEvent('download');
    await page.locator('dg-export-menu button[data-export="gaps.csv"]').click();
    expect(readFileSync(await (await download).path(), 'utf8')).toBe(readFileSync(join(out, 'gaps.csv'), 'utf8'));
  });

  test('shows the equal-area map and the curves with drawn content (screenshots kept)', async () => {
    const { page } = opened;
    await page.locator('dg-display-controls select[name="map-view"]').selectOption('equal-earth');
    const { png } = await waitForCanvasDrawn(page, 'dg-equal-area-view canvas', { minPixels: 5000 });
    saveScreenshot('equal-area-map', png);
    const curves = await page.locator('dg-curves-panel').screenshot();
    saveScreenshot('curves', curves);
    expect((await countDrawnPixels(page, curves)).drawn).toBeGreaterThan(3000);
    saveScreenshot('workbench-equal-area', await page.screenshot());
    expect(await runAxe(page)).toEqual([]);
  });
});

describe('importing a table', () => {
  test('goes through the mapping step, lists the rejected row, and shows names as text', async () => {
    const opened = await openPage(served.browser, served.app.url);
    const { page } = opened;
    const dialogs: string[] = [];
    page.on('dialog', (d) => { dialogs.push(d.message()); void d.dismiss(); });
    try {
      await waitReady(page);
      await page.locator('dg-import-panel input[name="occurrences"]').setInputFiles('test/e2e/fixtures/small-import.csv');
      const mapping = page.locator('dg-import-panel section.mapping');
      await expect.poll(() => mapping.count()).toBe(1);
      await expect.poll(async () => (await mapping.textContent()) ?? '').toMatch(/taxon/);
      // The hostile name is shown literally in the preview, never as an element.
      expect(await mapping.locator('td', { hasText: '<img src=x onerror=alert(1)>' }).count()).toBe(1);
      expect(await page.locator('dg-import-panel img').count()).toBe(0);
      await page.locator('dg-import-panel select#map-taxon').selectOption('Fossil label');
      await page.locator('dg-import-panel button', { hasText: 'Read the table' }).click();
      await expect.poll(async () => (await page.locator('dg-import-panel [data-field="table-summary"]').textContent()) ?? '').toContain('small-import.csv');
      await waitReady(page);
      expect(await page.locator('dg-import-panel [data-field="table-summary"]').textContent()).toMatch(/7 rows read,\s+6 accepted, 1 rejected/);
      expect(await page.locator('dg-rejects-panel [data-field="rejected-count"]').textContent()).toBe('1');
      const rejected = page.locator('dg-rejects-panel tbody tr');
      expect(await rejected.count()).toBe(1);
      expect(await rejected.textContent()).toMatch(/6.*oldest_ma.*Gammora,abc/s);
      // The demo's poles, polygons and indicators do not stay with the user's table.
      expect(await page.locator('dg-import-panel').evaluate((el) => el.shadowRoot?.textContent ?? '')).not.toContain('(demo)');
      expect(await field(page, 'name')).toBe('Cenomanian');
      expect(await field(page, 'occurrences')).toBe('4');
      expect(dialogs).toEqual([]);
      expect(await runAxe(page)).toEqual([]);
      expect(opened.foreignRequests()).toEqual([]);
      // Choosing a cell (the keyboard's way to what pointing at it on the map does) lists its
      // taxa, as text. The slice's four cells are entries 0–3 (entries count from the oldest
      // slice); one holds the hostile name.
      const listed: string[] = [];
      const picker = page.locator('dg-cell-details select[name="cell"]');
      expect(await picker.locator('option').count()).toBe(1 + 4);
      for (let entry = 0; entry < 4; entry++) {
        await picker.selectOption(String(entry));
        await expect.poll(async () => (await page.locator('dg-cell-details h2').textContent()) ?? '').toContain(`Cell ${await picker.locator(`option[value="${entry}"]`).evaluate((o) => o.textContent?.split(':')[0])}`);
        await expect.poll(() => page.locator('dg-cell-details li').count()).toBeGreaterThan(0);
        listed.push(...(await page.locator('dg-cell-details li').allTextContents()));
      }
      expect(listed.sort()).toEqual(['<img src=x onerror=alert(1)>', 'Alphaxis', 'Alphaxis', 'Betanid']);
      expect(await page.locator('dg-cell-details img').count()).toBe(0);
      await waitForCanvasDrawn(page, 'dg-globe-view canvas', { minPixels: 2000 });
      saveScreenshot('import-small-table', await page.screenshot());
    } finally {
      await opened.close();
    }
  });
});

describe('a browser without WebGL', () => {
  test('gets a notice and the equal-area canvas map instead of the globe', async () => {
    const noWebgl = `(() => {
      const original = HTMLCanvasElement.prototype.getContext;
      HTMLCanvasElement.prototype.getContext = function (kind, ...rest) {
        return String(kind).startsWith('webgl') || kind === 'experimental-webgl' ? null : original.call(this, kind, ...rest);
      };
    })();`;
    const opened = await openPage(served.browser, served.app.url, { initScript: noWebgl });
    try {
      await waitReady(opened.page);
      const { page } = opened;
      await expect.poll(() => page.locator('dg-equal-area-view').count()).toBe(1);
      expect(await page.locator('dg-globe-view').count()).toBe(0);
      expect(await page.locator('dg-equal-area-view').textContent()).toBeDefined();
      await expect.poll(async () => (await page.locator('dg-equal-area-view').evaluate((el) => el.shadowRoot?.textContent ?? ''))).toMatch(/no WebGL/i);
      const { png } = await waitForCanvasDrawn(page, 'dg-equal-area-view canvas', { minPixels: 5000 });
      saveScreenshot('no-webgl', png);
      expect(opened.consoleErrors).toEqual([]);
    } finally {
      await opened.close();
    }
  });
});

describe('the page address', () => {
  test('reopens the view it holds: settings, slice and map', async () => {
    const opened = await openPage(served.browser, `${served.app.url}#bins=stages&grid=healpix%3A16&measure=taxa&slice=Campanian&map=polar-south`);
    try {
      const { page } = opened;
      await waitReady(page);
      expect(await field(page, 'name')).toBe('Campanian');
      expect(await page.locator('dg-equal-area-view').count()).toBe(1);
      expect(await page.locator('dg-display-controls select[name="measure"]').inputValue()).toBe('taxa');
      const { rows } = await cliSlices('--bins', 'stages', '--grid', 'healpix:16');
      expectSameSlice(await pageSlice(page), rows.get('Campanian'));
    } finally {
      await opened.close();
    }
  });
});

describe('dropping a file on the page', () => {
  test('starts the import with the mapping step', async () => {
    const opened = await openPage(served.browser, served.app.url);
    try {
      const { page } = opened;
      await waitReady(page);
      const text = readFileSync('test/e2e/fixtures/small-import.csv', 'utf8');
      const transfer = await page.evaluateHandle((csv) => {
        const data = new DataTransfer();
        data.items.add(new File([csv], 'dropped.csv', { type: 'text/csv' }));
        return data;
      }, text);
      await page.dispatchEvent('dg-app', 'dragover', { dataTransfer: transfer });
      await page.dispatchEvent('dg-app', 'drop', { dataTransfer: transfer });
      await expect.poll(async () => (await page.locator('dg-import-panel section.mapping').textContent()) ?? '').toContain('dropped.csv');
    } finally {
      await opened.close();
    }
  });
});
