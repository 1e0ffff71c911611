import { describe, expect, it } from 'vitest';
import { geoArea } from 'd3-geo';
import { booleanClockwise, booleanValid, polygon } from '@turf/turf';
import { splitAtAntimeridian, type Ring } from '../../src/sphere/split-antimeridian';

/** d3-geo reads rings clockwise (STACK.md): reverse our counter-clockwise ones before measuring. */
const d3Area = (ring: Ring) => geoArea({ type: 'Polygon', coordinates: [[...ring].reverse()] });

/** A small counter-clockwise lon/lat box, densified so straight lon/lat edges and great circles agree closely. */
function box(west: number, east: number, south: number, north: number): Ring {
  const ring: Ring = [];
  const steps = 20;
  for (let i = 0; i < steps; i++) ring.push([west + ((east - west) * i) / steps, south]);
  for (let i = 0; i < steps; i++) ring.push([east, south + ((north - south) * i) / steps]);
  for (let i = 0; i < steps; i++) ring.push([east - ((east - west) * i) / steps, north]);
  for (let i = 0; i < steps; i++) ring.push([west, north - ((north - south) * i) / steps]);
  ring.push([west, south]);
  return ring;
}

describe('splitAtAntimeridian', () => {
  it('returns a ring that stays within ±180° unchanged', () => {
    const ring = box(10, 20, -5, 5);
    expect(splitAtAntimeridian(ring)).toEqual([ring]);
  });

  it.each([
    ['running past +180°', box(175, 185, 10, 20)],
    ['running past -180°', box(-188, -172, -30, -20)],
  ])('splits a ring %s into two parts within range whose areas add up to the whole (d3-geo geoArea)', (_name, ring) => {
    const parts = splitAtAntimeridian(ring);
    expect(parts).toHaveLength(2);
    for (const part of parts) {
      for (const [lon] of part) expect(Math.abs(lon)).toBeLessThanOrEqual(180);
      expect(part[0]).toEqual(part[part.length - 1]);
      // turf's booleanClockwise: RFC 7946 exteriors must stay counter-clockwise.
      expect(booleanClockwise(part)).toBe(false);
      expect(() => polygon([part])).not.toThrow();
    }
    const total = parts.reduce((sum, part) => sum + d3Area(part), 0);
    // Vertices added on the cut make tiny lon/lat-vs-great-circle differences: relative 1e-4 is ample.
    expect(total / d3Area(ring)).toBeCloseTo(1, 4);
  });

  // s2 (as R's sf uses it) refuses a ring with a repeated vertex ("Edge 0 is degenerate");
  // turf's booleanValid refuses it too.
  it('puts no crossing beside a vertex already on the cut, so no position repeats', () => {
    const diamond: Ring = [[175, 0], [180, -5], [185, 0], [180, 5], [175, 0]];
    const parts = splitAtAntimeridian(diamond);
    expect(parts).toEqual([
      [[175, 0], [180, -5], [180, 5], [175, 0]],
      [[-180, -5], [-175, 0], [-180, 5], [-180, -5]],
    ]);
    for (const part of parts) expect(booleanValid(polygon([part]))).toBe(true);
    expect((d3Area(parts[0]) + d3Area(parts[1])) / d3Area(diamond)).toBeCloseTo(1, 12);
  });

  it('gives no part for a side the ring only touches along the cut', () => {
    const touching: Ring = [[180, 0], [190, 0], [190, 5], [180, 5], [180, 0]];
    expect(splitAtAntimeridian(touching)).toEqual([[[-180, 0], [-170, 0], [-170, 5], [-180, 5], [-180, 0]]]);
  });
});
