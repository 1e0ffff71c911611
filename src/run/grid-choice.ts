import { HEALPIX_MAX_NSIDE, HealpixGrid, LatitudeBandsGrid, parseGridName, type EqualAreaGrid } from '../grid';

/** The equal-area grid of a run. */
export type GridChoice =
  | { readonly kind: 'healpix'; readonly nside: number }
  | { readonly kind: 'bands'; readonly degrees: number };

export const GRID_EXPECTED = `healpix:NSIDE (NSIDE a power of two, 1–${HEALPIX_MAX_NSIDE}) or bands:DEG (0 < DEG <= 90)`;

/** Canonical text of a grid choice, the grid's name in exports: `healpix:32`, `bands:5`. */
export function gridText(choice: GridChoice): string {
  return choice.kind === 'healpix' ? `healpix:${choice.nside}` : `bands:${choice.degrees}`;
}

export function gridOf(choice: GridChoice): EqualAreaGrid {
  return choice.kind === 'healpix' ? new HealpixGrid(choice.nside) : new LatitudeBandsGrid(choice.degrees);
}

/** The grid choice a text names (as parseGridName reads it). */
export function gridChoiceOf(text: string): GridChoice | { readonly expected: string } {
  let grid: EqualAreaGrid;
  try {
    grid = parseGridName(text);
  } catch (error) {
    if (error instanceof RangeError) return { expected: GRID_EXPECTED };
    throw error;
  }
  const [kind, parameter] = grid.name.split(':');
  return kind === 'healpix' ? { kind: 'healpix', nside: Number(parameter) } : { kind: 'bands', degrees: Number(parameter) };
}
