// @vitest-environment happy-dom
// The reactive controllers in web/controllers, on small Lit hosts: each follows its host's
// connection (Lit's ReactiveController contract) and lets go of observers and scheduled work on
// disconnect. Key handling follows the WAI-ARIA Authoring Practices' roving tabindex pattern.
import { LitElement, html } from 'lit';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { IdleWorkController, RovingFocusController, SizeController } from '../../web/controllers';

/** A ResizeObserver stand-in that reports only when told to. */
class FakeResizeObserver {
  static live = new Set<FakeResizeObserver>();
  readonly targets = new Set<Element>();
  constructor(private readonly callback: ResizeObserverCallback) {}
  observe(target: Element): void {
    this.targets.add(target);
    FakeResizeObserver.live.add(this);
  }
  unobserve(target: Element): void {
    this.targets.delete(target);
  }
  disconnect(): void {
    this.targets.clear();
    FakeResizeObserver.live.delete(this);
  }
  /** Reports a new content size for every observed element. */
  static resize(width: number, height: number): void {
    for (const observer of FakeResizeObserver.live) {
      const entries = [...observer.targets].map((target) => ({ target, contentRect: { width, height } }) as unknown as ResizeObserverEntry);
      observer.callback(entries, observer as unknown as ResizeObserver);
    }
  }
}

class SizedHost extends LitElement {
  readonly size = new SizeController(this, () => this.renderRoot.querySelector('.box'), { width: 300, height: 200 });
  renders = 0;
  override render() {
    this.renders++;
    return html`<div class="box"></div>`;
  }
}
customElements.define('test-sized-host', SizedHost);

class SizeCallbackHost extends LitElement {
  readonly sizes: [number, number][] = [];
  readonly size = new SizeController(this, () => this, { width: 0, height: 0, onResize: (w, h) => this.sizes.push([w, h]) });
  renders = 0;
  override render() {
    this.renders++;
    return html``;
  }
}
customElements.define('test-size-callback-host', SizeCallbackHost);

class IdleHost extends LitElement {
  readonly idle = new IdleWorkController(this);
}
customElements.define('test-idle-host', IdleHost);

class ListHost extends LitElement {
  items = 5;
  activated: number[] = [];
  readonly roving = new RovingFocusController(this, {
    container: () => this.renderRoot.querySelector('ul'),
    attribute: 'data-item',
    range: () => (this.items === 0 ? undefined : [0, this.items - 1]),
    keys: { ArrowDown: 1, ArrowUp: -1, Home: 'low', End: 'high' },
    onActivate: (index) => this.activated.push(index),
  });
  override render() {
    return html`<ul @keydown=${this.roving.onKeyDown} @focusin=${this.roving.onFocusIn} @focusout=${this.roving.onFocusOut}>
      ${Array.from({ length: this.items }, (_, k) => html`<li data-item=${k} tabindex=${this.roving.tabIndex(k, 2)}>${k}</li>`)}
    </ul><button>after</button>`;
  }
}
customElements.define('test-list-host', ListHost);

async function mount<T extends LitElement>(tag: string): Promise<T> {
  const element = document.createElement(tag) as T;
  document.body.append(element);
  await element.updateComplete;
  return element;
}

describe('SizeController', () => {
  beforeEach(() => vi.stubGlobal('ResizeObserver', FakeResizeObserver));
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.replaceChildren();
  });

  it('keeps the default size until the first observation, then the observed size in whole pixels, and updates the host', async () => {
    const host = await mount<SizedHost>('test-sized-host');
    expect([host.size.width, host.size.height]).toEqual([300, 200]);
    const before = host.renders;
    FakeResizeObserver.resize(640.7, 480.2);
    await host.updateComplete;
    expect([host.size.width, host.size.height]).toEqual([640, 480]);
    expect(host.renders).toBe(before + 1);
  });

  it('observes the rendered element, not the host', async () => {
    const host = await mount<SizedHost>('test-sized-host');
    const observed = [...FakeResizeObserver.live].flatMap((o) => [...o.targets]);
    expect(observed).toEqual([host.renderRoot.querySelector('.box')]);
  });

  it('keeps the last real size while the element is hidden (0 × 0) and asks for no update', async () => {
    const host = await mount<SizedHost>('test-sized-host');
    FakeResizeObserver.resize(500, 400);
    await host.updateComplete;
    const renders = host.renders;
    FakeResizeObserver.resize(0, 0);
    await host.updateComplete;
    expect([host.size.width, host.size.height, host.renders]).toEqual([500, 400, renders]);
  });

  it('stops observing on disconnect and observes again on reconnect', async () => {
    const host = await mount<SizedHost>('test-sized-host');
    expect(FakeResizeObserver.live.size).toBe(1);
    host.remove();
    expect(FakeResizeObserver.live.size).toBe(0);
    FakeResizeObserver.resize(800, 600);
    expect(host.size.width).toBe(300);
    document.body.append(host);
    await host.updateComplete;
    expect(FakeResizeObserver.live.size).toBe(1);
    FakeResizeObserver.resize(800, 600);
    expect(host.size.width).toBe(800);
  });

  it('calls onResize instead of updating the host when given one', async () => {
    const host = await mount<SizeCallbackHost>('test-size-callback-host');
    const renders = host.renders;
    FakeResizeObserver.resize(320, 240);
    FakeResizeObserver.resize(320, 240);
    await host.updateComplete;
    expect(host.sizes).toEqual([[320, 240]]);
    expect(host.renders).toBe(renders);
  });
});

describe('IdleWorkController', () => {
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
    document.body.replaceChildren();
  });

  /** requestIdleCallback stand-in: callbacks run when `flush` is called, each with `budget` ms of idle time. */
  function fakeIdle(budgetSteps: number) {
    const queue = new Map<number, IdleRequestCallback>();
    let next = 1;
    vi.stubGlobal('requestIdleCallback', (fn: IdleRequestCallback) => {
      queue.set(next, fn);
      return next++;
    });
    vi.stubGlobal('cancelIdleCallback', (handle: number) => queue.delete(handle));
    return {
      queue,
      flush(): void {
        const callbacks = [...queue.values()];
        queue.clear();
        for (const fn of callbacks) {
          let left = budgetSteps;
          fn({ didTimeout: false, timeRemaining: () => (left-- > 0 ? 10 : 0) });
        }
      },
    };
  }

  it('runs steps in idle periods until the task says it is done', async () => {
    const idle = fakeIdle(3);
    const host = await mount<IdleHost>('test-idle-host');
    const done: number[] = [];
    host.idle.run(() => {
      done.push(done.length);
      return done.length < 5;
    });
    expect(done).toEqual([]);
    idle.flush();
    expect(done).toEqual([0, 1, 2]);
    expect(host.idle.pending).toBe(true);
    idle.flush();
    expect(done).toEqual([0, 1, 2, 3, 4]);
    expect(host.idle.pending).toBe(false);
    expect(idle.queue.size).toBe(0);
  });

  it('replaces a running task with a new one, and cancel stops it', async () => {
    const idle = fakeIdle(10);
    const host = await mount<IdleHost>('test-idle-host');
    const first = vi.fn(() => true);
    const second = vi.fn(() => true);
    host.idle.run(first);
    host.idle.run(second);
    idle.flush();
    expect(first).not.toHaveBeenCalled();
    expect(second).toHaveBeenCalled();
    host.idle.cancel();
    expect(idle.queue.size).toBe(0);
    expect(host.idle.pending).toBe(false);
  });

  it('pauses while the host is disconnected and resumes where it stopped', async () => {
    const idle = fakeIdle(2);
    const host = await mount<IdleHost>('test-idle-host');
    let count = 0;
    host.idle.run(() => ++count < 4);
    idle.flush();
    expect(count).toBe(2);
    host.remove();
    expect(idle.queue.size).toBe(0);
    idle.flush();
    expect(count).toBe(2);
    document.body.append(host);
    idle.flush();
    expect(count).toBe(4);
    expect(host.idle.pending).toBe(false);
  });

  it('falls back to a timer where the browser has no requestIdleCallback', async () => {
    vi.stubGlobal('requestIdleCallback', undefined);
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] });
    const host = await mount<IdleHost>('test-idle-host');
    let count = 0;
    host.idle.run(() => ++count < 3);
    expect(count).toBe(0);
    await vi.runAllTimersAsync();
    expect(count).toBe(3);
    host.idle.run(() => ++count < 100);
    host.remove();
    await vi.runAllTimersAsync();
    expect(count).toBe(3);
  });
});

describe('RovingFocusController', () => {
  afterEach(() => document.body.replaceChildren());

  const items = (host: ListHost) => [...host.renderRoot.querySelectorAll<HTMLElement>('li')];
  const key = (target: Element, name: string) => {
    const event = new KeyboardEvent('keydown', { key: name, bubbles: true, cancelable: true, composed: true });
    target.dispatchEvent(event);
    return event;
  };

  it('puts one item in the tab order: the fallback until an item has focus', async () => {
    const host = await mount<ListHost>('test-list-host');
    expect(items(host).map((li) => li.tabIndex)).toEqual([-1, -1, 0, -1, -1]);
  });

  it('moves the focus with the arrow keys and Home/End, within the list’s ends', async () => {
    const host = await mount<ListHost>('test-list-host');
    items(host)[2].focus();
    expect(host.roving.focused).toBe(2);
    const event = key(items(host)[2], 'ArrowDown');
    await host.updateComplete;
    expect(event.defaultPrevented).toBe(true);
    expect(host.roving.focused).toBe(3);
    expect(host.shadowRoot!.activeElement).toBe(items(host)[3]);
    expect(items(host).map((li) => li.tabIndex)).toEqual([-1, -1, -1, 0, -1]);
    key(items(host)[3], 'End');
    await host.updateComplete;
    key(items(host)[4], 'ArrowDown');
    await host.updateComplete;
    expect(host.roving.focused).toBe(4);
    key(items(host)[4], 'Home');
    await host.updateComplete;
    key(items(host)[0], 'ArrowUp');
    await host.updateComplete;
    expect(host.roving.focused).toBe(0);
    expect(host.shadowRoot!.activeElement).toBe(items(host)[0]);
  });

  it('activates the focused item on Enter and Space, and leaves other keys to the page', async () => {
    const host = await mount<ListHost>('test-list-host');
    items(host)[1].focus();
    key(items(host)[1], 'Enter');
    key(items(host)[1], ' ');
    expect(host.activated).toEqual([1, 1]);
    expect(key(items(host)[1], 'a').defaultPrevented).toBe(false);
  });

  it('forgets the focus when it leaves the list, and on disconnect', async () => {
    const host = await mount<ListHost>('test-list-host');
    items(host)[3].focus();
    expect(host.roving.focused).toBe(3);
    host.renderRoot.querySelector('button')!.focus();
    expect(host.roving.focused).toBeUndefined();
    items(host)[1].focus();
    host.remove();
    expect(host.roving.focused).toBeUndefined();
  });
});
