// The spread bench's reference, run in a process of its own (fresh heap, measured like ours by
// report-peak-memory.mjs): papaparse parsing the table into typed-array columns, numbers into
// Float64Arrays and text into dictionary codes — what a careful one-off script builds before any
// analysis. Usage: node --import ./test/bench/report-peak-memory.mjs parse-to-columns.mjs <csv> <rows>
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';

const [path, expectedRows] = process.argv.slice(2);
const rows = Papa.parse(readFileSync(path, 'utf8'), { skipEmptyLines: true }).data;
const header = rows[0];
const count = rows.length - 1;
const numeric = ['max_ma', 'min_ma', 'palaeo_lat', 'palaeo_lon'].map((name) => ({ at: header.indexOf(name), values: new Float64Array(count) }));
const text = ['taxon', 'collection', 'environment'].map((name) => ({ at: header.indexOf(name), codes: new Uint32Array(count), dictionary: new Map() }));
for (let r = 0; r < count; r++) {
  const row = rows[r + 1];
  for (const column of numeric) column.values[r] = Number(row[column.at]);
  for (const column of text) {
    const value = row[column.at];
    let code = column.dictionary.get(value);
    if (code === undefined) column.dictionary.set(value, (code = column.dictionary.size));
    column.codes[r] = code;
  }
}
if (count !== Number(expectedRows)) {
  process.stderr.write(`reference: read ${count} rows, expected ${expectedRows}\n`);
  process.exit(1);
}
