/** The panels' exported figures: standalone SVG documents with a title block, from the same layouts as the screen. */
import { assignText, binsText } from '../../src/run';
import type { AnalysisView } from '../protocol';
import { sliceTitle } from '../text';
import { curvesLayout } from './curves-layout';
import { curvesDescription } from './curves-text';
import { latitudeLayout } from './latitude-layout';
import { latitudeDescription } from './latitude-text';
import { clampSlice, viewIndicatorKinds } from './view-helpers';
import { visibleSeries } from './series';
import { svgDocument } from './svg-document';

export interface Figure {
  readonly text: string;
  readonly width: number;
  readonly height: number;
}

export const CURVES_TITLE = 'Footprint through time';
export const LATITUDE_TITLE = 'Occurrences by palaeolatitude';
const EMPTY_HEIGHT = 40;
/** The latitude figure is never narrower than this, CSS px: room for its title and its axis labels whatever the panel's width. */
const LATITUDE_MIN_WIDTH = 400;

function empty(title: string, width: number): Figure {
  return { text: svgDocument({ width, height: EMPTY_HEIGHT, title, description: 'No analysis yet.', marks: [] }), width, height: EMPTY_HEIGHT };
}

/** The curves as a figure: the visible series on the time axis, titled with the settings. */
export function curvesFigure(
  view: AnalysisView | undefined, seriesKeys: readonly string[], normalise: boolean, width: number, range?: { readonly from: number; readonly to: number },
): Figure {
  if (view === undefined || view.slices.length === 0) return empty(CURVES_TITLE, width);
  const series = visibleSeries(seriesKeys);
  const slices = range === undefined ? view.slices : view.slices.slice(range.from, range.to + 1);
  const details = [`bins ${binsText(view.settings.bins)}`, `assign ${assignText(view.settings.assign)}`, `grid ${view.gridName}`, `${slices.length} slices`];
  const layout = curvesLayout({
    slices, collectionsArePositions: view.collectionsArePositions, series, normalise, width,
    heading: { title: CURVES_TITLE, details },
  });
  const description = curvesDescription(slices, series, normalise, view.collectionsArePositions);
  const marks = [...layout.marks, ...layout.axisMarks];
  return { text: svgDocument({ width, height: layout.height, title: CURVES_TITLE, description, marks }), width, height: layout.height };
}

/** The latitude panel of one slice as a figure. */
export function latitudeFigure(view: AnalysisView | undefined, slice: number, panelWidth: number): Figure {
  const width = Math.max(panelWidth, LATITUDE_MIN_WIDTH);
  if (view === undefined || view.slices.length === 0 || view.latitude.bands === 0) return empty(LATITUDE_TITLE, width);
  const s = clampSlice(view, slice);
  const metrics = view.slices[s];
  const kinds = viewIndicatorKinds(view);
  const details = [sliceTitle(metrics), `${view.latitude.bandDeg}° bands`, `bins ${binsText(view.settings.bins)}`, `assign ${assignText(view.settings.assign)}`];
  const layout = latitudeLayout({ latitude: view.latitude, slice: s, sliceName: metrics.name, kinds, width, heading: { title: LATITUDE_TITLE, details } });
  const description = latitudeDescription(view.latitude, s, metrics.name, kinds);
  return { text: svgDocument({ width, height: layout.height, title: LATITUDE_TITLE, description, marks: layout.marks }), width, height: layout.height };
}
