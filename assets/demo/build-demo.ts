/**
 * Builds every demo file in memory from the seed: a pure function of the code, so the test
 * can compare it with the committed files byte for byte.
 */
import { buildLandmass, type Landmass } from './landmasses';
import { landName } from './names';
import { streamFor } from './random';
import { poleTableRows } from './plate-motion';
import type { RotationModel } from '../../src/rotation';
import { poleTableCsv, poleTableModel } from './pole-table-csv';
import { landGeoJson } from './land-geojson';
import { makeClades, makeGenera } from './taxa';
import { windowCollections, type Collection } from './collections';
import { collectionGenera, occurrenceLines, OCCURRENCE_HEADER } from './occurrences';
import { indicatorLines, INDICATOR_HEADER } from './indicators';
import { problemLines } from './problems';
import { midpoint } from './age-ranges';
import { SAMPLING_WINDOWS } from './sampling-plan';
import { DEMO_SEED, PLATES } from './world';

export const DEMO_FILES = ['land.geojson', 'poles.csv', 'occurrences.csv', 'occurrences-with-problems.csv', 'indicators.csv'] as const;
export type DemoFileName = (typeof DEMO_FILES)[number];

/** Independent random streams, one per part of the scenario. */
const STREAM = { names: 1, outlines: 2, biota: 3, collections: 4, finds: 5, indicators: 6 } as const;

function buildLandmasses(seed: number): Landmass[] {
  const names = streamFor(seed, STREAM.names), outlines = streamFor(seed, STREAM.outlines);
  const taken = new Set<string>();
  return PLATES.map((p) => buildLandmass(p.landmass, landName(names, taken), outlines));
}

/** Collections of all windows, oldest midpoint first (stable for ties). */
function allCollections(lands: readonly Landmass[], model: RotationModel, seed: number): Collection[] {
  const rng = streamFor(seed, STREAM.collections);
  const all = SAMPLING_WINDOWS.flatMap((w) => windowCollections(w, lands, model, rng));
  return all.sort((a, b) => midpoint(b.ages) - midpoint(a.ages));
}

export function buildDemo(seed = DEMO_SEED): Record<DemoFileName, string> {
  const lands = buildLandmasses(seed);
  const poles = poleTableCsv(poleTableRows(PLATES));
  const model = poleTableModel(poles);
  const biota = streamFor(seed, STREAM.biota);
  const clades = makeClades(biota);
  const genera = makeGenera(biota, clades, lands.map((l) => l.plateId));
  const finds = streamFor(seed, STREAM.finds);
  const occurrences = allCollections(lands, model, seed).flatMap((c, i) =>
    occurrenceLines(c, `c${String(i + 1).padStart(5, '0')}`, collectionGenera(c, genera, finds), genera, clades));
  const indicators = indicatorLines(lands, model, streamFor(seed, STREAM.indicators));
  const csv = (header: string, lines: readonly string[]) => `${header}\n${lines.join('\n')}\n`;
  return {
    'land.geojson': landGeoJson(lands),
    'poles.csv': poles,
    'occurrences.csv': csv(OCCURRENCE_HEADER, occurrences),
    'occurrences-with-problems.csv': csv(OCCURRENCE_HEADER, problemLines(occurrences)),
    'indicators.csv': csv(INDICATOR_HEADER, indicators),
  };
}
