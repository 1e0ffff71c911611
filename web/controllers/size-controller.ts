/**
 * Follows the size of an element a component renders (or the component itself) with a
 * ResizeObserver. Observes from the first update on (when the element exists), lets go on
 * disconnect and observes again on reconnect. On a change it asks the host to update, or calls
 * `onResize` instead when the host only needs to pass the size on (a map resizing its canvas).
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';

export interface SizeOptions {
  /** The size assumed until the first observation (and where there is no ResizeObserver), px. */
  readonly width: number;
  readonly height: number;
  readonly onResize?: (width: number, height: number) => void;
}

export class SizeController implements ReactiveController {
  /** Content-box size, whole px. */
  width: number;
  height: number;
  readonly #host: ReactiveControllerHost;
  readonly #target: () => Element | null;
  readonly #onResize: ((width: number, height: number) => void) | undefined;
  #observer: ResizeObserver | undefined;

  constructor(host: ReactiveControllerHost, target: () => Element | null, options: SizeOptions) {
    this.#host = host;
    this.#target = target;
    this.width = options.width;
    this.height = options.height;
    this.#onResize = options.onResize;
    host.addController(this);
  }

  hostConnected(): void {
    this.#observe();
  }

  hostUpdated(): void {
    this.#observe();
  }

  hostDisconnected(): void {
    this.#observer?.disconnect();
    this.#observer = undefined;
  }

  #observe(): void {
    if (this.#observer !== undefined || typeof ResizeObserver === 'undefined') return;
    const element = this.#target();
    if (element === null) return;
    this.#observer = new ResizeObserver((entries) => {
      const box = entries[entries.length - 1].contentRect;
      const width = Math.floor(box.width);
      const height = Math.floor(box.height);
      // A hidden element measures 0 × 0: keep the last real size rather than drawing into nothing.
      if (width <= 0 || height <= 0 || (width === this.width && height === this.height)) return;
      this.width = width;
      this.height = height;
      if (this.#onResize === undefined) this.#host.requestUpdate();
      else this.#onResize(width, height);
    });
    this.#observer.observe(element);
  }
}
