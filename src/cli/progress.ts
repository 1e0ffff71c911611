/** Files larger than this get progress lines on stderr while they are read. */
export const PROGRESS_MIN_BYTES = 8 << 20;
const PROGRESS_INTERVAL_MS = 1000;

/**
 * A throttled "rows read" reporter for stderr: rewrites one line on a terminal, prints a line
 * now and then otherwise (a log file should not fill with carriage returns).
 */
export function progressReporter(totalBytes: number, quiet: boolean): { rows(count: number): void; done(): void } {
  const active = !quiet && totalBytes >= PROGRESS_MIN_BYTES;
  const tty = process.stderr.isTTY === true;
  let last = performance.now();
  let shown = false;
  return {
    rows(count) {
      if (!active) return;
      const now = performance.now();
      if (now - last < PROGRESS_INTERVAL_MS) return;
      last = now;
      shown = true;
      process.stderr.write(`${tty ? '\r' : ''}reading: ${count.toLocaleString('en')} rows${tty ? '' : '\n'}`);
    },
    done() {
      if (shown && tty) process.stderr.write('\n');
    },
  };
}
