/** The available area of `gaps`: the whole sphere, the cells occupied in any slice, or the polygons of a GeoJSON file. */
export type AreaChoice = { readonly kind: 'all' } | { readonly kind: 'occupied' } | { readonly kind: 'file' };

export const AREA_EXPECTED = 'all, occupied, or file (a GeoJSON file of polygons)';

const AREA_WORDS = ['all', 'occupied', 'file'] as const;

export function areaText(choice: AreaChoice): string {
  return choice.kind;
}

/** True when `--area` text names a built-in area rather than a GeoJSON file. */
export function namesBuiltInArea(text: string): boolean {
  return /^\s*(all|occupied)\s*$/i.test(text);
}

export function areaChoiceOf(text: string): AreaChoice | { readonly expected: string } {
  const word = text.trim().toLowerCase();
  return (AREA_WORDS as readonly string[]).includes(word) ? { kind: word as AreaChoice['kind'] } : { expected: AREA_EXPECTED };
}
