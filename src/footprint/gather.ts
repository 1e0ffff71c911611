type Column = Float64Array | Uint32Array;

/**
 * Copies `source[order[k]]` into position k. The analysis gathers each column into slice order
 * once, so that every later pass over a slice reads memory in sequence instead of jumping
 * across the whole table (which dominated the time on a million rows).
 */
export function gather<T extends Column>(source: T, order: Uint32Array): T {
  const out = new (source.constructor as new (length: number) => T)(order.length);
  for (let k = 0; k < order.length; k++) out[k] = source[order[k]];
  return out;
}
