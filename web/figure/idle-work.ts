/** Work done in small steps while the page is idle (on a timer where requestIdleCallback is missing). */

/** Work per timer tick without idle callbacks, ms. */
const TIMER_SLICE_MS = 8;
/** Time left in an idle period below which no new step starts, ms. */
const IDLE_MARGIN_MS = 2;

export class IdleWork {
  #handle: number | undefined;
  #cancelHandle: (handle: number) => void = () => {};

  /** `step` does one piece of work and says whether more is left. Replaces any running task. */
  run(step: () => boolean): void {
    this.cancel();
    const idle = typeof requestIdleCallback === 'function';
    const schedule = (fn: (deadline?: IdleDeadline) => void): number => (idle ? requestIdleCallback(fn) : window.setTimeout(fn, 50));
    // Called as plain functions: the browser's own would throw when called on this object.
    this.#cancelHandle = idle ? (handle) => cancelIdleCallback(handle) : (handle) => window.clearTimeout(handle);
    const tick = (deadline?: IdleDeadline): void => {
      const until = performance.now() + TIMER_SLICE_MS;
      let more = true;
      while (more && (deadline === undefined ? performance.now() < until : deadline.timeRemaining() > IDLE_MARGIN_MS)) more = step();
      this.#handle = more ? schedule(tick) : undefined;
    };
    this.#handle = schedule(tick);
  }

  cancel(): void {
    if (this.#handle !== undefined) this.#cancelHandle(this.#handle);
    this.#handle = undefined;
  }
}
