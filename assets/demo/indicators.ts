/**
 * Lithological climate indicators placed by palaeolatitude with made-up rules of thumb (not
 * a climate model): reefs, bauxite and laterite in the tropics, evaporites in the subtropics,
 * coal in the humid equatorial and mid-latitude belts, glacial deposits near the poles, and
 * further from them during an invented early cold phase.
 */
import { pickByArea, siteInto, type Landmass } from './landmasses';
import { midpoint, reportedRange } from './age-ranges';
import { palaeoPositionInto } from './reconstruct';
import { formatAge, formatPosition } from './csv-format';
import { latOfVector } from './spherical';
import { uniform, weightedIndex, type Rng } from './random';
import { SCENARIO_BASE_MA, SCENARIO_TOP_MA } from './stages';
import type { RotationModel } from '../../src/rotation';

export const INDICATOR_HEADER = 'kind,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,lat,lon,plate_id';
const INDICATOR_KINDS = ['coal', 'evaporite', 'glacial', 'bauxite', 'laterite', 'reef'] as const;
const INDICATOR_COUNT = 3000;

/** Before this age glaciers reach lower latitudes (invented cold phase). */
const COLD_PHASE_UNTIL_MA = 280;

/** Relative chance of each kind (in INDICATOR_KINDS order) at an absolute palaeolatitude. */
function kindWeights(absLat: number, ageMa: number): number[] {
  const band = (lo: number, hi: number, w: number) => (absLat >= lo && absLat < hi ? w : 0);
  const glacialFrom = ageMa > COLD_PHASE_UNTIL_MA ? 45 : 60;
  return [
    band(0, 10, 0.7) + band(40, 65, 1) + band(35, 40, 0.3) + band(65, 70, 0.3),
    band(15, 35, 1.2) + band(10, 15, 0.3) + band(35, 40, 0.3),
    band(glacialFrom, 91, 1) + band(glacialFrom - 10, glacialFrom, 0.3),
    band(0, 20, 0.5) + band(20, 30, 0.15),
    band(0, 25, 0.6) + band(25, 35, 0.2),
    band(0, 25, 1) + band(25, 32, 0.4),
  ];
}

/** CSV lines (no header), oldest first. */
export function indicatorLines(lands: readonly Landmass[], model: RotationModel, rng: Rng): string[] {
  const rows: Array<{ age: number; line: string }> = [];
  for (let i = 0; i < INDICATOR_COUNT; i++) {
    const land = pickByArea(rng, lands);
    const present = siteInto(land, rng, new Float64Array(3));
    const ages = reportedRange(uniform(rng, SCENARIO_TOP_MA, SCENARIO_BASE_MA), rng);
    const age = midpoint(ages);
    const palaeo = palaeoPositionInto(model, land.plateId, age, present, new Float64Array(3));
    const weights = kindWeights(Math.abs(latOfVector(palaeo)), age);
    const kind = INDICATOR_KINDS[weightedIndex(rng, weights, weights.reduce((a, b) => a + b, 0))];
    const [pLat, pLon] = formatPosition(palaeo), [lat, lon] = formatPosition(present);
    rows.push({ age, line: `${kind},${formatAge(ages.oldestMa)},${formatAge(ages.youngestMa)},${pLat},${pLon},${lat},${lon},${land.plateId}` });
  }
  return rows.sort((a, b) => b.age - a.age).map((r) => r.line);
}
