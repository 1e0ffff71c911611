// Checks run inside a page: axe-core accessibility audit, canvas drawn (after forcing the GPU
// to finish), and counting drawn pixels of a PNG screenshot without a PNG decoder in Node.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const artifacts = join(dirname(require.resolve('../../package.json')), 'test-artifacts', 'e2e');

/**
 * The page's `__dgFinishCanvas` (installed by openPage's init script; pages must be opened with
 * it): forces the GPU to finish a canvas and returns its context kind, or '' when it has none.
 * Functions passed to page.evaluate are sent as text, so each one looks it up itself.
 */
type WithFinisher = Window & { __dgFinishCanvas: (canvas: Element) => string };

export interface AxeViolation {
  readonly id: string;
  readonly impact: string;
  readonly help: string;
  /** CSS selector paths of the offending nodes (shadow roots as nested arrays, joined by " >>> "). */
  readonly targets: readonly string[];
}

let axeSource: string | undefined;

/**
 * Runs axe-core over the page (open shadow roots included) and returns the serious and critical
 * violations. The library is evaluated through the DevTools protocol, which the page's CSP
 * does not govern (a script tag would be refused: script-src 'self').
 */
export async function runAxe(page: Page): Promise<AxeViolation[]> {
  axeSource ??= readFileSync(join(dirname(require.resolve('axe-core')), 'axe.min.js'), 'utf8');
  await page.evaluate(axeSource);
  return page.evaluate(async () => {
    interface AxeNode { target: unknown[] }
    interface AxeResult { id: string; impact: string | null; help: string; nodes: AxeNode[] }
    const axe = (window as unknown as { axe: { run(context: Document, options: object): Promise<{ violations: AxeResult[] }> } }).axe;
    const { violations } = await axe.run(document, { resultTypes: ['violations'] });
    return violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({
        id: v.id, impact: v.impact ?? '', help: v.help,
        targets: v.nodes.map((n) => n.target.map((t) => (Array.isArray(t) ? t.join(' >>> ') : String(t))).join(' >>> ')),
      }));
  });
}

export interface PixelCount {
  readonly width: number;
  readonly height: number;
  /** Pixels whose colour differs from the most frequent colour (the background) by more than the tolerance. */
  readonly drawn: number;
  readonly distinctColours: number;
}

/**
 * Decodes a PNG (a screenshot) in the page with the browser's own decoder and counts pixels
 * that differ from the most frequent colour, per channel by more than `tolerance`.
 */
export function countDrawnPixels(page: Page, png: Buffer, tolerance = 8): Promise<PixelCount> {
  return page.evaluate(async ({ base64, tolerance }) => {
    const image = new Image();
    image.src = `data:image/png;base64,${base64}`;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = image.naturalWidth;
    canvas.height = image.naturalHeight;
    const context = canvas.getContext('2d', { willReadFrequently: true });
    if (!context) throw new Error('countDrawnPixels: no 2D canvas context in this page.');
    context.drawImage(image, 0, 0);
    const { data } = context.getImageData(0, 0, canvas.width, canvas.height);
    const frequency = new Map<number, number>();
    for (let i = 0; i < data.length; i += 4) {
      const key = ((data[i] << 24) | (data[i + 1] << 16) | (data[i + 2] << 8) | data[i + 3]) >>> 0;
      frequency.set(key, (frequency.get(key) ?? 0) + 1);
    }
    let background = 0;
    let most = -1;
    for (const [key, n] of frequency) if (n > most) [background, most] = [key, n];
    const bg = [background >>> 24, (background >>> 16) & 255, (background >>> 8) & 255, background & 255];
    let drawn = 0;
    for (let i = 0; i < data.length; i += 4) {
      if (Math.abs(data[i] - bg[0]) > tolerance || Math.abs(data[i + 1] - bg[1]) > tolerance || Math.abs(data[i + 2] - bg[2]) > tolerance || Math.abs(data[i + 3] - bg[3]) > tolerance) drawn++;
    }
    return { width: canvas.width, height: canvas.height, drawn, distinctColours: frequency.size };
  }, { base64: png.toString('base64'), tolerance });
}

export interface CanvasDrawn {
  readonly png: Buffer;
  readonly pixels: PixelCount;
  /** The canvas's context kind: 'webgl2', 'webgl', '2d' or 'bitmaprenderer'. */
  readonly kind: string;
}

/**
 * Waits until the canvas matched by `selector` (Playwright CSS; it pierces open shadow roots)
 * has a context and at least `minPixels` drawn pixels in its screenshot. Before every screenshot
 * the GPU is made to finish (a 1×1 `readPixels`; SwiftShader can lag the map's idle event by
 * seconds), or a 2D canvas is read back.
 */
export async function waitForCanvasDrawn(page: Page, selector: string, options: { minPixels?: number; timeoutMs?: number } = {}): Promise<CanvasDrawn> {
  const minPixels = options.minPixels ?? 100;
  const deadline = Date.now() + (options.timeoutMs ?? 60_000);
  const canvas = page.locator(selector).first();
  for (;;) {
    const kind = await canvas.evaluate((element) => (window as unknown as WithFinisher).__dgFinishCanvas(element), undefined, { timeout: Math.max(1, deadline - Date.now()) });
    if (kind !== '') {
      const png = await canvas.screenshot({ animations: 'disabled', timeout: Math.max(1, deadline - Date.now()) });
      const pixels = await countDrawnPixels(page, png);
      if (pixels.drawn >= minPixels) return { png, pixels, kind };
      if (Date.now() > deadline) throw new Error(`${selector}: only ${pixels.drawn} drawn pixels (wanted ≥ ${minPixels}) after the timeout.`);
    } else if (Date.now() > deadline) {
      throw new Error(`${selector}: the canvas never got a drawing context.`);
    }
    await page.waitForTimeout(250);
  }
}

/**
 * Makes the GPU finish every canvas in the page (open shadow roots included), so that a
 * screenshot shows final pixels; returns how many canvases have a context.
 */
export function finishDrawing(page: Page): Promise<number> {
  return page.evaluate(() => {
    let count = 0;
    const visit = (root: Document | ShadowRoot): void => {
      for (const element of root.querySelectorAll('*')) {
        if (element.shadowRoot) visit(element.shadowRoot);
        if (element instanceof HTMLCanvasElement && (window as unknown as WithFinisher).__dgFinishCanvas(element) !== '') count++;
      }
    };
    visit(document);
    return count;
  });
}

/** Writes `png` to test-artifacts/e2e/<name>.png and returns the path. */
export function saveScreenshot(name: string, png: Buffer): string {
  mkdirSync(artifacts, { recursive: true });
  const path = join(artifacts, `${name.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '')}.png`);
  writeFileSync(path, png);
  return path;
}
