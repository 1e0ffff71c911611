/**
 * Follows the size of an element a component renders (or the component itself) with a
 * ResizeObserver, and asks the component to update when it changes. Observes from the first
 * update on (when the element exists) and lets go on disconnect.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';

export class SizeController implements ReactiveController {
  /** Content-box size, whole px; the defaults until the first observation (or where there is no ResizeObserver). */
  width: number;
  height: number;
  private observer: ResizeObserver | undefined;

  constructor(private readonly host: ReactiveControllerHost, private readonly target: () => Element | null, width: number, height: number) {
    this.width = width;
    this.height = height;
    host.addController(this);
  }

  hostConnected(): void {
    this.observe();
  }

  hostUpdated(): void {
    this.observe();
  }

  hostDisconnected(): void {
    this.observer?.disconnect();
    this.observer = undefined;
  }

  private observe(): void {
    if (this.observer !== undefined || typeof ResizeObserver === 'undefined') return;
    const element = this.target();
    if (element === null) return;
    this.observer = new ResizeObserver((entries) => {
      const box = entries[entries.length - 1].contentRect;
      const width = Math.floor(box.width);
      const height = Math.floor(box.height);
      // A hidden element measures 0 × 0: keep the last real size rather than drawing into nothing.
      if (width <= 0 || height <= 0 || (width === this.width && height === this.height)) return;
      this.width = width;
      this.height = height;
      this.host.requestUpdate();
    });
    this.observer.observe(element);
  }
}
