/**
 * One small store for the page's state: components read `store.state` through a
 * StoreController and change it only through the workbench's actions.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';

export class Store<S extends object> extends EventTarget {
  private current: S;

  constructor(initial: S) {
    super();
    this.current = initial;
  }

  get state(): S {
    return this.current;
  }

  update(patch: Partial<S>): void {
    this.current = { ...this.current, ...patch };
    this.dispatchEvent(new Event('change'));
  }
}

/** Re-renders its host whenever the store changes. */
export class StoreController<S extends object> implements ReactiveController {
  private readonly onChange = (): void => this.host.requestUpdate();

  constructor(private readonly host: ReactiveControllerHost, readonly store: Store<S>) {
    host.addController(this);
  }

  get state(): S {
    return this.store.state;
  }

  hostConnected(): void {
    this.store.addEventListener('change', this.onChange);
  }

  hostDisconnected(): void {
    this.store.removeEventListener('change', this.onChange);
  }
}
