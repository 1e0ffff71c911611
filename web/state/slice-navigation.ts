/** Moving through time: the current slice, kept within the slices shown. */
import type { ActionContext } from './action-context';
import { shownSlices } from './slice-range';

export class SliceNavigation {
  constructor(private readonly context: ActionContext) {}

  /** Moves to a slice, kept within the slices shown. */
  setSlice(slice: number): void {
    this.moveTo(slice);
    this.context.noteSliceMove();
  }

  /** One slice older (−1) or younger (+1); counted on the new slices when an analysis is on its way. */
  stepSlice(delta: number): void {
    this.moveTo(this.context.state.slice + delta);
    this.context.noteSliceMove(delta);
  }

  private moveTo(slice: number): void {
    const { state, store } = this.context;
    const view = state.view;
    if (view === undefined || view.slices.length === 0) return;
    const { from, to } = shownSlices(view.slices, state.wholeScale);
    const next = Math.min(to, Math.max(from, Math.round(slice)));
    if (next === state.slice) return;
    store.update({ slice: next, cell: undefined });
    this.context.syncUrl();
  }

  /** First (−1) or last (+1) slice shown. */
  slicesEnd(end: -1 | 1): void {
    const { view, wholeScale } = this.context.state;
    if (view === undefined) return;
    const { from, to } = shownSlices(view.slices, wholeScale);
    this.setSlice(end < 0 ? from : to);
  }

  setWholeScale(wholeScale: boolean): void {
    this.context.store.update({ wholeScale });
    this.setSlice(this.context.state.slice);
    this.context.syncUrl();
  }
}
