import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli';

describe('the coverage summary', () => {
  it('prints each kind of slice caution once, with how many slices and their names', async () => {
    // Slice 20–10 Ma: two places (few, and no hull). Slice 10–0 Ma: twelve places 30° apart
    // along latitude 10°N, whose hull covers about 41% of the sphere (wide).
    const rows = ['taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,collection', 'Alpha,16,14,-5,20,c1', 'Beta,15,13,5,22,c2'];
    for (let k = 0; k < 12; k++) rows.push(`Gamma,6,4,10,${-180 + 30 * k},d${k}`);
    const dir = mkdtempSync(join(tmpdir(), 'driftgrid-cautions-'));
    writeFileSync(join(dir, 'cautions.csv'), rows.join('\n'));
    const run = await runCli('coverage', join(dir, 'cautions.csv'), '--bins', 'equal:10', '--grid', 'healpix:4', '--out', join(dir, 'out'));
    expect(run.status).toBe(0);
    const lines = run.stdout.split('\n');
    expect(lines).toContain('  1 slice(s) with fewer than 10 distinct places (every footprint measure is noisy): 20–10 Ma');
    expect(lines).toContain('  1 slice(s) with no convex hull, fewer than three distinct positions (hull_km2 left empty): 20–10 Ma');
    expect(lines).toContain('  1 slice(s) with a hull over 35% of the sphere, close to a hemisphere (a few outlying places govern its area): 10–0 Ma');
  });
});
