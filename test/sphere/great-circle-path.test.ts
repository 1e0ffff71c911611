import { geoDistance, geoInterpolate } from 'd3-geo';
import { describe, expect, it } from 'vitest';
import { ANTIPODAL_ARC, appendArcInterior, appendGreatCircleArc, continuousLongitude } from '../../src/sphere/great-circle-path';
import { degreesToUnitVectors, unitVectorsToDegreesInto } from '../../src/sphere/unit-vectors';

const RAD = Math.PI / 180;

/** Angular distance in degrees between [lon, lat] points, by d3-geo (the outside reference). */
function gap(a: [number, number], b: [number, number]): number {
  return geoDistance(a, b) / RAD;
}

describe('appendArcInterior', () => {
  it('divides the arc into equal steps that d3-geo interpolates at the same fractions, ends left out', () => {
    const ends = degreesToUnitVectors(Float64Array.of(-35, 62), Float64Array.of(100, -170));
    const out: number[] = [];
    const theta = appendArcInterior(ends, 0, 1, 3 * RAD, out);
    // d3-geo's geoDistance is the outside reference for the arc's angle.
    expect(theta).toBeCloseTo(geoDistance([100, -35], [-170, 62]), 14);
    const steps = Math.ceil(theta / (3 * RAD));
    expect(out.length).toBe(3 * (steps - 1));
    const lat = new Float64Array(out.length / 3), lon = new Float64Array(out.length / 3);
    unitVectorsToDegreesInto(Float64Array.from(out), lat, lon);
    const along = geoInterpolate([100, -35], [-170, 62]);
    for (let k = 0; k < lat.length; k++) expect(gap([lon[k], lat[k]], along((k + 1) / steps))).toBeLessThan(1e-9);
  });

  it('appends nothing and reports the angle for antipodal ends', () => {
    const ends = degreesToUnitVectors(Float64Array.of(20, -20), Float64Array.of(30, -150));
    const out: number[] = [];
    expect(appendArcInterior(ends, 0, 1, RAD, out)).toBeGreaterThan(ANTIPODAL_ARC);
    expect(out).toEqual([]);
  });
});

describe('appendGreatCircleArc', () => {
  it('puts every vertex on the great circle d3-geo interpolates between the ends', () => {
    const out: number[] = [];
    appendGreatCircleArc(10, -20, 55, 140, 1, -20, out);
    const along = geoInterpolate([-20, 10], [140, 55]);
    const n = out.length / 2;
    for (let k = 0; k < n; k++) {
      const expected = along((k + 1) / n);
      expect(gap([out[2 * k], out[2 * k + 1]], expected)).toBeLessThan(1e-9);
    }
  });

  it('keeps each step no longer than the step asked for and ends exactly at the end point', () => {
    const out: number[] = [];
    appendGreatCircleArc(-40, 170, 30, -150, 2, 170, out);
    let previous: [number, number] = [170, -40];
    for (let k = 0; k < out.length; k += 2) {
      const point: [number, number] = [out[k], out[k + 1]];
      expect(gap(previous, point)).toBeLessThanOrEqual(2 + 1e-9);
      previous = point;
    }
    expect(out[out.length - 1]).toBe(30);
    expect(out[out.length - 2]).toBe(210); // −150 continued past the antimeridian from 170
  });

  it('writes longitudes that never jump by more than 180 degrees between vertices', () => {
    const out: number[] = [];
    appendGreatCircleArc(0, 179, 0, -179, 0.5, 179, out);
    let previous = 179;
    for (let k = 0; k < out.length; k += 2) {
      expect(Math.abs(out[k] - previous)).toBeLessThan(180);
      previous = out[k];
    }
    expect(previous).toBeCloseTo(181, 12);
  });

  it('writes the end point alone for antipodal ends, which have no unique arc', () => {
    const out: number[] = [];
    appendGreatCircleArc(0, 0, 0, 180, 1, 0, out);
    expect(out).toEqual([180, 0]);
  });
});

describe('continuousLongitude', () => {
  it('moves a longitude by whole turns to within 180 degrees of the previous one', () => {
    expect(continuousLongitude(-170, 175)).toBe(190);
    expect(continuousLongitude(170, -175)).toBe(-190);
    expect(continuousLongitude(20, 10)).toBe(20);
    expect(continuousLongitude(10, 730)).toBe(730);
  });
});
