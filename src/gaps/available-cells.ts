/**
 * Which cells are available to be sampled: a cell is available when its centre lies inside the
 * area. The area is the whole sphere, the union of the cells occupied in any slice, or a set
 * of polygons (see spherical-polygons.ts for how they are read).
 */
import type { GapGrid } from './gap-grid';
import type { OccupiedCells } from './gap-summary';
import { pointsInSphericalPolygons, type SphericalPolygons } from './spherical-polygons';

export const AREA_KINDS = { all: 'all', occupied: 'occupied', polygons: 'polygons' } as const;

export type AvailableArea =
  | { readonly kind: typeof AREA_KINDS.all }
  | { readonly kind: typeof AREA_KINDS.occupied }
  | { readonly kind: typeof AREA_KINDS.polygons; readonly polygons: SphericalPolygons };

/** One byte per cell, 1 where the cell is available. `occupied` is read for the `occupied` area only. */
export function availableCells(g: GapGrid, area: AvailableArea, occupied: OccupiedCells): Uint8Array {
  const out = new Uint8Array(g.grid.cellCount);
  switch (area.kind) {
    case AREA_KINDS.all:
      return out.fill(1);
    case AREA_KINDS.occupied:
      for (const cell of occupied.cell) out[cell] = 1;
      return out;
    case AREA_KINDS.polygons:
      return pointsInSphericalPolygons(area.polygons, g.centreLat, g.centreLon, out);
  }
}
