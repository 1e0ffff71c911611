/**
 * Latitude span left after removing the one position whose removal narrows it most, degrees.
 * Only the southernmost or the northernmost position can narrow it, so the answer is the smaller
 * of (max − second lowest) and (second highest − min), counting equal latitudes separately: a
 * shared extreme is not narrowed by removing one of its holders. NaN for fewer than two positions
 * (none would be left); 0 for two.
 */
export function spanWithoutDeg(latDeg: Float64Array): number {
  const n = latDeg.length;
  if (n < 2) return NaN;
  let min = Infinity, secondMin = Infinity, max = -Infinity, secondMax = -Infinity;
  for (let i = 0; i < n; i++) {
    const lat = latDeg[i];
    if (lat < min) { secondMin = min; min = lat; } else if (lat < secondMin) secondMin = lat;
    if (lat > max) { secondMax = max; max = lat; } else if (lat > secondMax) secondMax = lat;
  }
  return Math.min(max - secondMin, secondMax - min);
}
