// The bands:DEG grid (definition in /work/shared/DESIGN.md; construction documented on bandLayout).
// Outside references: Archimedes' hat-box theorem (the zone between latitudes φ₀ < φ₁ has area
// 2π(sin φ₁ − sin φ₀) on the unit sphere), layouts worked by hand from it, and d3-geo geoCentroid
// (the spherical centroid of a polygon) for the cell centres.
import { geoCentroid } from 'd3-geo';
import { describe, expect, it } from 'vitest';
import { LatitudeBandsGrid, bandLayout } from '../../src/grid';
import { d3Polygon, lonDifference } from './d3-rings';

const DEG = 180 / Math.PI;
const SOME_DEGS = [90, 60, 45, 30, 10, 7.5, 5, 2, 1] as const;

describe('bands layout', () => {
  it('matches layouts worked by hand for DEG 90, 60 and 45', () => {
    // bands:90: round(180/90) = 2 rows of 90°, mid-latitudes ±45°: round(cos 45°·360/90) = round(2.83)
    //   = 3 columns each, N = 6; the middle edge has sin φ = −1 + 2·3/6 = 0.
    // bands:60: 3 rows of 60°, mid-latitudes −60°, 0°, 60°: round(0.5·6) = 3, 6, 3 columns, N = 12;
    //   sin φ₁ = −1 + 2·3/12 = −1/2, so the edges are −90°, −30°, 30°, 90°.
    // bands:45: 4 rows, mid-latitudes ±67.5°, ±22.5°: round(0.383·8) = 3, round(0.924·8) = 7;
    //   N = 20; sin φ₁ = −1 + 2·3/20 = −0.7, φ₂ = 0.
    const cases: Array<[number, number[], number[]]> = [
      [90, [3, 3], [-90, 0, 90]],
      [60, [3, 6, 3], [-90, -30, 30, 90]],
      [45, [3, 7, 7, 3], [-90, Math.asin(-0.7) * DEG, 0, -Math.asin(-0.7) * DEG, 90]],
    ];
    for (const [deg, columns, edges] of cases) {
      const layout = bandLayout(deg);
      expect(Array.from(layout.columns)).toEqual(columns);
      expect(layout.cellCount).toBe(columns.reduce((a, b) => a + b, 0));
      layout.edgeLatDeg.forEach((edge, k) => expect(edge).toBeCloseTo(edges[k], 12));
    }
  });

  it('gives every cell the same area, 4π/N, by the hat-box theorem', () => {
    for (const deg of [...SOME_DEGS, 0.5, 0.1]) {
      const { rowCount, columns, edgeLatDeg, cellCount } = bandLayout(deg);
      for (let row = 0; row < rowCount; row++) {
        const zone = 2 * Math.PI * (Math.sin(edgeLatDeg[row + 1] / DEG) - Math.sin(edgeLatDeg[row] / DEG));
        expect(Math.abs((zone / columns[row]) * (cellCount / (4 * Math.PI)) - 1), `bands:${deg} row ${row}`).toBeLessThan(1e-9);
      }
    }
  });

  it('is symmetric about the equator', () => {
    for (const deg of SOME_DEGS) {
      const { rowCount, columns, edgeLatDeg } = bandLayout(deg);
      for (let row = 0; row < rowCount; row++) expect(columns[row]).toBe(columns[rowCount - 1 - row]);
      for (let k = 0; k <= rowCount; k++) expect(edgeLatDeg[k] + edgeLatDeg[rowCount - k]).toBe(0);
    }
  });

  it('keeps rows about DEG high after moving their edges (within 5% of 180°/rows)', () => {
    for (const deg of SOME_DEGS) {
      const { rowCount, edgeLatDeg } = bandLayout(deg);
      const nominal = 180 / rowCount;
      for (let k = 0; k <= rowCount; k++) expect(Math.abs(edgeLatDeg[k] - (-90 + k * nominal))).toBeLessThan(0.05 * nominal);
    }
  });

  it('refuses a DEG outside (0, 90] and one whose cells would not fit 32-bit numbers', () => {
    for (const deg of [0, -1, 90.5, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(() => new LatitudeBandsGrid(deg)).toThrow(`Band size ${deg} is not allowed: expected a number of degrees with 0 < DEG <= 90.`);
    }
    expect(() => new LatitudeBandsGrid(0.003)).toThrow('cell numbers must fit 32 bits');
    expect(new LatitudeBandsGrid(0.0031).cellCount).toBeLessThanOrEqual(2 ** 32);
  });
});

describe('bands cells', () => {
  it('numbers cells by the rows south of them plus the column eastward from -180° (worked by hand)', () => {
    // bands:60: row 0 (−90°…−30°) holds cells 0–2, row 1 (−30°…30°) cells 3–8 (60° columns),
    // row 2 cells 9–11 (120° columns).
    const grid = new LatitudeBandsGrid(60);
    expect(grid.cellOf(-60, -179)).toBe(0);
    expect(grid.cellOf(0, -179)).toBe(3);
    expect(grid.cellOf(0, 179)).toBe(8);
    expect(grid.cellOf(10, -50)).toBe(5); // 130° east of -180°: column 2
    expect(grid.cellOf(60, 0)).toBe(10); // 180° east of -180°: column 1 of 3
  });

  it('gives a position on a row edge to the row north of it, and on a column edge to the column east of it', () => {
    const grid = new LatitudeBandsGrid(90); // rows split at 0°, columns 120° wide from -180°
    expect(grid.cellOf(0, -179)).toBe(3);
    expect(grid.cellOf(0, -60)).toBe(4);
    expect(grid.cellOf(0, 60)).toBe(5);
    expect(grid.cellOf(-10, -60)).toBe(1);
    const forty = new LatitudeBandsGrid(45);
    const edge = forty.layout.edgeLatDeg[1];
    expect(forty.cellOf(edge, 0)).toBe(3 + 3); // row 1 (7 columns) starts at cell 3; lon 0 is column 3
    expect(forty.cellOf(edge - 1e-9, 0)).toBe(1);
  });

  it('gives longitudes 180° and -180° the same cell, and takes other longitudes modulo 360°', () => {
    const grid = new LatitudeBandsGrid(2);
    for (let lat = -89.5; lat <= 89.5; lat += 0.7) {
      expect(grid.cellOf(lat, 180)).toBe(grid.cellOf(lat, -180));
      expect(grid.cellOf(lat, 190)).toBe(grid.cellOf(lat, -170));
      expect(grid.cellOf(lat, -725)).toBe(grid.cellOf(lat, -5));
    }
  });

  it('puts a pole in one cell whatever longitude comes with it: the top row’s column holding lon 0', () => {
    const grid = new LatitudeBandsGrid(10); // polar rows have 3 columns of 120°: lon 0 is column 1
    for (const lon of [0, 90, -179, 400]) {
      expect(grid.cellOf(90, lon)).toBe(grid.cellCount - 3 + 1);
      expect(grid.cellOf(-90, lon)).toBe(1);
    }
  });

  it('maps every cell centre back to its own cell', () => {
    const c = new Float64Array(2);
    for (const deg of SOME_DEGS) {
      const grid = new LatitudeBandsGrid(deg);
      for (let cell = 0; cell < grid.cellCount; cell++) {
        grid.cellCentreInto(cell, c);
        expect(grid.cellOf(c[0], c[1])).toBe(cell);
      }
    }
  });

  it('has centres at the spherical centroid of the cell, as d3-geo geoCentroid finds it', () => {
    // d3 reads edges as great circles; with steps of DEG/1000 the difference is far below 1e-5°.
    const c = new Float64Array(2);
    for (const deg of [90, 45, 30, 10, 5]) {
      const grid = new LatitudeBandsGrid(deg);
      const { rowCount, firstCell } = grid.layout;
      for (let row = 0; row < rowCount; row++) {
        const cell = firstCell[row] + Math.floor((firstCell[row + 1] - firstCell[row]) / 2);
        const [lon, lat] = geoCentroid(d3Polygon(grid.cellRing(cell, deg / 1000)));
        grid.cellCentreInto(cell, c);
        expect(c[0], `${grid.name} cell ${cell}`).toBeCloseTo(lat, 5);
        expect(lonDifference(c[1], lon), `${grid.name} cell ${cell}`).toBeCloseTo(0, 5);
      }
    }
  });

  it('writes the same cells through cellsOf as through cellOf', () => {
    const grid = new LatitudeBandsGrid(2.5);
    expect(grid.name).toBe('bands:2.5');
    const lat = Float64Array.from({ length: 2001 }, (_, i) => -90 + (i * 180) / 2000);
    const lon = Float64Array.from({ length: 2001 }, (_, i) => -540 + i * 0.5393);
    const out = new Uint32Array(lat.length);
    grid.cellsOf(lat, lon, out);
    out.forEach((cell, i) => expect(cell).toBe(grid.cellOf(lat[i], lon[i])));
    expect(() => grid.cellsOf(Float64Array.of(0, 95), Float64Array.of(0, 0), new Uint32Array(2))).toThrow(
      'Position 1: latitude 95 is outside [-90, 90] degrees.',
    );
  });
});
