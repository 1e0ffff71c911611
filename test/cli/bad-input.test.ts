import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { runCli } from './run-cli';

const BAD = 'test/fixtures/bad';
const fixtures = readdirSync(BAD).filter((name) => name !== 'README.md');
const digest = (path: string) => createHash('sha256').update(readFileSync(path)).digest('hex');

describe('every malformed file in test/fixtures/bad', () => {
  it('is more than twenty files', () => {
    expect(fixtures.length).toBeGreaterThanOrEqual(20);
  });

  it.each(fixtures)('%s ends with status 1 and a message naming the file and the problem, or with its bad rows in rejects.csv', async (name) => {
    const path = join(BAD, name);
    const before = { sha: digest(path), mtime: statSync(path).mtimeMs };
    const out = mkdtempSync(join(tmpdir(), 'driftgrid-bad-'));
    const run = await runCli('coverage', path, '--out', out);
    if (run.status === 1) {
      expect(run.stderr).toMatch(new RegExp(`^driftgrid: ${path.replaceAll('.', '\\.')}: \\S`));
      expect(run.stderr).not.toMatch(/\n\s+at /); // no stack trace
      expect(run.stderr.trim().split('\n').length).toBeLessThanOrEqual(3);
    } else {
      expect(run.status).toBe(0);
      const rejects = Papa.parse<Record<string, string>>(readFileSync(join(out, 'rejects.csv'), 'utf8'), { header: true, skipEmptyLines: true }).data;
      expect(rejects.length).toBeGreaterThan(0);
      for (const reject of rejects) {
        expect(Number(reject.line)).toBeGreaterThan(1);
        expect(reject.field).not.toBe('');
        expect(reject.reason).toMatch(/expected|give|blank|must|not a|malformed|missing/);
        expect(reject.original).not.toBe('');
      }
      // Nothing is lost: every row read is either counted in a slice or listed as rejected.
      const slices = readFileSync(join(out, 'slices.csv'), 'utf8');
      const inSlices = slices.trim().split('\n').slice(1).reduce((sum, line) => sum + Number(line.split(',')[4]), 0);
      const rowsRead = Number(/rows read: ([\d,]+)/.exec(run.stdout)?.[1].replaceAll(',', ''));
      expect(inSlices + rejects.length).toBe(rowsRead);
    }
    expect({ sha: digest(path), mtime: statSync(path).mtimeMs }).toEqual(before);
  });
});

describe('options that cannot be used', () => {
  const table = 'test/fixtures/good/synonym-headers.csv';
  it.each([
    [['coverage'], /needs an occurrence table/],
    [['coverage', table, '--grid', 'hexes:3'], /--grid "hexes:3": expected healpix:NSIDE/],
    [['coverage', table, '--grid', 'healpix:33'], /power of two/],
    [['coverage', table, '--bins', 'equal:-5'], /equal/],
    [['coverage', table, '--assign', 'share:1.5'], /share/],
    [['coverage', table, '--seed', 'x'], /--seed "x": expected a whole number/],
    [['coverage', table, '--map', 'taxon'], /expected field=column/],
    [['coverage', table, '--colour', 'red'], /Unknown option '--colour'/],
    [['coverage', 'no-such-file.csv'], /no-such-file\.csv/],
    [['spin'], /Unknown command "spin"/],
    [['coverage', '--session', 'x.json', '--grid', 'bands:5'], /--session fixes .* --grid/],
    // The page refuses this file in the same words (test/e2e/session-refusal.e2e.test.ts).
    [['coverage', '--session', 'test/e2e/fixtures/session-rotate-sideways.json'], /^driftgrid: test\/e2e\/fixtures\/session-rotate-sideways\.json, settings\.rotateAt "sideways": expected slice or occurrence\n$/],
  ])('%j is refused with a message saying what was expected', async (args, message) => {
    const run = await runCli(...args, '--out', mkdtempSync(join(tmpdir(), 'driftgrid-opt-')));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(message);
    expect(run.stderr).not.toMatch(/\n\s+at /);
  });
});
