// HEALPix cell numbers and centres checked against Górski et al. (2005), ApJ 622:759:
// - §4 pixel-centre equations (RING order), from the paper:
//     north cap, ring i = 1 … nside−1:   z = 1 − i²/(3 nside²),        φ = (π/(2i)) (j − 1/2),  j = 1 … 4i
//     belt, ring i = nside … 3 nside:    z = 4/3 − 2i/(3 nside),       φ = (π/(2 nside)) (j − s/2),
//                                        s = (i − nside + 1) mod 2,    j = 1 … 4 nside
//     south cap: mirror of the north cap (z → −z).
// - the base layout and the NESTED scheme as drawn in the paper's figures: base cells 0–3 centred on z = 2/3, 4–7 on z = 0,
//   8–11 on z = −2/3; NESTED numbers the four children of cell p at 2·nside as 4p … 4p+3, with
//   child 0 at the south corner, 1 east, 2 west, 3 north.
// (Section numbers are from memory.)
import { describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { lonDifference } from './d3-rings';

const DEG = 180 / Math.PI;
const latOfZ = (z: number): number => Math.asin(z) * DEG;
const SMALL_NSIDES = [1, 2, 4, 8, 16] as const;

describe('HEALPix cell count and area', () => {
  it('has 12·nside² cells of 4π/(12·nside²) sr each, for every allowed nside', () => {
    for (let nside = 1; nside <= 8192; nside *= 2) {
      const grid = new HealpixGrid(nside);
      expect(grid.cellCount).toBe(12 * nside * nside);
      expect(grid.cellAreaSr).toBeCloseTo((4 * Math.PI) / (12 * nside * nside), 15);
      expect(grid.name).toBe(`healpix:${nside}`);
    }
  });
});

describe('HEALPix cell centres', () => {
  it('places the 12 base cells (nside 1) on z = 2/3, 0, −2/3 at the longitudes of the paper', () => {
    // Paper, §4 with nside = 1: ring 1 (z = 2/3, s = 1) at φ = π/4 + kπ/2; ring 2 (z = 0, s = 0) at
    // φ = kπ/2; ring 3 (z = −2/3) like ring 1. NESTED base numbers: 0–3 north, 4–7 belt, 8–11 south,
    // each row eastward from φ = 0. From memory, healpy's pix2ang(1, 0) is (θ = 0.84106867, φ = π/4)
    // and pix2ang(1, 4) is (π/2, 0), which agree.
    const grid = new HealpixGrid(1);
    const c = new Float64Array(2);
    const expected: Array<[number, number]> = [
      [latOfZ(2 / 3), 45], [latOfZ(2 / 3), 135], [latOfZ(2 / 3), -135], [latOfZ(2 / 3), -45],
      [0, 0], [0, 90], [0, -180], [0, -90],
      [latOfZ(-2 / 3), 45], [latOfZ(-2 / 3), 135], [latOfZ(-2 / 3), -135], [latOfZ(-2 / 3), -45],
    ];
    expected.forEach(([lat, lon], cell) => {
      grid.cellCentreInto(cell, c);
      expect(c[0]).toBeCloseTo(lat, 12);
      expect(c[1]).toBeCloseTo(lon, 12);
    });
  });

  it('puts NESTED cells at nside 2 where the paper puts them (worked by hand)', () => {
    // nside = 2. Children of base cell 0 (centre z = 2/3, φ = π/4):
    //   0 (south corner): belt ring i = 3, z = 4/3 − 6/6 = 1/3, s = 0, φ = (π/4)·1 = 45°
    //   1 (east):         ring i = 2, z = 4/3 − 4/6 = 2/3, s = 1, φ = (π/4)(2 − 1/2) = 67.5°
    //   2 (west):         ring i = 2, z = 2/3, j = 1: φ = (π/4)(1/2) = 22.5°
    //   3 (north):        cap ring i = 1, z = 1 − 1/12 = 11/12, φ = (π/2)(1 − 1/2) = 45°
    // Children of base cell 4 (centre z = 0, φ = 0): 16 south (ring 5, z = −1/3, φ = 0),
    //   17 east (ring 4, z = 0, s = 1, φ = (π/4)(1/2) = 22.5°), 18 west (φ = −22.5°),
    //   19 north (ring 3, z = 1/3, φ = 0).
    // 32 = first child of base cell 8 (centre z = −2/3, φ = π/4): its south corner is the pole side,
    //   mirror of cell 3: z = −11/12, φ = 45°. 47 = north child of base cell 11 (φ = 7π/4): belt
    //   ring 5, z = −1/3, φ = 315° = −45°.
    const grid = new HealpixGrid(2);
    const c = new Float64Array(2);
    const cases: Array<[number, number, number]> = [
      [0, 1 / 3, 45], [1, 2 / 3, 67.5], [2, 2 / 3, 22.5], [3, 11 / 12, 45],
      [16, -1 / 3, 0], [17, 0, 22.5], [18, 0, -22.5], [19, 1 / 3, 0],
      [32, -11 / 12, 45], [47, -1 / 3, -45],
    ];
    for (const [cell, z, lon] of cases) {
      grid.cellCentreInto(cell, c);
      expect(c[0], `cell ${cell}`).toBeCloseTo(latOfZ(z), 12);
      expect(c[1], `cell ${cell}`).toBeCloseTo(lon, 12);
    }
  });

  it('has exactly the set of centres given by the paper’s ring equations, for nside 1 to 16', () => {
    const key = (z: number, phi: number): [number, number] => [z, ((phi % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI)];
    const order = (a: [number, number], b: [number, number]) =>
      Math.round(b[0] * 1e9) - Math.round(a[0] * 1e9) || Math.round(a[1] * 1e9) - Math.round(b[1] * 1e9);
    for (const nside of SMALL_NSIDES) {
      const paper: Array<[number, number]> = [];
      for (let i = 1; i < nside; i++) {
        for (let j = 1; j <= 4 * i; j++) {
          const phi = (Math.PI / (2 * i)) * (j - 0.5);
          paper.push(key(1 - (i * i) / (3 * nside * nside), phi), key(-(1 - (i * i) / (3 * nside * nside)), phi));
        }
      }
      for (let i = nside; i <= 3 * nside; i++) {
        const s = (i - nside + 1) % 2;
        for (let j = 1; j <= 4 * nside; j++) paper.push(key(4 / 3 - (2 * i) / (3 * nside), (Math.PI / (2 * nside)) * (j - s / 2)));
      }
      const grid = new HealpixGrid(nside);
      const c = new Float64Array(2);
      const ours: Array<[number, number]> = [];
      for (let cell = 0; cell < grid.cellCount; cell++) {
        grid.cellCentreInto(cell, c);
        ours.push(key(Math.sin(c[0] / DEG), c[1] / DEG));
      }
      paper.sort(order);
      ours.sort(order);
      expect(ours.length).toBe(paper.length);
      ours.forEach((v, k) => {
        expect(v[0]).toBeCloseTo(paper[k][0], 12);
        expect(v[1]).toBeCloseTo(paper[k][1], 12);
      });
    }
  });

  it('maps every cell centre back to its own cell, for nside 1 to 16', () => {
    const c = new Float64Array(2);
    for (const nside of SMALL_NSIDES) {
      const grid = new HealpixGrid(nside);
      for (let cell = 0; cell < grid.cellCount; cell++) {
        grid.cellCentreInto(cell, c);
        expect(grid.cellOf(c[0], c[1])).toBe(cell);
      }
    }
  });

  it('maps the centres of cells spread over all faces back to their cells at nside 8192', () => {
    const grid = new HealpixGrid(8192);
    const c = new Float64Array(2);
    for (let cell = 0; cell < grid.cellCount; cell += 7_919_993) {
      grid.cellCentreInto(cell, c);
      expect(grid.cellOf(c[0], c[1])).toBe(cell);
    }
    // The cells round the poles are the smallest targets: the last cell of face 0 and the first of face 8.
    for (const cell of [8192 * 8192 - 1, 8 * 8192 * 8192]) {
      grid.cellCentreInto(cell, c);
      expect(grid.cellOf(c[0], c[1])).toBe(cell);
    }
  });

  it('nests: the centre of child cell q at 2·nside lies in cell q >> 2 at nside (the NESTED scheme of the paper)', () => {
    const c = new Float64Array(2);
    for (const nside of [1, 2, 4, 8, 16, 32]) {
      const parent = new HealpixGrid(nside);
      const child = new HealpixGrid(2 * nside);
      for (let q = 0; q < child.cellCount; q++) {
        child.cellCentreInto(q, c);
        expect(parent.cellOf(c[0], c[1])).toBe(q >> 2);
      }
    }
  });
});

describe('HEALPix position to cell', () => {
  it('assigns positions to the cells the paper’s equations give (worked by hand, nside 2)', () => {
    // (0°, 10°): on the equator, belt ring i = 4 (z = 0, s = 1) has centres at φ = ±22.5°, …; the cell
    //   centred at 22.5° spans ±22.5° along the equator, so it holds lon 10°: the east child of base
    //   cell 4, NESTED 4·4 + 1 = 17.
    // (80°, 100°): z = sin 80° = 0.985 > 11/12 (the first cap ring), so the position is in one of the
    //   four cells touching the pole; lon 100° is in base cell 1 (90°…180°): its north child 4·1 + 3 = 7.
    // (−30°, −100°): z = −1/2, belt. In the paper's projection plane (t = φ/(π/4), u = 3z/2) the
    //   position is (t, u) = (260/45, −3/4) = (5.778, −0.75). Base cell 7 is the square
    //   |t − 6| + |u| ≤ 1; its south child 28 (centre z = −1/3, φ = 270°) is |t − 6| + |u + 1/2| ≤ 1/2:
    //   0.222 + 0.25 = 0.472 ≤ 0.5, so the position is in cell 28.
    const grid = new HealpixGrid(2);
    expect(grid.cellOf(0, 10)).toBe(17);
    expect(grid.cellOf(80, 100)).toBe(7);
    expect(grid.cellOf(-30, -100)).toBe(28);
    const c = new Float64Array(2);
    grid.cellCentreInto(28, c);
    expect(c[0]).toBeCloseTo(latOfZ(-1 / 3), 12);
    expect(lonDifference(c[1], -90)).toBeCloseTo(0, 12);
  });

  it('writes the same cells through cellsOf as through cellOf', () => {
    const grid = new HealpixGrid(64);
    const lat = Float64Array.from({ length: 2001 }, (_, i) => -90 + (i * 180) / 2000);
    const lon = Float64Array.from({ length: 2001 }, (_, i) => -540 + i * 0.5393);
    const out = new Uint32Array(lat.length);
    grid.cellsOf(lat, lon, out);
    out.forEach((cell, i) => expect(cell).toBe(grid.cellOf(lat[i], lon[i])));
  });
});
