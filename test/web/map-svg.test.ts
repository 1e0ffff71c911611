// @vitest-environment happy-dom
// The SVG map figure, read back with the DOM's XML parser (happy-dom) and checked against:
// - the colour scale (countScale of measureMax): one path per occupied cell, filled in its colour;
// - the Equal Earth projection's defining property (Šavrič, Patterson & Jenny 2018, equal-area):
//   on the map, area = k²·(area on the unit sphere), k the projection's scale — so the cell paths
//   together cover k²·cells·4π/(12·nside²) px² (HEALPix cell area, Górski et al. 2005). A ring
//   left in RFC 7946 order would cover the rest of the globe instead and fail this;
// - XML 1.0 escaping of every name that reaches the document.
import { describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { countScale } from '../../web/colour/measure-scale';
import { figureLayout } from '../../web/equal-area/figure-layout';
import { fittedProjection, type EqualAreaProjection } from '../../web/equal-area/map-projection';
import { mapSvg } from '../../web/equal-area/map-svg';
import { ViewGeometry } from '../../web/equal-area/view-geometry';
import type { AnalysisView, Measure } from '../../web/protocol';
import { DEFAULT_LAYERS, MEASURE_UNITS, measureMax, type LayerVisibility } from '../../web/state/view-options';
import { DEFAULT_SLICES, smallView } from './small-analysis-view';

const ALL_LAYERS: LayerVisibility = { cells: true, points: true, hull: true, spanningTree: true, polygons: true, indicators: true };

function figure(view: AnalysisView, options: { slice?: number; measure?: Measure; layers?: LayerVisibility; projection?: EqualAreaProjection; width?: number; mapHeight?: number } = {}) {
  const input = {
    geometry: new ViewGeometry(view), slice: options.slice ?? 0, measure: options.measure ?? 'occurrences', layers: options.layers ?? ALL_LAYERS,
    projection: options.projection ?? 'equal-earth', width: options.width ?? 960, mapHeight: options.mapHeight ?? 480,
  } as const;
  const text = mapSvg(input);
  const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
  return { input, text, doc };
}

/** Total area of an SVG path of straight segments (M, L, Z; absolute), by the shoelace formula per subpath. */
function pathArea(d: string): number {
  let total = 0;
  for (const sub of d.split('M').filter((s) => s.length > 0)) {
    const xy = sub.replace(/Z/g, '').split(/[L,]/).map(Number);
    let twice = 0;
    for (let i = 0; i < xy.length; i += 2) {
      const j = (i + 2) % xy.length;
      twice += xy[i] * xy[j + 1] - xy[j] * xy[i + 1];
    }
    total += Math.abs(twice) / 2;
  }
  return total;
}

describe('mapSvg', () => {
  const view = smallView();

  it('is a well-formed SVG document with one path per occupied cell of the slice, filled by countScale', () => {
    for (const measure of ['occurrences', 'collections', 'taxa'] as const) {
      for (let slice = 0; slice < view.slices.length; slice++) {
        const { doc } = figure(view, { slice, measure });
        expect(doc.querySelector('parsererror')).toBeNull();
        expect(doc.documentElement.nodeName).toBe('svg');
        const paths = [...doc.querySelectorAll('#cells path')];
        const { sliceStart, cell } = view.cells;
        expect(paths.length).toBe(sliceStart[slice + 1] - sliceStart[slice]);
        const scale = countScale(measureMax(view, measure));
        paths.forEach((path, k) => {
          const e = sliceStart[slice] + k;
          expect(path.getAttribute('data-cell')).toBe(String(cell[e]));
          expect(path.getAttribute('fill')).toBe(scale.css(view.cells[measure][e]));
        });
      }
    }
  });

  it('draws the cells with the area Equal Earth gives them: k² times their area on the sphere', () => {
    const fine = smallView({ cellStepDeg: 0.25 });
    const grid = new HealpixGrid(8);
    for (let slice = 0; slice < fine.slices.length; slice++) {
      const { input, doc } = figure(fine, { slice, width: 3000, mapHeight: 1500 });
      const { x0, y0, x1, y1 } = figureLayout(input.width, input.mapHeight, true).map;
      const k = fittedProjection('equal-earth', x0, y0, x1, y1).scale();
      const drawn = [...doc.querySelectorAll('#cells path')].reduce((sum, p) => sum + pathArea(p.getAttribute('d')!), 0);
      // 0.25° chords and 0.1 px rounding: well within 0.5%.
      expect(drawn / (k * k * fine.slices[slice].cells * grid.cellAreaSr), `slice ${slice}`).toBeCloseTo(1, 2);
    }
  });

  it('writes a title with the slice name and ages, the legend and the projection line', () => {
    const { doc, text } = figure(view, { slice: 3, measure: 'taxa' });
    const title = `${DEFAULT_SLICES[3].name}, 80–70.5 Ma`;
    expect(doc.querySelector('title')!.textContent).toBe(title);
    expect(text).toContain(`font-weight="600">${title}</text>`);
    expect(doc.querySelectorAll('linearGradient stop').length).toBe(9);
    expect(doc.querySelector('#legend rect')!.getAttribute('fill')).toBe('url(#count-ramp)');
    const labels = [...doc.querySelectorAll('#legend text')].map((t) => t.textContent);
    expect(labels).toContain(`Occupied cells: ${MEASURE_UNITS.taxa} (log scale)`);
    for (const tick of countScale(measureMax(view, 'taxa')).ticks) expect(labels).toContain(String(tick));
    for (const kind of ['coal', 'evaporite', 'reef']) expect(labels).toContain(kind);
    expect(text).toContain('Equal Earth projection');
  });

  it('escapes hostile slice and indicator names, which read back as the same text', () => {
    const hostile = '<img src=x onerror=alert(1)> & "quotes" \'too\'';
    const base = smallView({ slices: [{ ...DEFAULT_SLICES[0], name: hostile }] });
    const named: AnalysisView = { ...base, indicators: { ...base.indicators!, kinds: ['<script>alert(2)</script>', 'b&b', 'c'] } };
    const { text, doc } = figure(named);
    expect(text).not.toContain('<img');
    expect(text).not.toContain('<script');
    expect(text).toContain('&lt;img src=x onerror=alert(1)&gt; &amp; &quot;quotes&quot; &apos;too&apos;');
    expect(doc.querySelector('parsererror')).toBeNull();
    expect(doc.querySelector('title')!.textContent).toBe(`${hostile}, 110–100 Ma`);
    expect([...doc.querySelectorAll('#legend text')].map((t) => t.textContent)).toContain('<script>alert(2)</script>');
  });

  it('leaves out the layers that are switched off', () => {
    const none: LayerVisibility = { cells: false, points: false, hull: false, spanningTree: false, polygons: false, indicators: false };
    const { doc } = figure(view, { layers: none });
    for (const id of ['cells', 'places', 'hull', 'spanning-tree', 'base-polygons', 'indicators']) expect(doc.getElementById(id), id).toBeNull();
    expect(doc.getElementById('sphere')).not.toBeNull();
    const defaults = figure(view, { layers: DEFAULT_LAYERS }).doc;
    expect(defaults.getElementById('spanning-tree')).toBeNull();
    expect(defaults.getElementById('hull')).not.toBeNull();
  });

  it('draws one square per place of the slice, and on a polar map only the places of its hemisphere', () => {
    const slice = 1;
    const { sliceStart, lat } = view.positions;
    const squares = (doc: Document) => (doc.getElementById('places')!.getAttribute('d')!.match(/M/g) ?? []).length;
    expect(squares(figure(view, { slice }).doc)).toBe(sliceStart[slice + 1] - sliceStart[slice]);
    let north = 0;
    for (let i = sliceStart[slice]; i < sliceStart[slice + 1]; i++) if (lat[i] > 0) north++;
    expect(squares(figure(view, { slice, projection: 'polar-north' }).doc)).toBe(north);
    expect(figure(view, { projection: 'polar-north' }).text).toContain('northern hemisphere only');
  });

  it('draws only the sphere, graticule and legend when there is no analysis', () => {
    const text = mapSvg({ geometry: undefined, slice: 0, measure: 'occurrences', layers: ALL_LAYERS, projection: 'polar-south', width: 600, mapHeight: 600 });
    const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
    expect(doc.querySelector('parsererror')).toBeNull();
    expect(doc.getElementById('cells')).toBeNull();
    expect(doc.querySelector('title')!.textContent).toBe('No slice');
  });
});
