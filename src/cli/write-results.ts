import { mkdir, realpath, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

/**
 * Writes result files into `folder` (created when missing). Refuses to write over any of the
 * inputs, so that a user's file is never modified even when --out points at its folder.
 */
export async function writeResults(folder: string, files: Readonly<Record<string, string | Uint8Array>>, inputs: readonly string[]): Promise<string[]> {
  await mkdir(folder, { recursive: true });
  const protectedPaths = new Set(await Promise.all(inputs.map((p) => realpath(p).catch(() => resolve(p)))));
  const targets = Object.keys(files).map((name) => join(folder, name));
  for (const target of targets) {
    const real = await realpath(target).catch(() => resolve(target));
    if (protectedPaths.has(real)) throw new Error(`Refusing to write ${target}: it is one of the input files. Choose another --out folder.`);
  }
  await Promise.all(Object.entries(files).map(([name, text]) => writeFile(join(folder, name), text)));
  return targets;
}
