import { describe, expect, it } from 'vitest';
import { curvesLayout } from '../../web/charts/curves-layout';
import { curvesDescription, curvesReadout } from '../../web/charts/curves-text';
import { SERIES, visibleSeries } from '../../web/charts/series';
import { bandEdges, bandLabel, bandShares, peakBand } from '../../web/charts/band-shares';
import { latitudeLayout, SLICE_BAR, TOTAL_BAR } from '../../web/charts/latitude-layout';
import { bandReadout, latitudeDescription } from '../../web/charts/latitude-text';
import type { Mark, PathMark, RectMark } from '../../web/charts/marks';
import { rgbCss } from '../../web/colour/layer-colours';
import type { LatitudeCounts } from '../../web/protocol';
import { curvesFigure, latitudeFigure } from '../../web/charts/figures';
import { fiveSlices, view } from './chart-fixtures';

// Geometry worked by hand from the layout constants: margins 52 px left and 16 px right, so a
// width of 568 px leaves 500 px for 50 Myr (10 px per Myr); small-multiple rows are 72 px with
// an 18 px label strip and a 6 px gap; the plot starts 4 px down on screen.
const WIDTH = 568;

function seriesPaths(marks: readonly Mark[], colour: readonly number[]): PathMark[] {
  return marks.filter((m): m is PathMark => m.kind === 'path' && m.stroke === rgbCss(colour) && m.strokeWidth === 1.5);
}

describe('curvesLayout', () => {
  it('puts the oldest slice on the left: slice i spans x from its base age to its top age', () => {
    const layout = curvesLayout({ slices: fiveSlices(), collectionsArePositions: false, series: SERIES, normalise: false, width: WIDTH });
    expect(Array.from(layout.sliceLeft)).toEqual([52, 152, 252, 352, 452]);
    expect(Array.from(layout.sliceRight)).toEqual([152, 252, 352, 452, 552]);
  });

  it('draws hull area [1, 2, NaN, 4, 5] km² as two runs in its own row, with a gap where there is no hull', () => {
    const hull = SERIES.find((s) => s.key === 'hullKm2')!;
    const layout = curvesLayout({ slices: fiveSlices(), collectionsArePositions: false, series: SERIES, normalise: false, width: WIDTH });
    // Row 4 (hull): top 4 + 4·72 = 292, plot 310…358 px; axis 0…6 (max 5 → step 2 → 6), so y(v) = 358 − v·8.
    // Mid-ages 45, 35, 25, 15, 5 Ma → x = 102, 202, 302, 402, 502.
    expect(seriesPaths(layout.marks, hull.colour).map((m) => m.d)).toEqual(['M102,350L202,342M402,326L502,318']);
    expect(layout.height).toBe(4 + 7 * 72 + 38);
  });

  it('divides each series by its maximum on one 0…1 axis when normalised', () => {
    const occurrences = SERIES.find((s) => s.key === 'occurrences')!;
    const layout = curvesLayout({ slices: fiveSlices(), collectionsArePositions: false, series: [occurrences], normalise: true, width: WIDTH });
    // Occurrences 10, 20, 40, 8, 5 ÷ 40 = 0.25, 0.5, 1, 0.2, 0.125; plot 22…224 px, y(v) = 224 − 202·v.
    expect(seriesPaths(layout.marks, occurrences.colour).map((m) => m.d)).toEqual(['M102,173.5L202,123L302,22L402,183.6L502,198.8']);
    expect(layout.plotBottom).toBe(224);
  });

  it('labels the value axis of each row with round ticks and units', () => {
    const layout = curvesLayout({ slices: fiveSlices(), collectionsArePositions: true, series: visibleSeries(['collections', 'hullKm2']), normalise: false, width: WIDTH });
    const texts = [...layout.marks, ...layout.axisMarks].flatMap((m) => (m.kind === 'text' ? [m.text] : []));
    expect(texts).toContain('distinct places');
    expect(texts).toContain('hull area (km²)');
    // Collections max 5 → axis 0, 2, 4, 6; time axis every 10 Ma from 0 to 50.
    expect(texts).toEqual(expect.arrayContaining(['0', '2', '4', '6', '10', '20', '30', '40', '50', 'Age (Ma)']));
  });

  it('keeps the time axis apart, below the rows', () => {
    const layout = curvesLayout({ slices: fiveSlices(), collectionsArePositions: false, series: SERIES, normalise: false, width: WIDTH });
    const axisTexts = layout.axisMarks.flatMap((m) => (m.kind === 'text' ? [m] : []));
    expect(axisTexts.map((t) => t.text)).toEqual(['0', '10', '20', '30', '40', '50', 'Age (Ma)']);
    expect(axisTexts.every((t) => t.y > layout.plotBottom && t.y <= layout.height)).toBe(true);
    // Ticks run young to old, so 0 Ma sits at the right edge and 50 Ma at the left.
    expect(axisTexts[0].x).toBe(552.5);
    expect(axisTexts[5].x).toBe(52.5);
  });

  it('says so when no series is chosen', () => {
    const layout = curvesLayout({ slices: fiveSlices(), collectionsArePositions: false, series: [], normalise: false, width: WIDTH });
    expect(layout.marks.some((m) => m.kind === 'text' && m.text === 'No series selected')).toBe(true);
  });

  it('adds a title block and a legend to a figure', () => {
    const layout = curvesLayout({
      slices: fiveSlices(), collectionsArePositions: false, series: SERIES, normalise: true, width: WIDTH,
      heading: { title: 'Footprint through time', details: ['bins stages'] },
    });
    const texts = layout.marks.flatMap((m) => (m.kind === 'text' ? [m.text] : []));
    expect(texts.slice(0, 2)).toEqual(['Footprint through time', 'bins stages']);
    for (const spec of SERIES) expect(texts).toContain(spec.label);
  });
});

describe('curves text', () => {
  it('reads out a slice with units, and the reason when there is no hull', () => {
    const slices = fiveSlices();
    expect(curvesReadout(slices[2], visibleSeries(['occurrences', 'hullKm2', 'latSpan']), false)).toBe('E3, 30–20 Ma: occurrences 40; hull area none (one place); latitude span 0.0°');
    expect(curvesReadout(slices[0], visibleSeries(['hullKm2', 'mstKm']), false)).toBe('E1, 50–40 Ma: hull area 1 km²; spanning-tree length 100 km');
    // A slice named by its range (equal bins) is not named twice.
    expect(curvesReadout({ ...slices[0], name: '50–40 Ma' }, visibleSeries(['taxa']), false)).toBe('50–40 Ma: taxa 3');
  });

  it('summarises what is drawn and where each series peaks', () => {
    expect(curvesDescription(fiveSlices(), visibleSeries(['occurrences', 'hullKm2']), true, false)).toBe(
      'occurrences, hull area per time slice, each divided by its largest value, over 5 slices from 50 to 0 Ma. occurrences peaks at 40 in E3; hull area peaks at 5 km² in E5.',
    );
  });
});

describe('band shares', () => {
  it('gives band edges from the South Pole up, the last band stopping at 90°', () => {
    expect(bandEdges(10, 0)).toEqual([-90, -80]);
    expect(bandEdges(10, 17)).toEqual([80, 90]);
    expect(bandLabel(10, 8)).toBe('10°S–0°');
    expect(bandLabel(10, 9)).toBe('0°–10°N');
  });

  it('turns counts 1, 3, 0, 4 into shares 1/8, 3/8, 0, 1/2', () => {
    const shares = bandShares(Uint32Array.from([9, 9, 1, 3, 0, 4]), 2, 4);
    expect(shares.total).toBe(8);
    expect(Array.from(shares.counts)).toEqual([1, 3, 0, 4]);
    expect(Array.from(shares.shares)).toEqual([0.125, 0.375, 0, 0.5]);
    expect(peakBand(shares.shares)).toBe(3);
  });

  it('gives all-zero shares, and no peak, for a slice with no occurrences', () => {
    const shares = bandShares(new Uint32Array(3), 0, 3);
    expect(Array.from(shares.shares)).toEqual([0, 0, 0]);
    expect(peakBand(shares.shares)).toBe(-1);
  });
});

/** Two 90° bands (south, north), two slices, two indicator kinds. */
function twoBands(): LatitudeCounts {
  return {
    bandDeg: 90, bands: 2,
    perSlice: Uint32Array.from([1, 3, 1, 0]), total: Uint32Array.from([2, 3]),
    // (slice · kinds + kind) · bands + band: slice 0 has kind 0 in the south twice, kind 1 in the north once.
    indicatorsPerSlice: Uint32Array.from([2, 0, 0, 1, 0, 0, 0, 0]), indicatorsTotal: Uint32Array.from([2, 0, 0, 1]),
  };
}

describe('latitudeLayout', () => {
  it('draws the slice and whole-range shares as bars, north at the top', () => {
    const layout = latitudeLayout({ latitude: twoBands(), slice: 0, sliceName: 'S0', kinds: [], width: 400 });
    // Slice shares 1/4 (south), 3/4 (north); whole range 2/5, 3/5. Largest 0.75 → axis 0…0.8 over
    // 46…386 px (400 − 14 right margin), 425 px per unit share.
    // (The legend's squares share the colours but sit above the plot.)
    const bars = layout.marks.filter((m): m is RectMark => m.kind === 'rect' && (m.fill === SLICE_BAR || m.fill === TOTAL_BAR) && m.y >= layout.bandTop[1]);
    const north = bars.filter((b) => b.y < layout.bandBottom[1]);
    const south = bars.filter((b) => b.y >= layout.bandTop[0]);
    expect(north.map((b) => [b.fill, b.width])).toEqual([[SLICE_BAR, 318.75], [TOTAL_BAR, 255]]);
    expect(south.map((b) => [b.fill, b.width])).toEqual([[SLICE_BAR, 106.25], [TOTAL_BAR, 170]]);
    expect(layout.bandTop[1]).toBeLessThan(layout.bandTop[0]);
    expect(layout.bandBottom[1]).toBe(layout.bandTop[0]);
  });

  it('adds one dot per (kind, band) with sites in the slice', () => {
    const layout = latitudeLayout({ latitude: twoBands(), slice: 0, sliceName: 'S0', kinds: ['coal', 'reef'], width: 400 });
    const dots = layout.marks.filter((m): m is PathMark => m.kind === 'path' && m.fill !== undefined && m.stroke === 'none');
    // Two legend dots plus one dot for each kind.
    expect(dots.map((d) => (d.d.match(/M/g) ?? []).length)).toEqual([1, 1, 1, 1]);
    const texts = layout.marks.flatMap((m) => (m.kind === 'text' ? [m.text] : []));
    expect(texts).toEqual(expect.arrayContaining(['S0 (n = 4)', 'all slices (n = 5)', 'coal', 'reef', '90°N', '0°', '90°S']));
  });

  it('says so when the slice has no occurrences', () => {
    const layout = latitudeLayout({ latitude: { ...twoBands(), perSlice: Uint32Array.from([1, 3, 0, 0]) }, slice: 1, sliceName: 'S1', kinds: [], width: 400 });
    expect(layout.marks.some((m) => m.kind === 'text' && m.text === 'no occurrences in S1')).toBe(true);
  });
});

describe('latitude text', () => {
  it('reads out a band with counts and shares of both, and the indicator sites', () => {
    expect(bandReadout(twoBands(), 0, 'S0', 0, ['coal', 'reef'])).toBe('90°S–0°: S0 1 of 4 (25.0%); all slices 2 of 5 (40.0%); indicator sites: coal 2');
  });

  it('summarises the shares and where each peaks', () => {
    expect(latitudeDescription(twoBands(), 0, 'S0', ['coal', 'reef'])).toBe(
      'Share of occurrences per 90° palaeolatitude band, north at the top: S0 (4 occurrences) against all slices (5). Largest share: S0 0°–90°N (75.0%), all slices 0°–90°N (60.0%). Indicator sites in S0: coal 2, reef 1.',
    );
  });
});

describe('figures', () => {
  it('writes the curves as a titled SVG document with the settings, rows and time axis', () => {
    const v = view(fiveSlices(), twoBands());
    const figure = curvesFigure(v, ['occurrences', 'hullKm2'], false, WIDTH);
    expect(figure.width).toBe(WIDTH);
    expect(figure.text).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="568" height="\d+"/);
    for (const text of ['<title>Footprint through time</title>', 'bins stages · assign mid-age · grid healpix:32 · 5 slices', '>occurrences</text>', '>hull area (km²)</text>', '>Age (Ma)</text>']) {
      expect(figure.text).toContain(text);
    }
    expect(figure.text).not.toContain('>taxa</text>');
  });

  it('writes the latitude panel of the chosen slice as a titled SVG document', () => {
    const figure = latitudeFigure(view(fiveSlices(), twoBands()), 1, 400);
    for (const text of ['<title>Occurrences by palaeolatitude</title>', 'E2, 40–30 Ma · 90° bands', '>E2 (n = 1)</text>', '>all slices (n = 5)</text>']) {
      expect(figure.text).toContain(text);
    }
  });

  it('writes a small document saying there is nothing yet without an analysis', () => {
    expect(curvesFigure(undefined, [], false, 300).text).toContain('<desc>No analysis yet.</desc>');
    expect(latitudeFigure(undefined, 0, 300).height).toBe(40);
  });
});
