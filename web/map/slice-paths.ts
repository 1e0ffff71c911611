/**
 * One slice's polylines from a PathSet, as deck.gl binary path data. The vertices are a view
 * into the PathSet's coordinates (no copy); only the start indices are rebased to 0.
 */
import type { PathSet } from '../protocol';
import { angleBoundDeg } from './globe-lift';

export interface SlicePaths {
  /** Paths in the slice. */
  readonly length: number;
  /** Path i owns vertices startIndices[i] … startIndices[i + 1] − 1 (length + 1 values). */
  readonly startIndices: Uint32Array;
  /** [lon, lat] per vertex, degrees (a subarray of PathSet.coords). */
  readonly positions: Float32Array;
  /** Upper bound, degrees, of the longest segment's great-circle angle (0 when none). */
  readonly maxStepDeg: number;
}

export function slicePaths(paths: PathSet, slice: number): SlicePaths {
  const firstPath = paths.sliceStart[slice];
  const endPath = paths.sliceStart[slice + 1];
  const length = endPath - firstPath;
  const base = paths.pathStart[firstPath];
  const startIndices = new Uint32Array(length + 1);
  for (let i = 0; i <= length; i++) startIndices[i] = paths.pathStart[firstPath + i] - base;
  const positions = paths.coords.subarray(base * 2, paths.pathStart[endPath] * 2);
  let maxStepDeg = 0;
  for (let p = 0; p < length; p++) {
    for (let v = startIndices[p] + 1; v < startIndices[p + 1]; v++) {
      maxStepDeg = Math.max(maxStepDeg, angleBoundDeg(positions[v * 2 - 2], positions[v * 2 - 1], positions[v * 2], positions[v * 2 + 1]));
    }
  }
  return { length, startIndices, positions, maxStepDeg };
}
