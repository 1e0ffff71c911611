/**
 * Occurrences: each collection lists several genera living at its age, drawn with weights
 * for abundance, home landmass and preferred palaeolatitude, so a slice that samples more
 * landmasses and latitudes finds more genera.
 */
import { weightedIndex, poisson, type Rng } from './random';
import { latOfVector } from './spherical';
import { midpoint } from './age-ranges';
import { formatAge, formatPosition } from './csv-format';
import { REALMS, type Clade, type Genus } from './taxa';
import type { Collection } from './collections';

export const OCCURRENCE_HEADER = 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,lat,lon,plate_id,collection,environment,group';

/** Weight of a genus away from its home landmasses: rare strays. */
const STRAY_FACTOR = 0.03;
/** Mean number of genera per collection beyond the first. */
const EXTRA_GENERA = { [REALMS.marine]: 10, [REALMS.nonMarine]: 6 } as const;

function weightOf(g: Genus, plateId: number, absLat: number): number {
  const home = g.homePlates.length === 0 || g.homePlates.includes(plateId) ? 1 : STRAY_FACTOR;
  const z = (absLat - g.preferredAbsLat) / g.latTolerance;
  return g.commonness * home * Math.exp(-0.5 * z * z);
}

/** Indices of the genera found in one collection, in alphabetical order of name. */
export function collectionGenera(c: Collection, genera: readonly Genus[], rng: Rng): number[] {
  const age = midpoint(c.ages), absLat = Math.abs(latOfVector(c.palaeo));
  const candidates: number[] = [];
  const weights: number[] = [];
  let total = 0;
  genera.forEach((g, i) => {
    if (g.realm !== c.realm || g.firstMa < age || g.lastMa > age) return;
    const w = weightOf(g, c.plateId, absLat);
    if (w > 0) {
      candidates.push(i);
      weights.push(w);
      total += w;
    }
  });
  const wanted = Math.min(1 + poisson(rng, EXTRA_GENERA[c.realm]), candidates.length);
  const chosen: number[] = [];
  while (chosen.length < wanted) {
    const k = weightedIndex(rng, weights, total);
    chosen.push(candidates[k]);
    total -= weights[k];
    weights[k] = 0;
  }
  return chosen.sort((a, b) => (genera[a].name < genera[b].name ? -1 : 1));
}

/** CSV lines (no header) of the occurrences of one collection. */
export function occurrenceLines(
  c: Collection, id: string, found: readonly number[], genera: readonly Genus[], clades: readonly Clade[],
): string[] {
  const [palaeoLat, palaeoLon] = formatPosition(c.palaeo);
  const [lat, lon] = formatPosition(c.present);
  const shared = `${formatAge(c.ages.oldestMa)},${formatAge(c.ages.youngestMa)},${palaeoLat},${palaeoLon},${lat},${lon},${c.plateId},${id},${c.environment}`;
  return found.map((i) => `${genera[i].name},${shared},${clades[genera[i].clade].name}`);
}
