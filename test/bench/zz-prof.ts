import { readTableFile } from '../../src/cli/read-table-file';
import { findChartInterval, parseBinsOption, parseAssignRule } from '../../src/time';
import { parseGridName } from '../../src/grid';
import { analyse } from '../../src/analysis';
const read = await readTableFile(process.argv[2], { resolveInterval: findChartInterval, mapping: {} });
const grid = parseGridName('healpix:32');
const scale = parseBinsOption('stages');
for (let i = 0; i < 3; i++) { const t = performance.now(); analyse(read.table, { scale, rule: parseAssignRule('midpoint', 1), grid }); console.log('analyse', (performance.now() - t).toFixed(0)); }
