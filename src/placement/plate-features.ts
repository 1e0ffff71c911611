/**
 * Base polygons to reconstruct, read from a parsed GeoJSON object (RFC 7946): a
 * FeatureCollection (or one Feature) of Polygon or MultiPolygon features, each with a
 * `plate_id` property. Everything else is refused with every problem listed by feature.
 *
 * Ring orientation: RFC 7946 asks for exteriors anticlockwise and holes clockwise, and says
 * readers should not refuse files that do not follow it. A present-day ring is read as the area
 * it outlines on a lon/lat map (the sign of its planar shoelace area, as planar GIS readers do);
 * a ring wound the other way is reversed into RFC 7946 order, and a note says so.
 */
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { ProblemList, type InputProblem } from '../problems';
import { MAX_PLATE_ID, parsePlateId } from '../table';

/** Properties rotate adds to every feature it writes; an input may not have them already. */
export const ADDED_PROPERTIES = ['slice', 'slice_name', 'placed_at_ma'] as const;

export interface PlateFeature {
  /** Position in the input, from 1. */
  readonly index: number;
  readonly plateId: number;
  /** The feature's `id` member, when it has one. */
  readonly id?: string | number;
  readonly properties: Readonly<Record<string, unknown>>;
  /** Two-dimensional, rings in RFC 7946 order. */
  readonly geometry: Polygon | MultiPolygon;
}

export interface PlateFeatureNote {
  readonly feature: number;
  readonly plateId: number;
  readonly note: string;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Characters of a JSON value shown in a problem. */
const SHOWN_CHARS = 60;

/** A JSON value as written (a string without its quotes), cut with `…` when long; empty when missing. */
function shown(value: unknown): string {
  const text = value === undefined ? '' : typeof value === 'string' ? value : JSON.stringify(value);
  return text.length > SHOWN_CHARS ? `${text.slice(0, SHOWN_CHARS)}…` : text;
}

/** Twice the signed planar area of a closed lon/lat ring (shoelace formula); > 0 anticlockwise. */
function shoelace(ring: readonly Position[]): number {
  let sum = 0;
  for (let k = 0; k + 1 < ring.length; k++) sum += ring[k][0] * ring[k + 1][1] - ring[k + 1][0] * ring[k][1];
  return sum;
}

/** Two positions naming one point: on the same pole, or on ±180° at the same latitude. */
function samePoint(a: Position, b: Position): boolean {
  return (Math.abs(a[1]) === 90 && a[1] === b[1]) || (a[1] === b[1] && Math.abs(a[0]) === 180 && Math.abs(b[0]) === 180);
}

class Reader {
  readonly problems = new ProblemList();
  readonly notes: PlateFeatureNote[] = [];

  /** A problem at `field` (a path such as `feature 3, ring 1`), with the value found there. */
  problem(field: string, value: unknown, expected: string): void {
    this.problems.add({ field, value: shown(value), expected } satisfies InputProblem);
  }

  /** A ring as 2-D positions in the wanted orientation, or undefined after a problem. */
  ring(value: unknown, where: string, exterior: boolean, note: (text: string) => void): Position[] | undefined {
    if (!Array.isArray(value) || value.length < 4) {
      this.problem(where, value, 'a closed ring of at least 4 positions');
      return undefined;
    }
    const ring: Position[] = [];
    let extra = false;
    for (let k = 0; k < value.length; k++) {
      const p: unknown = value[k];
      const ok = Array.isArray(p) && p.length >= 2 && p.every((v) => typeof v === 'number' && Number.isFinite(v));
      if (!ok || Math.abs(p[0]) > 180 || Math.abs(p[1]) > 90) {
        this.problem(`${where}, position ${k + 1}`, p, '[longitude, latitude] in degrees, longitude from -180 to 180, latitude from -90 to 90');
        return undefined;
      }
      extra ||= p.length > 2;
      ring.push([p[0], p[1]]);
    }
    const first = ring[0], last = ring[ring.length - 1];
    if (first[0] !== last[0] || first[1] !== last[1]) {
      this.problem(`${where}, position ${ring.length}`, last, `a closed ring: the last position equal to the first, ${JSON.stringify(first)}`);
      return undefined;
    }
    const jump = ring.findIndex((p, k) => k > 0 && Math.abs(p[0] - ring[k - 1][0]) > 180 && !samePoint(p, ring[k - 1]));
    if (jump > 0) {
      this.problem(
        `${where}, position ${jump + 1}`, ring[jump],
        `rings cut at the antimeridian into parts (RFC 7946 §3.1.9): the edge from ${JSON.stringify(ring[jump - 1])} to here crosses it`,
      );
      return undefined;
    }
    if (extra) note(`${where}: positions carry a third value (altitude); it is not carried into the reconstruction`);
    const area = shoelace(ring);
    if (area === 0) {
      this.problem(where, ring, 'a ring around an area (this ring encloses no area)');
      return undefined;
    }
    if (area > 0 !== exterior) {
      ring.reverse();
      note(`${where}: ${exterior ? 'exterior ring is clockwise' : 'hole is anticlockwise'}; read as the area it outlines on a lon/lat map and written in RFC 7946 order`);
    }
    return ring;
  }

  polygon(value: unknown, where: string, note: (text: string) => void): Position[][] | undefined {
    if (!Array.isArray(value) || value.length === 0) {
      this.problem(where, value, 'an array of rings (the exterior, then any holes)');
      return undefined;
    }
    const rings = value.map((r, k) => this.ring(r, `${where}, ring ${k + 1}`, k === 0, note));
    return rings.every((r) => r !== undefined) ? (rings as Position[][]) : undefined;
  }

  geometry(value: unknown, where: string, note: (text: string) => void): Polygon | MultiPolygon | undefined {
    if (!isObject(value)) {
      this.problem(`${where} geometry`, value, 'a Polygon or MultiPolygon geometry (there is none)');
      return undefined;
    }
    if (value.type === 'Polygon') {
      const rings = this.polygon(value.coordinates, where, note);
      return rings === undefined ? undefined : { type: 'Polygon', coordinates: rings };
    }
    if (value.type === 'MultiPolygon') {
      if (!Array.isArray(value.coordinates) || value.coordinates.length === 0) {
        this.problem(where, value.coordinates, 'an array of polygons');
        return undefined;
      }
      const parts = value.coordinates.map((p: unknown, k: number) => this.polygon(p, `${where}, polygon ${k + 1}`, note));
      return parts.every((p) => p !== undefined) ? { type: 'MultiPolygon', coordinates: parts as Position[][][] } : undefined;
    }
    this.problem(`${where} geometry type`, value.type, 'Polygon or MultiPolygon (points belong in a table)');
    return undefined;
  }

  feature(value: unknown, index: number): PlateFeature | undefined {
    const where = `feature ${index}`;
    if (!isObject(value) || value.type !== 'Feature') {
      this.problem(where, value, 'an object with "type": "Feature"');
      return undefined;
    }
    const properties = isObject(value.properties) ? value.properties : {};
    const raw = properties.plate_id;
    const plateId = typeof raw === 'number' ? (Number.isInteger(raw) && raw >= 0 && raw <= MAX_PLATE_ID ? raw : -1)
      : typeof raw === 'string' ? parsePlateId(raw) : -1;
    if (plateId < 0) {
      this.problem(`${where} plate_id`, raw, `a property plate_id, a whole number from 0 to ${MAX_PLATE_ID}${raw === undefined ? ' (plate_id is missing)' : ''}`);
    }
    for (const name of ADDED_PROPERTIES) {
      if (name in properties) this.problem(`${where} property ${name}`, properties[name], `no property "${name}": rotate adds it to every feature it writes, so rename it`);
    }
    const notes: string[] = [];
    const geometry = this.geometry(value.geometry, where, (text) => notes.push(text));
    if (geometry === undefined || plateId < 0) return undefined;
    for (const note of notes) this.notes.push({ feature: index, plateId, note });
    const id = typeof value.id === 'string' || typeof value.id === 'number' ? value.id : undefined;
    return { index, plateId, ...(id === undefined ? {} : { id }), properties, geometry };
  }
}

/**
 * The features of a parsed GeoJSON object, validated and in RFC 7946 ring order, with notes on
 * what was accepted but changed. Throws InputError naming `source` and listing every problem.
 */
export function plateFeaturesOf(root: unknown, source: string): { features: PlateFeature[]; notes: PlateFeatureNote[] } {
  const reader = new Reader();
  let list: unknown[] = [];
  if (isObject(root) && root.type === 'FeatureCollection' && Array.isArray(root.features)) list = root.features;
  else if (isObject(root) && root.type === 'Feature') list = [root];
  else {
    reader.problem('type', isObject(root) ? root.type : root, 'a FeatureCollection of Polygon or MultiPolygon features with a plate_id property');
  }
  if (list.length === 0 && reader.problems.count === 0) reader.problem('features', list, 'at least one feature (the FeatureCollection has none)');
  const features = list.map((f, k) => reader.feature(f, k + 1));
  reader.problems.throwIfAny(source);
  return { features: features as PlateFeature[], notes: reader.notes };
}
