import { createWriteStream } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { basename, extname } from 'node:path';
import { finished } from 'node:stream/promises';
import { PLACEMENT_COLUMNS, placementFields } from '../export/placement-fields';
import { rejectsCsv } from '../export/rejects-csv';
import { collectExclusions, placeOccurrences, ROTATE_AT, type Placement } from '../placement';
import { EXCLUSIONS, EXCLUSION_STAGE, exclusionName } from '../problems';
import { normaliseHeader, type Delimiter, type OccurrenceTable } from '../table/index';
import { assignRuleOf, isBlankRecord } from '../run';
import { assignSlices, findChartInterval } from '../time';
import { oldestAge } from '../table/oldest-age';
import { excludedRowsOfFile } from './excluded-rows';
import { readTableFile, scanRecordsFile } from './read-table-file';
import type { RotateContext } from './rotate-command';
import { countBy, modelNotes } from './summary';
import { prepareTargets } from './write-results';

/** Characters of output gathered before they are handed to the file. */
const FLUSH_CHARS = 1 << 20;

/**
 * rotate on a table: the file written back unchanged, record by record, with
 * palaeo_lat, palaeo_lon and placed_at_ma appended (empty where a row has no position;
 * those rows are in rejects.csv with the reason). Table palaeocoordinates are not used.
 */
export async function rotateTable(context: RotateContext): Promise<void> {
  const { options, model } = context;
  const { input } = options;
  const read = await readTableFile(input, { mapping: options.settings.map, resolveInterval: findChartInterval }).catch((error: unknown) => {
    throw new Error(`${input}: ${error instanceof Error ? error.message : String(error)}`);
  });
  refuseClash(read.columns.header, input);
  const { table } = read;
  const scale = context.scaleFor(oldestAge(table));
  const assignment = assignSlices(table.oldestMa, table.youngestMa, scale, assignRuleOf(options.settings.assign, options.settings.seed));
  const placement = placeOccurrences(table, assignment, scale, model, { rotateAt: options.settings.rotateAt, preferModel: false, modelOnly: true });
  const exclusions = collectExclusions(assignment, placement, assignment.slice);
  const rejects = [...read.rejects, ...(await excludedRowsOfFile(input, table, exclusions, placement, model, options.settings.rotateAt))];

  const extension = extname(input);
  const [tablePath, rejectsPath] = await prepareTargets(options.out, [`${basename(input, extension)}-rotated${extension}`, 'rejects.csv'], context.inputs);
  await writeTableBack(input, tablePath, table, placement, read.delimiter);
  await writeFile(rejectsPath, rejectsCsv(rejects));
  if (options.quiet) return;
  const n = (value: number) => value.toLocaleString('en');
  const out = [`rows read: ${n(read.rowsRead)}; accepted: ${n(table.count)}; rejected on reading: ${n(read.rejects.length)}`];
  for (const [field, count] of countBy(read.rejects.map((r) => r.field))) out.push(`  rejected for ${field}: ${n(count)}`);
  const at = options.settings.rotateAt === ROTATE_AT.slice ? "each slice's mid-age" : "each row's own age";
  out.push(`rotated with ${model.source} to ${at}: ${n(placement.fromModel)}${placement.clamped > 0 ? ` (${n(placement.clamped)} clamped to the oldest age the model reaches for their plate)` : ''}`);
  for (const [reason, count] of countBy(Array.from(exclusions.reasons, (code) => {
    const { stage, reason } = EXCLUSIONS[exclusionName(code)];
    return `${stage === EXCLUSION_STAGE.slice ? 'not in any slice' : 'not placed'}, ${reason}`;
  }))) {
    out.push(`  ${reason}: ${n(count)}`);
  }
  out.push(...modelNotes(model));
  out.push(`wrote ${tablePath}, ${rejectsPath}`);
  out.push(`elapsed: ${((performance.now() - context.started) / 1000).toFixed(2)} s`);
  process.stdout.write(out.join('\n') + '\n');
}

/** The appended columns must not already be there: the result would have two of one name. */
function refuseClash(header: readonly string[], input: string): void {
  const taken = new Set(PLACEMENT_COLUMNS.map(normaliseHeader));
  const clash = header.flatMap((h, i) => (taken.has(normaliseHeader(h)) ? [`column ${i + 1} ("${h}")`] : []));
  if (clash.length === 0) return;
  throw new Error(`${input}: ${clash.join(' and ')} ha${clash.length === 1 ? 's' : 've'} the name of a column rotate appends (${PLACEMENT_COLUMNS.join(', ')}); rename or remove ${clash.length === 1 ? 'it' : 'them'} in a copy of the table first.`);
}

/** The line ending of the first line: CRLF, CR or LF (LF when the chunk holds no line break). */
function lineEnding(bytes: Uint8Array): string {
  for (let i = 0; i < bytes.length; i++) {
    if (bytes[i] === 10) return '\n';
    if (bytes[i] === 13) return bytes[i + 1] === 10 ? '\r\n' : '\r';
  }
  return '\n';
}

/**
 * Streams the input again and writes each record as it stands (raw text, quotes and all), the
 * placement fields appended; blank lines stay blank, so line numbers match the input's. A
 * byte-order mark is kept; every line ends as the input's first line does.
 */
async function writeTableBack(input: string, target: string, table: OccurrenceTable, placement: Placement, delimiter: Delimiter): Promise<void> {
  const out = createWriteStream(target);
  const done = finished(out);
  let pending: string[] = [];
  let size = 0;
  const push = (text: string): void => {
    pending.push(text);
    size += text.length;
    if (size < FLUSH_CHARS) return;
    out.write(pending.join(''));
    pending = [];
    size = 0;
  };
  let eol = '\n';
  let firstChunk = true;
  let header = true;
  let row = 0;
  await scanRecordsFile(input, (r) => {
    if (isBlankRecord(r)) {
      push(eol);
    } else if (header) {
      header = false;
      push(`${r.raw}${PLACEMENT_COLUMNS.map((c) => delimiter + c).join('')}${eol}`);
    } else if (row < table.count && table.line[row] === r.line) {
      // Placement.lat is NaN for a row without a position: three empty fields.
      push(`${r.raw}${placementFields(placement.lat[row], placement.lon[row], placement.ageMa[row], delimiter)}${eol}`);
      row++;
    } else {
      push(`${r.raw}${placementFields(Number.NaN, 0, 0, delimiter)}${eol}`); // rejected on reading
    }
  }, {
    delimiter,
    onChunk: (bytes) => {
      if (!firstChunk) return;
      firstChunk = false;
      eol = lineEnding(bytes);
      if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) push('\ufeff');
    },
  });
  out.end(pending.join(''));
  await done;
}
