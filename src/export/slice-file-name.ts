/** Digits of the slice number in file names, at least. */
const MIN_DIGITS = 3;

/**
 * `slice-001-asselian.geojson`: the slice number (from 1, zero-padded so that names sort in
 * slice order) and the slice name reduced to lower-case ASCII letters, digits and hyphens
 * (accents dropped, every other run of characters one hyphen), so that the name is safe on
 * every file system; the number alone keeps names unique.
 */
export function sliceFileName(slice: number, sliceCount: number, name: string, extension: string): string {
  const digits = Math.max(MIN_DIGITS, String(sliceCount).length);
  const plain = name.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '');
  return `slice-${String(slice).padStart(digits, '0')}${plain === '' ? '' : `-${plain}`}.${extension}`;
}
