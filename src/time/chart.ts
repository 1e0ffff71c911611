import chartJson from '../../assets/timescale/chart.json';
import type { TimeScale } from './time-scale';

/**
 * The built-in International Chronostratigraphic Chart (ICS), Phanerozoic part. The data, its
 * version and how it was checked are described in assets/timescale/README.md.
 */

/** Ranks of the chart held in chart.json, broadest first. */
export type ChartRank = 'era' | 'period' | 'subperiod' | 'epoch' | 'stage';

/** The ranks a time scale can be built from. */
export type ChartScaleRank = 'periods' | 'epochs' | 'stages';

interface ChartUnitRecord {
  readonly name: string;
  readonly baseMa: number;
  readonly baseUncertaintyMa?: number;
  readonly approximate?: boolean;
  readonly era?: string;
  readonly period?: string;
  readonly subperiod?: string;
  readonly epoch?: string;
}

interface ChartFile {
  readonly version: string;
  readonly eras: readonly ChartUnitRecord[];
  readonly periods: readonly ChartUnitRecord[];
  readonly subperiods: readonly ChartUnitRecord[];
  readonly epochs: readonly ChartUnitRecord[];
  readonly stages: readonly ChartUnitRecord[];
}

// Assignment (not a cast) so that a malformed chart.json fails to compile.
const chart: ChartFile = chartJson;

/** One unit of the chart with its span in Ma. */
export interface ChartInterval {
  /** The chart's spelling. */
  readonly name: string;
  readonly rank: ChartRank;
  /** Older boundary, Ma. */
  readonly baseMa: number;
  /** Younger boundary, Ma: the next younger unit's base; for the last unit of a rank, its parent's top (0 at the youngest). */
  readonly topMa: number;
  /** The chart's ± on the base, Ma, where it gives one. */
  readonly baseUncertaintyMa?: number;
  /** True where the chart prints the base as approximate (~). */
  readonly approximate: boolean;
  /** Name of the enclosing unit one rank up (subperiod for Carboniferous epochs); none for eras. */
  readonly parent?: string;
}

/** Chart version the data were taken from, e.g. `v2024/12`. */
export const CHART_VERSION: string = chart.version;

const RANK_LISTS: ReadonlyArray<readonly [ChartRank, readonly ChartUnitRecord[]]> = [
  ['era', chart.eras],
  ['period', chart.periods],
  ['subperiod', chart.subperiods],
  ['epoch', chart.epochs],
  ['stage', chart.stages],
];

// A unit's top is the next unit's base; the last unit of a list ends where its parent ends
// (the Pennsylvanian where the Carboniferous does), or at 0 Ma for a list without parents.
function toIntervals(
  rank: ChartRank,
  units: readonly ChartUnitRecord[],
  parentTop: ReadonlyMap<string, number>,
): readonly ChartInterval[] {
  return units.map((unit, i) => {
    const parent = unit.epoch ?? unit.subperiod ?? unit.period ?? unit.era;
    const lastTop = parent === undefined ? 0 : (parentTop.get(parent) ?? 0);
    return {
      name: unit.name,
      rank,
      baseMa: unit.baseMa,
      topMa: i + 1 < units.length ? units[i + 1].baseMa : lastTop,
      baseUncertaintyMa: unit.baseUncertaintyMa,
      approximate: unit.approximate === true,
      parent,
    };
  });
}

// Built broadest rank first so that each rank can read its parents' tops.
const INTERVALS: ReadonlyMap<ChartRank, readonly ChartInterval[]> = (() => {
  const byRank = new Map<ChartRank, readonly ChartInterval[]>();
  const tops = new Map<string, number>();
  for (const [rank, units] of RANK_LISTS) {
    const intervals = toIntervals(rank, units, tops);
    byRank.set(rank, intervals);
    for (const unit of intervals) if (!tops.has(unit.name)) tops.set(unit.name, unit.topMa);
  }
  return byRank;
})();

/** All units of one rank, oldest first. */
export function chartIntervals(rank: ChartRank): readonly ChartInterval[] {
  return INTERVALS.get(rank) ?? [];
}

const SCALE_RANK: Readonly<Record<ChartScaleRank, ChartRank>> = {
  periods: 'period',
  epochs: 'epoch',
  stages: 'stage',
};

/** A time scale of the chart's periods, epochs or stages: oldest first, contiguous, 0 Ma at the top. */
export function chartScale(rank: ChartScaleRank): TimeScale {
  const units = chartIntervals(SCALE_RANK[rank]);
  return {
    label: rank,
    names: units.map((u) => u.name),
    baseMa: Float64Array.from(units, (u) => u.baseMa),
    topMa: Float64Array.from(units, (u) => u.topMa),
  };
}

function lookupKey(name: string): string {
  return name.trim().toLowerCase();
}

// Broadest rank first, so a name used at two ranks (the Pridoli is both series and stage)
// resolves to the broader unit.
const BY_NAME: ReadonlyMap<string, ChartInterval> = (() => {
  const map = new Map<string, ChartInterval>();
  for (const [rank] of RANK_LISTS) {
    for (const unit of chartIntervals(rank)) {
      const key = lookupKey(unit.name);
      if (!map.has(key)) map.set(key, unit);
    }
  }
  return map;
})();

// Time terms (Early/Late) for the rock terms (Lower/Upper) the chart uses: common practice.
const TIME_TO_ROCK: ReadonlyArray<readonly [string, string]> = [
  ['early ', 'lower '],
  ['late ', 'upper '],
];

/**
 * The chart unit with this name: exact chart spelling, case-insensitive, surrounding whitespace
 * ignored. "Early X" and "Late X" are also accepted for the chart's "Lower X" and "Upper X"
 * ("Early Jurassic" = "Lower Jurassic", "Late Pleistocene" = "Upper Pleistocene"). A name used at
 * two ranks resolves to the broader unit. Undefined when nothing matches.
 */
export function findChartInterval(name: string): ChartInterval | undefined {
  const key = lookupKey(name);
  const exact = BY_NAME.get(key);
  if (exact !== undefined) return exact;
  for (const [time, rock] of TIME_TO_ROCK) {
    if (key.startsWith(time)) return BY_NAME.get(rock + key.slice(time.length));
  }
  return undefined;
}
