/** Reading the user's files in the worker: the occurrence table (streamed) and the optional inputs. */
import { plateFeaturesOf, type PlateFeature } from '../../src/placement';
import { poleTableFromRecords, type PoleTable } from '../../src/rotation';
import { readRecords } from '../../src/run';
import { createOccurrenceReader, type OccurrenceReadResult } from '../../src/table';
import { binsFromRecords, findChartInterval, type TimeScale } from '../../src/time';
import type { ExtraRole, ExtraSummary, Source } from '../protocol';
import { countWords } from '../text';
import { blobText, sha256Hex, sourceBlob, sourceName, streamText } from './stream-source';

export interface LoadedTable {
  readonly read: OccurrenceReadResult;
  readonly blob: Blob;
  readonly name: string;
  readonly sha256: string;
}

export interface Progress {
  readonly onBytes: (bytesRead: number, totalBytes: number, rowsRead: number) => void;
  readonly signal: AbortSignal;
}

export async function readOccurrenceTable(source: Source, mapping: Readonly<Record<string, string>>, progress: Progress): Promise<LoadedTable> {
  const blob = await sourceBlob(source);
  const name = sourceName(source);
  let rowsRead = 0;
  const reader = createOccurrenceReader({ mapping, resolveInterval: findChartInterval, onProgress: (rows) => (rowsRead = rows) });
  try {
    await streamText(blob, {
      push: (text) => reader.push(text),
      onBytes: (bytes, total) => progress.onBytes(bytes, total, rowsRead),
      signal: progress.signal,
    });
    return { read: reader.end(), blob, name, sha256: await sha256Hex(blob) };
  } catch (error) {
    throw named(name, error);
  }
}

export type ExtraInput =
  | { readonly role: 'rotation'; readonly poles: PoleTable }
  | { readonly role: 'polygons'; readonly features: readonly PlateFeature[] }
  | { readonly role: 'indicators'; readonly read: OccurrenceReadResult }
  | { readonly role: 'bins'; readonly scale: TimeScale };

export interface LoadedExtra {
  readonly input: ExtraInput;
  readonly summary: ExtraSummary;
  readonly blob: Blob;
  readonly sha256: string;
}

export async function readExtra(role: ExtraRole, source: Source): Promise<LoadedExtra> {
  const blob = await sourceBlob(source);
  const name = sourceName(source);
  try {
    const { input, description } = await parseExtra(role, blob, name);
    return { input, summary: { role, name, description }, blob, sha256: await sha256Hex(blob) };
  } catch (error) {
    throw named(name, error);
  }
}

async function parseExtra(role: ExtraRole, blob: Blob, name: string): Promise<{ input: ExtraInput; description: string }> {
  switch (role) {
    case 'rotation': {
      const { header, records } = await readRecords(blobText(blob));
      const poles = poleTableFromRecords(header, records, name);
      return { input: { role, poles }, description: countWords(records.length, 'pole') };
    }
    case 'bins': {
      const { header, records } = await readRecords(blobText(blob));
      const scale = binsFromRecords(header, records, name);
      return { input: { role, scale }, description: `${countWords(scale.names.length, 'bin')}, ${scale.baseMa[0]}–${scale.topMa[scale.names.length - 1]} Ma` };
    }
    case 'polygons': {
      let root: unknown;
      try {
        root = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(await blob.arrayBuffer()));
      } catch (error) {
        throw new Error(`not a UTF-8 JSON file (${error instanceof Error ? error.message : String(error)}); expected a GeoJSON FeatureCollection`);
      }
      const { features } = plateFeaturesOf(root, name);
      return { input: { role, features }, description: countWords(features.length, 'polygon') };
    }
    case 'indicators': {
      // Indicator tables name a kind where occurrence tables name a taxon.
      const reader = createOccurrenceReader({ mapping: { taxon: 'kind' }, resolveInterval: findChartInterval });
      await blobText(blob)((text) => reader.push(text));
      const read = reader.end();
      const rejected = read.rejects.length === 0 ? '' : `, ${read.rejects.length} rejected (first: line ${read.rejects[0].line}, ${read.rejects[0].field}: ${read.rejects[0].reason})`;
      return { input: { role, read }, description: `${countWords(read.table.count, 'site')} of ${countWords(read.table.taxon.values.length, 'kind')}${rejected}` };
    }
  }
}

function named(name: string, error: unknown): Error {
  if (error instanceof Error && error.name === 'CancelledError') return error;
  const message = error instanceof Error ? error.message : String(error);
  return new Error(message.startsWith(name) ? message : `${name}: ${message}`);
}
