/**
 * Whether the WebGL map draws a slice's occurrence places. Software WebGL (no GPU) spends about a
 * second per frame on 200k points (STACK.md), so above a budget the map shows the aggregated
 * cells only, unless the user asks for the points or zooms in far enough to look at detail.
 */
import { POINT_BUDGET } from '../state/view-options';
import { formatCount } from '../text';

/** Zoom level from which points are drawn whatever their number. */
export const POINT_ZOOM = 4;

export const POINT_DECISIONS = ['drawn', 'layer-off', 'over-budget'] as const;
export type PointDecision = (typeof POINT_DECISIONS)[number];

export function pointDecision(count: number, layerOn: boolean, showAll: boolean, zoom: number, budget = POINT_BUDGET): PointDecision {
  if (!layerOn) return 'layer-off';
  return count <= budget || showAll || zoom >= POINT_ZOOM ? 'drawn' : 'over-budget';
}

/** The on-screen sentence for points left out, or '' when there is nothing to say. */
export function pointNotice(decision: PointDecision, count: number, budget = POINT_BUDGET): string {
  if (decision !== 'over-budget') return '';
  return `Places not drawn: ${formatCount(count)} in this slice, more than the budget of ${formatCount(budget)}. Zoom in to level ${POINT_ZOOM}, or ask for all points.`;
}
