export { COMMON_INDICATOR_KINDS, type CommonIndicatorKind, commonIndicatorKind, normalisedKind } from './indicator-kinds';
export { type IndicatorSummary, summariseIndicators } from './indicator-summary';
