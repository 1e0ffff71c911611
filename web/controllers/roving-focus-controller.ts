/**
 * Roving focus over a list of items (the WAI-ARIA "roving tabindex" pattern): one item is in the
 * tab order, arrow keys move the focus between items, and Home/End jump to the ends. Items carry
 * their index in a data attribute; the host renders `tabindex=${focus.tabIndex(i, fallback)}` and
 * binds `onKeyDown`, `onFocusIn` and `onFocusOut` on the list's container.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';

/** What a key does: a step through the indexes, or a jump to the lowest or highest one. */
export type RovingMove = number | 'low' | 'high';

export interface RovingFocusOptions {
  /** The element holding the items. */
  readonly container: () => Element | null;
  /** Attribute holding each item's index, e.g. "data-slice". */
  readonly attribute: string;
  /** The lowest and highest index there is now; undefined when the list is empty. */
  readonly range: () => readonly [number, number] | undefined;
  /** KeyboardEvent.key → move. */
  readonly keys: Readonly<Record<string, RovingMove>>;
  /** Called on Enter or Space with the focused item's index, when given. */
  readonly onActivate?: (index: number) => void;
}

export class RovingFocusController implements ReactiveController {
  /** The index of the item with keyboard focus, if one has it. */
  focused: number | undefined = undefined;
  readonly #host: ReactiveControllerHost;
  readonly #options: RovingFocusOptions;
  /** Set when a key moved the focus: the item is focused once the host has rendered its tab stop. */
  #moveFocus = false;

  constructor(host: ReactiveControllerHost, options: RovingFocusOptions) {
    this.#host = host;
    this.#options = options;
    host.addController(this);
  }

  /** 0 for the one item in the tab order (the focused one, else `fallback`), −1 for the rest. */
  tabIndex(index: number, fallback: number): 0 | -1 {
    return index === (this.focused ?? fallback) ? 0 : -1;
  }

  hostUpdated(): void {
    if (!this.#moveFocus || this.focused === undefined) return;
    this.#moveFocus = false;
    const item = this.#options.container()?.querySelector(`[${this.#options.attribute}="${this.focused}"]`);
    if (item instanceof HTMLElement || item instanceof SVGElement) item.focus();
  }

  hostDisconnected(): void {
    this.#set(undefined);
    this.#moveFocus = false;
  }

  readonly onKeyDown = (event: KeyboardEvent): void => {
    const at = this.#indexOf(event);
    const range = this.#options.range();
    if (at === undefined || range === undefined) return;
    const move = this.#options.keys[event.key];
    if (move !== undefined) {
      const [low, high] = range;
      const next = move === 'low' ? low : move === 'high' ? high : at + move;
      this.#moveFocus = true;
      this.#set(Math.min(high, Math.max(low, next)));
    } else if (this.#options.onActivate !== undefined && (event.key === 'Enter' || event.key === ' ')) {
      this.#options.onActivate(at);
    } else {
      return;
    }
    // Handled here: the page's own keys (arrows and Home/End step the current slice) must not act as well.
    event.preventDefault();
    event.stopPropagation();
  };

  readonly onFocusIn = (event: FocusEvent): void => {
    this.#set(this.#indexOf(event));
  };

  readonly onFocusOut = (event: FocusEvent): void => {
    const next = event.relatedTarget;
    const container = this.#options.container();
    if (!(next instanceof Node && container !== null && container.contains(next))) this.#set(undefined);
  };

  #set(index: number | undefined): void {
    if (index === this.focused) return;
    this.focused = index;
    this.#host.requestUpdate();
  }

  /** The index in the options' attribute of the event's target or its nearest ancestor that has one. */
  #indexOf(event: Event): number | undefined {
    const item = event.target instanceof Element ? event.target.closest(`[${this.#options.attribute}]`) : null;
    const value = item?.getAttribute(this.#options.attribute);
    return value === undefined || value === null ? undefined : Number(value);
  }
}
