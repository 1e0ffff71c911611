/**
 * The view in the page address (after #), so that it can be bookmarked and reloaded:
 * settings, measure, slice (by name), map view, layers and curves. Unknown or malformed values
 * are ignored in favour of the defaults, and say so through `ignored`.
 */
import { assignText, binsText, DEFAULT_RUN_SETTINGS, gridText, parseRunSettings, type RunSettingName, type RunSettings } from '../../src/run';
import { MEASURES, type Measure } from '../protocol';
import { CURVE_SERIES, type CurveSeries } from './app-state';
import { DEFAULT_LAYERS, MAP_VIEWS, type LayerVisibility, type MapView } from './view-options';

export interface UrlState {
  readonly settings: RunSettings;
  readonly measure: Measure;
  readonly sliceName: string | undefined;
  readonly mapView: MapView | undefined;
  readonly layers: LayerVisibility;
  readonly curveSeries: readonly CurveSeries[] | undefined;
  readonly normaliseCurves: boolean;
  readonly wholeScale: boolean;
}

const LAYER_KEYS = Object.keys(DEFAULT_LAYERS) as (keyof LayerVisibility)[];

export function encodeUrlState(state: UrlState): string {
  const p = new URLSearchParams();
  const s = state.settings;
  p.set('bins', binsText(s.bins));
  p.set('assign', assignText(s.assign));
  if (s.assign.kind === 'draw') p.set('seed', String(s.seed));
  p.set('grid', gridText(s.grid));
  if (s.rotateAt !== DEFAULT_RUN_SETTINGS.rotateAt) p.set('rotate-at', s.rotateAt);
  if (s.preferModel) p.set('prefer-model', '1');
  if (s.beyondModel !== DEFAULT_RUN_SETTINGS.beyondModel) p.set('beyond-model', s.beyondModel);
  p.set('measure', state.measure);
  if (state.sliceName !== undefined) p.set('slice', state.sliceName);
  if (state.mapView !== undefined) p.set('map', state.mapView);
  p.set('layers', LAYER_KEYS.filter((k) => state.layers[k]).join(','));
  if (state.curveSeries !== undefined) p.set('curves', state.curveSeries.join(','));
  if (state.normaliseCurves) p.set('normalise', '1');
  if (state.wholeScale) p.set('whole-scale', '1');
  return p.toString();
}

export function decodeUrlState(hash: string): { state: UrlState; ignored: string[] } {
  const p = new URLSearchParams(hash.replace(/^#/, ''));
  const ignored: string[] = [];
  const pick = <T extends string>(key: string, allowed: (v: string) => v is T, fallback: T): T => {
    const value = p.get(key);
    if (value === null) return fallback;
    if (allowed(value)) return value;
    ignored.push(`${key}=${value}`);
    return fallback;
  };
  const isText = (v: string): v is string => v.length > 0 && v.length <= 200;
  // Each setting read by the one settings reader; a value it refuses is ignored (and listed).
  const setting = <K extends RunSettingName & keyof RunSettings>(name: K, key: string): RunSettings[K] => {
    const value = p.get(key);
    if (value === null) return DEFAULT_RUN_SETTINGS[name];
    try {
      return parseRunSettings({ [name]: value }, { naming: 'option' })[name];
    } catch {
      ignored.push(`${key}=${value}`);
      return DEFAULT_RUN_SETTINGS[name];
    }
  };
  const settings: RunSettings = {
    bins: setting('bins', 'bins'),
    assign: setting('assign', 'assign'),
    seed: setting('seed', 'seed'),
    grid: setting('grid', 'grid'),
    map: DEFAULT_RUN_SETTINGS.map,
    rotateAt: setting('rotateAt', 'rotate-at'),
    preferModel: p.get('prefer-model') === '1',
    beyondModel: setting('beyondModel', 'beyond-model'),
    area: DEFAULT_RUN_SETTINGS.area,
    bandDeg: DEFAULT_RUN_SETTINGS.bandDeg,
    within: DEFAULT_RUN_SETTINGS.within,
  };
  const layersText = p.get('layers');
  const layerNames = layersText === null ? undefined : layersText.split(',').filter((x) => x !== '');
  for (const name of layerNames ?? []) if (!(LAYER_KEYS as string[]).includes(name)) ignored.push(`layers: ${name}`);
  const layers = layerNames === undefined ? DEFAULT_LAYERS
    : (Object.fromEntries(LAYER_KEYS.map((k) => [k, layerNames.includes(k)])) as unknown as LayerVisibility);
  const curvesText = p.get('curves');
  const curveSeries = curvesText === null ? undefined
    : curvesText.split(',').filter((x): x is CurveSeries => (CURVE_SERIES as readonly string[]).includes(x));
  const mapText = p.get('map');
  const mapView = mapText !== null && (MAP_VIEWS as readonly string[]).includes(mapText) ? (mapText as MapView) : undefined;
  if (mapText !== null && mapView === undefined) ignored.push(`map=${mapText}`);
  const sliceName = p.get('slice') ?? undefined;
  return {
    state: {
      settings,
      measure: pick('measure', (v): v is Measure => (MEASURES as readonly string[]).includes(v), 'occurrences'),
      sliceName: sliceName !== undefined && isText(sliceName) ? sliceName : undefined,
      mapView,
      layers,
      curveSeries,
      normaliseCurves: p.get('normalise') === '1',
      wholeScale: p.get('whole-scale') === '1',
    },
    ignored,
  };
}
