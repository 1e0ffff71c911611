import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { geoArea } from 'd3-geo';
import { booleanClockwise } from '@turf/turf';
import type { FeatureCollection, MultiPolygon, Polygon, Position } from 'geojson';
import {
  DEFAULT_MAX_STEP_DEG, createQuaternion, createRotationModel, poleTableFromRecords, quaternionFromAxisAngleInto,
  quaternionFromPole, reconstructGeometry,
} from '../../src/rotation';
import { demoText } from '../demo/demo-files';
import { angleBetweenDeg, unit } from './rodrigues';

// References: d3-geo's geoArea (great-circle edges; it reads rings clockwise, so every ring is
// reversed before measuring, STACK.md) and @turf/turf's booleanClockwise for RFC 7946 order.
// A rigid rotation preserves area, so a reconstructed outline must measure what it did today,
// to rounding (1e-9 relative): densified points lie on the original great circles and cut points
// on the exact great-circle crossings, so neither changes the area.

const IDENTITY = createQuaternion();

function polygons(g: Polygon | MultiPolygon): Position[][][] {
  return g.type === 'Polygon' ? [g.coordinates] : g.coordinates;
}

/** Area in steradians by d3-geo, every ring reversed into d3's order. */
function d3Area(g: Polygon | MultiPolygon): number {
  return polygons(g).reduce((sum, rings) => sum + geoArea({ type: 'Polygon', coordinates: rings.map((r) => [...r].reverse()) }), 0);
}

/** A ring of `count` points on the small circle of radius `radiusDeg` about (lat, lon),
 * anticlockwise seen from outside (RFC 7946 exterior order), closed. */
function circle(lat: number, lon: number, radiusDeg: number, count: number, clockwise = false): Position[] {
  const c = unit(lat, lon), r = (radiusDeg * Math.PI) / 180;
  const east = Math.hypot(c[0], c[1]) > 1e-12 ? [-c[1] / Math.hypot(c[0], c[1]), c[0] / Math.hypot(c[0], c[1]), 0] : [0, 1, 0];
  const north = [c[1] * east[2] - c[2] * east[1], c[2] * east[0] - c[0] * east[2], c[0] * east[1] - c[1] * east[0]];
  const ring: Position[] = [];
  for (let k = 0; k < count; k++) {
    const a = ((clockwise ? -1 : 1) * 2 * Math.PI * k) / count;
    const v = [0, 1, 2].map((i) => c[i] * Math.cos(r) + Math.sin(r) * (Math.cos(a) * east[i] + Math.sin(a) * north[i]));
    ring.push([Math.atan2(v[1], v[0]) * (180 / Math.PI), Math.asin(v[2]) * (180 / Math.PI)]);
  }
  ring.push([...ring[0]]);
  return ring;
}

function expectValidOutput(g: Polygon | MultiPolygon): void {
  for (const rings of polygons(g)) {
    rings.forEach((ring, r) => {
      expect(ring.length).toBeGreaterThanOrEqual(4);
      expect(ring[ring.length - 1]).toEqual(ring[0]);
      for (const [lon, lat] of ring) {
        expect(Math.abs(lon)).toBeLessThanOrEqual(180);
        expect(Math.abs(lat)).toBeLessThanOrEqual(90);
      }
      expect(booleanClockwise(ring)).toBe(r > 0); // exteriors anticlockwise, holes clockwise
    });
  }
}

describe('reconstructing polygons', () => {
  const land = (JSON.parse(demoText('land.geojson')) as FeatureCollection<Polygon>).features;

  it('keeps the d3-geo area of every demo landmass under rotations to many ages and poles', () => {
    for (const f of land) {
      const today = d3Area(f.geometry);
      for (const [lat, lon, angle] of [[0, 0, 0], [10, 20, 30], [-60, 150, 75], [89, -10, 170], [0, 90, -120]]) {
        const moved = reconstructGeometry(f.geometry, quaternionFromPole(lat, lon, angle));
        expectValidOutput(moved);
        expect(Math.abs(d3Area(moved) / today - 1)).toBeLessThan(1e-9);
      }
    }
  });

  it('keeps the d3-geo area of every demo landmass reconstructed with the demo pole table', () => {
    const [header, ...lines] = demoText('poles.csv').trimEnd().split('\n');
    const model = createRotationModel(poleTableFromRecords(header.split(','), lines.map((l, i) => ({ line: i + 2, fields: l.split(',') })), 'poles.csv'));
    for (const f of land) {
      const today = d3Area(f.geometry);
      for (const age of [66, 143.1, 251.902, 300]) {
        const moved = reconstructGeometry(f.geometry, model.rotationAt(f.properties!.plate_id as number, age));
        expectValidOutput(moved);
        expect(Math.abs(d3Area(moved) / today - 1)).toBeLessThan(1e-9);
      }
    }
  });

  it('keeps area and validity for any small outline under any rotation', () => {
    const deg = (min: number, max: number) => fc.integer({ min: min * 1e3, max: max * 1e3 }).map((i) => i / 1e3);
    fc.assert(fc.property(deg(-89, 89), deg(-180, 180), deg(0.5, 40), fc.integer({ min: 5, max: 60 }), deg(-90, 90), deg(-180, 180), deg(-180, 180),
      (lat, lon, radius, count, pLat, pLon, angle) => {
        const outline: Polygon = { type: 'Polygon', coordinates: [circle(lat, lon, radius, count)] };
        const moved = reconstructGeometry(outline, quaternionFromPole(pLat, pLon, angle));
        expectValidOutput(moved);
        expect(Math.abs(d3Area(moved) / d3Area(outline) - 1)).toBeLessThan(1e-9);
      }), { numRuns: 300 });
  });

  it('divides long edges into steps of at most maxStepDeg along the great circle', () => {
    const triangle: Polygon = { type: 'Polygon', coordinates: [[[0, 0], [40, 0], [20, 30], [0, 0]]] };
    for (const step of [DEFAULT_MAX_STEP_DEG, 0.25, 7]) {
      const ring = (reconstructGeometry(triangle, IDENTITY, { maxStepDeg: step }) as Polygon).coordinates[0];
      const a = unit(0, 40), b = unit(30, 20);
      const normal = [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
      for (let k = 1; k < ring.length; k++) {
        expect(angleBetweenDeg(unit(ring[k][1], ring[k][0]), unit(ring[k - 1][1], ring[k - 1][0]))).toBeLessThanOrEqual(step + 1e-9);
      }
      // The points of the second edge lie on the plane of its great circle.
      const second = ring.filter(([lon, lat]) => lon < 40 && lon > 20 && lat > 0);
      expect(second.length).toBeGreaterThan(0);
      for (const [lon, lat] of second) {
        const v = unit(lat, lon);
        expect(Math.abs(v[0] * normal[0] + v[1] * normal[1] + v[2] * normal[2])).toBeLessThan(1e-12);
      }
    }
  });

  it('cuts an outline carried across the antimeridian into parts that add up to its area', () => {
    const square: Polygon = { type: 'Polygon', coordinates: [[[160, -10], [175, -10], [175, 10], [160, 10], [160, -10]]] };
    const moved = reconstructGeometry(square, quaternionFromPole(90, 0, 15));
    expect(moved.type).toBe('MultiPolygon');
    expect(polygons(moved)).toHaveLength(2);
    expectValidOutput(moved);
    expect(Math.abs(d3Area(moved) / d3Area(square) - 1)).toBeLessThan(1e-9);
  });

  it('keeps each hole with the part of the outline around it', () => {
    const holed: Polygon = { type: 'Polygon', coordinates: [circle(0, 170, 12, 90), circle(0, 170, 3, 40, true), circle(0, 163, 2, 30, true)] };
    const moved = reconstructGeometry(holed, quaternionFromPole(90, 0, 8));
    expectValidOutput(moved);
    expect(polygons(moved).map((p) => p.length).sort()).toEqual([2, 3]);
    expect(Math.abs(d3Area(moved) / d3Area(holed) - 1)).toBeLessThan(1e-9);
  });

  it.each([
    ['north', 80, 1],
    ['south', -75, -1],
  ])('closes an outline that comes to enclose the %s pole along the pole line, keeping its area', (_pole, lat, sign) => {
    const cap: Polygon = { type: 'Polygon', coordinates: [circle(lat, 30, 20, 180)] };
    const moved = reconstructGeometry(cap, quaternionFromPole(0, 120, sign * 5));
    expectValidOutput(moved);
    for (const rings of polygons(moved)) expect(rings[0].some(([, la]) => la === 90 * sign)).toBe(true);
    // Closed form for the small circle's cap, 2π(1 − cos r), is approached by the 180-gon.
    expect(d3Area(moved) / (2 * Math.PI * (1 - Math.cos((20 * Math.PI) / 180)))).toBeCloseTo(1, 3);
    expect(Math.abs(d3Area(moved) / d3Area(cap) - 1)).toBeLessThan(1e-9);
  });

  it('handles a band around a pole: the outline and its hole both enclose it', () => {
    const band: Polygon = { type: 'Polygon', coordinates: [circle(90, 0, 30, 120), circle(90, 0, 10, 60, true)] };
    const moved = reconstructGeometry(band, quaternionFromPole(0, 0, 5));
    expectValidOutput(moved);
    expect(Math.abs(d3Area(moved) / d3Area(band) - 1)).toBeLessThan(1e-9);
  });

  it('handles a vertex carried exactly onto a pole and an edge passing over a pole', () => {
    // 10° about the axis towards (0°N, 90°W) carries (80°N, 0°E) along its meridian onto the north pole.
    const triangle: Polygon = { type: 'Polygon', coordinates: [[[0, 80], [-30, 60], [30, 60], [0, 80]]] };
    const q = quaternionFromAxisAngleInto(0, -1, 0, (10 * Math.PI) / 180, createQuaternion());
    const moved = reconstructGeometry(triangle, q);
    expectValidOutput(moved);
    expect(Math.abs(d3Area(moved) / d3Area(triangle) - 1)).toBeLessThan(1e-9);
    const over: Polygon = { type: 'Polygon', coordinates: [[[0, 80], [90, 60], [180, 80], [0, 80]]] };
    const crossed = reconstructGeometry(over, IDENTITY);
    expectValidOutput(crossed);
    expect(Math.abs(d3Area(crossed) / d3Area(over) - 1)).toBeLessThan(1e-9);
  });

  it('reconstructs each polygon of a MultiPolygon', () => {
    const two: MultiPolygon = { type: 'MultiPolygon', coordinates: [[circle(10, 10, 5, 30)], [circle(-20, 100, 3, 30)]] };
    const moved = reconstructGeometry(two, quaternionFromPole(30, -40, 25));
    expect(moved.type).toBe('MultiPolygon');
    expect(polygons(moved)).toHaveLength(2);
    expect(Math.abs(d3Area(moved) / d3Area(two) - 1)).toBeLessThan(1e-9);
  });

  it('refuses an unclosed ring, an edge between antipodes and a step that is not an angle', () => {
    expect(() => reconstructGeometry({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1]]] }, IDENTITY))
      .toThrow('polygon, ring 1: expected a closed ring of at least 4 positions, the last equal to the first.');
    expect(() => reconstructGeometry({ type: 'MultiPolygon', coordinates: [[circle(0, 0, 1, 8)], [[[0, 0], [180, 0], [90, 45], [0, 0]]]] }, IDENTITY))
      .toThrow('polygon 2, ring 1, edge 1: its ends are antipodal, so no single great circle joins them.');
    expect(() => reconstructGeometry({ type: 'Polygon', coordinates: [circle(0, 0, 1, 8)] }, IDENTITY, { maxStepDeg: 0 }))
      .toThrow('maxStepDeg 0 is not an angle between 0 and 180 degrees.');
  });
});
