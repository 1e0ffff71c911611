/** A count with its noun, singular for exactly one: "1 collection", "2 collections", "1,204 taxa". */
import { formatNumber } from '../charts/number-format';

/** Each counted thing as [singular, plural]. */
export const COUNT_NOUNS = {
  occurrence: ['occurrence', 'occurrences'],
  collection: ['collection', 'collections'],
  /** Distinct positions: what collections are counted as when the table names none. */
  place: ['distinct place', 'distinct places'],
  taxon: ['taxon', 'taxa'],
  cell: ['occupied cell', 'occupied cells'],
  slice: ['slice', 'slices'],
  row: ['row', 'rows'],
  pole: ['pole', 'poles'],
  bin: ['bin', 'bins'],
  polygon: ['polygon', 'polygons'],
  site: ['site', 'sites'],
  kind: ['kind', 'kinds'],
} as const;

export type CountNoun = keyof typeof COUNT_NOUNS;

/** "1,234" (thousands grouped by commas; the one way counts are written in the page). */
export function formatCount(n: number): string {
  return formatNumber(n);
}

export function countWords(n: number, noun: CountNoun): string {
  const [one, many] = COUNT_NOUNS[noun];
  return `${formatCount(n)} ${n === 1 ? one : many}`;
}

/** The noun for a view's collection counts: collections, or distinct places when the table names no collections. */
export function collectionNoun(collectionsArePositions: boolean): CountNoun {
  return collectionsArePositions ? 'place' : 'collection';
}
