import { describe, expect, it } from 'vitest';
import { geoArea } from 'd3-geo';
import { booleanClockwise, polygon } from '@turf/turf';
import { splitAtAntimeridian, type Ring } from '../../src/export/split-antimeridian';

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
});
