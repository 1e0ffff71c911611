/**
 * The common lithological climate indicators, each with a symbol and a colour of our own
 * choosing. Kinds in an indicator table are free text; a kind written as one of a common
 * kind's plain names (any case, spaces, hyphens or underscores alike) is that kind, and any
 * other kind is kept as written, with no symbol of its own. Colours: the six of the Okabe–Ito
 * palette (Okabe & Ito 2008, "Color Universal Design"; distinguishable with colour-vision
 * deficiencies) that the map's overlays leave free (orange and vermillion draw the hull and the
 * spanning tree), and a brown of our own for laterite; the symbols tell kinds apart as well.
 */

export const COMMON_INDICATOR_KINDS = [
  { id: 'coal', label: 'Coal', symbol: 'square', colour: '#000000', names: ['coal', 'coals', 'coal seam', 'lignite'] },
  { id: 'evaporite', label: 'Evaporite', symbol: 'diamond', colour: '#CC79A7', names: ['evaporite', 'evaporites', 'gypsum', 'anhydrite', 'halite', 'salt'] },
  {
    id: 'glacial', label: 'Glacial deposits', symbol: 'triangle-down', colour: '#56B4E9',
    names: ['glacial', 'glacial deposit', 'glacial deposits', 'tillite', 'tillites', 'till', 'diamictite', 'dropstone', 'dropstones'],
  },
  { id: 'bauxite', label: 'Bauxite', symbol: 'circle', colour: '#0072B2', names: ['bauxite', 'bauxites'] },
  { id: 'laterite', label: 'Laterite', symbol: 'hexagon', colour: '#8C510A', names: ['laterite', 'laterites', 'lateritic soil'] },
  { id: 'calcrete', label: 'Calcrete', symbol: 'triangle-up', colour: '#F0E442', names: ['calcrete', 'calcretes', 'caliche'] },
  { id: 'reef', label: 'Reef', symbol: 'star', colour: '#009E73', names: ['reef', 'reefs', 'coral reef', 'carbonate reef'] },
] as const;

export type CommonIndicatorKind = (typeof COMMON_INDICATOR_KINDS)[number];

/** A kind as written, reduced for matching: lower case, hyphens and underscores as spaces, runs of space as one, trimmed. */
export function normalisedKind(text: string): string {
  return text.toLowerCase().replace(/[\s_-]+/g, ' ').trim();
}

const BY_NAME: ReadonlyMap<string, CommonIndicatorKind> = new Map(
  COMMON_INDICATOR_KINDS.flatMap((kind) => kind.names.map((name): [string, CommonIndicatorKind] => [name, kind])),
);

/** The common kind a written kind names, or undefined for any other kind. */
export function commonIndicatorKind(text: string): CommonIndicatorKind | undefined {
  return BY_NAME.get(normalisedKind(text));
}
