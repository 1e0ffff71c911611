export { tallyCells, type CellTallies, type SliceOrderedRows } from './cell-tallies';
export { DistinctCounter } from './distinct-counter';
export { gather } from './gather';
export { groupBySlice, type SliceGroups } from './group-by-slice';
export { latitudeHistogram, type LatitudeHistogram } from './latitude-histogram';
export { measureFootprint, measureFootprintWithShapes, type Footprint, type FootprintShapes } from './slice-footprint';
export type { SliceLevers } from './slice-levers';
export { slicePositions, type SlicePositions } from './slice-positions';
export {
  FEW_PLACES_BELOW, SLICE_CAUTION, WIDE_HULL_SHARE, sliceCautions, type SliceCaution, type SliceNumbers,
} from './slice-cautions';
