export type { RichnessInput } from './richness-input';
export { sliceAbundances, taxaPerSlice, type SliceAbundances } from './slice-abundances';
export { sliceCollections, type SliceCollections } from './slice-collections';
export { sliceCells, lowerBound, type SliceCells } from './slice-cells';
export { cellMembers, type CellMembers } from './cell-members';
export { boundaryCrossers, taxonRanges, type BoundaryCrossers } from './boundary-crossers';
export { threeTimers, type ThreeTimers } from './three-timers';
export { goodsU, occurrenceSingletons, referenceSingletons } from './goods-u';
export { chao1, type Chao1 } from './chao1';
export { rarefiedRichness } from './rarefaction';
export { sortedQuantile, mean, sampleSd } from './sample-summaries';
export { sliceRandom, uniformBelow } from './slice-seed';
export { shareholderQuorumSubsampling, SQS_REASONS, type SqsReasonCode, type SqsSeries, type SqsSettings } from './sqs';
export { sharedCells, type SharedCells } from './shared-cells';
export { circularRegions, DEFAULT_REGION_SETTINGS, type RegionalSeries, type RegionSettings } from './circular-regions';
export { ageResampledRichness, type AgeRangeRows, type AgeRichness } from './age-resampling';
export { pearson, spearman, ranks, firstDifferences } from './correlation';
export {
  samplingShift, movedNames, footprintCorrelations, logChanges, logRatio, DEFAULT_SHIFT_THRESHOLD, SHIFT_STATES,
  type NamedSeries, type SamplingShift, type FootprintCorrelation,
} from './sampling-shift';
export { richnessCurves, type CurvesOptions, type RichnessCurves } from './richness-curves';
