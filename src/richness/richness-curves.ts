import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { isSeed } from '../time/seeded-random';
import type { TimeScale } from '../time/time-scale';
import { ageResampledRichness, type AgeRangeRows, type AgeRichness } from './age-resampling';
import { boundaryCrossers, type BoundaryCrossers } from './boundary-crossers';
import { chao1 } from './chao1';
import { circularRegions, DEFAULT_REGION_SETTINGS, type RegionalSeries, type RegionSettings } from './circular-regions';
import { goodsU, occurrenceSingletons, referenceSingletons } from './goods-u';
import { rarefiedRichness } from './rarefaction';
import type { RichnessInput } from './richness-input';
import { footprintCorrelations, logChanges, logRatio, samplingShift, type FootprintCorrelation, type NamedSeries, type SamplingShift } from './sampling-shift';
import { sharedCells, type SharedCells } from './shared-cells';
import { sliceAbundances, taxaPerSlice } from './slice-abundances';
import { sliceCells } from './slice-cells';
import { sliceCollections } from './slice-collections';
import { shareholderQuorumSubsampling, type SqsSeries } from './sqs';
import { threeTimers, type ThreeTimers } from './three-timers';

export interface CurvesOptions {
  /** SQS target coverage, 0 < quorum ≤ 1. */
  readonly quorum: number;
  /** SQS trials per slice. */
  readonly trials: number;
  /** Seed of every random draw (SQS, regions, ages). */
  readonly seed: number;
  /** Occurrences to rarefy to (Hurlbert); no rarefied series without it. */
  readonly rarefy?: number;
  /** Singletons behind Good's u for SQS: occurrences (default) or single-reference taxa (needs references). */
  readonly coverageFrom?: 'occurrences' | 'references';
  /** Circular regions (grid for cell centres; other settings default to DEFAULT_REGION_SETTINGS). */
  readonly regions?: { readonly grid: Pick<EqualAreaGrid, 'cellCentreInto'> } & Partial<Omit<RegionSettings, 'seed'>>;
  /** Age-uncertainty draws over these rows and the analysis's scale. */
  readonly ages?: { readonly rows: AgeRangeRows; readonly scale: Pick<TimeScale, 'baseMa' | 'topMa'>; readonly trials: number };
  /** Footprint series for the sampling-shift flag and correlations (cells, mst_km, lat_span, collections). */
  readonly footprint?: readonly NamedSeries[];
  /** Threshold on |log ratio| for the flag (DEFAULT_SHIFT_THRESHOLD). */
  readonly shiftThreshold?: number;
}

/** Every richness series per slice (Float64Array, NaN where a value cannot be computed). */
export interface RichnessCurves {
  readonly taxa: Float64Array;
  readonly occurrences: Float64Array;
  readonly crossers: BoundaryCrossers;
  readonly threeTimers: ThreeTimers;
  readonly goodsU: Float64Array;
  /** Present when the input has references. */
  readonly goodsURefs?: Float64Array;
  readonly chao1: Float64Array;
  readonly chao1Sd: Float64Array;
  readonly rarefied?: Float64Array;
  readonly sqs: SqsSeries;
  readonly shared: SharedCells;
  readonly regional?: RegionalSeries;
  readonly ages?: AgeRichness;
  readonly shift?: SamplingShift;
  readonly correlations?: readonly FootprintCorrelation[];
}

/** All richness curves of issue 11 from the columnar rows of one analysis. Throws RangeError on a bad option. */
export function richnessCurves(input: RichnessInput, options: CurvesOptions): RichnessCurves {
  checkOptions(input, options);
  const sliceCount = input.start.length - 1;
  const abundances = sliceAbundances(input);
  const taxa = taxaPerSlice(abundances);
  const occurrences = new Float64Array(sliceCount);
  for (let s = 0; s < sliceCount; s++) occurrences[s] = input.start[s + 1] - input.start[s];

  const f1 = occurrenceSingletons(abundances);
  const refF1 = input.reference ? referenceSingletons(abundances, input.reference) : undefined;
  const u = coverageSeries(f1, occurrences);
  const uRefs = refF1 ? coverageSeries(refF1, occurrences) : undefined;

  const chao1Estimate = new Float64Array(sliceCount);
  const chao1Sd = new Float64Array(sliceCount);
  const rarefied = options.rarefy === undefined ? undefined : new Float64Array(sliceCount);
  for (let s = 0; s < sliceCount; s++) {
    const { first, occurrences: counts } = abundances;
    let f2 = 0;
    for (let e = first[s]; e < first[s + 1]; e++) if (counts[e] === 2) f2++;
    const estimate = chao1(taxa[s], f1[s], f2, occurrences[s]);
    chao1Estimate[s] = estimate.estimate;
    chao1Sd[s] = estimate.sd;
    if (rarefied && options.rarefy !== undefined) rarefied[s] = rarefiedRichness(counts, first[s], first[s + 1], options.rarefy);
  }

  const collections = sliceCollections(input);
  const sqsCoverage = options.coverageFrom === 'references' && uRefs ? uRefs : u;
  const sqs = shareholderQuorumSubsampling(abundances, collections, sqsCoverage, options);
  const cells = sliceCells(input);
  const shared = sharedCells(input.start, abundances, cells);
  const regional = options.regions
    ? circularRegions(input.start, abundances, cells, collections, options.regions.grid, {
      ...DEFAULT_REGION_SETTINGS, ...withoutGrid(options.regions), seed: options.seed,
    })
    : undefined;
  const ages = options.ages ? ageResampledRichness(options.ages.rows, options.ages.scale, options.ages.trials, options.seed) : undefined;

  const standardisedChanges: NamedSeries[] = [
    { name: 'sqs_mean', values: logChanges(sqs.mean) },
    { name: 'taxa_shared', values: logRatio(shared.taxaShared, shared.taxaSharedPrev) },
    ...(regional ? [{ name: 'regional_mean', values: logChanges(regional.mean) }] : []),
  ];
  const shift = options.footprint ? samplingShift(taxa, options.footprint, standardisedChanges, options.shiftThreshold) : undefined;
  const correlations = options.footprint ? footprintCorrelations(taxa, options.footprint) : undefined;

  return {
    taxa, occurrences,
    crossers: boundaryCrossers(abundances, input.taxonCount),
    threeTimers: threeTimers(abundances, input.taxonCount),
    goodsU: u,
    ...(uRefs ? { goodsURefs: uRefs } : {}),
    chao1: chao1Estimate, chao1Sd,
    ...(rarefied ? { rarefied } : {}),
    sqs, shared,
    ...(regional ? { regional } : {}),
    ...(ages ? { ages } : {}),
    ...(shift ? { shift } : {}),
    ...(correlations ? { correlations } : {}),
  };
}

function coverageSeries(singletons: Float64Array, occurrences: Float64Array): Float64Array {
  return singletons.map((f1, s) => goodsU(f1, occurrences[s]));
}

function withoutGrid(regions: NonNullable<CurvesOptions['regions']>): Partial<Omit<RegionSettings, 'seed'>> {
  const { grid: _grid, ...rest } = regions;
  return rest;
}

function checkOptions(input: RichnessInput, options: CurvesOptions): void {
  const positiveInteger = (name: string, value: number | undefined) => {
    if (value !== undefined && !(Number.isInteger(value) && value >= 1)) throw new RangeError(`${name} ${value} is not a positive integer.`);
  };
  if (!(options.quorum > 0 && options.quorum <= 1)) throw new RangeError(`quorum ${options.quorum} is not a number in (0, 1].`);
  positiveInteger('trials', options.trials);
  positiveInteger('rarefy', options.rarefy);
  positiveInteger('age trials', options.ages?.trials);
  positiveInteger('region minimum cells', options.regions?.minCells);
  positiveInteger('region trials', options.regions?.trials);
  if (options.regions?.minCollections !== undefined && !(Number.isInteger(options.regions.minCollections) && options.regions.minCollections >= 0)) {
    throw new RangeError(`region minimum collections ${options.regions.minCollections} is not a whole number.`);
  }
  if (options.regions?.radiusKm !== undefined && !(options.regions.radiusKm > 0)) throw new RangeError(`region radius ${options.regions.radiusKm} km is not a positive number.`);
  if (!isSeed(options.seed)) throw new RangeError(`seed ${options.seed} is not an integer from 0 to 4294967295.`);
  if (options.coverageFrom === 'references' && !input.reference) throw new RangeError('coverage from references needs a reference column.');
}
