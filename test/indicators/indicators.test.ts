import { describe, expect, it } from 'vitest';
import { COMMON_INDICATOR_KINDS, commonIndicatorKind, summariseIndicators } from '../../src/indicators';
import { OVERLAY_COLOURS } from '../../web/colour/layer-colours';

describe('common indicator kinds', () => {
  it.each([
    ['coal', 'coal'], [' Coal ', 'coal'], ['LIGNITE', 'coal'], ['Evaporites', 'evaporite'], ['gypsum', 'evaporite'],
    ['Tillite', 'glacial'], ['glacial_deposits', 'glacial'], ['Glacial-deposit', 'glacial'], ['diamictite', 'glacial'],
    ['bauxite', 'bauxite'], ['Laterite', 'laterite'], ['caliche', 'calcrete'], ['Coral  reef', 'reef'],
  ])('read %j as %s', (text, id) => {
    expect(commonIndicatorKind(text)?.id).toBe(id);
  });

  it.each(['sandstone', 'coal ball', 'reefal limestone', ''])('leave %j as written, with no common kind', (text) => {
    expect(commonIndicatorKind(text)).toBeUndefined();
  });

  it('give each kind its own symbol and colour, colours as #RRGGBB', () => {
    expect(new Set(COMMON_INDICATOR_KINDS.map((k) => k.symbol)).size).toBe(COMMON_INDICATOR_KINDS.length);
    expect(new Set(COMMON_INDICATOR_KINDS.map((k) => k.colour)).size).toBe(COMMON_INDICATOR_KINDS.length);
    for (const k of COMMON_INDICATOR_KINDS) expect(k.colour).toMatch(/^#[0-9A-F]{6}$/);
  });

  it("use neither of the colours the map draws the hull and the spanning tree in", () => {
    const hex = (rgb: readonly number[]) => `#${rgb.map((v) => v.toString(16).padStart(2, '0')).join('').toUpperCase()}`;
    const taken = [hex(OVERLAY_COLOURS.hull), hex(OVERLAY_COLOURS.spanningTree)];
    expect(taken).toEqual(['#E69F00', '#D55E00']); // Okabe & Ito's orange and vermillion
    for (const k of COMMON_INDICATOR_KINDS) expect(taken).not.toContain(k.colour);
  });

  it('name no plain name under two kinds', () => {
    const names = COMMON_INDICATOR_KINDS.flatMap((k) => k.names);
    expect(new Set(names).size).toBe(names.length);
  });
});

describe('indicator summaries', () => {
  const kinds = ['Coal', 'tillite', 'sandstone'];
  // Slice, latitude, kind per site; the last site is in no slice.
  const sites: Array<[number, number, number]> = [
    [0, 12.5, 0], [0, 18, 0], [0, -65, 1], [1, 80, 1], [1, 90, 1], [1, -90, 2], [1, 3, 0], [-1, 40, 0],
  ];
  const summary = summariseIndicators(
    Int32Array.from(sites, (s) => s[0]), Float64Array.from(sites, (s) => s[1]), Uint32Array.from(sites, (s) => s[2]), kinds, 3, 30,
  );
  const at = (slice: number, kind: number, band: number) => summary.sites[(slice * kinds.length + kind) * summary.bands + band];

  it('count sites by slice, kind and band, the North Pole in the last band', () => {
    expect(summary.bands).toBe(6);
    expect(at(0, 0, 3)).toBe(2); // 12.5° and 18° in [0°, 30°)
    expect(at(0, 1, 0)).toBe(1); // −65° in [−90°, −60°)
    expect(at(1, 1, 5)).toBe(2); // 80° and 90°
    expect(at(1, 2, 0)).toBe(1);
    expect(at(1, 0, 3)).toBe(1);
    expect(summary.sites.reduce((a, b) => a + b, 0)).toBe(7); // the site in no slice is not counted
  });

  it("give each kind's latitude range per slice, and none where a kind has no site", () => {
    const range = (slice: number, kind: number) => [summary.latMin[slice * kinds.length + kind], summary.latMax[slice * kinds.length + kind]];
    expect(range(0, 0)).toEqual([12.5, 18]);
    expect(range(1, 1)).toEqual([80, 90]);
    expect(range(1, 0)).toEqual([3, 3]);
    expect(range(0, 2).every(Number.isNaN)).toBe(true);
    expect(range(2, 0).every(Number.isNaN)).toBe(true);
  });

  it('match the kinds as written to the common kinds', () => {
    expect(summary.common.map((k) => k?.id)).toEqual(['coal', 'glacial', undefined]);
  });
});
