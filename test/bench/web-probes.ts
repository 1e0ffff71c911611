// In-page instruments for the workbench benchmark (web-import.bench.ts): when an import ends,
// how long a slice change keeps the main thread busy, and how much memory the tab holds.
import { readFileSync } from 'node:fs';
import type { Browser, CDPSession, Page } from 'playwright-core';

export interface ImportEnd {
  /** True when a busy signal (data-state "busy" or "loading", aria-busy="true", a progress bar) was seen. */
  readonly sawBusy: boolean;
}

/**
 * Waits until the table summary names `fileName`, `dg-app` says ready and nothing inside it
 * shows busy; fails with the page's message if it says error. Polls every 50 ms.
 */
export async function waitForImportEnd(page: Page, fileName: string, timeoutMs: number): Promise<ImportEnd> {
  const deadline = Date.now() + timeoutMs;
  let sawBusy = false;
  for (;;) {
    const s = await page.evaluate((fileName) => {
      const app = document.querySelector('dg-app');
      const state = app?.getAttribute('data-state') ?? '';
      let busy = state === 'loading' || state === 'busy' || app?.getAttribute('aria-busy') === 'true';
      let summary = '';
      let alert = '';
      const visit = (root: Document | ShadowRoot): void => {
        for (const el of root.querySelectorAll('*')) {
          if (el.matches('progress, [role=progressbar], [aria-busy=true]') && el.getClientRects().length > 0) busy = true;
          if (el.matches('[data-field=table-summary]')) summary += el.textContent ?? '';
          if (el.matches('[role=alert]')) alert += el.textContent?.trim() ?? '';
          if (el.shadowRoot) visit(el.shadowRoot);
        }
      };
      visit(document);
      return { state, busy, named: summary.includes(fileName), alert };
    }, fileName);
    sawBusy ||= s.busy;
    if (s.state === 'error') throw new Error(`The workbench reported an error: ${s.alert || '(no message shown)'}`);
    if (s.state === 'ready' && !s.busy && s.named) return { sawBusy };
    if (Date.now() > deadline) throw new Error(`Import of ${fileName} did not end within ${timeoutMs / 1000} s (state ${s.state}, busy ${s.busy}; ${s.alert}).`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

export interface KeyTiming {
  /**
   * The key's task: from a capture listener on window (before the app's handlers) to a bubble
   * listener on window added after the app's, so the handler and the synchronous re-render
   * (Lit's microtasks run between listeners). When the event never bubbles to window, an upper
   * bound: until the next message task or frame, whichever comes first.
   */
  readonly taskMs: number;
  /** The next frame's main-thread work: rAF callbacks (the map's redraw), style, layout, paint. */
  readonly frameMs: number;
  /** Long tasks (≥ 50 ms, the browser's threshold) starting within `settleMs` after the key. */
  readonly longestLongTaskMs: number;
}

/** Installs the key instruments once per page, after the app has added its own listeners. */
export async function installKeyTiming(page: Page): Promise<void> {
  await page.evaluate(() => {
    const w = window as unknown as Record<string, unknown>;
    const longTasks: { start: number; duration: number }[] = [];
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) longTasks.push({ start: e.startTime, duration: e.duration });
    }).observe({ type: 'longtask' });
    w.__dgLongTasks = longTasks;
    let press: { t0: number; handled: number } | undefined;
    window.addEventListener('keydown', () => {
      if (press && !Number.isFinite(press.handled)) press.handled = performance.now();
    });
    // Arms the instruments for the next key press; the result is left in __dgKeyResult.
    w.__dgArmKey = () => {
      w.__dgKeyResult = new Promise((resolve) => {
        const capture = () => {
          const current = { t0: performance.now(), handled: NaN };
          press = current;
          let next = Infinity;
          const afterTask = new MessageChannel();
          afterTask.port1.onmessage = () => (next = Math.min(next, performance.now()));
          afterTask.port2.postMessage(null);
          requestAnimationFrame(() => {
            const frameStart = performance.now();
            next = Math.min(next, frameStart);
            const afterFrame = new MessageChannel();
            afterFrame.port1.onmessage = () => resolve({
              t0: current.t0,
              task: (Number.isFinite(current.handled) ? current.handled : next) - current.t0,
              frame: performance.now() - frameStart,
            });
            afterFrame.port2.postMessage(null);
          });
        };
        window.addEventListener('keydown', capture, { capture: true, once: true });
      });
    };
  });
}

/** Presses `key` on the focused element and times it; waits `settleMs` for later work. */
export async function timeKey(page: Page, key: string, settleMs: number): Promise<KeyTiming> {
  type Armed = { __dgArmKey: () => void; __dgKeyResult: Promise<{ t0: number; task: number; frame: number }> };
  // Armed in its own round trip: a key event could otherwise reach the page first.
  await page.evaluate(() => (window as unknown as Armed).__dgArmKey());
  await page.keyboard.press(key);
  const { t0, task, frame } = await page.evaluate(() => (window as unknown as Armed).__dgKeyResult);
  await page.waitForTimeout(settleMs);
  const longest = await page.evaluate(({ t0, settleMs }) => {
    const tasks = (window as unknown as { __dgLongTasks: { start: number; duration: number }[] }).__dgLongTasks;
    return Math.max(0, ...tasks.filter((t) => t.start >= t0 - 1 && t.start <= t0 + settleMs).map((t) => t.duration));
  }, { t0, settleMs });
  return { taskMs: task, frameMs: frame, longestLongTaskMs: longest };
}

/** Main-thread task time so far (seconds), from the DevTools protocol's Performance domain. */
export async function mainThreadTaskSeconds(cdp: CDPSession): Promise<number> {
  const { metrics } = await cdp.send('Performance.getMetrics');
  return metrics.find((m) => m.name === 'TaskDuration')?.value ?? NaN;
}

export interface MemoryFigures {
  readonly heapUsedMb: number;
  readonly heapUsedAfterGcMb: number;
  /** Largest peak resident set (VmHWM) among renderer processes: the page and its workers. */
  readonly rendererPeakRssMb: number;
  readonly gpuPeakRssMb: number;
}

export async function memoryFigures(browser: Browser, cdp: CDPSession): Promise<MemoryFigures> {
  const heap = async () => ((await cdp.send('Performance.getMetrics')).metrics.find((m) => m.name === 'JSHeapUsedSize')?.value ?? NaN) / 2 ** 20;
  const heapUsedMb = await heap();
  await cdp.send('HeapProfiler.collectGarbage');
  const heapUsedAfterGcMb = await heap();
  const session = await browser.newBrowserCDPSession();
  const { processInfo } = (await session.send('SystemInfo.getProcessInfo')) as { processInfo: { type: string; id: number }[] };
  await session.detach();
  const peak = (type: string) => Math.max(0, ...processInfo.filter((p) => p.type === type).map((p) => peakRssMb(p.id)));
  return { heapUsedMb, heapUsedAfterGcMb, rendererPeakRssMb: peak('renderer'), gpuPeakRssMb: peak('GPU') };
}

function peakRssMb(pid: number): number {
  try {
    const kb = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return kb ? Number(kb[1]) / 1024 : 0;
  } catch {
    return 0;
  }
}
