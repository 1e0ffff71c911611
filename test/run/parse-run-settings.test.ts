// The one reader of run settings: what it accepts, the canonical text it writes, and the words it
// refuses with, which are the same for command-line options, session files and worker messages.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/problems';
import {
  DEFAULT_RUN_SETTINGS, assignChoiceOf, assignText, binsChoiceOf, binsText, gridChoiceOf, gridText, parseRunSettings, readSession, settingsText,
} from '../../src/run';

const AS_SETTINGS = { naming: 'setting' } as const;
const AS_OPTIONS = { naming: 'option' } as const;
const REQUIRED = { bins: 'stages', assign: 'mid-age', seed: 1, grid: 'healpix:32', map: {} };

/** The message parseRunSettings throws, or '' when it accepts. */
function refusal(raw: object, source: Parameters<typeof parseRunSettings>[1]): string {
  try {
    parseRunSettings(raw, source);
    return '';
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return (error as Error).message;
  }
}

describe('run settings', () => {
  it('take the command line defaults when nothing is given', () => {
    expect(parseRunSettings({}, AS_OPTIONS)).toEqual(DEFAULT_RUN_SETTINGS);
    expect(settingsText(DEFAULT_RUN_SETTINGS)).toEqual({
      bins: 'stages', assign: 'mid-age', seed: 1, grid: 'healpix:32', map: {}, rotateAt: 'slice', preferModel: false, beyondModel: 'reject',
    });
  });

  it('read the text of options and session files into tagged choices', () => {
    const settings = parseRunSettings(
      {
        bins: ' Equal:2.5 ', assign: 'share:0.75', seed: '42', grid: 'bands:10', map: ['taxon=genus', 'lat=y'], rotateAt: 'occurrence', preferModel: true,
        beyondModel: 'clamp', area: ' All', bandDeg: '15', within: true,
      },
      AS_OPTIONS,
    );
    expect(settings).toEqual({
      bins: { kind: 'equal', widthMyr: 2.5 }, assign: { kind: 'share', fraction: 0.75 }, seed: 42, grid: { kind: 'bands', degrees: 10 },
      map: { taxon: 'genus', lat: 'y' }, rotateAt: 'occurrence', preferModel: true, beyondModel: 'clamp',
      area: { kind: 'all' }, bandDeg: 15, within: true,
    });
    // The settings of gaps and of a fixed region are written only when they differ from the defaults.
    expect(settingsText(settings)).toMatchObject({ area: 'all', bandDeg: 15, within: true });
    expect(parseRunSettings({ ...REQUIRED, bins: 'file', assign: 'draw', seed: 4294967295 }, AS_SETTINGS)).toMatchObject({
      bins: { kind: 'file' }, assign: { kind: 'draw' }, seed: 4294967295,
    });
  });

  it('write each choice as text that reads back to the same choice', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.5, max: 500, noNaN: true }), fc.double({ min: 0.001, max: 1, noNaN: true }), fc.integer({ min: 0, max: 13 }),
      fc.double({ min: 0.5, max: 90, noNaN: true }),
      (width, fraction, level, degrees) => {
        for (const bins of [{ kind: 'equal', widthMyr: width }, { kind: 'chart', rank: 'epochs' }, { kind: 'file' }] as const) {
          expect(binsChoiceOf(binsText(bins))).toEqual(bins);
        }
        const assign = { kind: 'share', fraction } as const;
        expect(assignChoiceOf(assignText(assign))).toEqual(assign);
        for (const grid of [{ kind: 'healpix', nside: 2 ** level }, { kind: 'bands', degrees }] as const) {
          expect(gridChoiceOf(gridText(grid))).toEqual(grid);
        }
      },
    ));
  });

  it.each([
    ['bins', 'epochz', 'periods, epochs, stages, equal:N (N-Myr bins, e.g. equal:10) or file (an own bins table)'],
    ['bins', 'equal:-5', 'a bin width in Myr greater than 0, as in equal:10'],
    ['assign', 'first', 'mid-age, whole-range, share:F (0 < F <= 1) or draw'],
    ['assign', 'share:1.5', 'a share of the age range greater than 0 and at most 1, as in share:0.5'],
    ['seed', -1, 'a whole number from 0 to 4294967295'],
    ['seed', 2.5, 'a whole number from 0 to 4294967295'],
    ['seed', 4294967296, 'a whole number from 0 to 4294967295'],
    ['grid', 'hexes:3', 'healpix:NSIDE (NSIDE a power of two, 1–8192) or bands:DEG (0 < DEG <= 90)'],
    ['grid', 'healpix:33', 'healpix:NSIDE (NSIDE a power of two, 1–8192) or bands:DEG (0 < DEG <= 90)'],
    ['rotateAt', 'sideways', 'slice or occurrence'],
    ['beyondModel', 'wrap', 'reject or clamp'],
    ['preferModel', 'yes', 'true or false'],
    ['bins', 7, 'periods, epochs, stages, equal:N (N-Myr bins, e.g. equal:10) or file (an own bins table)'],
    ['quorum', 0, 'a number above 0 and at most 1, e.g. 0.5'],
    ['trials', 2.5, 'a whole number from 1 to 100000'],
    ['rarefy', 0, 'a whole number of occurrences, at least 1'],
    ['ageTrials', -3, 'a whole number from 1 to 100000'],
    ['regionKm', 10000, 'a distance in km above 0 and below 10000'],
    ['area', 'sea', 'all, occupied, or file (a GeoJSON file of polygons)'],
    ['bandDeg', 0, 'a band width in degrees, more than 0 and at most 180 (e.g. 10)'],
    ['bandDeg', '200', 'a band width in degrees, more than 0 and at most 180 (e.g. 10)'],
    ['within', 'yes', 'true or false'],
    ['colour', 'red', 'one of the settings bins, assign, seed, grid, map, rotateAt, preferModel, beyondModel, area, bandDeg, within, quorum, trials, rarefy, ageTrials, regionKm'],
  ])('refuse %s %j, naming the field, the value and what was expected', (name, value, expected) => {
    const shown = typeof value === 'string' ? value : JSON.stringify(value);
    expect(refusal({ ...REQUIRED, [name]: value }, { name: 'session.json', naming: 'setting' }))
      .toBe(`session.json, settings.${name} "${shown}": expected ${expected}`);
  });

  it('read the curves settings only when one is given, the rest at their defaults, and write them back', () => {
    expect(parseRunSettings(REQUIRED, AS_SETTINGS).curves).toBeUndefined();
    expect(settingsText(parseRunSettings(REQUIRED, AS_SETTINGS))).not.toHaveProperty('quorum');
    const given = parseRunSettings({ quorum: '0.4', rarefy: '20' }, AS_OPTIONS);
    expect(given.curves).toEqual({ quorum: 0.4, trials: 200, rarefy: 20, regionKm: 1500 });
    expect(parseRunSettings({ ...REQUIRED, ...settingsText(given) }, AS_SETTINGS)).toEqual(given);
    expect(refusal({ regionKm: 'far' }, AS_OPTIONS)).toBe('--region-km "far": expected a distance in km above 0 and below 10000');
  });

  it('name an option as the command line spells it, with the same value and expectation', () => {
    expect(refusal({ rotateAt: 'sideways', seed: 'x', map: ['taxon'] }, AS_OPTIONS)).toBe([
      '--seed "x": expected a whole number from 0 to 4294967295',
      '--map "taxon": expected field=column, e.g. taxon=genus_name',
      '--rotate-at "sideways": expected slice or occurrence',
    ].join('\n'));
    expect(refusal({ map: ['taxon=a', 'taxon=b'] }, AS_OPTIONS)).toBe('--map "taxon=b": expected each field named once; taxon is already mapped to a');
  });

  it('ask a session file for the settings every format has written', () => {
    expect(refusal({ assign: 'mid-age', seed: 1, map: {} }, { name: 's.json', naming: 'setting' })).toBe([
      's.json, settings.bins "": expected a value; a session file gives bins, assign, seed, grid, map',
      's.json, settings.grid "": expected a value; a session file gives bins, assign, seed, grid, map',
    ].join('\n'));
    expect(refusal({ ...REQUIRED, map: { taxon: 3 } }, AS_SETTINGS)).toBe('settings.map "3": expected the header of the column for taxon');
  });

  it('read the names session files used before format 3 as the present ones, and write the present ones', () => {
    const former = { bins: 'stages', seed: 7, grid: 'healpix:32', map: { max_ma: 'from', MIN_MA: 'to', taxon: 'genus' } };
    const read = (assign: string) => parseRunSettings({ ...former, assign }, AS_SETTINGS);
    expect(read('midpoint').assign).toEqual({ kind: 'mid-age' });
    expect(read(' Within ').assign).toEqual({ kind: 'whole-range' });
    expect(read('overlap:0.25').assign).toEqual({ kind: 'share', fraction: 0.25 });
    expect(read('random').assign).toEqual({ kind: 'draw' });
    expect(read('midpoint').map).toEqual({ oldest_ma: 'from', youngest_ma: 'to', taxon: 'genus' });
    expect(settingsText(read('overlap:0.25'))).toMatchObject({ assign: 'share:0.25', map: { oldest_ma: 'from', youngest_ma: 'to', taxon: 'genus' } });
    // A bad former value is shown as written; a field given by both names is refused.
    expect(refusal({ ...former, assign: 'overlap:2' }, AS_SETTINGS)).toBe('settings.assign "overlap:2": expected a share of the age range greater than 0 and at most 1, as in share:0.5');
    expect(refusal({ ...REQUIRED, map: { max_ma: 'a', oldest_ma: 'b' } }, AS_SETTINGS))
      .toBe('settings.map "b": expected each field named once; oldest_ma is already mapped to a');
  });

  it('take only the present names on the command line', () => {
    expect(refusal({ assign: 'midpoint' }, AS_OPTIONS)).toBe('--assign "midpoint": expected mid-age, whole-range, share:F (0 < F <= 1) or draw');
    expect(refusal({ assign: 'overlap:0.5' }, AS_OPTIONS)).toBe('--assign "overlap:0.5": expected mid-age, whole-range, share:F (0 < F <= 1) or draw');
    expect(parseRunSettings({ map: ['max_ma=from'] }, AS_OPTIONS).map).toEqual({ max_ma: 'from' }); // refused by the column mapper, naming the fields
  });

  it('read a session file the same way, whoever opens it', () => {
    const file = (settings: object) => JSON.stringify({
      format: 'driftgrid-session', formatVersion: 2, tool: { name: 'driftgrid', version: '0.1.0' },
      inputs: { occurrences: { path: 'o.csv', sha256: 'a'.repeat(64), bytes: 1 } }, settings,
    });
    expect(readSession(file({ ...REQUIRED, rotateAt: 'occurrence' }), 's.json').settings.rotateAt).toBe('occurrence');
    expect(() => readSession(file({ ...REQUIRED, grid: undefined }), 's.json')).toThrow('s.json, settings.grid "": expected a value');
    expect(() => readSession(file({ ...REQUIRED, seed: 'one' }), 's.json')).toThrow('s.json, settings.seed "one": expected a whole number from 0 to 4294967295');
  });
});
