// Grid names as defined in /work/shared/DESIGN.md: `healpix:NSIDE` (NSIDE a power of two) and
// `bands:DEG`; the canonical name is what exports write in their `grid` column.
import { describe, expect, it } from 'vitest';
import { HealpixGrid, LatitudeBandsGrid, parseGridName } from '../../src/grid';

describe('parseGridName', () => {
  it('reads healpix:NSIDE and bands:DEG into grids with canonical names', () => {
    const healpix = parseGridName('healpix:32');
    expect(healpix).toBeInstanceOf(HealpixGrid);
    expect(healpix.name).toBe('healpix:32');
    expect(healpix.cellCount).toBe(12 * 32 * 32);
    expect(parseGridName('healpix:1').cellCount).toBe(12);
    expect(parseGridName('healpix:8192').cellCount).toBe(12 * 8192 * 8192);
    const bands = parseGridName('bands:2.50');
    expect(bands).toBeInstanceOf(LatitudeBandsGrid);
    expect(bands.name).toBe('bands:2.5');
    expect(parseGridName('bands:90').cellCount).toBe(6); // worked by hand in latitude-bands.test.ts
    expect(parseGridName('bands:.5').name).toBe('bands:0.5');
  });

  it('refuses an nside that is not a power of two from 1 to 8192, naming the text', () => {
    for (const text of ['healpix:0', 'healpix:33', 'healpix:16384']) {
      expect(() => parseGridName(text)).toThrow(`Invalid grid "${text}": NSIDE must be a power of two from 1 to 8192.`);
    }
  });

  it('refuses a band size outside (0, 90], naming the text', () => {
    for (const text of ['bands:0', 'bands:0.0', 'bands:91']) {
      expect(() => parseGridName(text)).toThrow(`Invalid grid "${text}": DEG must be a number of degrees with 0 < DEG <= 90.`);
    }
  });

  it('refuses anything else with the two accepted forms in the message', () => {
    for (const text of ['hexes:3', '', 'healpix', 'healpix:', 'healpix:32 ', 'HEALPIX:32', 'healpix:3.0', 'bands:-5', 'bands:1e1', 'bands:5deg']) {
      expect(() => parseGridName(text)).toThrow(
        `Unknown grid "${text}": expected healpix:NSIDE (NSIDE a power of two, 1–8192) or bands:DEG (0 < DEG <= 90).`,
      );
    }
  });
});
