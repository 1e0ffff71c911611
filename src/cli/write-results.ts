import { createWriteStream } from 'node:fs';
import { mkdir, realpath } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { EXPORT_FILES, exportFileChunks, type ExportFile, type ExportSource } from '../run';

/**
 * Creates `folder` when missing and returns the paths of `names` in it. Refuses when any of them
 * is one of the inputs, so that a user's file is never modified even when the output folder is
 * its folder.
 */
export async function prepareTargets(folder: string, names: readonly string[], inputs: readonly string[]): Promise<string[]> {
  await mkdir(folder, { recursive: true });
  const protectedPaths = new Set(await Promise.all(inputs.map((p) => realpath(p).catch(() => resolve(p)))));
  const targets = names.map((name) => join(folder, name));
  for (const target of targets) {
    const real = await realpath(target).catch(() => resolve(target));
    if (protectedPaths.has(real)) throw new Error(`Refusing to write ${target}: it is one of the input files. Choose another --out folder.`);
  }
  return targets;
}

/**
 * Writes a run's export files (`names`, those of coverage by default) into `folder` (created when missing), never over any of the inputs,
 * each streamed to disk chunk by chunk as it is made, so that memory stays bounded however large
 * the cell files grow.
 */
export async function writeExports(
  folder: string, source: ExportSource, inputs: readonly string[], names: readonly ExportFile[] = EXPORT_FILES,
): Promise<string[]> {
  const targets = await prepareTargets(folder, names, inputs);
  for (const [k, name] of names.entries()) await writeChunks(targets[k], exportFileChunks(source, name));
  return targets;
}

/** Writes `chunks` to `target` in order, waiting for the disk when it falls behind. */
export function writeChunks(target: string, chunks: AsyncIterable<Uint8Array>): Promise<void> {
  return pipeline(Readable.from(chunks, { objectMode: false }), createWriteStream(target));
}
