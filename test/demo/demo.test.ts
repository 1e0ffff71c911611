// The committed demo files: reproducible from the generator, reconstructed correctly, and
// geometrically sound. Checks use d3-geo and @turf/turf (general-purpose references) and an
// independent Rodrigues-matrix reading of poles.csv, never the generator's own quaternions.
import { describe, expect, it } from 'vitest';
import { geoArea, geoContains } from 'd3-geo';
import { area as turfArea, booleanClockwise, booleanDisjoint, booleanValid, kinks } from '@turf/turf';
import type { Feature, FeatureCollection, Polygon, Position } from 'geojson';
import { buildDemo, DEMO_FILES } from '../../assets/demo/build-demo';
import { columns, demoCsv, demoText } from './demo-files';
import { angleBetweenDeg, apply, geodesicBetween, matMul, poleMatrix, unit, type Mat3 } from '../rotation/rodrigues';

const DEG = 180 / Math.PI;
/** Palaeopositions are written to 1e-4°, from the same unrounded vector as the present-day
 * position (also 1e-4°): the rounding moves each by < 1e-4°, so 1e-3° is a safe bound. */
const POSITION_TOLERANCE_DEG = 1e-3;

interface PlatePoles { relativeTo: number; ages: number[]; matrices: Mat3[] }

function readPoleTable(): Map<number, PlatePoles> {
  const { header, rows } = demoCsv('poles.csv');
  const c = columns(header);
  const table = new Map<number, PlatePoles>();
  for (const r of rows) {
    const plate = Number(r[c.plate_id]);
    const entry = table.get(plate) ?? { relativeTo: Number(r[c.relative_to]), ages: [], matrices: [] };
    entry.ages.push(Number(r[c.age_ma]));
    entry.matrices.push(poleMatrix(Number(r[c.pole_lat]), Number(r[c.pole_lon]), Number(r[c.angle_deg])));
    table.set(plate, entry);
  }
  return table;
}

const poles = readPoleTable();

/** Rotation relative to the parent: geodesic interpolation between the bracketing ages. */
function relativeMatrix(plate: number, ageMa: number): Mat3 {
  const p = poles.get(plate);
  if (p === undefined) throw new Error(`plate ${plate} missing from poles.csv`);
  const k = p.ages.findIndex((a) => a >= ageMa);
  if (k < 0) throw new Error(`age ${ageMa} beyond the pole table`);
  if (k === 0) return p.matrices[0];
  return geodesicBetween(p.matrices[k - 1], p.matrices[k], (ageMa - p.ages[k - 1]) / (p.ages[k] - p.ages[k - 1]));
}

/** Total rotation to the fixed plate: interpolate each link, then compose down the chain. */
function totalMatrix(plate: number, ageMa: number): Mat3 {
  let m = relativeMatrix(plate, ageMa);
  for (let p = poles.get(plate)!.relativeTo; p !== 0; p = poles.get(p)!.relativeTo) m = matMul(relativeMatrix(p, ageMa), m);
  return m;
}

/** Largest angle between each row's written palaeoposition and its recomputed one. */
function worstReconstructionError(file: string): { worst: number; rows: number } {
  const { header, rows } = demoCsv(file);
  const c = columns(header);
  const cache = new Map<string, Mat3>();
  let worst = 0;
  for (const r of rows) {
    const age = (Number(r[c.oldest_ma]) + Number(r[c.youngest_ma])) / 2;
    const key = `${r[c.plate_id]}@${age}`;
    let m = cache.get(key);
    if (m === undefined) cache.set(key, (m = totalMatrix(Number(r[c.plate_id]), age)));
    const expected = apply(m, unit(Number(r[c.lat]), Number(r[c.lon])));
    worst = Math.max(worst, angleBetweenDeg(expected, unit(Number(r[c.palaeo_lat]), Number(r[c.palaeo_lon]))));
  }
  return { worst, rows: rows.length };
}

type Land = Feature<Polygon, { plate_id: number; name: string }>;
const land = (JSON.parse(demoText('land.geojson')) as FeatureCollection<Polygon, { plate_id: number; name: string }>).features;

/** d3-geo reads a counter-clockwise ring as the rest of the sphere: give it the reverse. */
function forD3(f: Land, ring: Position[] = f.geometry.coordinates[0]): Land {
  return { ...f, geometry: { type: 'Polygon', coordinates: [[...ring].reverse()] } };
}

function firstDifference(actual: string, expected: string): string | null {
  if (actual === expected) return null;
  const a = actual.split('\n'), e = expected.split('\n');
  const i = a.findIndex((line, k) => line !== e[k]);
  return `line ${i + 1}: generated ${JSON.stringify(a[i])}, committed ${JSON.stringify(e[i])}`;
}

describe('the demo generator', () => {
  it('reproduces every committed demo file byte for byte', () => {
    const built = buildDemo();
    for (const name of DEMO_FILES) expect(firstDifference(built[name], demoText(name)), name).toBeNull();
  });
});

describe('palaeopositions in the demo files', () => {
  it('equal each occurrence’s present-day position turned by the interpolated total rotation', () => {
    const { worst, rows } = worstReconstructionError('occurrences.csv');
    expect(rows).toBeGreaterThan(45_000);
    expect(worst).toBeLessThan(POSITION_TOLERANCE_DEG);
  });

  it('equal each indicator’s present-day position turned by the interpolated total rotation', () => {
    expect(worstReconstructionError('indicators.csv').worst).toBeLessThan(POSITION_TOLERANCE_DEG);
  });
});

describe('the landmass outlines', () => {
  it('are 5 to 7 polygons with distinct plate ids and names, each plate in the pole table', () => {
    expect(land.length).toBeGreaterThanOrEqual(5);
    expect(land.length).toBeLessThanOrEqual(7);
    expect(new Set(land.map((f) => f.properties.plate_id)).size).toBe(land.length);
    expect(new Set(land.map((f) => f.properties.name)).size).toBe(land.length);
    for (const f of land) {
      expect(poles.has(f.properties.plate_id)).toBe(true);
      expect(f.properties.name).toMatch(/^[A-Z][a-z]+$/);
    }
  });

  it('are valid, simple, closed rings of 30–80 vertices in counter-clockwise (RFC 7946) order per @turf/turf', () => {
    for (const f of land) {
      const ring = f.geometry.coordinates[0];
      expect(ring.length - 1).toBeGreaterThanOrEqual(30);
      expect(ring.length - 1).toBeLessThanOrEqual(80);
      expect(ring[ring.length - 1]).toEqual(ring[0]);
      expect(booleanValid(f)).toBe(true);
      expect(kinks(f).features).toHaveLength(0);
      expect(booleanClockwise(ring)).toBe(false);
    }
  });

  it('stay off the antimeridian and apart from each other today', () => {
    for (const f of land) {
      const ring = f.geometry.coordinates[0];
      for (let i = 1; i < ring.length; i++) expect(Math.abs(ring[i][0] - ring[i - 1][0])).toBeLessThan(20);
    }
    for (let i = 0; i < land.length; i++) for (let j = i + 1; j < land.length; j++) expect(booleanDisjoint(land[i], land[j])).toBe(true);
  });

  it('have the same area by d3-geo as by @turf/turf, within 0.5%', () => {
    // turf.area gives m² on a sphere of radius 6371008.8 m (turf's earthRadius); d3 gives steradians.
    for (const f of land) {
      const sr = geoArea(forD3(f));
      expect(sr).toBeLessThan(2 * Math.PI);
      expect(Math.abs(turfArea(f) / 6371008.8 ** 2 / sr - 1)).toBeLessThan(0.005);
    }
  });

  it('keep their d3-geo area when reconstructed to any tabulated or interpolated age', () => {
    for (const f of land) {
      const today = geoArea(forD3(f));
      for (const age of [66, 143.1, 251.902, 300]) {
        const m = totalMatrix(f.properties.plate_id, age);
        const moved = f.geometry.coordinates[0].map(([lon, lat]) => {
          const v = apply(m, unit(lat, lon));
          return [Math.atan2(v[1], v[0]) * DEG, Math.asin(Math.max(-1, Math.min(1, v[2]))) * DEG];
        });
        expect(Math.abs(geoArea(forD3(f, moved)) / today - 1)).toBeLessThan(1e-9);
      }
    }
  });

  it('contain every present-day occurrence and indicator site of their plate per d3-geo', () => {
    const byPlate = new Map(land.map((f) => [f.properties.plate_id, forD3(f)]));
    for (const file of ['occurrences.csv', 'indicators.csv']) {
      const { header, rows } = demoCsv(file);
      const c = columns(header);
      const seen = new Set<string>();
      for (const r of rows) {
        const key = `${r[c.plate_id]},${r[c.lon]},${r[c.lat]}`;
        if (seen.has(key)) continue;
        seen.add(key);
        const outline = byPlate.get(Number(r[c.plate_id]));
        expect(outline, key).toBeDefined();
        if (!geoContains(outline!, [Number(r[c.lon]), Number(r[c.lat])])) expect.fail(`${file}: site ${key} lies outside its landmass`);
      }
      expect(seen.size).toBeGreaterThan(2000);
    }
  });
});
