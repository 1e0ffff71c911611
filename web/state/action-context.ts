/**
 * What every job of the workbench's actions shares: the store, the worker, one busy notice
 * owned by the latest piece of work, analyses where the latest call wins, and the address.
 */
import type { SliceMetrics } from '../../src/analysis';
import type { RunSettings } from '../../src/run';
import type { AppState } from './app-state';
import { matchingSlice, sliceNamed } from './slice-matching';
import { shownSlices } from './slice-range';
import type { Store } from './store';
import { encodeUrlState } from './url-state';
import { expectAnswer, type WorkerClient } from './worker-client';

/** Thrown into an analysis a newer one has replaced: its answer is dropped without a word. */
export class SupersededError extends Error {
  constructor() {
    super('replaced by a newer analysis');
    this.name = 'SupersededError';
  }
}

export class ActionContext {
  /** The latest analysis call; starting another aborts it (as Lit's Task does). */
  private analysisCall: AbortController | undefined;
  /** Number of the latest work that set the busy notice; only it clears the notice. */
  private busyOwner = 0;
  /**
   * While work that ends in a new analysis runs, the slice the user was on and the arrow steps
   * taken since: the steps count on the new slices too, even those the old ones had no room for
   * (the old strip may end where the new table goes on).
   */
  private stepsFrom: { slice: SliceMetrics | undefined; steps: number } | undefined;

  constructor(readonly store: Store<AppState>, readonly client: WorkerClient) {}

  get state(): AppState {
    return this.store.state;
  }

  /**
   * Analyses with new settings and keeps the user's place in time (or goes to `sliceName`).
   * When a newer analysis has been asked for meanwhile, this one's answer (or failure) is
   * dropped and it rejects with SupersededError.
   */
  async analyse(settings: RunSettings, sliceName?: string): Promise<void> {
    this.analysisCall?.abort();
    const call = new AbortController();
    this.analysisCall = call;
    let answer;
    try {
      answer = expectAnswer(await this.client.send({ type: 'analyse', settings }).answer, 'analysis');
    } catch (error) {
      throw call.signal.aborted ? new SupersededError() : error;
    }
    if (call.signal.aborted) throw new SupersededError();
    const { view } = answer;
    const tracked = this.stepsFrom;
    this.stepsFrom = undefined;
    const previous = tracked === undefined ? this.state.view?.slices[this.state.slice] : tracked.slice;
    const named = sliceName === undefined ? undefined : sliceNamed(view.slices, sliceName);
    const wanted = named ?? (previous === undefined ? 0 : matchingSlice(view.slices, previous)) + (tracked?.steps ?? 0);
    const { from, to } = shownSlices(view.slices, this.state.wholeScale);
    this.store.update({ view, settings, slice: Math.min(to, Math.max(from, wanted)), cell: undefined });
    this.syncUrl();
  }

  /**
   * Runs one piece of work with a busy notice; a failure becomes the problem shown, a
   * superseded analysis nothing. The notice goes when the latest work started ends. True when
   * the work succeeded.
   */
  async run(label: string, work: () => Promise<void>): Promise<boolean> {
    const owner = ++this.busyOwner;
    this.stepsFrom = { slice: this.state.view?.slices[this.state.slice], steps: 0 };
    this.store.update({ busy: { label, fraction: undefined }, problem: undefined });
    try {
      await work();
      return true;
    } catch (error) {
      if (!(error instanceof SupersededError)) {
        this.store.update({ problem: error instanceof Error && error.name === 'CancelledError' ? 'Import cancelled; the previous table is still loaded.' : errorText(error) });
      }
      return false;
    } finally {
      if (owner === this.busyOwner) {
        this.store.update({ busy: undefined });
        this.stepsFrom = undefined;
      }
    }
  }

  /** An arrow step (`delta`) or, with no delta, a jump to the slice now current. */
  noteSliceMove(delta?: number): void {
    if (this.stepsFrom === undefined) return;
    if (delta === undefined) this.stepsFrom = { slice: this.state.view?.slices[this.state.slice], steps: 0 };
    else this.stepsFrom.steps += delta;
  }

  syncUrl(): void {
    const s = this.state;
    const hash = encodeUrlState({
      settings: s.settings, measure: s.measure, sliceName: s.view?.slices[s.slice]?.name, mapView: s.mapView,
      layers: s.layers, curveSeries: s.curveSeries, normaliseCurves: s.normaliseCurves, wholeScale: s.wholeScale,
    });
    history.replaceState(null, '', `#${hash}`);
  }
}

export function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
