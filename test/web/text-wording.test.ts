// The page's words from web/text, shared by both maps, the cell panel and the figures.
// Outside references: English number agreement (singular only for exactly one, "taxon"/"taxa"
// from the ICZN's usage); thousands grouping as Intl.NumberFormat('en-US') writes it;
// hemisphere letters as in ISO 6709 (north and east positive); legend tick positions from the
// identity log(10ᵏ) / log(10ⁿ) = k / n.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countScale } from '../../web/colour/measure-scale';
import { MEASURE_UNITS } from '../../web/state/view-options';
import {
  ageRange, cellCentre, cellCounts, cellName, cellTipLines, COUNT_NOUNS, countWords, formatCount, legendTicks, legendTitle, mapDescription, sliceTitle,
} from '../../web/text';
import { fixtureView } from './globe-fixture';

describe('countWords', () => {
  it('uses the singular for exactly one and the plural otherwise, zero included', () => {
    expect(countWords(1, 'collection')).toBe('1 collection');
    expect(countWords(0, 'collection')).toBe('0 collections');
    expect(countWords(2, 'collection')).toBe('2 collections');
    expect(countWords(1, 'taxon')).toBe('1 taxon');
    expect(countWords(7, 'taxon')).toBe('7 taxa');
    expect(countWords(1, 'cell')).toBe('1 occupied cell');
    expect(countWords(1, 'place')).toBe('1 distinct place');
    expect(countWords(12_345, 'occurrence')).toBe('12,345 occurrences');
  });

  it('never writes "1" before a plural noun nor any other count before a singular one', () => {
    const nouns = Object.keys(COUNT_NOUNS) as (keyof typeof COUNT_NOUNS)[];
    fc.assert(fc.property(fc.nat(10_000_000), fc.constantFrom(...nouns), (n, noun) => {
      const [one, many] = COUNT_NOUNS[noun];
      expect(countWords(n, noun)).toBe(`${formatCount(n)} ${n === 1 ? one : many}`);
    }));
  });

  it('groups thousands as Intl.NumberFormat("en-US") does', () => {
    const intl = new Intl.NumberFormat('en-US');
    fc.assert(fc.property(fc.nat(2 ** 32 - 1), (n) => {
      expect(formatCount(n)).toBe(intl.format(n));
    }));
  });
});

describe('sliceTitle', () => {
  it('names a slice by its name and ages, written as in bin names', () => {
    expect(sliceTitle({ name: 'Maastrichtian', baseMa: 72.1, topMa: 66 })).toBe('Maastrichtian, 72.1–66 Ma');
    expect(ageRange({ baseMa: 0.0117, topMa: 0 })).toBe('0.0117–0 Ma');
  });

  it('does not repeat the range when an equal bin is named by it, and says when there is no slice', () => {
    expect(sliceTitle({ name: '5–0 Ma', baseMa: 5, topMa: 0 })).toBe('5–0 Ma');
    expect(sliceTitle(undefined)).toBe('No slice');
    expect(sliceTitle(fixtureView().slices[7])).toBe('No slice');
  });
});

describe('cell words', () => {
  const view = fixtureView();

  it('lists a cell’s three counts with singular and plural', () => {
    expect(cellCounts(view, 0)).toEqual(['1 occurrence', '1 collection', '1 taxon']);
    expect(cellCounts(view, 2)).toEqual(['120 occurrences', '3 collections', '7 taxa']);
  });

  it('counts distinct places instead of collections when the table names no collections', () => {
    expect(cellCounts({ ...view, collectionsArePositions: true }, 0)[1]).toBe('1 distinct place');
    expect(cellCounts({ ...view, collectionsArePositions: true }, 1)[1]).toBe('2 distinct places');
  });

  it('heads a tooltip with the cell’s id and grid, then the counts', () => {
    expect(cellName(view, 1)).toBe(`Cell ${view.cells.cell[1]} (${view.gridName})`);
    expect(cellTipLines(view, 1)).toEqual([cellName(view, 1), ...cellCounts(view, 1)]);
  });

  it('gives a cell centre latitude first, each coordinate with its hemisphere letter', () => {
    expect(cellCentre(12.34, -45.61)).toBe('centre: latitude 12.3° N, longitude 45.6° W');
    expect(cellCentre(-33.96, 151.18)).toBe('centre: latitude 34.0° S, longitude 151.2° E');
  });

  it('writes no hemisphere where a coordinate rounds to the equator, the prime meridian or the antimeridian', () => {
    expect(cellCentre(0.04, -0.04)).toBe('centre: latitude 0.0°, longitude 0.0°');
    expect(cellCentre(-89.99, 179.99)).toBe('centre: latitude 90.0° S, longitude 180.0°');
    expect(cellCentre(45, -180)).toBe('centre: latitude 45.0° N, longitude 180.0°');
  });
});

describe('mapDescription', () => {
  const view = fixtureView();

  it('names the map, the slice, the cell count and what colours the cells', () => {
    expect(mapDescription(view, 1, 'taxa', 'Globe')).toBe(
      'Globe of slice B, 10–5 Ma: 2 occupied cells coloured by distinct taxa per cell, 1 distinct place, 1 occurrence.');
  });

  it('says when there is nothing to show', () => {
    expect(mapDescription(undefined, 0, 'taxa', 'Flat map (Web Mercator)')).toBe('Flat map (Web Mercator): no analysis to show yet.');
    expect(mapDescription(view, 5, 'taxa', 'Equal Earth map')).toBe('Equal Earth map: no analysis to show yet.');
  });
});

describe('legend words', () => {
  it('titles the legend with the measure’s unit and the kind of scale', () => {
    expect(legendTitle('occurrences')).toBe(`Occupied cells: ${MEASURE_UNITS.occurrences} (log scale)`);
  });

  it('places ticks 1, 10, 100, 1000 at 0, ⅓, ⅔ and all of a log scale up to 1000, labelled with grouped digits', () => {
    const ticks = legendTicks(countScale(1000));
    expect(ticks.map((t) => t.label)).toEqual(['1', '10', '100', '1,000']);
    expect(ticks.map((t) => t.value)).toEqual([1, 10, 100, 1000]);
    ticks.forEach((t, k) => expect(t.position).toBeCloseTo(k / 3, 12));
  });

  it('ends on the largest count, placed at the top of the ramp', () => {
    const ticks = legendTicks(countScale(4321));
    expect(ticks.at(-1)).toEqual({ value: 4321, position: 1, label: '4,321' });
    // 1,000 (at 83 % of the ramp) would run into 4,321 and is left out.
    expect(ticks.at(-2)!.position).toBeCloseTo(Math.log(100) / Math.log(4321), 12);
  });

  it('leaves out a decade whose label would run into the largest count’s', () => {
    // 100 sits at log 100 / log 122 ≈ 0.96 of the ramp, a few pixels from 122.
    expect(legendTicks(countScale(122)).map((t) => t.label)).toEqual(['1', '10', '122']);
    expect(legendTicks(countScale(1100)).map((t) => t.label)).toEqual(['1', '10', '100', '1,100']);
    // Far enough apart, both stay.
    expect(legendTicks(countScale(900)).map((t) => t.label)).toEqual(['1', '10', '100', '900']);
  });
});
