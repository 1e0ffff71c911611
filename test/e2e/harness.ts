// Browser-test harness: builds and serves the workbench, launches headless Chromium (software
// WebGL, see STACK.md) and opens pages that record every request, console error, uncaught
// exception and Content-Security-Policy violation. Pixel and accessibility checks are in
// ./page-checks.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { buildWeb, webOut } from '../../scripts/build-web.mjs';
import { ensureChromium } from '../../scripts/ensure-chromium.mjs';
import { serve } from '../../scripts/serve.mjs';

export { countDrawnPixels, finishDrawing, runAxe, saveScreenshot, waitForCanvasDrawn } from './page-checks';
export type { AxeViolation, CanvasDrawn, PixelCount } from './page-checks';

/** Chromium flags for headless software rendering without any network chatter (STACK.md). */
export const CHROMIUM_FLAGS = [
  '--no-sandbox', '--use-angle=swiftshader', '--enable-unsafe-swiftshader',
  '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run',
  '--disable-quic', '--disable-default-apps', '--no-default-browser-check',
] as const;

let built: Promise<void> | undefined;

/**
 * Builds dist/web once per process; skipped when dist/web exists and E2E_SKIP_BUILD=1 (set by
 * `npm test`, which has just built it, and by the e2e global setup after its build).
 */
export function ensureWebBuilt(): Promise<void> {
  built ??= (async () => {
    if (process.env.E2E_SKIP_BUILD === '1' && existsSync(join(webOut, 'index.html'))) return;
    buildWeb();
  })();
  return built;
}

export interface App {
  /** `http://127.0.0.1:PORT/` */
  readonly url: string;
  readonly origin: string;
  close(): Promise<void>;
}

/** Serves the built workbench (or `root`, for checking the harness itself) on a free port. */
export async function startApp(options: { root?: string } = {}): Promise<App> {
  const root = options.root ?? webOut;
  if (options.root === undefined) await ensureWebBuilt();
  const served = await serve({ root, port: 0 });
  return { url: served.url, origin: new URL(served.url).origin, close: served.close };
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: ensureChromium(), headless: true, args: [...CHROMIUM_FLAGS] });
}

export interface OpenedPage {
  readonly page: Page;
  readonly context: BrowserContext;
  /** Every URL requested by the page and its workers, in order. */
  readonly requests: string[];
  /** console.error messages (page and workers) and uncaught exceptions. */
  readonly consoleErrors: string[];
  /** CSP violations, page and workers: Chromium's console wording and `directive blocked-uri (source:line)` from the events. */
  readonly cspViolations: string[];
  /** Requests that went anywhere but the page's own origin, blob: or data:. */
  foreignRequests(): string[];
  close(): Promise<void>;
}

// Runs before any page script, outside the page's CSP. Records the kind of context every canvas
// gets, so that `__dgFinishCanvas` can make the GPU finish a canvas without ever creating a
// context by asking (./page-checks uses it), and reports CSP violations to the harness.
// `__name` is the helper tsx (esbuild's keepNames) wraps named functions in; functions sent to
// page.evaluate from code run by tsx (the benchmarks) call it, so the page needs a stand-in.
const INIT_SCRIPT = `(() => {
  if (!('__name' in globalThis)) Object.defineProperty(globalThis, '__name', { value: (target) => target });
  const kinds = new WeakMap();
  for (const proto of [HTMLCanvasElement.prototype, typeof OffscreenCanvas === 'undefined' ? undefined : OffscreenCanvas.prototype]) {
    if (!proto) continue;
    const original = proto.getContext;
    proto.getContext = function (kind, ...rest) {
      const context = original.call(this, kind, ...rest);
      if (context && !kinds.has(this)) kinds.set(this, kind);
      return context;
    };
  }
  Object.defineProperty(window, '__dgFinishCanvas', { value: (canvas) => {
    const kind = kinds.get(canvas) ?? '';
    if (kind === '2d') canvas.getContext('2d').getImageData(0, 0, 1, 1);
    else if (kind.includes('webgl')) {
      const gl = canvas.getContext(kind);
      gl.readPixels(0, 0, 1, 1, gl.RGBA, gl.UNSIGNED_BYTE, new Uint8Array(4));
    }
    return kind;
  } });
  document.addEventListener('securitypolicyviolation', (e) => {
    window.__dgCspViolation(e.violatedDirective + ' ' + (e.blockedURI || '(inline)') + ' (' + (e.sourceFile || '?') + ':' + e.lineNumber + ')');
  }, true);
})();`;

const WORKER_CSP_TAG = '[driftgrid-e2e csp] ';

/** With the same policy in the header and the meta tag, Chromium reports each violation twice. */
function addOnce(list: string[], text: string): void {
  if (!list.includes(text)) list.push(text);
}

/** Chromium asks for /favicon.ico by itself; its 404 is not the app's doing. */
function isFaviconMiss(text: string, url: string): boolean {
  return text.startsWith('Failed to load resource') && new URL(url, 'http://x').pathname === '/favicon.ico';
}

/** Opens `url` in a fresh context (its own cache and storage) and records what the page does. */
export async function openPage(
  browser: Browser, url: string, options: { waitUntil?: 'load' | 'domcontentloaded'; initScript?: string } = {},
): Promise<OpenedPage> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 }, deviceScaleFactor: 1 });
  const requests: string[] = [];
  const consoleErrors: string[] = [];
  const cspViolations: string[] = [];
  context.on('request', (request) => requests.push(request.url()));
  await context.exposeFunction('__dgCspViolation', (text: string) => addOnce(cspViolations, text));
  await context.addInitScript({ content: INIT_SCRIPT });
  if (options.initScript !== undefined) await context.addInitScript({ content: options.initScript });
  const page = await context.newPage();
  // Playwright reports the page's workers' console messages here too.
  page.on('console', (message) => {
    if (message.type() !== 'error') return;
    const text = message.text();
    const where = message.location().url;
    // Chromium also logs a violation as a console error; count it as a violation.
    if (text.startsWith(WORKER_CSP_TAG)) addOnce(cspViolations, `worker: ${text.slice(WORKER_CSP_TAG.length)}`);
    else if (/Content Security Policy/i.test(text)) addOnce(cspViolations, text);
    else if (!isFaviconMiss(text, where)) consoleErrors.push(where ? `${text} (${where}:${message.location().lineNumber})` : text);
  });
  page.on('pageerror', (error) => consoleErrors.push(`uncaught: ${error.stack ?? error.message}`));
  // A worker's violations and uncaught errors stay in the worker, which init scripts do not
  // reach; these listeners report them on its console. Listening from here can miss what a
  // worker does in its very first task, before this runs.
  page.on('worker', (worker) => {
    worker.evaluate((tag) => {
      self.addEventListener('securitypolicyviolation', (e) => console.error(`${tag}${e.violatedDirective} ${e.blockedURI || '(inline)'} (${e.sourceFile || '?'}:${e.lineNumber})`));
      self.addEventListener('error', (e) => console.error(`uncaught in worker: ${e.message} (${e.filename}:${e.lineno})`));
      self.addEventListener('unhandledrejection', (e) => console.error(`unhandled rejection in worker: ${e.reason instanceof Error ? e.reason.stack : String(e.reason)}`));
    }, WORKER_CSP_TAG).catch(() => undefined);
  });
  const origin = new URL(url).origin;
  await page.goto(url, { waitUntil: options.waitUntil ?? 'load' });
  return {
    page, context, requests, consoleErrors, cspViolations,
    foreignRequests: () => requests.filter((r) => !r.startsWith('blob:') && !r.startsWith('data:') && new URL(r).origin !== origin),
    close: () => context.close(),
  };
}

/** The built workbench served and one browser launched for a whole test file, both closed after it. */
export function servedWorkbench(): { readonly app: App; readonly browser: Browser } {
  const served = {} as { app: App; browser: Browser };
  beforeAll(async () => {
    served.app = await startApp();
    served.browser = await launchBrowser();
  });
  afterAll(async () => {
    await served.browser?.close();
    await served.app?.close();
  });
  return served;
}

/** Waits until the page says its current work is done (dg-app's data-state). */
export async function waitReady(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('dg-app')?.getAttribute('data-state') === 'ready', null, { timeout: 60_000 });
}
