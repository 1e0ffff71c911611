export { cellCentre, cellCounts, cellName, cellTipLines, positionWords } from './cell-words';
export { COUNT_NOUNS, collectionNoun, countWords, formatCount, type CountNoun } from './count-words';
export { legendTicks, legendTitle, type LegendTick } from './legend-words';
export { mapDescription } from './map-description';
export { ageRange, slicePosition, sliceTitle } from './slice-title';
