// What the demo files promise in assets/demo/README.md: clean occurrence rows, a pole table in
// the DESIGN.md format, a footprint that widens and narrows, indicators in their belts, and a
// problems file whose faulty lines are exactly the documented ones.
import { describe, expect, it } from 'vitest';
import { PROBLEMS } from '../../assets/demo/problems';
import { columns, demoCsv, demoText } from './demo-files';
import { angleBetweenDeg, apply, poleMatrix, unit, type Mat3 } from '../rotation/rodrigues';

const OCCURRENCE_HEADER = 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,lat,lon,plate_id,collection,environment,group';
const ENVIRONMENTS = new Set(['shallow marine', 'deep marine', 'reef', 'terrestrial', 'fluvial', 'lacustrine']);
const DECIMAL = /^-?\d+(\.\d+)?$/;

/** Why a record is not a clean occurrence row, or null. Deliberately strict and independent
 * of the project's table reader. */
function rowFault(f: readonly string[]): string | null {
  if (f.length !== 11) return `${f.length} fields`;
  if (!/^[A-Z][a-z]+$/.test(f[0])) return 'taxon';
  for (let i = 1; i <= 6; i++) if (!DECIMAL.test(f[i])) return OCCURRENCE_HEADER.split(',')[i];
  const [oldestMa, youngestMa, pLat, pLon, lat, lon] = f.slice(1, 7).map(Number);
  if (!(youngestMa >= 66 && oldestMa > youngestMa && oldestMa <= 300)) return 'ages';
  if (Math.abs(pLat) > 90 || Math.abs(lat) > 90) return 'latitude';
  if (!(pLon > -180 && pLon <= 180 && lon > -180 && lon <= 180)) return 'longitude';
  if (!/^\d+$/.test(f[7]) || f[8] === '' || !ENVIRONMENTS.has(f[9]) || !/^[A-Z][a-z]+$/.test(f[10])) return 'plate, collection, environment or group';
  return null;
}

const occ = demoCsv('occurrences.csv');
const oc = columns(occ.header);
const mid = (r: readonly string[]) => (Number(r[oc.oldest_ma]) + Number(r[oc.youngest_ma])) / 2;

describe('occurrences.csv', () => {
  it('has the documented header and about 50,000 clean rows', () => {
    expect(occ.header.join(',')).toBe(OCCURRENCE_HEADER);
    expect(occ.rows.length).toBeGreaterThan(45_000);
    expect(occ.rows.length).toBeLessThan(55_000);
    const faults = occ.rows.map((r, i) => [i + 2, rowFault(r)]).filter(([, f]) => f !== null);
    expect(faults.slice(0, 5)).toEqual([]);
  });

  it('groups rows into collections of several distinct taxa sharing one site and one age range', () => {
    const sites = new Map<string, { key: string; taxa: Set<string> }>();
    const faults: string[] = [];
    for (const r of occ.rows) {
      const key = [oc.oldest_ma, oc.youngest_ma, oc.palaeo_lat, oc.palaeo_lon, oc.lat, oc.lon, oc.plate_id, oc.environment].map((i) => r[i]).join(',');
      const c = sites.get(r[oc.collection]) ?? { key, taxa: new Set<string>() };
      if (c.key !== key) faults.push(`${r[oc.collection]}: ${key} differs from ${c.key}`);
      if (c.taxa.has(r[oc.taxon])) faults.push(`${r[oc.collection]}: ${r[oc.taxon]} listed twice`);
      c.taxa.add(r[oc.taxon]);
      sites.set(r[oc.collection], c);
    }
    expect(faults.slice(0, 5)).toEqual([]);
    expect(occ.rows.length / sites.size).toBeGreaterThan(5);
  });

  it('has age ranges of varied width, from under 2 Myr to over 10 Myr', () => {
    const widths = occ.rows.map((r) => Number(r[oc.oldest_ma]) - Number(r[oc.youngest_ma]));
    expect(widths.filter((w) => w < 2).length / widths.length).toBeGreaterThan(0.1);
    expect(widths.filter((w) => w > 10).length / widths.length).toBeGreaterThan(0.05);
  });

  it('samples a footprint that narrows to one landmass and widens to all, with richness following it', () => {
    const bins = new Map<number, { plates: Set<string>; taxa: Set<string>; lo: number; hi: number }>();
    for (const r of occ.rows) {
      const b = Math.floor(mid(r) / 10);
      const bin = bins.get(b) ?? { plates: new Set<string>(), taxa: new Set<string>(), lo: 90, hi: -90 };
      bin.plates.add(r[oc.plate_id]);
      bin.taxa.add(r[oc.taxon]);
      bin.lo = Math.min(bin.lo, Number(r[oc.palaeo_lat]));
      bin.hi = Math.max(bin.hi, Number(r[oc.palaeo_lat]));
      bins.set(b, bin);
    }
    const all = [...bins.values()];
    const spans = all.map((b) => b.hi - b.lo), richness = all.map((b) => b.taxa.size);
    expect(Math.min(...all.map((b) => b.plates.size))).toBe(1);
    expect(Math.max(...all.map((b) => b.plates.size))).toBe(6);
    expect(Math.min(...spans)).toBeLessThan(20);
    expect(Math.max(...spans)).toBeGreaterThan(60);
    expect(pearson(spans, richness)).toBeGreaterThan(0.5);
  });
});

/** Pearson's product-moment correlation coefficient (textbook formula). */
function pearson(a: readonly number[], b: readonly number[]): number {
  const ma = a.reduce((s, x) => s + x, 0) / a.length, mb = b.reduce((s, x) => s + x, 0) / b.length;
  let sab = 0, saa = 0, sbb = 0;
  a.forEach((x, i) => { sab += (x - ma) * (b[i] - mb); saa += (x - ma) ** 2; sbb += (b[i] - mb) ** 2; });
  return sab / Math.sqrt(saa * sbb);
}

describe('poles.csv', () => {
  const { header, rows } = demoCsv('poles.csv');
  const pc = columns(header);

  it('has the DESIGN.md header and a row every 10 Myr from 0 to 300 Ma per plate, identity at 0 Ma', () => {
    expect(header.join(',')).toBe('plate_id,relative_to,age_ma,pole_lat,pole_lon,angle_deg');
    const plates = new Set(rows.map((r) => r[pc.plate_id]));
    for (const p of plates) {
      const own = rows.filter((r) => r[pc.plate_id] === p);
      expect(own.map((r) => Number(r[pc.age_ma]))).toEqual(Array.from({ length: 31 }, (_, i) => 10 * i));
      expect(Number(own[0][pc.angle_deg])).toBe(0);
      for (const r of own) {
        expect(Number(r[pc.angle_deg])).toBeGreaterThanOrEqual(0);
        expect(Number(r[pc.angle_deg])).toBeLessThanOrEqual(180);
      }
    }
  });

  it('forms a tree rooted at plate 0 with at least one chain through another plate', () => {
    const parent = new Map(rows.map((r) => [r[pc.plate_id], r[pc.relative_to]]));
    expect(parent.has('0')).toBe(false);
    let depth = 0;
    for (const p of parent.keys()) {
      let d = 0;
      for (let q = p; q !== '0'; q = parent.get(q)!) {
        expect(parent.has(q), `plate ${q} needs poles`).toBe(true);
        expect(++d).toBeLessThan(10);
      }
      depth = Math.max(depth, d);
    }
    expect(depth).toBeGreaterThanOrEqual(2);
  });

  it('moves every plate smoothly, less than 10° per 10 Myr relative to its parent (about 11 cm/yr at most)', () => {
    // Plate speeds of a few cm/yr are common knowledge (from memory); 1° ≈ 111 km.
    const probe = [unit(0, 0), unit(0, 90), unit(90, 0)];
    for (const p of new Set(rows.map((r) => r[pc.plate_id]))) {
      const ms: Mat3[] = rows.filter((r) => r[pc.plate_id] === p).map((r) => poleMatrix(Number(r[pc.pole_lat]), Number(r[pc.pole_lon]), Number(r[pc.angle_deg])));
      let travelled = 0;
      for (let k = 1; k < ms.length; k++) {
        const step = Math.max(...probe.map((v) => angleBetweenDeg(apply(ms[k], v), apply(ms[k - 1], v))));
        expect(step).toBeLessThan(10);
        travelled += step;
      }
      expect(travelled).toBeGreaterThan(10);
    }
  });
});

describe('indicators.csv', () => {
  const { header, rows } = demoCsv('indicators.csv');
  const ic = columns(header);

  it('has the documented header and a few thousand rows of the six kinds', () => {
    expect(header.join(',')).toBe('kind,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,lat,lon,plate_id');
    expect(rows.length).toBe(3000);
    expect(new Set(rows.map((r) => r[ic.kind]))).toEqual(new Set(['coal', 'evaporite', 'glacial', 'bauxite', 'laterite', 'reef']));
  });

  it('keeps each kind within the palaeolatitude belts the README states', () => {
    const belt: Record<string, [number, number]> = {
      reef: [0, 32], bauxite: [0, 30], laterite: [0, 35], evaporite: [10, 40], coal: [0, 70], glacial: [35, 90],
    };
    for (const r of rows) {
      const [lo, hi] = belt[r[ic.kind]], a = Math.abs(Number(r[ic.palaeo_lat]));
      if (a < lo || a > hi) expect.fail(`${r.join(',')}: |palaeo_lat| ${a} outside ${lo}–${hi}`);
    }
    const coal = rows.filter((r) => r[ic.kind] === 'coal').map((r) => Math.abs(Number(r[ic.palaeo_lat])));
    expect(coal.filter((a) => a >= 10 && a < 35)).toHaveLength(0);
  });
});

describe('occurrences-with-problems.csv', () => {
  const lines = demoText('occurrences-with-problems.csv').split('\n');
  lines.pop();

  it('has 200 rows of which exactly the documented lines are faulty', () => {
    expect(lines[0]).toBe(OCCURRENCE_HEADER);
    expect(lines.length - 1).toBe(200);
    const faulty = lines.map((l, i) => (i > 0 && rowFault(l.split(',')) !== null ? i + 1 : 0)).filter((n) => n > 0);
    expect(faulty).toEqual(PROBLEMS.map((p) => p.line));
    expect(PROBLEMS.length).toBe(15);
  });

  it('is described line by line in the README', () => {
    const readme = demoText('README.md');
    for (const p of PROBLEMS) expect(readme).toContain(`| ${p.line} | \`${p.field}\` | ${p.what} |`);
  });
});
