/**
 * The made-up biota: clades and genera with first and last appearances. Originations follow
 * a rate that changes through time; durations are exponential; three invented crises cut
 * short most of the genera alive at them, so diversity rises, crashes and recovers.
 */
import { exponential, gaussian, poisson, randomIndex, uniform, type Rng } from './random';
import { cladeName, genusName } from './names';
import { SCENARIO_TOP_MA } from './stages';

export const REALMS = { marine: 'marine', nonMarine: 'non-marine' } as const;
export type Realm = (typeof REALMS)[keyof typeof REALMS];

export interface Clade {
  readonly name: string;
  readonly realm: Realm;
}

export interface Genus {
  readonly name: string;
  readonly clade: number;
  readonly realm: Realm;
  /** First and last appearance, Ma (first >= last). */
  readonly firstMa: number;
  readonly lastMa: number;
  /** Plates it lives on; empty for a cosmopolitan genus. */
  readonly homePlates: readonly number[];
  /** Preferred absolute palaeolatitude and tolerance (standard deviation), degrees. */
  readonly preferredAbsLat: number;
  readonly latTolerance: number;
  /** Relative abundance (log-normal), so a few genera are common and many are rare. */
  readonly commonness: number;
}

const MARINE_CLADES = 5;
const NON_MARINE_CLADES = 3;
const MARINE_SHARE = 0.65;
/** Originations start before the scenario so that it opens with a standing diversity. */
const SIMULATION_START_MA = 330;
const MEAN_DURATION_MYR = 14;

/** Genera originating per Myr at `ageMa` (invented). */
function originationRate(ageMa: number): number {
  if (ageMa > 251.902) return 14;
  if (ageMa > 249) return 3; // aftermath of the first crisis
  if (ageMa > 240) return 26; // recovery
  if (ageMa > 201.4) return 13;
  if (ageMa > 195) return 20;
  if (ageMa > 100.5) return 14;
  return 19; // late radiation
}

/** Invented crises: a genus living through one ends there with this probability. */
const CRISES = [
  { ageMa: 251.902, toll: 0.85 },
  { ageMa: 201.4, toll: 0.55 },
  { ageMa: 93.9, toll: 0.25 },
] as const;

export function makeClades(rng: Rng): Clade[] {
  const taken = new Set<string>();
  return Array.from({ length: MARINE_CLADES + NON_MARINE_CLADES }, (_, i) => ({
    name: cladeName(rng, taken),
    realm: i < MARINE_CLADES ? REALMS.marine : REALMS.nonMarine,
  }));
}

function homePlates(rng: Rng, plateIds: readonly number[]): number[] {
  const u = rng();
  if (u < 0.25) return []; // cosmopolitan
  const count = u < 0.7 ? 1 : 2 + randomIndex(rng, 2);
  const pool = [...plateIds];
  const homes: number[] = [];
  while (homes.length < count) homes.push(pool.splice(randomIndex(rng, pool.length), 1)[0]);
  return homes.sort((a, b) => a - b);
}

function lastAppearance(firstMa: number, rng: Rng): number {
  let lastMa = firstMa - Math.max(1, exponential(rng, MEAN_DURATION_MYR));
  for (const c of CRISES) if (firstMa > c.ageMa && lastMa < c.ageMa && rng() < c.toll) lastMa = c.ageMa;
  return Math.max(lastMa, SCENARIO_TOP_MA);
}

/** Genera, oldest first, from a 1-Myr-step birth process between 330 and 66 Ma. */
export function makeGenera(rng: Rng, clades: readonly Clade[], plateIds: readonly number[]): Genus[] {
  const taken = new Set<string>();
  const genera: Genus[] = [];
  for (let t = SIMULATION_START_MA; t > SCENARIO_TOP_MA; t--) {
    const births = poisson(rng, originationRate(t));
    for (let b = 0; b < births; b++) {
      const firstMa = t - rng();
      const marine = rng() < MARINE_SHARE;
      const clade = marine ? randomIndex(rng, MARINE_CLADES) : MARINE_CLADES + randomIndex(rng, NON_MARINE_CLADES);
      genera.push({
        name: genusName(rng, taken),
        clade,
        realm: clades[clade].realm,
        firstMa,
        lastMa: lastAppearance(firstMa, rng),
        homePlates: homePlates(rng, plateIds),
        preferredAbsLat: Math.min(Math.abs(gaussian(rng) * 30), 85),
        latTolerance: uniform(rng, 8, 25),
        commonness: Math.exp(1.1 * gaussian(rng)),
      });
    }
  }
  return genera;
}
