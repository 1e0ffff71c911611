import { describe, expect, it } from 'vitest';
import {
  CHART_VERSION,
  chartIntervals,
  chartScale,
  findChartInterval,
  type ChartInterval,
  type ChartRank,
} from '../../src/time';

// Source for every check in this file: the ICS International Chronostratigraphic Chart v2024/12.
// How chart.json was entered and checked is in assets/timescale/README.md.

const RANKS: readonly ChartRank[] = ['era', 'period', 'subperiod', 'epoch', 'stage'];

// Units of `rank` lying under `ancestor`, found by climbing parent links.
function descendantsOf(ancestor: ChartInterval, rank: ChartRank): ChartInterval[] {
  return chartIntervals(rank).filter((unit) => {
    for (let up = unit.parent; up !== undefined; up = findChartInterval(up)?.parent) {
      if (up === ancestor.name) return true;
    }
    return false;
  });
}

describe('the built-in chart', () => {
  it('states the chart version it was taken from', () => {
    expect(CHART_VERSION).toBe('v2024/12');
  });

  it('has 12 periods, 38 epochs and 102 stages in the Phanerozoic', () => {
    // The chart's stage column holds 102 units in v2024/12, counting the Pridoli, which has no
    // stages and spans the column; epochs count Carboniferous subseries and Cambrian Series 2.
    expect(chartIntervals('period')).toHaveLength(12);
    expect(chartIntervals('epoch')).toHaveLength(38);
    expect(chartIntervals('stage')).toHaveLength(102);
  });

  it.each(RANKS)('lists %s units oldest first with strictly decreasing bases', (rank) => {
    const units = chartIntervals(rank);
    for (let i = 1; i < units.length; i++) expect(units[i].baseMa).toBeLessThan(units[i - 1].baseMa);
  });

  it.each(['periods', 'epochs', 'stages'] as const)('builds a contiguous %s scale ending at 0 Ma', (rank) => {
    const scale = chartScale(rank);
    const n = scale.names.length;
    for (let i = 0; i + 1 < n; i++) expect(scale.topMa[i]).toBe(scale.baseMa[i + 1]);
    expect(scale.topMa[n - 1]).toBe(0);
    expect(scale.baseMa[0]).toBe(538.8); // base of the Cambrian, hence of the Phanerozoic
  });

  it('nests stages in epochs, epochs in periods and periods in eras, sharing their boundaries', () => {
    const levels: ReadonlyArray<readonly [ChartRank, ChartRank]> = [
      ['era', 'period'],
      ['period', 'epoch'],
      ['period', 'stage'],
      ['subperiod', 'epoch'],
      ['epoch', 'stage'],
    ];
    for (const [upper, lower] of levels) {
      const all = chartIntervals(lower);
      for (const parent of chartIntervals(upper)) {
        const children = descendantsOf(parent, lower);
        expect(children.length, `${parent.name} has ${lower}s`).toBeGreaterThan(0);
        // A consecutive run of the list, from the parent's base to its top.
        const first = all.indexOf(children[0]);
        expect(children, `${lower}s of ${parent.name} are consecutive`).toEqual(all.slice(first, first + children.length));
        expect(children[0].baseMa, `base of ${parent.name}`).toBe(parent.baseMa);
        expect(children[children.length - 1].topMa, `top of ${parent.name}`).toBe(parent.topMa);
      }
    }
  });

  it('gives every stage, epoch and period a parent that exists one rank up', () => {
    const names = (rank: ChartRank) => new Set(chartIntervals(rank).map((u) => u.name));
    for (const stage of chartIntervals('stage')) expect(names('epoch').has(stage.parent ?? '')).toBe(true);
    for (const period of chartIntervals('period')) expect(names('era').has(period.parent ?? '')).toBe(true);
    for (const epoch of chartIntervals('epoch')) {
      const up = epoch.parent ?? '';
      expect(names('period').has(up) || names('subperiod').has(up)).toBe(true);
    }
  });

  // Well-known boundaries, checked literally. Values from memory of ICS chart v2024/12 and
  // confirmed in the ICS machine-readable chart data, except where a note says memory was wrong.
  it.each([
    ['Cambrian', 538.8],
    ['Ordovician', 486.85],
    ['Silurian', 443.1], // memory had 443.8 (an older chart); ICS data 443.1
    ['Devonian', 419.62], // memory had 419.2; ICS data 419.62
    ['Carboniferous', 358.86], // memory had 358.9; ICS data 358.86
    ['Permian', 298.9],
    ['Triassic', 251.902],
    ['Jurassic', 201.4],
    ['Cretaceous', 143.1], // formerly ~145.0 on the chart
    ['Paleogene', 66.0],
    ['Neogene', 23.04],
    ['Quaternary', 2.58],
    ['Holocene', 0.0117],
    ['Meghalayan', 0.0042],
    ['Northgrippian', 0.0082],
    ['Chibanian', 0.774],
    ['Calabrian', 1.8],
    ['Zanclean', 5.333],
    ['Messinian', 7.246],
    ['Rupelian', 33.9],
    ['Ypresian', 56.0],
    ['Toarcian', 184.2],
    ['Changhsingian', 254.14],
    ['Tremadocian', 486.85],
  ])('puts the base of the %s at %f Ma', (name, baseMa) => {
    expect(findChartInterval(name)?.baseMa).toBe(baseMa);
  });

  it('carries the chart uncertainty and approximate marks', () => {
    expect(findChartInterval('Triassic')?.baseUncertaintyMa).toBe(0.024);
    expect(findChartInterval('Danian')?.baseUncertaintyMa).toBeUndefined();
    expect(findChartInterval('Norian')?.approximate).toBe(true);
    expect(findChartInterval('Hettangian')?.approximate).toBe(false);
  });

  it('puts the top of the Meghalayan, the youngest stage, at 0 Ma', () => {
    expect(findChartInterval('Meghalayan')).toMatchObject({ rank: 'stage', baseMa: 0.0042, topMa: 0 });
  });
});

describe('finding a chart interval by name', () => {
  it('ignores case and surrounding whitespace', () => {
    expect(findChartInterval('  maastrichtian ')).toMatchObject({ name: 'Maastrichtian', rank: 'stage', baseMa: 72.2, topMa: 66.0 });
    expect(findChartInterval('JURASSIC')).toMatchObject({ name: 'Jurassic', rank: 'period', baseMa: 201.4, topMa: 143.1 });
  });

  it('accepts Early and Late for the chart series named Lower and Upper (common practice)', () => {
    expect(findChartInterval('Early Jurassic')).toMatchObject({ name: 'Lower Jurassic', rank: 'epoch' });
    expect(findChartInterval('late cretaceous')).toMatchObject({ name: 'Upper Cretaceous', baseMa: 100.5, topMa: 66.0 });
    expect(findChartInterval('Middle Triassic')).toMatchObject({ name: 'Middle Triassic', baseMa: 246.7 });
    expect(findChartInterval('Late Pleistocene')).toMatchObject({ name: 'Upper Pleistocene', rank: 'stage' });
  });

  it('finds eras and Carboniferous subperiods too', () => {
    expect(findChartInterval('Mesozoic')).toMatchObject({ rank: 'era', baseMa: 251.902, topMa: 66.0 });
    expect(findChartInterval('Pennsylvanian')).toMatchObject({ rank: 'subperiod', baseMa: 323.4, topMa: 298.9 });
  });

  it('resolves a name used at two ranks to the broader unit', () => {
    expect(findChartInterval('Pridoli')).toMatchObject({ rank: 'epoch', parent: 'Silurian' });
  });

  it('returns undefined for a name the chart does not have', () => {
    expect(findChartInterval('Tertiary')).toBeUndefined();
    expect(findChartInterval('Early Miocene')).toBeUndefined();
    expect(findChartInterval('')).toBeUndefined();
  });
});
