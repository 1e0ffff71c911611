import type { AnalysisView } from '../protocol';

/** Whether `slice` indexes one of the view's slices. */
export function hasSlice(view: AnalysisView | undefined, slice: number): view is AnalysisView {
  return view !== undefined && Number.isInteger(slice) && slice >= 0 && slice < view.slices.length;
}
