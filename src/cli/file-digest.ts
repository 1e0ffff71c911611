import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import type { SessionInput } from '../export/session';

/** SHA-256 and size of a file, read as a stream (the file is opened read-only). */
export async function fileDigest(path: string): Promise<{ sha256: string; bytes: number }> {
  const hash = createHash('sha256');
  let bytes = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) {
    hash.update(chunk as Buffer);
    bytes += (chunk as Buffer).length;
  }
  return { sha256: hash.digest('hex'), bytes };
}

/** Fails when a file recorded in a session has changed since, so a rerun cannot silently differ. */
export async function checkUnchanged(path: string, recorded: SessionInput): Promise<void> {
  const now = await fileDigest(path);
  if (now.sha256 !== recorded.sha256) {
    throw new Error(`${path} has changed since the session was recorded (SHA-256 ${now.sha256}, session says ${recorded.sha256}).`);
  }
}
