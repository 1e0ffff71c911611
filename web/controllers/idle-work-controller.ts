/**
 * Work done in small steps while the page is idle (requestIdleCallback; a timer where the browser
 * has none). One task per controller: a new one replaces the last. The task pauses while the host
 * is disconnected and resumes where it stopped when it is connected again.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';

/** Work per timer tick without idle callbacks, ms. */
const TIMER_SLICE_MS = 8;
/** Delay between timer ticks without idle callbacks, ms. */
const TIMER_DELAY_MS = 50;
/** Time left in an idle period below which no new step starts, ms. */
const IDLE_MARGIN_MS = 2;

/** Does one piece of work and says whether more is left. */
export type IdleStep = () => boolean;

export class IdleWorkController implements ReactiveController {
  #step: IdleStep | undefined;
  #cancel: (() => void) | undefined;
  #connected = false;

  constructor(host: ReactiveControllerHost) {
    host.addController(this);
  }

  /** Whether a task has steps left (scheduled, or paused while disconnected). */
  get pending(): boolean {
    return this.#step !== undefined;
  }

  run(step: IdleStep): void {
    this.cancel();
    this.#step = step;
    if (this.#connected) this.#schedule();
  }

  cancel(): void {
    this.#unschedule();
    this.#step = undefined;
  }

  hostConnected(): void {
    this.#connected = true;
    if (this.#step !== undefined && this.#cancel === undefined) this.#schedule();
  }

  hostDisconnected(): void {
    this.#connected = false;
    this.#unschedule();
  }

  #unschedule(): void {
    this.#cancel?.();
    this.#cancel = undefined;
  }

  #schedule(): void {
    // Called as plain functions: the browser's own throw when called on another object.
    if (typeof requestIdleCallback === 'function') {
      const handle = requestIdleCallback((deadline) => this.#tick(() => deadline.timeRemaining() > IDLE_MARGIN_MS));
      this.#cancel = () => cancelIdleCallback(handle);
    } else {
      const handle = setTimeout(() => {
        const until = performance.now() + TIMER_SLICE_MS;
        this.#tick(() => performance.now() < until);
      }, TIMER_DELAY_MS);
      this.#cancel = () => clearTimeout(handle);
    }
  }

  #tick(timeLeft: () => boolean): void {
    this.#cancel = undefined;
    const step = this.#step;
    if (step === undefined) return;
    let more = true;
    while (more && this.#step === step && timeLeft()) more = step();
    // The step may have started another task (run) or ended this one (cancel): keep to that.
    if (this.#step !== step || this.#cancel !== undefined) return;
    if (more) this.#schedule();
    else this.#step = undefined;
  }
}
