import { readFile } from 'node:fs/promises';

/** A GeoJSON file parsed; a file that is not UTF-8 or not JSON is refused with its name. */
export async function readGeoJsonFile(path: string): Promise<unknown> {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(await readFile(path));
  } catch (error) {
    throw new Error(`${path}: cannot read it as UTF-8 text (${error instanceof Error ? error.message : String(error)}); expected a GeoJSON file`);
  }
  try {
    return JSON.parse(text);
  } catch (error) {
    // The parser's message may quote the text, line breaks and all: keep the message on one line.
    const why = (error instanceof Error ? error.message : String(error)).replace(/\s+/g, ' ');
    throw new Error(`${path}: not JSON (${why}); expected a GeoJSON FeatureCollection`);
  }
}
