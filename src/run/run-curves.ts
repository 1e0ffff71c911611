import type { SliceMetrics } from '../analysis';
import { gather } from '../footprint';
import { richnessCurves, type NamedSeries, type RichnessCurves, type RichnessInput } from '../richness';
import type { OccurrenceTable } from '../table';
import { DEFAULT_CURVES_SETTINGS, type CurvesSettings } from './curves-settings';
import type { Run } from './run-analysis';

/** The footprint measures the sampling-shift flag and the correlations compare richness with (slices.csv names). */
const FOOTPRINT_MEASURES = ['cells', 'mst_km', 'lat_span', 'collections'] as const;

/** The curves settings of a run: its own, or the defaults when it gave none. */
function curvesSettingsOf(run: Pick<Run, 'settings'>): CurvesSettings {
  return run.settings.curves ?? DEFAULT_CURVES_SETTINGS;
}

/** The richness curves of a run, with the settings and footprint series they were made with. */
export interface CurvesRun {
  readonly settings: CurvesSettings;
  readonly curves: RichnessCurves;
  /** The footprint measures (FOOTPRINT_MEASURES) the flag and the correlations compared richness with. */
  readonly footprint: readonly NamedSeries[];
}

/**
 * Every richness curve of a run, from the slice-ordered rows its analysis already built (no
 * second grouping): the table is read only for its references and age ranges.
 */
export function runCurves(run: Run, table: OccurrenceTable): CurvesRun {
  const { result, settings, grid, scale } = run;
  const curves = curvesSettingsOf(run);
  const { order } = result.rowsBySlice;
  const { rows } = result;
  const input: RichnessInput = {
    start: rows.start, taxon: rows.taxon, taxonCount: table.taxon.values.length,
    collection: rows.collection, collectionCount: rows.collectionCount, cell: rows.cell,
    ...(table.reference === undefined ? {} : { reference: gather(table.reference.codes, order) }),
  };
  const measures: Readonly<Record<(typeof FOOTPRINT_MEASURES)[number], (slice: SliceMetrics) => number>> = {
    cells: (slice) => slice.cells, mst_km: (slice) => slice.mstKm, lat_span: (slice) => slice.latSpan, collections: (slice) => slice.collections,
  };
  // An empty slice has no footprint to compare (mst_km is already undefined there): every measure
  // is NaN for it, so that all four correlations use the same steps between sampled slices.
  const footprint: NamedSeries[] = FOOTPRINT_MEASURES.map((name) => ({
    name, values: Float64Array.from(result.slices, (slice) => (slice.occurrences > 0 ? measures[name](slice) : Number.NaN)),
  }));
  const richness = richnessCurves(input, {
    quorum: curves.quorum,
    trials: curves.trials,
    seed: settings.seed,
    ...(curves.rarefy === undefined ? {} : { rarefy: curves.rarefy }),
    regions: { grid, radiusKm: curves.regionKm },
    ...(curves.ageTrials === undefined ? {} : {
      ages: {
        rows: { taxon: rows.taxon, taxonCount: table.taxon.values.length, oldestMa: gather(table.oldestMa, order), youngestMa: gather(table.youngestMa, order) },
        scale, trials: curves.ageTrials,
      },
    }),
    footprint,
  });
  return { settings: curves, curves: richness, footprint };
}
