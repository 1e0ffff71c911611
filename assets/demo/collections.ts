/**
 * Collections: sites on the landmasses, each with an age range, a realm and an environment,
 * placed by the sampling plan. Positions stay unrounded here; both the present-day and the
 * palaeo position come from the same unrounded vector and are rounded only when written.
 */
import { latOfVector, type Vec3 } from './spherical';
import { pickByArea, siteInto, type Landmass } from './landmasses';
import { midpoint, reportedRange, type AgeRange } from './age-ranges';
import { palaeoPositionInto } from './reconstruct';
import { uniform, type Rng } from './random';
import { REALMS, type Realm } from './taxa';
import type { RotationModel } from '../../src/rotation';
import type { SamplingWindow } from './sampling-plan';
import { stageRunSpan } from './stages';

export const ENVIRONMENTS = {
  shallowMarine: 'shallow marine', deepMarine: 'deep marine', reef: 'reef',
  terrestrial: 'terrestrial', fluvial: 'fluvial', lacustrine: 'lacustrine',
} as const;
export type Environment = (typeof ENVIRONMENTS)[keyof typeof ENVIRONMENTS];

/** Reefs only in the palaeotropics (invented rule of thumb). */
const REEF_MAX_ABS_LAT = 28;
const MARINE_COLLECTION_SHARE = 0.7;
const MAX_SITE_TRIES = 10_000;

export interface Collection {
  readonly plateId: number;
  readonly ages: AgeRange;
  readonly realm: Realm;
  readonly environment: Environment;
  readonly present: Vec3;
  readonly palaeo: Vec3;
}

function environmentAt(realm: Realm, palaeoLat: number, rng: Rng): Environment {
  const u = rng();
  if (realm === REALMS.nonMarine) return u < 0.5 ? ENVIRONMENTS.terrestrial : u < 0.8 ? ENVIRONMENTS.fluvial : ENVIRONMENTS.lacustrine;
  if (Math.abs(palaeoLat) < REEF_MAX_ABS_LAT && u < 0.3) return ENVIRONMENTS.reef;
  return u < 0.8 ? ENVIRONMENTS.shallowMarine : ENVIRONMENTS.deepMarine;
}

/** Palaeolatitude of a landmass's centre at `ageMa`: the middle of a window's belt. */
function beltCentre(model: RotationModel, land: Landmass, ageMa: number): number {
  return latOfVector(palaeoPositionInto(model, land.plateId, ageMa, land.centre, new Float64Array(3)));
}

/** The collections of one sampling window, in the order drawn. */
export function windowCollections(
  window: SamplingWindow, lands: readonly Landmass[], model: RotationModel, rng: Rng,
): Collection[] {
  const { baseMa, topMa } = stageRunSpan(window.oldestStage, window.youngestStage);
  const name = `${window.oldestStage}–${window.youngestStage}`;
  const pool = window.plates.map((id) => {
    const land = lands.find((l) => l.plateId === id);
    if (land === undefined) throw new Error(`Sampling window ${name} names plate ${id}, which has no landmass.`);
    return land;
  });
  const centre = beltCentre(model, pool[0], (baseMa + topMa) / 2);
  const count = Math.round((baseMa - topMa) * window.collectionsPerMyr);
  const out: Collection[] = [];
  for (let c = 0; c < count; c++) {
    const ages = reportedRange(uniform(rng, topMa, baseMa), rng);
    for (let tries = 0; ; tries++) {
      if (tries === MAX_SITE_TRIES) throw new Error(`No site found in the belt of sampling window ${name}.`);
      const land = pickByArea(rng, pool);
      const present = siteInto(land, rng, new Float64Array(3));
      const palaeo = palaeoPositionInto(model, land.plateId, midpoint(ages), present, new Float64Array(3));
      const lat = latOfVector(palaeo);
      if (window.beltHalfWidthDeg !== null && Math.abs(lat - centre) > window.beltHalfWidthDeg) continue;
      const realm = rng() < MARINE_COLLECTION_SHARE ? REALMS.marine : REALMS.nonMarine;
      out.push({ plateId: land.plateId, ages, realm, environment: environmentAt(realm, lat, rng), present, palaeo });
      break;
    }
  }
  return out;
}
