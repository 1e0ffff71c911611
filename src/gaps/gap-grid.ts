/**
 * What the gap kernels need of a grid, built once and shared by every slice: the planar mesh
 * of its cell outlines, which cells share an edge, and each cell's centre.
 */
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { degreesToUnitVectors } from '../sphere/unit-vectors';
import { type CellAdjacency, cellAdjacency } from './cell-adjacency';
import { buildCellMesh, type CellMesh } from './cell-mesh';

export interface GapGrid {
  readonly grid: EqualAreaGrid;
  readonly mesh: CellMesh;
  readonly adjacency: CellAdjacency;
  /** Centre of each cell (grid.cellCentreInto), degrees. */
  readonly centreLat: Float64Array;
  readonly centreLon: Float64Array;
  /** The centres as unit vectors, interleaved [x0, y0, z0, x1, …]. */
  readonly centreXyz: Float64Array;
}

export function prepareGapGrid(grid: EqualAreaGrid): GapGrid {
  const mesh = buildCellMesh(grid);
  const centreLat = new Float64Array(grid.cellCount), centreLon = new Float64Array(grid.cellCount);
  const centre = new Float64Array(2);
  for (let cell = 0; cell < grid.cellCount; cell++) {
    grid.cellCentreInto(cell, centre);
    centreLat[cell] = centre[0];
    centreLon[cell] = centre[1];
  }
  return { grid, mesh, adjacency: cellAdjacency(mesh), centreLat, centreLon, centreXyz: degreesToUnitVectors(centreLat, centreLon) };
}
