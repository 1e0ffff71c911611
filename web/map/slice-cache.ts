/**
 * Per-slice prepared data for one (view, measure) pair, built once per slice and kept for the
 * most recently shown slices. A new view or measure empties it and bumps `generation`, which
 * layer ids carry, so the renderer drops every layer built from the old data.
 */
export class SliceCache<T> {
  readonly capacity: number;
  #view: object | undefined = undefined;
  #measure: string | undefined = undefined;
  #generation = 0;
  /** Insertion order is recency order: the last key is the most recently used. */
  readonly #entries = new Map<number, T>();

  constructor(capacity: number) {
    if (!(Number.isInteger(capacity) && capacity >= 1)) throw new RangeError(`Slice cache capacity ${capacity} is not allowed: expected a whole number ≥ 1.`);
    this.capacity = capacity;
  }

  /** Counts the (view, measure) pairs seen: it changes whenever the cached data is dropped. */
  get generation(): number {
    return this.#generation;
  }

  /** The slice's data for (view, measure), built with `build` if not held. */
  get(view: object, measure: string, slice: number, build: () => T): T {
    if (view !== this.#view || measure !== this.#measure) {
      this.#view = view;
      this.#measure = measure;
      this.#entries.clear();
      this.#generation++;
    }
    let value = this.#entries.get(slice);
    if (value === undefined) {
      value = build();
      if (this.#entries.size >= this.capacity) this.#entries.delete(this.#entries.keys().next().value as number);
    } else {
      this.#entries.delete(slice);
    }
    this.#entries.set(slice, value);
    return value;
  }

  /** The slice's data if held for (view, measure), without touching its recency. */
  peek(view: object, measure: string, slice: number): T | undefined {
    return view === this.#view && measure === this.#measure ? this.#entries.get(slice) : undefined;
  }

  /** Held slices with their data, least recently used first. */
  entries(): IterableIterator<[number, T]> {
    return this.#entries.entries();
  }

  clear(): void {
    this.#view = undefined;
    this.#measure = undefined;
    this.#entries.clear();
    this.#generation++;
  }
}
