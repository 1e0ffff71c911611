/** Small questions the panels ask of an AnalysisView, and of their own events. */
import type { AnalysisView } from '../protocol';
import { indicatorKinds } from './latitude-text';

/** A slice index within the view's slices (rounded and clamped). */
export function clampSlice(view: AnalysisView, slice: number): number {
  return Math.min(view.slices.length - 1, Math.max(0, Math.round(slice)));
}

/** Indicator kinds the latitude panel marks for this view (none without per-slice indicator counts). */
export function viewIndicatorKinds(view: AnalysisView): readonly string[] {
  return indicatorKinds(view.latitude, view.indicators?.kinds);
}

/** The number in attribute `name` of the event's target or its nearest ancestor that has one. */
export function dataIndex(event: Event, name: string): number | undefined {
  const target = event.target instanceof Element ? event.target.closest(`[${name}]`) : null;
  const value = target?.getAttribute(name);
  return value === undefined || value === null ? undefined : Number(value);
}
